package org.feedernote.model;

/**
 * What the device at a circuit's origin protects against: overload and fault (the usual case), or
 * fault only (a motor circuit whose overload protection is a separate relay at the starter).
 */
public enum Protection implements Token {
    OVERLOAD_AND_FAULT("overload-and-fault"),
    FAULT_ONLY("fault-only");

    private final String token;
    Protection(String token) { this.token = token; }
    @Override public String token() { return token; }
}
