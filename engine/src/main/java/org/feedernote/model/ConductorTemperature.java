package org.feedernote.model;

/** Conductor temperature used for the resistance in the voltage drop. */
public enum ConductorTemperature implements Token {
    MAXIMUM("maximum"),
    ESTIMATED("estimated");

    private final String token;
    ConductorTemperature(String token) { this.token = token; }
    @Override public String token() { return token; }
}
