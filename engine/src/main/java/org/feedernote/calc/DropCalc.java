package org.feedernote.calc;

import static org.feedernote.formula.Formula.bind;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.feedernote.data.ReferenceData;
import org.feedernote.formula.DemandFormulas;
import org.feedernote.formula.DesignCurrentFormulas;
import org.feedernote.formula.ImpedanceFormulas;
import org.feedernote.formula.TermFormulas;
import org.feedernote.formula.Units;
import org.feedernote.formula.VoltageDropFormulas;
import org.feedernote.model.*;
import org.feedernote.trace.Q;
import org.feedernote.trace.Trace;

/**
 * The voltage drop: the conductor temperature and impedance, a circuit's own drop (approximate and
 * exact forms), the cumulative drop from the origin and its limit, and a motor's starting dip,
 * with the voltage-drop and motor-starting checks.
 */
final class DropCalc {
    private final Engine.Run run;
    private final ReferenceData data;
    private final ImpedanceCalc impedance;
    private final TermFormulas termFormulas;

    DropCalc(Engine.Run run, ReferenceData data, ImpedanceCalc impedance, TermFormulas termFormulas) {
        this.run = run;
        this.data = data;
        this.impedance = impedance;
        this.termFormulas = termFormulas;
    }

    /** A circuit's impedance and own voltage drop (sections z and vd), the part of its own figures its drop needs. */
    record OwnDrop(ImpedanceResult z, Trace vt, String vid, Q length, Q un, Q dropV, Q dropPct, Q dropExactPct, Q own) {}

    /** @param iz the circuit's current-carrying capacity, read only where the conductor temperature is estimated from it */
    OwnDrop ownDrop(Trace ct, Circuit c, int phases, Q ib, Q pf, Q iz) {
        String id = c.id();
        Trace zt = ct.recording() ? ct.section(id + "/z", "Cable impedance", describeCable(c.cable())) : ct;
        ImpedanceResult z;
        if (tabulated()) {
            Q theta = tabulatedTemperature(zt, c);
            z = impedance.tabulated(zt, id + "/z", c.cable(), c.conditions().method(), theta, phases);
        } else {
            Q theta = temperature(zt, c, ib, iz);
            z = impedance.impedance(zt, id + "/z", c.cable(), theta, run.f, phases);
        }

        Trace vt = !ct.recording() ? ct : ct.section(id + "/vd", "Voltage drop", phases == 3 ? "three-phase, referred to U" : "single-phase, referred to U_0");
        String vid = id + "/vd";
        Q length = Given.input(vt, vid, "/L", "Route length", "L", c.lengthM(), Units.M, c.where().path(), ".length_m");
        Q un = Given.alias("U_n", phases == 3 ? run.u : run.u0);
        Q dropV;
        Q sin = null;
        if (pf != null) {
            sin = VoltageDropFormulas.SIN_FROM_COS.eval(vt, vid, "/sin_phi", "", bind(VoltageDropFormulas.COS_PHI, pf));
            dropV = VoltageDropFormulas.APPROXIMATE.eval(vt, vid, "/dU", "power factor known", bind(VoltageDropFormulas.R, z.r()),
                    bind(VoltageDropFormulas.X, z.x()), bind(VoltageDropFormulas.COS_PHI, pf), bind(VoltageDropFormulas.SIN_PHI, sin),
                    bind(VoltageDropFormulas.I, ib), bind(VoltageDropFormulas.L, length));
        } else {
            dropV = VoltageDropFormulas.UNKNOWN_POWER_FACTOR.eval(vt, vid, "/dU", "power factor unknown",
                    bind(VoltageDropFormulas.Z, z.z()), bind(VoltageDropFormulas.I, ib), bind(VoltageDropFormulas.L, length));
        }
        Q dropPct = VoltageDropFormulas.PERCENT_OF_NOMINAL.eval(vt, vid, "/dU_pct", "", bind(VoltageDropFormulas.DU, dropV),
                bind(VoltageDropFormulas.U_N, un));
        Q dropExactPct = null;
        double quadrature = pf == null ? 0
                : ib.value() * length.value() * (z.x().value() * pf.value() - z.r().value() * sin.value()) / 1000;
        boolean exactSolvable = pf != null && Math.abs(quadrature) < un.value();
        if (pf != null && !exactSolvable) {
            if (vt.recording()) Given.decision(vt, vid + "/exact-none", "Voltage drop, exact phasor form",
                    "the quadrature drop I_b·L·(x·cos φ − r·sin φ) exceeds U_n",
                    "the exact form has no solution: the cable cannot deliver I_b over this length", "circuit theory", dropPct.id());
        }
        if (exactSolvable) {
            Q dropExact = VoltageDropFormulas.EXACT.evalAs("ΔU_exact", vt, vid, "/dU_exact", "phasor form",
                    bind(VoltageDropFormulas.U_N, un), bind(VoltageDropFormulas.R, z.r()), bind(VoltageDropFormulas.X, z.x()),
                    bind(VoltageDropFormulas.COS_PHI, pf), bind(VoltageDropFormulas.SIN_PHI, sin), bind(VoltageDropFormulas.I, ib),
                    bind(VoltageDropFormulas.L, length));
            dropExactPct = relabel(VoltageDropFormulas.PERCENT_OF_NOMINAL.evalAs("ΔU_exact", vt, vid, "/dU_exact_pct", "exact form",
                    bind(VoltageDropFormulas.DU, dropExact), bind(VoltageDropFormulas.U_N, un)), "ΔU_exact");
        }
        boolean exactGoverns = run.inst.basis().voltageDropMethod().value() == DropMethod.EXACT && dropExactPct != null;
        if (run.inst.basis().voltageDropMethod().value() == DropMethod.EXACT) {
            if (vt.recording()) Given.decision(vt, vid + "/method", "Voltage-drop form checked", "basis.voltage_drop_method = exact"
                            + (dropExactPct == null ? ", but the exact form is not available" : ""),
                    dropExactPct == null ? "the approximate form governs" : "the exact phasor form governs",
                    "design input", (dropExactPct == null ? dropPct : dropExactPct).id());
        } else {
            if (vt.recording()) Given.decision(vt, vid + "/method", "Voltage-drop form checked",
                    "basis.voltage_drop_method = approximate" + (run.inst.basis().voltageDropMethod().given() ? "" : " (default)"),
                    "the approximate form governs" + (dropExactPct != null ? "; the exact form is shown for comparison" : ""),
                    "IEC 60364-5-52:2009, Annex G", dropPct.id());
        }
        Q own = relabel(exactGoverns ? dropExactPct : dropPct, "ΔU(" + id + ")");
        return new OwnDrop(z, vt, vid, length, un, dropV, dropPct, dropExactPct, own);
    }

    /**
     * A circuit's own voltage drop with the no-op trace, for the sizing's weighing of a larger
     * size: the device and the capacity checks are not made, and the capacity only where the
     * conductor temperature is estimated from it.
     */
    Q ownDrop(Circuit c) {
        int phases = c.phases();
        Q ib = run.designCurrent.get(c.id());
        Q iz = run.inst.basis().conductorTemperature().value() == ConductorTemperature.MAXIMUM || tabulated() ? null
                : run.capacityCalc.capacity(Trace.noop(), c, phases, ib).iz();
        return ownDrop(Trace.noop(), c, phases, ib, run.powerFactor.get(c.id()), iz).own();
    }

    private boolean tabulated() {
        return run.inst.basis().impedance().value() == ImpedanceBasis.TABULATED;
    }

    /**
     * The conductor temperature of tabulated r and x: the tables are printed at the insulation's
     * maximum operating temperature, and are used as printed (an estimated temperature is not applied).
     */
    Q tabulatedTemperature(Trace t, Circuit c) {
        String id = c.id() + "/z";
        Q thetaMax = data.maxTemperature(t, id, "/theta_max", c.cable().insulation());
        if (t.recording()) {
            Setting<ConductorTemperature> setting = run.inst.basis().conductorTemperature();
            String because = "basis.impedance = tabulated: the voltage-drop tables give r and x at the maximum conductor operating temperature"
                    + (setting.value() == ConductorTemperature.ESTIMATED
                    ? "; basis.conductor_temperature = estimated is not applied to the tabulated figures (for a drop at the estimated temperature, use basis.impedance = derived)"
                    : "");
            Given.decision(t, id + "/theta", "Conductor temperature for the voltage drop", because,
                    "θ = θ_max of " + c.cable().insulation().token().toUpperCase(Locale.ROOT) + " = " + Decimals.trim(thetaMax.value())
                            + " °C: r and x as printed (the largest r, on the safe side)",
                    "BS 7671:2018 Appendix 4 voltage-drop tables; IEC 60364-5-52:2009, Table 52.1", thetaMax.id());
        }
        return relabel(thetaMax, "θ");
    }

    Q temperature(Trace t, Circuit c, Q ib, Q iz) {
        String id = c.id() + "/z";
        Q thetaMax = data.maxTemperature(t, id, "/theta_max", c.cable().insulation());
        Setting<ConductorTemperature> setting = run.inst.basis().conductorTemperature();
        if (setting.value() == ConductorTemperature.MAXIMUM || ib.value() >= iz.value()) {
            String because = setting.value() == ConductorTemperature.MAXIMUM
                    ? "basis.conductor_temperature = maximum" + (setting.given() ? "" : " (default)")
                    : "basis.conductor_temperature = estimated, but I_b ≥ I_z";
            if (t.recording()) Given.decision(t, id + "/theta", "Conductor temperature for the voltage drop", because,
                    "θ = θ_max of " + c.cable().insulation().token().toUpperCase(Locale.ROOT) + " = " + Decimals.trim(thetaMax.value()) + " °C",
                    "IEC 60364-5-52:2009, Table 52.1", thetaMax.id());
            return relabel(thetaMax, "θ");
        }
        boolean ground = c.conditions().method() == Method.D1 || c.conditions().method() == Method.D2;
        Setting<Double> amb = c.conditions().ambientC().given() ? c.conditions().ambientC()
                : (ground ? run.inst.basis().ambientGroundC() : run.inst.basis().ambientAirC());
        Q thetaA = Given.setting(t, id, "/theta_a", ground ? "Ground temperature" : "Ambient air temperature", "θ_a", amb, Units.DEG_C,
                "IEC 60364-5-52:2009, reference ambient");
        return ImpedanceFormulas.ESTIMATED_TEMPERATURE.eval(t, id, "/theta", "estimated", bind(ImpedanceFormulas.THETA_A, thetaA),
                bind(ImpedanceFormulas.THETA_MAX, thetaMax), bind(ImpedanceFormulas.I_B, ib),
                bind(ImpedanceFormulas.I_REF, iz));
    }

    /** What the drop from the origin gives a circuit: the cumulative drop, a final circuit's limit and a motor's starting dip (else null). */
    record PathDrop(Q cumulative, Q limit, Q dip) {}

    /**
     * The cumulative drop of c, and for a final circuit its limit and, for a motor, the starting
     * dip, their checks added to checks.
     */
    PathDrop pathDrop(Trace ct, Circuit c, Engine.Run.OwnFigures o, Map<String, CircuitResult> done, List<CheckResult> checks) {
        String id = c.id();
        Trace vt = o.vt();
        Q cumulative = cumulative(vt, c, o.own(), done);
        Q limit = null;
        Q dip = null;
        if (c.isFeeder()) {
            if (vt.recording()) Given.note(vt, o.vid() + "/board", "Cumulative drop at board " + c.to(),
                    "Checked against the limit at the terminals of each load supplied from " + c.to() + ".", "");
        } else {
            limit = limit(vt, c);
            checks.add(Checks.check(vt, o.vid(), "/check", "voltage-drop", "Voltage drop, origin to terminals", cumulative, limit,
                    "IEC 60364-5-52:2009, 525 and Annex G"));
            if (c.load().kind() == LoadKind.MOTOR && c.load().startingCurrentMultiple() != null) {
                Trace st = !ct.recording() ? ct : ct.section(id + "/st", "Motor starting", "voltage dip at the motor terminals while it starts");
                MotorStart start = motorStart(st, c, o, done);
                dip = start.dip();
                checks.add(start.check());
            } else if (c.load().kind() == LoadKind.MOTOR) {
                if (vt.recording()) Given.note(vt, id + "/st/none", "Motor starting",
                        "No starting_current_multiple is given: the starting dip is not checked.", "");
            }
        }
        return new PathDrop(cumulative, limit, dip);
    }

    Q cumulative(Trace t, Circuit c, Q own, Map<String, CircuitResult> done) {
        List<Q> terms = new ArrayList<>();
        for (Circuit f : run.feederPath(c.from())) {
            CircuitResult r = done.get(f.id());
            Q used = r.dropExactPercent() != null && run.inst.basis().voltageDropMethod().value() == DropMethod.EXACT
                    ? r.dropExactPercent() : r.dropPercent();
            // Shown by the feeder's name; a candidate's sum (no-op trace) reads only the value.
            terms.add(t.recording() ? relabel(used, "ΔU(" + f.id() + ")") : used);
        }
        terms.add(own);
        if (terms.size() == 1) {
            return relabel(own, "ΔU_total");
        }
        return termFormulas.eval(t, c.id(), "/vd/dU_total", "", "cumulative-drop", "ΔU_total", "d", Units.PERCENT, terms,
                vars -> DemandFormulas.sum("cumulative-drop", "Voltage drop, origin to " + (c.isFeeder() ? "board " + c.to() : "terminals"),
                        "ΔU_total", Units.PERCENT, vars, "Drops add along the path from the origin (each feeder's percentage plus the circuit's own)"));
    }

    Q limit(Trace t, Circuit c) {
        Basis basis = run.inst.basis();
        if (basis.limitsByKind()) {
            String kind = c.load().kind().token();
            boolean own = basis.voltageDropLimitsByKind().containsKey(kind);
            String key = own ? kind : LoadKind.OTHER.token();
            double limit = basis.voltageDropLimitsByKind().get(key);
            // The texts of the step are written only where it is recorded (not for sizing candidates).
            if (!t.recording()) return new Q(c.id(), "/vd/limit", "ΔU_max", limit, Units.PERCENT);
            return Given.input(t, c.id() + "/vd/limit", "Voltage-drop limit for " + kind + " loads", "ΔU_max", limit, Units.PERCENT,
                    basis.voltageDropLimitsPath() + "." + key);
        }
        return Given.setting(t, c.id(), "/vd/limit", "Voltage-drop limit, origin to terminals", "ΔU_max", basis.voltageDropLimitPercent(),
                Units.PERCENT, "default of this program: 4 % (common practice, no source; IEC 60364-5-52:2009 Table G.52.1 gives 3 % lighting, 5 % other uses from a public supply, 6 % / 8 % from a private one)");
    }

    Q starting(Trace t, Circuit c, ImpedanceResult z, Q ib, Q length, Q un, Map<String, CircuitResult> done) {
        String id = c.id() + "/st";
        Q k = Given.input(t, id, "/k_st", "Starting current multiple", "k_st", c.load().startingCurrentMultiple(), Units.NONE,
                c.where().path(), ".load.starting_current_multiple");
        Q ist = DesignCurrentFormulas.STARTING_CURRENT.eval(t, id, "/I_st", "", bind(DesignCurrentFormulas.K_ST, k),
                bind(DesignCurrentFormulas.I_B, ib));
        Q cosSt = Given.setting(t, id, "/cos_phi_st", "Power factor while starting", "cos φ_st", c.load().startingPowerFactor(),
                Units.NONE, "default of this program: 0.3 (common practice, no source)");
        Q sinSt = VoltageDropFormulas.SIN_FROM_COS_STARTING.eval(t, id, "/sin_phi_st", "", bind(VoltageDropFormulas.COS_ST, cosSt));
        Q du = VoltageDropFormulas.MOTOR_STARTING.eval(t, id, "/dU", "", bind(VoltageDropFormulas.R, z.r()),
                bind(VoltageDropFormulas.X, z.x()), bind(VoltageDropFormulas.COS_ST, cosSt), bind(VoltageDropFormulas.SIN_ST, sinSt),
                bind(VoltageDropFormulas.I_ST, ist), bind(VoltageDropFormulas.L, length));
        Q own = relabel(VoltageDropFormulas.PERCENT_OF_NOMINAL.evalAs("ΔU_st", t, id, "/dU_pct", "",
                bind(VoltageDropFormulas.DU, du), bind(VoltageDropFormulas.U_N, un)), "ΔU_st(" + c.id() + ")");
        List<Q> terms = new ArrayList<>();
        int phases = c.load().phases();
        terms.add(relabel(sourceDip(t, c, id, ist, cosSt, sinSt, phases), "ΔU_st(source)"));
        for (Circuit f : run.feederPath(c.from())) {
            CircuitResult fr = done.get(f.id());
            ImpedanceResult fz = phases == 3 ? fr.impedance()
                    : impedance.mvPerAm(t, id + "/" + f.id() + "/z", fr.impedance().theta(), fr.impedance().resistance(),
                    fr.impedance().reactance(), 1);
            Q inc = VoltageDropFormulas.STARTING_INCREMENT.eval(t, id + "/" + f.id() + "/inc", "feeder " + f.id(),
                    bind(VoltageDropFormulas.R, fz.r()), bind(VoltageDropFormulas.X, fz.x()), bind(VoltageDropFormulas.COS_ST, cosSt),
                    bind(VoltageDropFormulas.SIN_ST, sinSt), bind(VoltageDropFormulas.I_ST, ist), bind(VoltageDropFormulas.I_B, ib),
                    bind(VoltageDropFormulas.L, fr.length()), bind(VoltageDropFormulas.U_N, un));
            terms.add(relabel(fr.dropPercent(), "ΔU(" + f.id() + ")"));
            terms.add(relabel(inc, "ΔU_st(" + f.id() + ")"));
        }
        terms.add(own);
        return termFormulas.eval(t, id + "/dU_total", "", "starting-dip-total", "ΔU_st,total", "d", Units.PERCENT, terms,
                vars -> DemandFormulas.sum("starting-dip-total", "Voltage dip at the motor terminals while it starts", "ΔU_st,total",
                        Units.PERCENT, vars, "The source's dip at the starting current, the running drop of each upstream feeder and its added drop from the starting current, and the motor circuit's drop at starting current"));
    }

    /**
     * The dip across the source (transformer or network at the origin) at the starting current
     * and power factor: per phase for a three-phase motor, the line-neutral loop for a single-phase one.
     */
    private Q sourceDip(Trace t, Circuit c, String id, Q ist, Q cosSt, Q sinSt, int phases) {
        FaultPath.SourceImpedance src = run.faultPath.source();
        boolean three = phases == 3;
        if (t.recording()) Given.decision(t, id + "/source", "Source impedance in the starting dip",
                "the motor's starting current flows through the source as well as the cables; the origin is taken at U_n before the motor starts",
                "the whole starting current I_st through " + src.basis() + (three ? "" : "; the line-neutral loop, for a single-phase motor"),
                "IEC 60909-0:2016, 6.2 and 6.3.1; IEC 60364-5-52:2009, Annex G", src.r().id());
        Q r = three ? src.r() : src.rLoop();
        Q x = three ? src.x() : src.xLoop();
        return VoltageDropFormulas.SOURCE_STARTING.eval(t, id, "/dU_source", three ? "source, per phase" : "source, line-neutral loop",
                bind(VoltageDropFormulas.R_S, r), bind(VoltageDropFormulas.X_S, x), bind(VoltageDropFormulas.COS_ST, cosSt),
                bind(VoltageDropFormulas.SIN_ST, sinSt), bind(VoltageDropFormulas.I_ST, ist), bind(VoltageDropFormulas.U_0, run.u0));
    }

    /** A motor's dip while it starts and its check against the limit. */
    record MotorStart(Q dip, CheckResult check) {}

    MotorStart motorStart(Trace st, Circuit c, Engine.Run.OwnFigures o, Map<String, CircuitResult> done) {
        String id = c.id();
        Q dip = starting(st, c, o.z(), o.ib(), o.length(), o.un(), done);
        Q stLimit = Given.setting(st, id, "/st/limit", "Limit of the starting dip", "ΔU_st,max",
                run.inst.basis().motorStartingLimitPercent(), Units.PERCENT,
                "default of this program (common practice, no source)");
        CheckResult check = Checks.check(st, id, "/st/check", "motor-starting", "Voltage dip while the motor starts", dip, stLimit,
                "common practice, no source");
        if (!c.load().startingPowerFactor().given()) check = check.assuming(new Assumption(
                "cos φ_st taken as " + Decimals.trim(c.load().startingPowerFactor().value()) + ", the program's default",
                c.where().path() + ".load.starting_power_factor", false));
        return new MotorStart(dip, check);
    }

    String describeCable(Cable cable) {
        String size = (cable.parallel() > 1 ? cable.parallel() + " × " : "") + ReferenceData.sizeKey(cable.size().mm2()) + " mm²";
        String kind = cable.type() == CableType.MULTICORE ? cable.cores() + "-core" : "single-core, " + cable.formation().token();
        return size + " " + cable.conductor().token() + ", " + cable.insulation().token().toUpperCase(Locale.ROOT) + ", " + kind;
    }

    private static Q relabel(Q q, String symbol) {
        return q.as(symbol);
    }
}
