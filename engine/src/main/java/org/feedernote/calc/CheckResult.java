package org.feedernote.calc;

/**
 * The outcome of one named check. value and limit are in unit; atLeast is true for checks of
 * the form value ≥ limit (a capacity against a current), false for value ≤ limit.
 */
public record CheckResult(String name, String title, boolean pass, double value, double limit, String unit,
                          boolean atLeast, String stepId) {
    /** How close the check is to its limit: 1 at the limit, above 1 failing. */
    public double utilisation() {
        if (atLeast) return value == 0 ? Double.POSITIVE_INFINITY : limit / value;
        return limit == 0 ? Double.POSITIVE_INFINITY : value / limit;
    }
}
