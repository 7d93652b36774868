package org.feedernote.model;

/**
 * A value of the design input that is legal but unusual (a non-standard device rating, a load
 * far beyond its device): the calculation runs, and the designer is told where to look.
 */
public record InputWarning(Where where, String message) {
    /** As an error is written, with "warning:" after the position: file:line:column: warning: path: message. */
    public String text() {
        return where.text() + ": warning: " + (where.path().isEmpty() ? "" : where.path() + ": ") + message;
    }
}
