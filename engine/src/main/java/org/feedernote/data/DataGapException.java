package org.feedernote.data;

/** A lookup asked for a row or column the reference table does not cover. */
public final class DataGapException extends RuntimeException {
    private final boolean located;

    public DataGapException(String message) {
        this(message, false);
    }

    /** @param located whether the message already names the file, line and key path */
    public DataGapException(String message, boolean located) {
        super(message);
        this.located = located;
    }

    public boolean located() {
        return located;
    }
}
