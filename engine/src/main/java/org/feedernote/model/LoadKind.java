package org.feedernote.model;

/** What a final circuit supplies. */
public enum LoadKind implements Token {
    LIGHTING("lighting"),
    SOCKET("socket"),
    MOTOR("motor"),
    HEATING("heating"),
    OTHER("other");

    private final String token;
    LoadKind(String token) { this.token = token; }
    @Override public String token() { return token; }
}
