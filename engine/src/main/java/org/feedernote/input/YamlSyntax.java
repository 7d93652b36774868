package org.feedernote.input;

import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;

/**
 * A YAML syntax error in plain words: where it is and what usually causes it. The parser's own
 * words name its state ("while parsing a block collection"), which tells a reader nothing; its
 * marks say where it was and what it found, and from those most slips can be named.
 */
final class YamlSyntax {
    private YamlSyntax() {}

    private static final String GENERAL = "check the indentation (spaces, not tabs), the ':' after each key,"
            + " and that every quote and bracket is closed";

    /** The error for the parser's exception, or null when it is not a YAML syntax error with marks. */
    static InputError explain(String file, Throwable e) {
        Throwable cause = e;
        while (cause != null && !(cause instanceof MarkedYAMLException)) cause = cause.getCause();
        if (cause == null) return null;
        MarkedYAMLException y = (MarkedYAMLException) cause;
        String problem = y.getProblem() == null ? "" : y.getProblem();
        String context = y.getContext() == null ? "" : y.getContext();
        Mark at = y.getProblemMark() != null ? y.getProblemMark() : y.getContextMark();
        Mark opened = y.getContextMark() != null ? y.getContextMark() : at;
        if (at == null) return null;
        String words;
        Mark where = at;
        if (problem.contains("cannot start any token")) {
            String c = between(problem, "found character '", "'");
            words = c.startsWith("\\t") || c.startsWith("\t")
                    ? "a tab character: YAML indents with spaces only; replace the tab by spaces"
                    : "the character '" + c + "' cannot begin a value; put the value in quotes (\"" + c + "…\")";
        } else if (context.contains("quoted scalar")) {
            where = opened;
            words = problem.contains("end of stream")
                    ? "the quote opened here is never closed; add the closing quote"
                    : "a quoted text that is not closed or holds an unknown escape: close the quote on its line,"
                            + " and write a backslash as \\\\ or use single quotes";
        } else if (problem.contains("could not find expected ':'")) {
            where = opened;
            words = "this line has a key without ':' after it (or a text running on from the line above); write 'key: value'";
        } else if (problem.contains("mapping values are not allowed")) {
            words = "a ':' where no key can begin: the line is indented deeper than the key above it allows,"
                    + " or a value holds ': ' and needs quotes";
        } else if (problem.startsWith("expected ',' or ']'")) {
            words = "the list opened with '[' at line " + line(opened) + ", column " + column(opened)
                    + " is not closed: add ']' (or a ',' between its items)";
        } else if (problem.startsWith("expected ',' or '}'")) {
            words = "the mapping opened with '{' at line " + line(opened) + ", column " + column(opened)
                    + " is not closed: add '}' (or a ',' between its entries)";
        } else if (problem.contains("but found ']'") || problem.contains("but found '}'")) {
            String bracket = problem.contains("']'") ? "]" : "}";
            words = "a closing '" + bracket + "' without an opening '" + ("]".equals(bracket) ? "[" : "{") + "' before it";
        } else if (problem.contains("expected <block end>") || problem.contains("did not find expected key")
                || problem.contains("did not find expected '-'")) {
            words = "this line is indented differently from the lines above it: the keys of one mapping,"
                    + " and the '- ' of one list, start in the same column (indent with spaces)";
        } else if (problem.contains("undefined alias")) {
            words = "'*' begins an alias to an anchor ('&name') that is not defined above; put a text starting with '*' in quotes";
        } else if (context.contains("alias") || context.contains("anchor")) {
            words = "'*' and '&' begin aliases and anchors in YAML; put a text starting with them in quotes";
        } else if (context.contains("block scalar")) {
            words = "a block text after '|' or '>' is not well formed; indent its lines under the key, or put the text in quotes";
        } else {
            words = problem.isEmpty() ? context : problem;
            words = words.strip() + "; " + GENERAL;
        }
        return new InputError(file, line(where), column(where), "", "the file is not valid YAML: " + words);
    }

    private static int line(Mark m) {
        return m.getLine() + 1;
    }

    private static int column(Mark m) {
        return m.getColumn() + 1;
    }

    private static String between(String text, String before, String after) {
        int start = text.indexOf(before);
        if (start < 0) return "?";
        start += before.length();
        int end = text.indexOf(after, start);
        return end < 0 ? text.substring(start) : text.substring(start, end);
    }
}
