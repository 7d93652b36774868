package org.feedernote.calc;

import org.feedernote.trace.Q;

/**
 * What a circuit asks of the board it starts at: active and reactive power where the power
 * factor is known, or apparent power alone where it is not; and the phase it sits on.
 *
 * @param phases 1 or 3
 * @param phase 1, 2 or 3 for single-phase circuits; 0 for three-phase
 */
record LoadDemand(String circuitId, int phases, int phase, Q p, Q q, Q s, boolean powerFactorKnown) {
    /** Apparent power in kVA, for balancing. */
    double apparentKva() {
        return s != null ? s.value() : Math.hypot(p.value(), q.value());
    }
}
