package org.feedernote.data;

import java.util.List;

import org.feedernote.model.Conductor;
import org.feedernote.model.Curve;
import org.feedernote.model.Insulation;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/** Lookups for the fault path: adiabatic constants and temperatures, let-through energy of class 3 MCBs. */
public final class FaultData {
    private final ReferenceData data;
    private final ReferenceTable adiabatic;

    public FaultData(ReferenceData data) {
        this.data = data;
        this.adiabatic = data.table("adiabatic.csv");
    }

    private ReferenceTable adiabatic() {
        return adiabatic;
    }

    public Step.Lookup materialConstant(String id, Conductor c) {
        return adiabatic().lookup(id, "Material constant", "K", "A·√s/mm²", c.token(), "K", c.token(), "K = √(Q_c(β + 20)/ρ_20)");
    }

    public Step.Lookup beta(String id, Conductor c) {
        return adiabatic().lookup(id, "Reciprocal of the temperature coefficient at 0 °C", "β", "°C", c.token(), "beta", c.token(), "β");
    }

    /** {@link #finalTemperature(String, Insulation)} as the quantity owner + step, recorded in t. */
    public Q finalTemperature(Trace t, String owner, String step, Insulation i) {
        return adiabatic().quantity(t, owner, step, "θ_f", "°C", i.token(), "theta_final", () -> finalTemperature(owner + step, i));
    }

    public Step.Lookup finalTemperature(String id, Insulation i) {
        return adiabatic().lookup(id, "Final temperature of the conductor in a fault", "θ_f", "°C", i.token(), "theta_final",
                i.token().toUpperCase(java.util.Locale.ROOT), "final temperature");
    }

    public Step.Lookup separateInitialTemperature(String id, Insulation i) {
        return adiabatic().lookup(id, "Initial temperature of a protective conductor not in a cable", "θ_i", "°C", i.token(),
                "theta_initial_separate", i.token().toUpperCase(java.util.Locale.ROOT), "Table A.54.2, initial");
    }

    /**
     * The class 3 let-through energy for a B or C type MCB up to 32 A, interpolated linearly
     * between the tabulated prospective currents (the limits rise smoothly with the current), or
     * null where the table does not cover the device or the current.
     */
    public Step.Lookup classThreeLetThrough(String id, Curve curve, double ratingA, double faultKa) {
        if (curve == null || curve == Curve.D || ratingA > 32) return null;
        ReferenceTable t = data.table("energy-limiting.csv");
        String column = curve.token() + (ratingA <= 16 ? "16" : "32");
        String label = "type " + curve.token() + (ratingA <= 16 ? ", up to 16 A" : ", 20 to 32 A");
        List<String> rows = t.rowKeys();
        double first = Double.parseDouble(rows.get(0));
        if (faultKa > Double.parseDouble(rows.get(rows.size() - 1)) + 1e-12) return null;
        if (faultKa <= first) {
            Step.Lookup s = t.lookup(id, "Let-through energy, energy-limiting class 3", "I²t", "A²s", rows.get(0), column,
                    rows.get(0) + " kA (prospective " + ka(faultKa) + " kA, at or below the first row)", label);
            return s;
        }
        for (int i = 1; i < rows.size(); i++) {
            double lo = Double.parseDouble(rows.get(i - 1));
            double hi = Double.parseDouble(rows.get(i));
            if (faultKa <= hi + 1e-12) {
                double vlo = t.value(rows.get(i - 1), column);
                double vhi = t.value(rows.get(i), column);
                double v = vlo + (vhi - vlo) * (faultKa - lo) / (hi - lo);
                return new Step.Lookup(id, "Let-through energy, energy-limiting class 3", "I²t", v, "A²s", t.ref(),
                        rows.get(i - 1) + " to " + rows.get(i) + " kA (prospective " + ka(faultKa) + " kA)", label,
                        "interpolated linearly between " + ReferenceData.sizeKey(vlo) + " and " + ReferenceData.sizeKey(vhi) + " A²s", List.of());
            }
        }
        return null;
    }

    private static String ka(double v) {
        return ReferenceData.sizeKey(Math.round(v * 1000) / 1000.0);
    }

    /**
     * The maximum break time of an RCD at a residual current of multiple · I_Δn: the time of the
     * largest tabulated multiple not above it (1, 2 or 5; the slower time, on the safe side), or
     * null below I_Δn, where the RCD need not operate.
     */
    public Step.Lookup rcdBreakTime(String id, boolean delayed, double multiple) {
        int m = multiple >= 5 - 1e-9 ? 5 : multiple >= 2 - 1e-9 ? 2 : multiple >= 1 - 1e-9 ? 1 : 0;
        if (m == 0) return null;
        String type = delayed ? "S" : "general";
        ReferenceTable t = data.table("rcd-break-times.csv");
        Step.Lookup s = t.lookup(id, "Maximum break time of the RCD", "t_RCD", "s", type + " " + m, "max_break_s",
                (delayed ? "time-delayed type S" : "general type") + ", " + m + " I_Δn", "maximum break time");
        return new Step.Lookup(s.q(), s.title(), s.table(), s.row() + " (residual current " + ReferenceData.sizeKey(Math.round(multiple * 100) / 100.0)
                + " I_Δn)", s.column(), "the largest tabulated multiple not above the current", List.of());
    }
}
