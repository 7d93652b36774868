package org.feedernote.model;

/**
 * Where an item was written in the design input, for messages. place: the sheet and cell
 * ("circuits!A12") of a spreadsheet or CSV input, null for YAML and JSON.
 */
public record Where(String file, int line, int column, String path, String place) {
    public Where(String file, int line, int column, String path) {
        this(file, line, column, path, null);
    }

    public String text() { return place == null ? file + ":" + line + ":" + column : file + ": " + place; }
}
