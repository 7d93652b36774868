package org.feedernote.input;

/**
 * One problem in a design input, with where it is and what was expected. place: where a
 * spreadsheet or CSV input holds it ("circuits!F12"), given instead of line and column in the
 * text; null for YAML and JSON. line and column then only order the errors.
 */
public record InputError(String file, int line, int column, String path, String message, String place) implements Comparable<InputError> {
    public InputError(String file, int line, int column, String path, String message) {
        this(file, line, column, path, message, null);
    }

    public String text() {
        String at = place == null ? file + ":" + line + ":" + column : file + ": " + place;
        return at + ": " + (path.isEmpty() ? "" : path + ": ") + message;
    }

    @Override public int compareTo(InputError o) {
        int c = Integer.compare(line, o.line);
        if (c != 0) return c;
        c = Integer.compare(column, o.column);
        return c != 0 ? c : text().compareTo(o.text());
    }
}
