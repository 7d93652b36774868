package org.feedernote.calc;

import static org.feedernote.formula.FaultFormulas.*;
import static org.feedernote.formula.Formula.bind;

import java.util.Map;

import org.feedernote.data.DeviceData;
import org.feedernote.data.FaultData;
import org.feedernote.formula.Units;
import org.feedernote.model.Cable;
import org.feedernote.model.CableType;
import org.feedernote.model.Circuit;
import org.feedernote.model.Conductor;
import org.feedernote.model.CpcKind;
import org.feedernote.model.Device;
import org.feedernote.model.DeviceKind;
import org.feedernote.model.Insulation;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.Trace;

/**
 * The short-circuit side of a circuit's protection: breaking capacity (IEC 60364-4-43, 434.5.1),
 * short-circuit protection of the line conductors (435.1, else the adiabatic check of 434.5.2) and
 * the adiabatic withstand of the protective conductor (IEC 60364-5-54, 543.1.2). The let-through
 * energy is taken at the fault current actually calculated, from the part of the device that
 * operates at that current.
 */
final class Withstand {
    private static final String T_INSTANT = "instantaneous region: operation within 0.1 s (IEC 60898-1:2015, Table 7; IEC 60364-4-43:2008, 434.5.2)";
    private static final String CLAUSE_435 = "IEC 60364-4-43:2008, 435.1";

    private final FaultData faults;
    private final DeviceData devices;

    Withstand(FaultData faults, DeviceData devices) {
        this.faults = faults;
        this.devices = devices;
    }

    /**
     * How the device operates, as the disconnection check found it: the current that operates its
     * overcurrent part within the required time (null where the input lacks it), that time, and
     * the rated residual operating current of an RCD part (null without one).
     */
    record Operation(Q ia, Q time, Q idn) {}

    // ---------------- breaking capacity ----------------

    CheckResult breaking(Trace t, Circuit c, String id, Q prospective) {
        String title = "Breaking capacity ≥ prospective fault current";
        if (backedUp(c.device(), prospective)) return backup(t, c, id, title, prospective);
        if (c.device().breakingCapacityKa() == null) {
            if (t.recording()) Given.decision(t, id + "/check", title, "the input gives no breaking_capacity_ka for the device",
                    "FAIL: the device cannot be shown to break " + FaultPath.NumberFormatPolicyLite.ka(prospective.value()) + " kA",
                    "IEC 60364-4-43:2008, 434.5.1");
            return CheckResult.undetermined("breaking-capacity", title, Units.KA, id, "/check",
                    c.where().path() + ".device.breaking_capacity_ka is not given");
        }
        Q icu = Given.input(t, id, "/Icu", "Rated breaking capacity of the device", "I_cu", c.device().breakingCapacityKa(), Units.KA,
                c.where().path(), ".device.breaking_capacity_ka");
        boolean pass = icu.value() >= prospective.value() - 1e-12;
        if (t.recording()) t.add(new Step.Check(id + "/check", title, "breaking-capacity", icu, "≥", prospective, pass,
                "IEC 60364-4-43:2008, 434.5.1"));
        return new CheckResult("breaking-capacity", title, pass, icu.value(), prospective.value(), Units.KA, true, id, "/check");
    }

    /** Whether the device relies on back-up protection: one is given, and the device alone cannot be shown to break the current. */
    static boolean backedUp(Device dev, Q prospective) {
        return dev.backup() != null && (dev.breakingCapacityKa() == null || dev.breakingCapacityKa() < prospective.value() - 1e-12);
    }

    /**
     * Back-up protection (434.5.1): a lower breaking capacity is permitted where a device on the
     * supply side has the necessary breaking capacity and the two are co-ordinated; the
     * manufacturer's combined value stands for that co-ordination and is checked instead.
     */
    private CheckResult backup(Trace t, Circuit c, String id, String title, Q prospective) {
        Device.Backup b = c.device().backup();
        String path = c.where().path() + ".device";
        if (t.recording()) Given.decision(t, id + "/backup", "Back-up protection",
                (c.device().breakingCapacityKa() == null ? "the input gives no breaking_capacity_ka for the device"
                        : "the device's rated breaking capacity " + FaultPath.NumberFormatPolicyLite.ka(c.device().breakingCapacityKa())
                        + " kA is below the prospective fault current " + FaultPath.NumberFormatPolicyLite.ka(prospective.value()) + " kA")
                        + "; the input names back-up protection by the device of " + b.upstreamCircuit()
                        + " with a combined breaking capacity from the manufacturer (" + path + ".backup)",
                "the combination's breaking capacity is checked instead of the device's own: a stated decision of the designer, resting on the "
                        + "manufacturer's co-ordination data; the upstream device's own breaking capacity is checked at its own point, where the "
                        + "prospective current is not lower",
                "IEC 60364-4-43:2008, 434.5.1 (from memory)");
        Q combined = Given.input(t, id, "/Icu_backup", "Combined breaking capacity with the device of " + b.upstreamCircuit()
                + " (manufacturer's back-up data)", "I_cu,comb", b.combinedBreakingCapacityKa(), Units.KA, path, ".backup.combined_breaking_capacity_ka");
        boolean pass = combined.value() >= prospective.value() - 1e-12;
        if (t.recording()) t.add(new Step.Check(id + "/check", title + " (back-up protection)", "breaking-capacity", combined, "≥", prospective, pass,
                "IEC 60364-4-43:2008, 434.5.1 (from memory)"));
        return new CheckResult("breaking-capacity", title + " (back-up protection by " + b.upstreamCircuit() + ")", pass, combined.value(),
                prospective.value(), Units.KA, true, id, "/check", true, null);
    }

    // ---------------- line conductors ----------------

    /**
     * Short-circuit protection of the line conductors. Where the device protects the circuit
     * against overload and can break the prospective current at its point, it protects the
     * conductors on its load side against short circuit as well (435.1): no adiabatic check. Where
     * it cannot break that current, no let-through energy of it can be relied on. Otherwise (the
     * device gives fault protection only, or its breaking capacity is unknown) the adiabatic check.
     */
    CheckResult line(Trace t, Circuit c, String id, Q prospectiveKa, Operation op, Q in, Q thetaMax, boolean overloadProtected,
                     CheckResult breaking) {
        String name = "short-circuit";
        String title = "Short-circuit protection of the line conductor";
        boolean faultOnly = c.device().faultProtectionOnly();
        boolean backedUp = backedUp(c.device(), prospectiveKa);
        if (backedUp && breaking.pass()) {
            if (t.recording()) Given.decision(t, id + "/rule", "Short-circuit protection of the line conductor",
                    "the device breaks the fault current only with its back-up device (" + c.device().backup().upstreamCircuit() + ")",
                    "the adiabatic check applies: the energy the two let through must not exceed what the conductors withstand "
                            + "(give the combination's let-through from the manufacturer as device.let_through_a2s)",
                    "IEC 60364-4-43:2008, 434.5.1 (from memory) and 434.5.2");
            Q current = rel(A_FROM_KA.eval(t, id, "/I", "", bind(IK_KA, prospectiveKa)), "I_k");
            return adiabatic(t, c, id, name, title, current, op, in, c.cable().size().mm2(), thetaMax, false);
        }
        if (overloadProtected && !faultOnly && breaking.determined() && breaking.pass()) {
            if (t.recording()) Given.decision(t, id + "/check", title,
                    "the device protects the circuit against overload (I_b ≤ I_n ≤ I_z and I_2 ≤ 1.45 · I_z are met) and its rated breaking capacity "
                            + FaultPath.NumberFormatPolicyLite.ka(breaking.value()) + " kA is not less than the prospective fault current "
                            + FaultPath.NumberFormatPolicyLite.ka(breaking.limit()) + " kA at its point of installation",
                    "PASS: the device also protects the line conductors on its load side against short circuit; no adiabatic check is needed",
                    CLAUSE_435);
            return CheckResult.deemed(name, title, Units.MM2, id, "/check",
                    CLAUSE_435 + " (the overload device's breaking capacity is not less than the prospective fault current)");
        }
        if (breaking.determined() && !breaking.pass()) {
            if (t.recording()) Given.decision(t, id + "/check", title,
                    "the device's rated breaking capacity is below the prospective fault current (see breaking capacity): it cannot be relied on to clear the fault",
                    "FAIL: the withstand of the line conductors cannot rest on this device; a device of adequate breaking capacity (or back-up protection) is needed first",
                    "IEC 60364-4-43:2008, 434.5.1 and 434.5.2");
            return CheckResult.undetermined(name, title, Units.MM2, id, "/check", c.where().path()
                    + ".device.breaking_capacity_ka is below the prospective fault current, so no let-through of this device can be relied on");
        }
        if (t.recording()) Given.decision(t, id + "/rule", "Short-circuit protection of the line conductor",
                faultOnly ? "the device gives fault protection only (device.fault_protection_only)"
                        : !overloadProtected ? "the device does not protect the circuit against overload (433 not met)"
                        : "the device's breaking capacity is not given",
                "the adiabatic check applies", "IEC 60364-4-43:2008, 435.1 and 434.5.2");
        Q current = rel(A_FROM_KA.eval(t, id, "/I", "", bind(IK_KA, prospectiveKa)), "I_k");
        return adiabatic(t, c, id, name, title, current, op, in, c.cable().size().mm2(), thetaMax, false);
    }

    // ---------------- protective conductor ----------------

    CheckResult protective(Trace t, Circuit c, String id, Q ief, Operation op, Q in, Q thetaMax) {
        return adiabatic(t, c, id, "protective-conductor", "Withstand of the protective conductor", ief, op, in,
                c.cable().cpc().mm2(), thetaMax, true);
    }

    private CheckResult adiabatic(Trace t, Circuit c, String id, String name, String title, Q current, Operation op, Q in,
                                  double size, Q thetaMax, boolean protective) {
        Cable cable = c.cable();
        LetThrough lt = letThrough(t, c, id, current, op, in, protective);
        if (lt.i2t() == null) {
            if (t.recording()) Given.decision(t, id + "/check", title, lt.missing(), "FAIL: cannot be shown", "IEC 60364-4-43:2008, 434.5.2");
            return CheckResult.undetermined(name, title, Units.MM2, id, "/check", lt.missing());
        }
        Q k = kFactor(t, id, cable, thetaMax, protective);
        Q smin = MIN_SIZE.evalAs(protective ? "S_PE,min" : "S_min", t, id, "/Smin", "", bind(I2T, rel(lt.i2t(), "I²t")), bind(KF, k));
        Q installed = Given.derived(t, id, "/S", protective ? "Protective conductor installed" : "Line conductor installed",
                protective ? "S_PE" : "S", size * cable.parallel(), Units.MM2,
                cable.parallel() > 1 ? "design input (" + cable.parallel() + " conductors in parallel share the fault current)" : "design input");
        boolean pass = installed.value() >= smin.value() - 1e-12;
        if (t.recording()) t.add(new Step.Check(id + "/check", title, name, installed, "≥", smin, pass,
                "IEC 60364-4-43:2008, 434.5.2" + (protective ? "; IEC 60364-5-54:2011, 543.1.2" : "")));
        CheckResult result = new CheckResult(name, title, pass, installed.value(), smin.value(), Units.MM2, true, id, "/check");
        return lt.assumed() == null ? result
                : result.assuming(new Assumption(lt.assumed(), c.where().path() + ".device.let_through_a2s", lt.safeSide()));
    }

    /** The let-through energy at a current, or what the input lacks to know it. */
    private record LetThrough(Q i2t, String missing, String assumed, boolean safeSide) {
        LetThrough(Q i2t, String missing) {
            this(i2t, missing, null, true);
        }

        /** An upper bound of the energy (an operating time at least as long as the real one): on the safe side. */
        LetThrough(Q i2t, String missing, String assumed) {
            this(i2t, missing, assumed, true);
        }
    }

    /**
     * The let-through energy at the current I, from the part of the device that operates at it:
     * the manufacturer's value where given; the overcurrent part where I reaches the current that
     * operates it within the required time; the RCD part where I is below that but not below I_Δn;
     * never a value read at another current.
     */
    private LetThrough letThrough(Trace t, Circuit c, String id, Q current, Operation op, Q in, boolean protective) {
        Device dev = c.device();
        if (dev.letThroughA2s() != null) {
            return new LetThrough(Given.input(t, id, "/I2t", "Let-through energy of the device (manufacturer's data)", "I²t", dev.letThroughA2s(),
                    "A²s", c.where().path(), ".device.let_through_a2s"), null);
        }
        double i = current.value();
        boolean overcurrentPart = op.ia() != null && i >= op.ia().value() - 1e-9;
        if (overcurrentPart) {
            if (dev.kind() == DeviceKind.FUSE) {
                Step.Lookup gate = devices.hasFuseGates(in.value()) ? devices.fuseGate(id + "/I_max01", in.value(), DeviceData.Gate.MAX_01S) : null;
                if (gate != null && i >= gate.q().value() - 1e-9) {
                    Q g = Given.lookupUsing(t, gate, current);
                    if (t.recording()) Given.decision(t, id + "/t-basis", "Operating time", "I = " + FaultPath.NumberFormatPolicyLite.a(i)
                                    + " A is not below I_max(0.1 s) = " + FaultPath.NumberFormatPolicyLite.a(g.value()) + " A of the gG fuse-link",
                            "the fuse-link melts within 0.1 s; I² · 0.1 s is taken as its operating energy (at such currents the arcing adds a few "
                                    + "milliseconds to a melting time well below 0.1 s; common practice, no source; device.let_through_a2s replaces it)",
                            "IEC 60269-1, Table 3 (gates)");
                    Q t01 = Given.derived(t, id, "/t", "Operating time", "t", 0.1, Units.S, "IEC 60269-1, Table 3: melting within 0.1 s at I_max(0.1 s)");
                    return new LetThrough(ENERGY.eval(t, id, "/I2t", "gG fuse above I_max(0.1 s)", bind(I, current), bind(T, t01)), null,
                            "I²t taken as I² · 0.1 s (the gG fuse-link melts within 0.1 s), not the manufacturer's let-through");
                }
                if (t.recording()) Given.decision(t, id + "/t-basis", "Operating time", "I = " + FaultPath.NumberFormatPolicyLite.a(i)
                        + " A is not below I_a = " + FaultPath.NumberFormatPolicyLite.a(op.ia().value()) + " A, the current that operates the fuse within t",
                        "the fuse operates within t (an upper bound of its operating time)", "IEC 60364-4-43:2008, 434.5.2");
                return new LetThrough(ENERGY.eval(t, id, "/I2t", "within the required time", bind(I, current), bind(T, Given.alias("t", op.time()))), null,
                        "I²t taken as I² · t with the required disconnection time t as the fuse's operating time (an upper bound)");
            }
            if (dev.kind() == DeviceKind.MCB || dev.kind() == DeviceKind.RCBO) {
                Step.Lookup class3 = devices.classThreeLetThrough(id + "/I2t_cl3", dev.curve(), in.value(), i);
                Q t01 = Given.derived(t, id, "/t", "Operating time", "t", 0.1, Units.S, T_INSTANT);
                if (class3 == null) {
                    return new LetThrough(ENERGY.eval(t, id, "/I2t", "instantaneous region", bind(I, current), bind(T, t01)), null,
                            "I²t taken as I² · 0.1 s (operation within 0.1 s in the instantaneous region, an upper bound)");
                }
                // Both are upper bounds of the same energy: the breaker clears within 0.1 s in its
                // instantaneous region, and its class limits the energy at the tabulated current.
                double bound = i * i * 0.1;
                if (bound <= class3.q().value()) {
                    if (t.recording()) Given.decision(t, id + "/I2t-basis", "Let-through energy", "I² · 0.1 s = " + Decimals.trim(Math.round(bound))
                            + " A²s is below the energy-limiting class 3 limit " + Decimals.trim(Math.round(class3.q().value())) + " A²s",
                            "the smaller upper bound is used: I² · t with t = 0.1 s", "IEC 60898-1:2015, Table 7 and Annex ZA");
                    return new LetThrough(ENERGY.eval(t, id, "/I2t", "instantaneous region", bind(I, current), bind(T, t01)), null,
                            "I²t taken as I² · 0.1 s (operation within 0.1 s in the instantaneous region, an upper bound)");
                }
                Q v = Given.lookupUsing(t, class3, current);
                if (t.recording()) Given.note(t, id + "/class3", "Energy-limiting class",
                        "The circuit-breaker is taken as energy-limiting class 3, the usual class of modern MCBs; confirm with the manufacturer (device.let_through_a2s replaces it).", "");
                return new LetThrough(Given.alias("I²t", v), null,
                        "I²t taken as the energy-limiting class 3 limit (the breaker assumed to be of class 3)", false);
            }
            // MCCB: the instantaneous release within 0.1 s where the current reaches it, else the short-time release after its delay.
            boolean instantaneous = dev.instantaneousA() != null && i >= 1.2 * dev.instantaneousA() - 1e-9;
            if (!instantaneous && dev.shortTimeDelayS() != null) {
                Q tsd = Given.input(t, id, "/t_sd", "Short-time delay of the release", "t_sd", dev.shortTimeDelayS(), Units.S, c.where().path(),
                        ".device.short_time_delay_s");
                if (t.recording()) Given.decision(t, id + "/t-basis", "Operating time", "I = " + FaultPath.NumberFormatPolicyLite.a(i)
                                + " A reaches the short-time release" + (dev.instantaneousA() == null ? "" : " but not 1.2 × I_i"),
                        "the release operates after its delay t_sd (the manufacturer's let_through_a2s replaces this)", "IEC 60947-2:2016, 8.3.3 (from memory)");
                return new LetThrough(ENERGY.eval(t, id, "/I2t", "short-time region", bind(I, current), bind(T, tsd.as("t"))), null,
                        "I²t taken as I² · t_sd (the short-time delay as the operating time)");
            }
            Q t01 = Given.derived(t, id, "/t", "Operating time", "t", 0.1, Units.S,
                    "instantaneous release: operation within 0.1 s (IEC 60364-4-43:2008, 434.5.2; common practice, no source)");
            return new LetThrough(ENERGY.eval(t, id, "/I2t", "instantaneous region", bind(I, current), bind(T, t01)), null,
                    "I²t taken as I² · 0.1 s (the instantaneous release taken to operate within 0.1 s)");
        }
        if (op.idn() != null && i >= op.idn().value() - 1e-12) {
            double multiple = i / op.idn().value();
            DeviceData.Residual at = multiple >= 5 - 1e-9 ? DeviceData.Residual.FIVE : multiple >= 2 - 1e-9 ? DeviceData.Residual.TWO
                    : DeviceData.Residual.ONE;
            // Between the tabulated multiples the slower time of the lower one applies (on the safe side).
            Step.Lookup tr = devices.rcdMaximumBreakTime(id + "/t_rcd", dev.rcdTimeDelayed(), at);
            if (t.recording()) Given.decision(t, id + "/t-basis", "Part of the device that operates",
                    "I = " + FaultPath.NumberFormatPolicyLite.a(i) + " A is " + (op.ia() == null ? "" : "below the current that operates the overcurrent part ("
                            + FaultPath.NumberFormatPolicyLite.a(op.ia().value()) + " A) and ") + "not below I_Δn",
                    "the residual-current part operates: its maximum break time at this current applies", "IEC 61008-1 / IEC 61009-1, Table 1");
            Q tRcd = Given.lookupUsing(t, tr, current);
            return new LetThrough(ENERGY.eval(t, id, "/I2t", "RCD break time", bind(I, current), bind(T, rel(tRcd, "t"))), null,
                    "I²t taken as I² · the maximum break time of the residual-current part (an upper bound)");
        }
        if (op.ia() == null) {
            String key = dev.kind() == DeviceKind.MCCB ? ".device.instantaneous_a" : ".device.disconnection_current_a";
            return new LetThrough(null, c.where().path() + key + " is not given: the operating current of the device is not known");
        }
        if (t.recording()) Given.decision(t, id + "/t-basis", "Operating time", "I = " + FaultPath.NumberFormatPolicyLite.a(i) + " A is below I_a = "
                + FaultPath.NumberFormatPolicyLite.a(op.ia().value()) + " A", "the device is taken to operate within the required time t", "IEC 60364-4-43:2008, 434.5.2");
        return new LetThrough(ENERGY.eval(t, id, "/I2t", "within the required time", bind(I, current), bind(T, Given.alias("t", op.time()))), null,
                "I²t taken as I² · t with the required disconnection time t as the operating time (an upper bound)");
    }

    private static Q rel(Q q, String symbol) {
        return q.as(symbol);
    }

    // ---------------- k ----------------

    /** What the k factor depends on: the conductor and insulation materials and the initial temperature. */
    private record KInputs(Conductor conductor, Insulation insulation, boolean separate, double thetaMax) {
        // Written out, as the sizing's other lookup keys (see TermFormulas.Key).
        @Override public boolean equals(Object o) {
            return o instanceof KInputs k && conductor == k.conductor && insulation == k.insulation && separate == k.separate
                    && Double.compare(thetaMax, k.thetaMax) == 0;
        }

        @Override public int hashCode() {
            return ((conductor.ordinal() * 31 + insulation.ordinal()) * 31 + (separate ? 1 : 0)) * 31 + Double.hashCode(thetaMax);
        }
    }

    /** k by its inputs, for the sizing's candidates (the no-op trace): few combinations serve thousands of circuits. */
    private final Map<KInputs, Double> kValues = new java.util.concurrent.ConcurrentHashMap<>();

    private Q kFactor(Trace t, String id, Cable cable, Q thetaMax, boolean protective) {
        if (t.recording()) return kFactorSteps(t, id, cable, thetaMax, protective);
        KInputs key = new KInputs(cable.conductor(), cable.insulation(), protective && cable.separateCpc(), thetaMax.value());
        double k = kValues.computeIfAbsent(key, x -> kFactorSteps(t, id, cable, thetaMax, protective).value());
        return new Q(id, "/k", K_FACTOR.symbol(), k, K_FACTOR.unit());
    }

    /** Why a protective conductor that is not separate starts at the cable's maximum operating temperature. */
    private static String protectiveInCable(Cable cable) {
        if (cable.cpcKind() == CpcKind.CORE) return "the protective conductor is a core of the cable";
        if (cable.cpcKind() == CpcKind.TWIN_AND_EARTH) return "the protective conductor is the bare cpc in the sheath of the twin-and-earth cable";
        // cpc_mm2 given without cpc_kind, and not a core or a twin-and-earth cpc by its size: taken
        // as run with the cable, at θ_max, the lower k (on the safe side).
        return "cpc_kind not given: the protective conductor is taken as a core of the cable, in its sheath or bunched with it (the lower k, on the safe side)";
    }

    private Q kFactorSteps(Trace t, String id, Cable cable, Q thetaMax, boolean protective) {
        Q kc = Given.lookup(t, faults.materialConstant(id + "/K", cable.conductor()));
        Q beta = Given.lookup(t, faults.beta(id + "/beta", cable.conductor()));
        Q thetaF = Given.lookup(t, faults.finalTemperature(id + "/theta_f", cable.insulation()));
        Q thetaI;
        if (protective && cable.separateCpc()) {
            thetaI = Given.lookup(t, faults.separateInitialTemperature(id + "/theta_i", cable.insulation()));
            if (t.recording()) Given.decision(t, id + "/cpc-kind", "Kind of protective conductor", cable.type() == CableType.SINGLE_CORE
                            ? "single-core cables: the protective conductor is a separate insulated conductor"
                            : "the protective conductor is a separate insulated conductor, not part of the " + cable.cores() + "-core cable",
                    "initial temperature 30 °C (Table A.54.2)", "IEC 60364-5-54:2011, Table A.54.2", thetaI.id());
        } else {
            thetaI = rel(thetaMax, "θ_i");
            if (t.recording()) Given.decision(t, id + "/theta-i", "Initial conductor temperature", !protective
                    ? "the line conductor starts at its maximum operating temperature" : protectiveInCable(cable), "θ_i = θ_max",
                    "IEC 60364-5-54:2011, Tables A.54.3 and A.54.4", thetaMax.id());
        }
        return K_FACTOR.eval(t, id, "/k", "", bind(K, kc), bind(BETA, beta), bind(THETA_F, thetaF), bind(THETA_I, thetaI));
    }
}
