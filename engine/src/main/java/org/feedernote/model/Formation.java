package org.feedernote.model;

/** Arrangement of single-core cables of one circuit. */
public enum Formation implements Token {
    TREFOIL("trefoil"),
    FLAT_TOUCHING("flat-touching"),
    FLAT_SPACED("flat-spaced");

    private final String token;
    Formation(String token) { this.token = token; }
    @Override public String token() { return token; }
}
