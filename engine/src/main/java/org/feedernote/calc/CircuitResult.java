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
    // Plain loops: the sizing asks these of every candidate, and streams cost far more than the
    // work itself under the first JIT tier, which the command line runs.
    public boolean pass() {
        for (CheckResult c : checks) if (!c.pass()) return false;
        return true;
    }

    public List<CheckResult> failing() {
        List<CheckResult> failing = new java.util.ArrayList<>();
        for (CheckResult c : checks) if (!c.pass()) failing.add(c);
        return List.copyOf(failing);
    }

    /**
     * The assumptions that bear on this circuit's verdict or size, one line each ("short-circuit:
     * …"): those of a failing check, those not known to be on the safe side, and all of those of the
     * check that governs the size.
     */
    public List<String> assumptionsBearing() {
        List<String> out = new java.util.ArrayList<>();
        for (CheckResult k : checks) {
            List<Assumption> shown = k.name().equals(governingCheck) ? k.assumptions() : k.bearing();
            for (Assumption a : shown) out.add(k.name() + ": " + a.text());
        }
        return out;
    }

    public CheckResult check(String name) {
        for (CheckResult c : checks) if (c.name().equals(name)) return c;
        return null;
    }

    CircuitResult withGoverning(String governing) {
        return new CircuitResult(id, circuit, phases, connection, designCurrent, powerFactor, neutralCurrent, rating,
                conventionalTripping, tabulatedCapacity, correctionFactor, capacity, impedance, length, dropV, dropPercent,
                dropExactPercent, cumulativePercent, limitPercent, startingDipPercent, faultAtOrigin, loopImpedance,
                maxLoopImpedance, minEarthFault, downstream, checks, governing);
    }
}
