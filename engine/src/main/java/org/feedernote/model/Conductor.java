package org.feedernote.model;

/** Conductor material. */
public enum Conductor implements Token {
    COPPER("copper"),
    ALUMINIUM("aluminium");

    private final String token;
    Conductor(String token) { this.token = token; }
    @Override public String token() { return token; }
}
