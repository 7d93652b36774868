package org.feedernote.calc;

/**
 * The outcome of one named check. value and limit are in unit; atLeast is true for checks of
 * the form value ≥ limit (a capacity against a current), false for value ≤ limit.
 * <p>
 * A check that is not worked as a comparison has determined false and a remark that says why:
 * either it cannot be made for want of data (it fails; the remark names the missing key), or the
 * standard deems it met by a rule (it passes; the remark cites the rule).
 */
public record CheckResult(String name, String title, boolean pass, double value, double limit, String unit,
                          boolean atLeast, String stepOwner, String stepPart, boolean determined, String remark,
                          java.util.List<Assumption> assumptions) {

    public CheckResult(String name, String title, boolean pass, double value, double limit, String unit, boolean atLeast,
                       String stepOwner, String stepPart, boolean determined, String remark) {
        this(name, title, pass, value, limit, unit, atLeast, stepOwner, stepPart, determined, remark, java.util.List.of());
    }

    public CheckResult(String name, String title, boolean pass, double value, double limit, String unit, boolean atLeast,
                       String stepId) {
        this(name, title, pass, value, limit, unit, atLeast, stepId, "", true, null);
    }

    /**
     * As the canonical constructor, determined, for the step owner + part ("C-12/fault/sc" and
     * "/check"): the two are joined only where {@link #stepId()} is read, never for the sizing's
     * candidates.
     */
    public CheckResult(String name, String title, boolean pass, double value, double limit, String unit, boolean atLeast,
                       String stepOwner, String stepPart) {
        this(name, title, pass, value, limit, unit, atLeast, stepOwner, stepPart, true, null);
    }

    /** The id of the trace step that shows the check. */
    public String stepId() {
        return stepPart.isEmpty() ? stepOwner : stepOwner + stepPart;
    }

    /**
     * A check that cannot be made: it fails. why says what is missing, naming the input key that
     * would supply it ("device.breaking_capacity_ka is not given"); the trace step (owner + part) shows it.
     */
    public static CheckResult undetermined(String name, String title, String unit, String stepOwner, String stepPart, String why) {
        return new CheckResult(name, title, false, 0, 0, unit, false, stepOwner, stepPart, false, "not determined: " + why);
    }

    /** A check the standard deems met by a rule (rule says which and why): it passes without a comparison. */
    public static CheckResult deemed(String name, String title, String unit, String stepOwner, String stepPart, String rule) {
        return new CheckResult(name, title, true, 0, 0, unit, false, stepOwner, stepPart, false, "deemed met: " + rule);
    }

    /** The same check resting also on the assumption a. */
    public CheckResult assuming(Assumption a) {
        java.util.List<Assumption> all = new java.util.ArrayList<>(assumptions);
        all.add(a);
        return new CheckResult(name, title, pass, value, limit, unit, atLeast, stepOwner, stepPart, determined, remark, java.util.List.copyOf(all));
    }

    /**
     * The assumptions that bear on the verdict: every one not known to be on the safe side, and
     * the safe-side ones where the check fails (the datum might make it pass).
     */
    public java.util.List<Assumption> bearing() {
        if (assumptions.isEmpty()) return assumptions;
        java.util.List<Assumption> out = new java.util.ArrayList<>();
        for (Assumption a : assumptions) if (!a.safeSide() || !pass) out.add(a);
        return out;
    }

    /** True for a check deemed met by a rule rather than worked. */
    public boolean deemed() {
        return !determined && pass;
    }

    /** How close the check is to its limit: 1 at the limit, above 1 failing; 0 for a check deemed met. */
    public double utilisation() {
        if (!determined) return pass ? 0 : Double.POSITIVE_INFINITY;
        if (atLeast) return value == 0 ? Double.POSITIVE_INFINITY : limit / value;
        return limit == 0 ? Double.POSITIVE_INFINITY : value / limit;
    }
}
