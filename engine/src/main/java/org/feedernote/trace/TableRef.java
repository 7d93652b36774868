package org.feedernote.trace;

/** Where a tabulated value comes from: document, edition, table, and whether it was recalled. */
public record TableRef(String id, String title, String source, String edition, String table,
                       boolean fromMemory, String notes) {
    public String citation() {
        return source + ":" + edition + ", " + table;
    }
}
