package org.feedernote.model;

/** Reference installation method of IEC 60364-5-52. */
public enum Method implements Token {
    A1("A1"),
    A2("A2"),
    B1("B1"),
    B2("B2"),
    C("C"),
    D1("D1"),
    D2("D2"),
    E("E"),
    F("F"),
    G("G");

    private final String token;
    Method(String token) { this.token = token; }
    @Override public String token() { return token; }
}
