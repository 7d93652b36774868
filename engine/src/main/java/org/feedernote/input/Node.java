package org.feedernote.input;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The design input as a tree that remembers where every key and value was written, so that
 * each message can name the file, line and column.
 */
public sealed interface Node {

    Pos pos();

    /** Line and column, both counted from 1. */
    record Pos(int line, int column) {}

    /** A mapping; entries keep the order of the file. */
    record Obj(Pos pos, Map<String, Entry> entries) implements Node {
        public Node get(String key) {
            Entry e = entries.get(key);
            return e == null ? null : e.value();
        }
        public static Obj empty(Pos pos) { return new Obj(pos, new LinkedHashMap<>()); }
    }

    record Entry(String key, Pos keyPos, Node value) {}

    record Arr(Pos pos, List<Node> items) implements Node {}

    /** A scalar: String, Long, Double, Boolean, or null for an explicit null. */
    record Scalar(Pos pos, Object value) implements Node {
        public boolean isNumber() { return value instanceof Long || value instanceof Double; }
        public double number() { return ((Number) value).doubleValue(); }
        public String describe() {
            if (value == null) return "null";
            if (value instanceof String s) return "'" + s + "'";
            if (value instanceof Double d && d == Math.rint(d) && Math.abs(d) < 1e15) return Long.toString(d.longValue());
            return value.toString();
        }
    }
}
