package org.feedernote.calc;

import java.util.List;

import org.feedernote.model.Circuit;
import org.feedernote.trace.Q;

/** Everything calculated for one circuit; each figure is a traced quantity. */
public record CircuitResult(String id, Circuit circuit, int phases, String connection, Q designCurrent,
                            Q powerFactor, Q neutralCurrent, ImpedanceResult impedance, Q dropV, Q dropPercent,
                            Q dropExactPercent, Q cumulativePercent, Q limitPercent, Q startingDipPercent,
                            List<CheckResult> checks, String governingCheck) {
    public boolean pass() {
        return checks.stream().allMatch(CheckResult::pass);
    }

    public List<CheckResult> failing() {
        return checks.stream().filter(c -> !c.pass()).toList();
    }
}
