package org.feedernote.expr;

/**
 * A variable of a formula: its key in the bindings, the symbol shown in the working, and the
 * unit its bound value must carry.
 */
public record Var(String key, String symbol, String unit) {
    public Var {
        if (key == null || key.isBlank()) throw new IllegalArgumentException("variable key is empty");
    }
}
