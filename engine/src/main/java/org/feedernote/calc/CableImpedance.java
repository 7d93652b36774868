package org.feedernote.calc;

import org.feedernote.data.ReferenceData;
import org.feedernote.formula.Units;
import org.feedernote.model.Cable;
import org.feedernote.trace.Q;
import org.feedernote.trace.Trace;

/**
 * A cable's impedance per unit length outside a run, as the engine derives it for a circuit: for
 * comparing the derivation with the published voltage-drop tables, which print r and x in mV/A/m.
 */
public final class CableImpedance {
    private CableImpedance() {}

    /** How a three-phase flat group's three unequal drops are summed up. */
    public enum FlatGroup {
        /** Between the two outer phases, the largest: what the design uses. */
        OUTER_PAIR,
        /** The mean of the three phases, as some tables print it; for comparison only. */
        MEAN_OF_PHASES
    }

    /**
     * @param thetaC the conductor temperature, °C
     * @param phases 1 (two conductors) or 3 (line-to-line)
     */
    public static ImpedanceResult at(ReferenceData data, Cable cable, double thetaC, double frequencyHz, int phases, FlatGroup flat) {
        Q theta = new Q("T/theta", "θ", thetaC, Units.DEG_C);
        Q f = new Q("T/f", "f", frequencyHz, Units.HZ);
        return new ImpedanceCalc(data).impedance(Trace.noop(), "T", cable, theta, f, phases,
                flat == FlatGroup.MEAN_OF_PHASES ? ImpedanceCalc.FlatPhases.MEAN : ImpedanceCalc.FlatPhases.OUTER_PAIR);
    }
}
