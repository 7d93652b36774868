package org.feedernote.model;

/** Conductor insulation: PVC is 70 °C thermoplastic, XLPE 90 °C thermosetting. */
public enum Insulation implements Token {
    PVC("pvc"),
    XLPE("xlpe");

    private final String token;
    Insulation(String token) { this.token = token; }
    @Override public String token() { return token; }
}
