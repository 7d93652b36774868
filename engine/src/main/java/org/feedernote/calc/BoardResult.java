package org.feedernote.calc;

import java.util.List;

import org.feedernote.trace.Q;

/**
 * A board: the cumulative voltage drop from the origin to it, its demand per phase, its maximum
 * three-phase fault current and its earth-fault loop impedance Ze, its own checks (withstand), and
 * its maximum line-to-neutral fault current.
 */
public record BoardResult(String id, String description, String fedBy, Q dropPercent, List<Q> phaseCurrents,
                          Q neutralCurrent, Q faultKa, Q loopImpedance, List<CheckResult> checks, Q faultLineNeutralKa) {
    public boolean pass() {
        return checks.stream().allMatch(CheckResult::pass);
    }
}
