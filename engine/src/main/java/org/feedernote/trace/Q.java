package org.feedernote.trace;

/**
 * A traced quantity: the value a step produced, with the id of that step, the symbol it is
 * shown by and its unit. Calculations pass these around instead of bare doubles.
 */
public record Q(String id, String symbol, double value, String unit) {
    public Q {
        if (!Double.isFinite(value)) throw new IllegalArgumentException(id + ": value is not finite");
    }
}
