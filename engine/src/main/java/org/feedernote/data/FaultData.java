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
}
