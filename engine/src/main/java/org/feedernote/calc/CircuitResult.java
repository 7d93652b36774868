package org.feedernote.calc;

import java.util.List;

import org.feedernote.model.Circuit;
import org.feedernote.trace.Q;

/**
 * Everything calculated for one circuit; each figure is a traced quantity. circuit carries the
 * sizes finally used (auto sizes resolved). Capacity figures are null where not applicable.
 */
public record CircuitResult(String id, Circuit circuit, int phases, String connection, Q designCurrent,
                            Q powerFactor, Q neutralCurrent, Q rating, Q conventionalTripping, Q tabulatedCapacity,
                            Q correctionFactor, Q capacity, ImpedanceResult impedance, Q length, Q dropV, Q dropPercent,
                            Q dropExactPercent, Q cumulativePercent, Q limitPercent, Q startingDipPercent,
                            Q faultAtOrigin, Q loopImpedance, Q maxLoopImpedance, Q minEarthFault, BoardFault downstream,
                            List<CheckResult> checks, String governingCheck) {
    public boolean pass() {
        return checks.stream().allMatch(CheckResult::pass);
    }

    public List<CheckResult> failing() {
        return checks.stream().filter(c -> !c.pass()).toList();
    }

    public CheckResult check(String name) {
        return checks.stream().filter(c -> c.name().equals(name)).findFirst().orElse(null);
    }

    CircuitResult withGoverning(String governing) {
        return new CircuitResult(id, circuit, phases, connection, designCurrent, powerFactor, neutralCurrent, rating,
                conventionalTripping, tabulatedCapacity, correctionFactor, capacity, impedance, length, dropV, dropPercent,
                dropExactPercent, cumulativePercent, limitPercent, startingDipPercent, faultAtOrigin, loopImpedance,
                maxLoopImpedance, minEarthFault, downstream, checks, governing);
    }
}
