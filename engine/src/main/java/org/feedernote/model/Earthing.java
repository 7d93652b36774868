package org.feedernote.model;

/** System earthing. */
public enum Earthing implements Token {
    TN_S("TN-S"),
    TN_C_S("TN-C-S"),
    TT("TT");

    private final String token;
    Earthing(String token) { this.token = token; }
    @Override public String token() { return token; }
}
