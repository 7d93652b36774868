package org.feedernote.calc;

/**
 * The outcome of one named check. value and limit are in unit; atLeast is true for checks of
 * the form value ≥ limit (a capacity against a current), false for value ≤ limit. A check that
 * cannot be made for want of data is not determined: it fails, and its value is not meaningful.
 */
public record CheckResult(String name, String title, boolean pass, double value, double limit, String unit,
                          boolean atLeast, String stepOwner, String stepPart, boolean determined) {

    public CheckResult(String name, String title, boolean pass, double value, double limit, String unit, boolean atLeast,
                       String stepId) {
        this(name, title, pass, value, limit, unit, atLeast, stepId, "", true);
    }

    /**
     * As the canonical constructor, determined, for the step owner + part ("C-12/fault/sc" and
     * "/check"): the two are joined only where {@link #stepId()} is read, never for the sizing's
     * candidates.
     */
    public CheckResult(String name, String title, boolean pass, double value, double limit, String unit, boolean atLeast,
                       String stepOwner, String stepPart) {
        this(name, title, pass, value, limit, unit, atLeast, stepOwner, stepPart, true);
    }

    /** The id of the trace step that shows the check. */
    public String stepId() {
        return stepPart.isEmpty() ? stepOwner : stepOwner + stepPart;
    }

    /** A check that cannot be made: it fails, and says why in the trace step it names (owner + part). */
    public static CheckResult undetermined(String name, String title, String unit, String stepOwner, String stepPart) {
        return new CheckResult(name, title, false, 0, 0, unit, false, stepOwner, stepPart, false);
    }

    /** How close the check is to its limit: 1 at the limit, above 1 failing. */
    public double utilisation() {
        if (!determined) return Double.POSITIVE_INFINITY;
        if (atLeast) return value == 0 ? Double.POSITIVE_INFINITY : limit / value;
        return limit == 0 ? Double.POSITIVE_INFINITY : value / limit;
    }
}
