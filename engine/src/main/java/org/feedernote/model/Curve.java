package org.feedernote.model;

/** Instantaneous tripping type of an MCB or RCBO (IEC 60898-1). */
public enum Curve implements Token {
    B("B"),
    C("C"),
    D("D");

    private final String token;
    Curve(String token) { this.token = token; }
    @Override public String token() { return token; }
}
