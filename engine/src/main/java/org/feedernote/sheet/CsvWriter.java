package org.feedernote.sheet;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

/**
 * Writes a table as CSV (RFC 4180: a field in double quotes where it holds a comma, a quote or a
 * line break; lines end in CRLF), UTF-8 without a byte-order mark. Numbers in Java's shortest
 * exact form, so a spreadsheet reads them as numbers.
 */
public final class CsvWriter {
    private CsvWriter() {}

    public static String text(Table t) {
        StringBuilder b = new StringBuilder();
        int n = t.columns().size();
        for (int i = 0; i < n; i++) field(b, i, t.heading(i));
        b.append("\r\n");
        if (t.keyed()) {
            for (int i = 0; i < n; i++) field(b, i, t.columns().get(i).unit() == null ? "" : "(" + t.columns().get(i).unit() + ")");
            b.append("\r\n");
        }
        for (Table.Row row : t.rows()) {
            List<Object> cells = row.cells();
            for (int i = 0; i < n; i++) field(b, i, i < cells.size() ? cells.get(i) : null);
            b.append("\r\n");
        }
        return b.toString();
    }

    public static void write(Table t, Path file) throws IOException {
        java.nio.file.Files.write(file, text(t).getBytes(StandardCharsets.UTF_8));
    }

    private static void field(StringBuilder b, int i, Object v) {
        if (i > 0) b.append(',');
        if (v == null) return;
        String s;
        if (v instanceof Double d) s = d == Math.rint(d) && Math.abs(d) < 1e15 ? Long.toString(d.longValue()) : Double.toString(d);
        else s = v.toString();
        if (s.isEmpty()) {
            b.append("\"\"");
        } else if (s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0) {
            b.append('"').append(s.replace("\"", "\"\"")).append('"');
        } else {
            b.append(s);
        }
    }
}
