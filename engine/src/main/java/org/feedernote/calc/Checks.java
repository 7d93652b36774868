package org.feedernote.calc;

import java.util.List;

import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/** The comparison every check of the calculation makes, value ≤ limit, and the check nearest its limit. */
final class Checks {
    private Checks() {}

    /** value ≤ limit, for the step owner + part (joined only where the step is recorded or its id read). */
    static CheckResult check(Trace t, String owner, String part, String name, String title, Q value, Q limit, String reference) {
        boolean pass = value.value() <= limit.value() + 1e-12;
        if (t.recording()) {
            t.add(new Step.Check(owner + part, title, name, value, "≤", limit, pass, reference));
        }
        return new CheckResult(name, title, pass, value.value(), limit.value(), limit.unit(), false, owner, part);
    }

    /** The check nearest its limit; on a tie, the one listed first. */
    static String closestToLimit(List<CheckResult> checks) {
        CheckResult best = null;
        for (CheckResult k : checks) if (best == null || k.utilisation() > best.utilisation() + 1e-9) best = k;
        return best == null ? "voltage-drop" : best.name();
    }
}
