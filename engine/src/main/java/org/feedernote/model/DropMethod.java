package org.feedernote.model;

/** Which voltage-drop form governs the check. */
public enum DropMethod implements Token {
    APPROXIMATE("approximate"),
    EXACT("exact");

    private final String token;
    DropMethod(String token) { this.token = token; }
    @Override public String token() { return token; }
}
