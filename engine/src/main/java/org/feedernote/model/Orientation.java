package org.feedernote.model;

/** How single-core cables spaced one diameter apart (reference method G) are arranged: side by side, or one above another. */
public enum Orientation implements Token {
    HORIZONTAL("horizontal"),
    VERTICAL("vertical");

    private final String token;
    Orientation(String token) { this.token = token; }
    @Override public String token() { return token; }
}
