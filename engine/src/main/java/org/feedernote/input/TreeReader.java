package org.feedernote.input;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import org.yaml.snakeyaml.LoaderOptions;

/**
 * Reads YAML or JSON into a {@link Node} tree with positions, using Jackson's streaming parser
 * for both. Duplicate keys are reported, not silently overwritten.
 */
final class TreeReader {
    /** Large installations in flow style run to several MB; raised deliberately, alias and depth limits kept. */
    private static final int MAX_CODE_POINTS = 64 * 1024 * 1024;

    private final String file;
    private final List<InputError> errors;

    private TreeReader(String file, List<InputError> errors) {
        this.file = file;
        this.errors = errors;
    }

    static Node read(String file, String text, boolean json, List<InputError> errors) {
        TreeReader reader = new TreeReader(file, errors);
        try (JsonParser p = factory(json).createParser(text)) {
            JsonToken first = p.nextToken();
            if (first == null) {
                errors.add(new InputError(file, 1, 1, "", "the file is empty; expected a design input (format: 1, project, supply, boards, circuits)"));
                return null;
            }
            Node root = reader.value(p, Where.ROOT);
            if (p.nextToken() != null) {
                JsonLocation loc = p.currentTokenLocation();
                errors.add(new InputError(file, loc.getLineNr(), loc.getColumnNr(), "", "unexpected content after the end of the document"));
            }
            return root;
        } catch (JsonProcessingException e) {
            InputError explained = json ? null : YamlSyntax.explain(file, e);
            if (explained != null) {
                errors.add(explained);
                return null;
            }
            JsonLocation loc = e.getLocation();
            int line = loc == null ? 1 : Math.max(1, loc.getLineNr());
            int col = loc == null ? 1 : Math.max(1, loc.getColumnNr());
            errors.add(new InputError(file, line, col, "", "the file is not valid " + (json ? "JSON" : "YAML") + ": " + firstLine(e.getOriginalMessage())));
            return null;
        } catch (IOException e) {
            errors.add(new InputError(file, 1, 1, "", "cannot read the file: " + e.getMessage()));
            return null;
        }
    }

    private static JsonFactory factory(boolean json) {
        StreamReadConstraints constraints = StreamReadConstraints.builder().maxNestingDepth(200).build();
        if (json) {
            return JsonFactory.builder().streamReadConstraints(constraints).build();
        }
        LoaderOptions options = new LoaderOptions();
        options.setCodePointLimit(MAX_CODE_POINTS);
        options.setMaxAliasesForCollections(50);
        options.setNestingDepthLimit(200);
        return YAMLFactory.builder().loaderOptions(options).streamReadConstraints(constraints).build();
    }

    private static String firstLine(String s) {
        if (s == null) return "";
        int nl = s.indexOf('\n');
        return (nl < 0 ? s : s.substring(0, nl)).trim();
    }

    private static long pos(JsonParser p) {
        JsonLocation loc = p.currentTokenLocation();
        return Node.Pos.pack(Math.max(1, loc.getLineNr()), Math.max(1, loc.getColumnNr()));
    }

    /** Where a value sits, written out only for a message (most inputs need none). */
    private record Where(Where parent, String key, int index) {
        static final Where ROOT = new Where(null, null, -1);

        Where child(String k) { return new Where(this, k, -1); }
        Where item(int i) { return new Where(this, null, i); }

        String text() {
            if (parent == null) return "";
            String up = parent.text();
            if (key == null) return up + "[" + index + "]";
            return up.isEmpty() ? key : up + "." + key;
        }
    }

    /**
     * A YAML float. The parser marks YAML's .nan and .inf as floats it then cannot read: they are
     * kept as the non-finite values they spell, for the structure check to refuse with the key path.
     */
    private static Double floating(JsonParser p) throws IOException {
        try {
            return p.getDoubleValue();
        } catch (com.fasterxml.jackson.core.exc.StreamReadException e) {
            String text = p.getText().toLowerCase(java.util.Locale.ROOT);
            if (text.endsWith(".nan")) return Double.NaN;
            if (text.endsWith(".inf")) return text.startsWith("-") ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
            throw e;
        }
    }

    private Node value(JsonParser p, Where path) throws IOException {
        JsonToken t = p.currentToken();
        long pos = pos(p);
        switch (t) {
            case START_OBJECT: {
                Fields.Builder entries = new Fields.Builder();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String key = p.currentName();
                    long keyAt = pos(p);
                    p.nextToken();
                    Where childPath = path.child(key);
                    Node child = value(p, childPath);
                    Node.Entry first = entries.first(key);
                    if (first != null) {
                        Node.Pos keyPos = Node.Pos.unpack(keyAt);
                        errors.add(new InputError(file, keyPos.line(), keyPos.column(), childPath.text(),
                                "the key '" + key + "' is given twice (first at line " + first.keyPos().line() + ")"));
                    } else {
                        entries.add(new Node.Entry(key, keyAt, child));
                    }
                }
                return new Node.Obj(pos, entries.build());
            }
            case START_ARRAY: {
                List<Node> items = new ArrayList<>();
                int i = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    items.add(value(p, path.item(i++)));
                }
                return new Node.Arr(pos, items);
            }
            case VALUE_STRING:
                return new Node.Scalar(pos, p.getText());
            case VALUE_NUMBER_INT:
                return new Node.Scalar(pos, p.getNumberType() == JsonParser.NumberType.BIG_INTEGER
                        ? (Object) p.getDoubleValue() : (Object) p.getLongValue());
            case VALUE_NUMBER_FLOAT:
                return new Node.Scalar(pos, floating(p));
            case VALUE_TRUE:
                return new Node.Scalar(pos, Boolean.TRUE);
            case VALUE_FALSE:
                return new Node.Scalar(pos, Boolean.FALSE);
            case VALUE_NULL:
                return new Node.Scalar(pos, null);
            default:
                return new Node.Scalar(pos, p.getText());
        }
    }
}
