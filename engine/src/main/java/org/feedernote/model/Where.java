package org.feedernote.model;

/** Where an item was written in the design input, for messages. */
public record Where(String file, int line, int column, String path) {
    public String text() { return file + ":" + line + ":" + column; }
}
