package org.feedernote.model;

/** Phase a single-phase circuit is connected to. */
public enum Phase implements Token {
    L1("L1"),
    L2("L2"),
    L3("L3"),
    AUTO("auto");

    private final String token;
    Phase(String token) { this.token = token; }
    @Override public String token() { return token; }
}
