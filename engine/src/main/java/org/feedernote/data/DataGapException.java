package org.feedernote.data;

/** A lookup asked for a row or column the reference table does not cover. */
public final class DataGapException extends RuntimeException {
    public DataGapException(String message) { super(message); }
}
