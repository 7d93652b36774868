package org.feedernote.calc;

import static org.feedernote.formula.Formula.bind;

import java.util.ArrayList;
import java.util.List;

import org.feedernote.data.CapacityData;
import org.feedernote.formula.CapacityFormulas;
import org.feedernote.formula.TermFormulas;
import org.feedernote.formula.Units;
import org.feedernote.model.*;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * The device and the current-carrying capacity: the device's rating and conventional tripping
 * current, the tabulated capacity, the correction factors and I_z, and the capacity (Ib ≤ In ≤ Iz)
 * and overload checks; the probe the sizing skips small sizes with.
 */
final class CapacityCalc {
    private final Engine.Run run;
    private final CapacityData capacityData;
    private final TermFormulas termFormulas;

    CapacityCalc(Engine.Run run, CapacityData capacityData, TermFormulas termFormulas) {
        this.run = run;
        this.capacityData = capacityData;
        this.termFormulas = termFormulas;
    }

    /**
     * A circuit's device and capacity (sections dev and cap) with the capacity and overload
     * checks: the part of its own figures that does not depend on its impedance.
     */
    record OwnCapacity(Q in, Q i2, Capacity cap, List<CheckResult> checks) {}

    /** @param known the circuit's capacity with the no-op trace where a probe has made it, else null */
    OwnCapacity ownCapacity(Trace ct, Circuit c, int phases, Q ib, Capacity known) {
        String id = c.id();
        Trace dt = ct.recording() ? ct.section(id + "/dev", "Protective device", describeDevice(c.device())) : ct;
        Q in = c.device().ratingA() != null
                ? Given.input(dt, id, "/dev/I_n", "Rated current of the device", "I_n", c.device().ratingA(), Units.A, c.where().path(),
                        ".device.rating_a")
                : Given.lookupUsing(dt, capacityData.ratingAtLeast(id + "/dev/I_n", c.device().kind(), ib.value()), ib);
        if (c.device().longTimeA() != null) {
            Q frame = in;
            in = Given.input(dt, id, "/dev/I_r", "Long-time (overload) setting of the release", "I_r", c.device().longTimeA(), Units.A,
                    c.where().path(), ".device.long_time_a");
            if (dt.recording()) Given.decision(dt, id + "/dev/setting", "Current of the overload rule",
                    "an adjustable release: frame I_n = " + Decimals.trim(frame.value()) + " A, set to I_r = " + Decimals.trim(in.value()) + " A",
                    "I_r takes the place of I_n in I_b ≤ I_n ≤ I_z and I_2 = k_2 · I_n", "IEC 60364-4-43:2008, 433.1 (adjustable devices: the current setting)",
                    frame.id(), in.id());
            in = in.as("I_n");
        }
        Q k2 = Given.lookup(dt, capacityData.k2(id + "/dev/k2", c.device().kind()));
        Q i2 = CapacityFormulas.CONVENTIONAL_TRIPPING.eval(dt, id, "/dev/I_2", "", bind(CapacityFormulas.K2, k2),
                bind(CapacityFormulas.I_N, in));

        Trace kt = ct.recording() ? ct.section(id + "/cap", "Current-carrying capacity", describeConditions(c)) : ct;
        Capacity cap = known != null && !kt.recording() ? known : capacity(kt, c, phases, ib);

        List<CheckResult> checks = new ArrayList<>();
        Q demand = cap.neutralDesign() != null ? cap.neutralDesign() : ib;
        checks.add(capacityCheck(kt, id, demand, in, cap.iz()));
        Q limit145 = CapacityFormulas.OVERLOAD_LIMIT.eval(kt, id, "/cap/1.45Iz", "", bind(CapacityFormulas.I_Z, cap.iz()));
        checks.add(Checks.check(kt, id, "/cap/overload", "overload", "Overload: I_2 ≤ 1.45 · I_z", relabel(i2, "I_2"), limit145,
                "IEC 60364-4-43:2008, 433.1"));
        return new OwnCapacity(in, i2, cap, checks);
    }

    /**
     * The capacity check alone (device and tabulated capacity), for skipping sizes quickly while
     * sizing; the reason in words, or null when it passes.
     */
    String capacityShortfall(Circuit c) {
        return probe(c).shortfall();
    }

    /** The capacity check alone: why it fails (null where it passes), and the capacity, for the evaluation that may follow. */
    record Probe(String shortfall, Capacity capacity) {}

    Probe probe(Circuit c) {
        Trace t = Trace.noop();
        int phases = c.phases();
        Q ib = run.designCurrent.get(c.id());
        double in = c.device().overloadSettingA() != null ? c.device().overloadSettingA()
                : capacityData.ratingAtLeast("probe", c.device().kind(), ib.value()).value();
        Capacity cap = capacity(t, c, phases, ib);
        double need = cap.neutralDesign() != null ? Math.max(in, cap.neutralDesign().value()) : in;
        if (cap.iz().value() + 1e-9 < need) {
            return new Probe("I_z " + Decimals.trim(cap.iz().value()) + " A < I_n " + Decimals.trim(in) + " A", cap);
        }
        return new Probe(null, cap);
    }

    /** Tabulated capacity, the correction factors that apply, and I_z. */
    record Capacity(Q it, Q factor, Q iz, Q neutralDesign) {}

    Capacity capacity(Trace t, Circuit c, int phases, Q ib) {
        String id = c.id() + "/cap";
        Cable cable = c.cable();
        Method method = c.conditions().method();
        int loaded = phases == 3 ? 3 : 2;
        if (t.recording()) Given.decision(t, id + "/loaded", "Loaded conductors", phases == 3 ? "three-phase circuit (neutral current not counted)"
                : "single-phase circuit: line and neutral", loaded + " loaded conductors", "IEC 60364-5-52:2009, 523.6");
        Q it = capacityData.tabulated(t, id, "/I_t", cable.insulation(), cable.conductor(), method, loaded,
                cable.type(), cable.formation(), c.conditions().vertical(), cable.size().mm2());
        List<Q> factors = new ArrayList<>();
        boolean ground = method == Method.D1 || method == Method.D2;
        Setting<Double> amb = c.conditions().ambientC().given() ? c.conditions().ambientC()
                : (ground ? run.inst.basis().ambientGroundC() : run.inst.basis().ambientAirC());
        Q thetaA = Given.setting(t, id, "/theta_a", ground ? "Ground temperature" : "Ambient air temperature", "θ_a", amb, Units.DEG_C,
                ground ? "IEC 60364-5-52:2009, reference ground temperature 20 °C" : "IEC 60364-5-52:2009, reference ambient 30 °C");
        factors.add(Given.lookupUsing(t, ground ? capacityData.ambientGround(id + "/C_a", cable.insulation(), amb.value())
                : capacityData.ambientAir(id + "/C_a", cable.insulation(), amb.value()), thetaA));
        int n = c.conditions().groupedCircuits();
        if (n > 1) {
            factors.add(Given.lookup(t, capacityData.grouping(id + "/C_g", method, c.conditions().groupArrangement(), n)));
        } else {
            if (t.recording()) Given.decision(t, id + "/C_g", "Grouping", "grouped_circuits = 1" + (c.conditions().groupedCircuits() == 1 ? " (alone)" : ""),
                    "no grouping factor", "IEC 60364-5-52:2009, Table B.52.17");
        }
        if (c.conditions().thermalInsulationMm() > 0) {
            factors.add(Given.lookup(t, capacityData.thermalInsulation(id + "/C_i", c.conditions().thermalInsulationMm())));
        }
        if (ground) {
            Q rho = Given.setting(t, id, "/rho", "Soil thermal resistivity", "ρ_T", c.conditions().soilResistivityKmW(), "K·m/W",
                    "IEC 60364-5-52:2009, reference 2.5 K·m/W");
            factors.add(Given.lookupUsing(t, capacityData.soil(id + "/C_s", method, rho.value()), rho));
        }
        Q neutralDesign = null;
        Double h = c.conditions().thirdHarmonicPercent();
        boolean fourCore = cable.type() == CableType.MULTICORE && cable.cores() >= 4 && phases == 3;
        if (h != null && h > 0 && fourCore) {
            CapacityData.Harmonic band = capacityData.harmonic(id + "/C_h", h);
            factors.add(Given.lookup(t, band.factor()));
            if (band.neutralBasis()) {
                Q hq = Given.input(t, id, "/h", "Third-harmonic content", "h", h, Units.PERCENT, c.where().path(),
                        ".installation.third_harmonic_percent");
                neutralDesign = CapacityFormulas.NEUTRAL_FROM_HARMONICS.eval(t, id, "/I_N", "size by the neutral current",
                        bind(CapacityFormulas.H, hq), bind(CapacityFormulas.I_B, ib));
            }
        } else if (h != null && h > 0) {
            if (t.recording()) Given.note(t, id + "/C_h", "Third-harmonic currents", "The harmonic reduction of IEC 60364-5-52 Annex E applies to four- and five-core cables of three-phase circuits only; not applied here.",
                    "IEC 60364-5-52:2009, Annex E");
        }
        Q product = termFormulas.eval(t, id + "/C", "", "correction-product", "C", "c", Units.NONE, factors,
                CapacityFormulas::correctionProduct);
        Q iz;
        if (cable.parallel() > 1) {
            Q np = Given.derived(t, id, "/n", "Conductors in parallel per phase", "n", cable.parallel(), Units.NONE,
                    "design input (cable.parallel)");
            iz = CapacityFormulas.CAPACITY_PARALLEL.eval(t, id, "/I_z", "", bind(CapacityFormulas.N, np),
                    bind(CapacityFormulas.I_T, it), bind(CapacityFormulas.C, product));
        } else {
            iz = CapacityFormulas.CAPACITY.eval(t, id, "/I_z", "", bind(CapacityFormulas.I_T, it), bind(CapacityFormulas.C, product));
        }
        return new Capacity(it, product, iz, neutralDesign);
    }

    /**
     * Ib ≤ In ≤ Iz, reported with the contract's convention: value I_z against limit I_n, or,
     * where I_b exceeds I_n, value I_n against limit I_b (the comparison that fails).
     */
    CheckResult capacityCheck(Trace t, String circuit, Q ib, Q in, Q iz) {
        boolean first = ib.value() <= in.value() + 1e-9;
        boolean second = in.value() <= iz.value() + 1e-9;
        if (t.recording()) {
            String id = circuit + "/cap/check";
            t.add(new Step.Check(id + "1", "Coordination: I_b ≤ I_n", "capacity", relabel(ib, ib.symbol()), "≤", relabel(in, "I_n"),
                    first, "IEC 60364-4-43:2008, 433.1"));
            t.add(new Step.Check(id + "2", "Coordination: I_n ≤ I_z", "capacity", relabel(in, "I_n"), "≤", relabel(iz, "I_z"),
                    second, "IEC 60364-4-43:2008, 433.1"));
        }
        if (!first) return new CheckResult("capacity", "Ib ≤ In ≤ Iz", false, in.value(), ib.value(), Units.A, true, circuit, "/cap/check1");
        return new CheckResult("capacity", "Ib ≤ In ≤ Iz", second, iz.value(), in.value(), Units.A, true, circuit, "/cap/check2");
    }

    String describeDevice(Device d) {
        String kind = switch (d.kind()) {
            case MCB -> "MCB" + (d.curve() == null ? "" : " type " + d.curve().token());
            case RCBO -> "RCBO" + (d.curve() == null ? "" : " type " + d.curve().token());
            case MCCB -> "MCCB";
            case FUSE -> "gG fuse";
        };
        return kind + (d.ratingA() == null ? ", rating auto" : ", " + Decimals.trim(d.ratingA()) + " A");
    }

    String describeConditions(Circuit c) {
        Conditions k = c.conditions();
        return "method " + k.method().token() + (k.groupedCircuits() > 1 ? ", grouped with " + (k.groupedCircuits() - 1)
                + " other circuit" + (k.groupedCircuits() > 2 ? "s" : "") + " (" + k.groupArrangement().token() + ")" : ", alone");
    }

    private static Q relabel(Q q, String symbol) {
        return q.as(symbol);
    }
}
