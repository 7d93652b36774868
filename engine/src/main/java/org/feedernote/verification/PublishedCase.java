package org.feedernote.verification;

import java.util.Objects;

import org.feedernote.data.ReferenceData;

/**
 * One published value the program is held to: what is checked, where the value was published and
 * how it was read, the value with its unit, the agreement required, and how the program's own value
 * is obtained (a lookup, a derivation, or the engine on a small invented input written in place).
 */
public record PublishedCase(String id, String quantity, Source source, double expected, String unit, Tolerance tolerance,
                            Computation computation) {

    public PublishedCase {
        Objects.requireNonNull(id);
        Objects.requireNonNull(quantity);
        Objects.requireNonNull(source);
        Objects.requireNonNull(unit);
        Objects.requireNonNull(tolerance);
        Objects.requireNonNull(computation);
    }

    /** How the program's value is obtained from the reference data. */
    @FunctionalInterface
    public interface Computation {
        double compute(ReferenceData data);
    }

    /**
     * Where the value comes from: the document with its edition, the table or clause, and how the
     * value was read (the copy seen, "from memory", or a hand calculation from the document).
     */
    public record Source(String document, String place, String seen) {
        public Source {
            Objects.requireNonNull(document);
            Objects.requireNonNull(place);
            Objects.requireNonNull(seen);
        }

        public static Source recalled(String document, String place) {
            return new Source(document, place, "from memory");
        }

        public String text() {
            return document + ", " + place + " (" + seen + ")";
        }
    }

    /** The agreement required: |computed − expected| ≤ absolute + relative × |expected|. */
    public record Tolerance(double absolute, double relative, String why) {
        public static Tolerance exact() {
            return new Tolerance(1e-9, 0, "the table's value itself");
        }

        public static Tolerance absolute(double value, String why) {
            return new Tolerance(value, 0, why);
        }

        public static Tolerance relative(double fraction, String why) {
            return new Tolerance(0, fraction, why);
        }

        public double band(double expected) {
            return absolute + relative * Math.abs(expected);
        }
    }

    /** The program's value for this case and whether it agrees; a computation that throws fails, saying why. */
    public Outcome check(ReferenceData data) {
        double computed;
        try {
            computed = computation.compute(data);
        } catch (RuntimeException e) {
            return new Outcome(this, Double.NaN, false, e.getClass().getSimpleName() + ": " + e.getMessage());
        }
        boolean pass = Double.isFinite(computed) && Math.abs(computed - expected) <= tolerance.band(expected);
        return new Outcome(this, computed, pass, "");
    }

    /** A case's result: the computed value, PASS or FAIL, and what went wrong when the value could not be computed. */
    public record Outcome(PublishedCase publishedCase, double computed, boolean pass, String problem) {}
}
