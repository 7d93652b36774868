package org.feedernote.input;

/** One problem in a design input, with where it is and what was expected. */
public record InputError(String file, int line, int column, String path, String message) implements Comparable<InputError> {
    public String text() {
        return file + ":" + line + ":" + column + ": " + (path.isEmpty() ? "" : path + ": ") + message;
    }

    @Override public int compareTo(InputError o) {
        int c = Integer.compare(line, o.line);
        if (c != 0) return c;
        c = Integer.compare(column, o.column);
        return c != 0 ? c : text().compareTo(o.text());
    }
}
