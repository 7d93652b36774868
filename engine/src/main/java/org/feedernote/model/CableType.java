package org.feedernote.model;

/** Cable construction. */
public enum CableType implements Token {
    MULTICORE("multicore"),
    SINGLE_CORE("single-core");

    private final String token;
    CableType(String token) { this.token = token; }
    @Override public String token() { return token; }
}
