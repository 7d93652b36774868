package org.feedernote.model;

/** Protective device kind. */
public enum DeviceKind implements Token {
    MCB("mcb"),
    RCBO("rcbo"),
    MCCB("mccb"),
    FUSE("fuse");

    private final String token;
    DeviceKind(String token) { this.token = token; }
    @Override public String token() { return token; }
}
