package org.feedernote.input;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The design input as a tree that remembers where every key and value was written, so that
 * each message can name the file, line and column. A node keeps its position as one number
 * (line and column packed, see {@link Pos#pack}) and makes the {@link Pos} when asked: a large
 * installation has hundreds of thousands of positions, nearly all of which no message reads.
 */
public sealed interface Node {

    Pos pos();

    /** Line and column, both counted from 1. */
    record Pos(int line, int column) {
        /** Line and column in one number: the line in the high half, the column in the low. */
        static long pack(int line, int column) {
            return ((long) line << 32) | (column & 0xffffffffL);
        }

        static Pos unpack(long at) {
            return new Pos((int) (at >>> 32), (int) at);
        }
    }

    /** A mapping; entries keep the order of the file. at: the packed position. */
    record Obj(long at, Map<String, Entry> entries) implements Node {
        public Pos pos() { return Pos.unpack(at); }
        public Node get(String key) {
            Entry e = entries.get(key);
            return e == null ? null : e.value();
        }
        public static Obj empty(Pos pos) { return new Obj(Pos.pack(pos.line(), pos.column()), new LinkedHashMap<>()); }
    }

    /** keyAt: the packed position of the key. */
    record Entry(String key, long keyAt, Node value) {
        public Pos keyPos() { return Pos.unpack(keyAt); }
    }

    record Arr(long at, List<Node> items) implements Node {
        public Pos pos() { return Pos.unpack(at); }
    }

    /** A scalar: String, Long, Double, Boolean, or null for an explicit null. */
    record Scalar(long at, Object value) implements Node {
        public Pos pos() { return Pos.unpack(at); }
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
