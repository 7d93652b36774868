package org.feedernote.calc;

/**
 * The outcome of one named check. value and limit are in unit; atLeast is true for checks of
 * the form value ≥ limit (a capacity against a current), false for value ≤ limit. A check that
 * cannot be made for want of data is not determined: it fails, and its value is not meaningful.
 */
public record CheckResult(String name, String title, boolean pass, double value, double limit, String unit,
                          boolean atLeast, String stepId, boolean determined) {

    public CheckResult(String name, String title, boolean pass, double value, double limit, String unit, boolean atLeast,
                       String stepId) {
        this(name, title, pass, value, limit, unit, atLeast, stepId, true);
    }

    /** A check that cannot be made: it fails, and says why in the trace step it names. */
    public static CheckResult undetermined(String name, String title, String unit, String stepId) {
        return new CheckResult(name, title, false, 0, 0, unit, false, stepId, false);
    }

    /** How close the check is to its limit: 1 at the limit, above 1 failing. */
    public double utilisation() {
        if (!determined) return Double.POSITIVE_INFINITY;
        if (atLeast) return value == 0 ? Double.POSITIVE_INFINITY : limit / value;
        return limit == 0 ? Double.POSITIVE_INFINITY : value / limit;
    }
}
