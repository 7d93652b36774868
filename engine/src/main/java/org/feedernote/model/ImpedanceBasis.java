package org.feedernote.model;

/**
 * Where a circuit's r and x come from: derived from the conductor's resistance and the cables'
 * geometry, or read from the published voltage-drop tables (mV/A/m) a checker's hand calculation uses.
 */
public enum ImpedanceBasis implements Token {
    DERIVED("derived"),
    TABULATED("tabulated");

    private final String token;
    ImpedanceBasis(String token) { this.token = token; }
    @Override public String token() { return token; }
}
