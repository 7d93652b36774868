package org.feedernote.model;

/** How the circuits of a group are laid. */
public enum Arrangement implements Token {
    BUNCHED("bunched"),
    WALL_SINGLE_LAYER("wall-single-layer"),
    TRAY_SINGLE_LAYER("tray-single-layer"),
    LADDER_SINGLE_LAYER("ladder-single-layer");

    private final String token;
    Arrangement(String token) { this.token = token; }
    @Override public String token() { return token; }
}
