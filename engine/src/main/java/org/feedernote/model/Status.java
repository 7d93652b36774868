package org.feedernote.model;

/** Status of the calculation note. */
public enum Status implements Token {
    DRAFT("draft"),
    FOR_REVIEW("for-review"),
    ISSUED("issued");

    private final String token;
    Status(String token) { this.token = token; }
    @Override public String token() { return token; }
}
