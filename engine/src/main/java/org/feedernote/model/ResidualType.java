package org.feedernote.model;

/** The break-time type of an RCD or RCBO (IEC 61008-1 / IEC 61009-1): general, or S (time-delayed). */
public enum ResidualType implements Token {
    GENERAL("general"),
    S("S");

    private final String token;
    ResidualType(String token) { this.token = token; }
    @Override public String token() { return token; }
}
