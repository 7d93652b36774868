package org.feedernote.trace;

import java.util.Objects;

/**
 * A traced quantity: the value a step produced, with the id of that step, the symbol it is
 * shown by and its unit. Calculations pass these around instead of bare doubles.
 *
 * <p>A step id is the circuit's (or board's) id followed by the step's own part ("C-12" and
 * "/vd/dU"). The two are joined only when the id is read: the sizing evaluates hundreds of
 * thousands of candidates with the no-op trace, and reads none of their ids.
 */
public final class Q {
    private final String owner;
    private final String step;
    private final String symbol;
    private final double value;
    private final String unit;
    /** owner + step, once read (a benign race: every thread would join the same text). */
    private String id;

    public Q(String id, String symbol, double value, String unit) {
        this(id, "", symbol, value, unit);
        this.id = id;
    }

    /** A quantity of the step owner + step (the id is joined when first read). */
    public Q(String owner, String step, String symbol, double value, String unit) {
        if (!Double.isFinite(value)) throw new IllegalArgumentException(owner + step + ": value is not finite");
        this.owner = Objects.requireNonNull(owner);
        this.step = Objects.requireNonNull(step);
        this.symbol = symbol;
        this.value = value;
        this.unit = unit;
    }

    public String id() {
        String joined = id;
        if (joined == null) {
            joined = step.isEmpty() ? owner : owner + step;
            id = joined;
        }
        return joined;
    }

    public String symbol() { return symbol; }
    public double value() { return value; }
    public String unit() { return unit; }

    /** The same quantity shown by another symbol (the id is not joined for it). */
    public Q as(String otherSymbol) {
        Q q = new Q(owner, step, otherSymbol, value, unit);
        q.id = id;
        return q;
    }

    @Override public boolean equals(Object o) {
        return o instanceof Q q && Double.compare(value, q.value) == 0 && id().equals(q.id()) && Objects.equals(symbol, q.symbol)
                && Objects.equals(unit, q.unit);
    }

    @Override public int hashCode() {
        return Objects.hash(id(), symbol, value, unit);
    }

    @Override public String toString() {
        return "Q[id=" + id() + ", symbol=" + symbol + ", value=" + value + ", unit=" + unit + "]";
    }
}
