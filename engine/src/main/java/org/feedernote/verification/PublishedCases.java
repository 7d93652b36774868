package org.feedernote.verification;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.feedernote.calc.CableImpedance;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.ImpedanceResult;
import org.feedernote.calc.Result;
import org.feedernote.data.CapacityData;
import org.feedernote.data.DeviceData;
import org.feedernote.data.FuseSystem;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.Arrangement;
import org.feedernote.model.Cable;
import org.feedernote.model.CableType;
import org.feedernote.model.Conductor;
import org.feedernote.model.CpcKind;
import org.feedernote.model.Curve;
import org.feedernote.model.Formation;
import org.feedernote.model.Insulation;
import org.feedernote.model.Method;
import org.feedernote.model.SizeChoice;
import org.feedernote.verification.PublishedCase.Source;
import org.feedernote.verification.PublishedCase.Tolerance;

/**
 * The published values the program is held to, in one list: the tests assert every case
 * ({@code PublishedCasesTest}) and {@code feedernote selfcheck} prints them. Each case names its
 * source beside the value (document and edition, table or clause, and the copy seen or "from
 * memory"). Inputs written here are invented; the expected values are the documents'.
 */
public final class PublishedCases {
    private PublishedCases() {}

    /** Built on first use, after the tables below are initialised. */
    private static final class Holder {
        static final List<PublishedCase> ALL = build();
    }

    public static List<PublishedCase> all() {
        return Holder.ALL;
    }

    private static List<PublishedCase> build() {
        List<PublishedCase> cases = new ArrayList<>();
        conductorResistance(cases);
        resistiveDrop(cases);
        multicoreReactance(cases);
        reactanceFromGeometry(cases);
        faultLevels(cases);
        adiabaticK(cases);
        loopImpedance(cases);
        disconnection(cases);
        capacityAndFactors(cases);
        deviceData(cases);
        List<String> ids = cases.stream().map(PublishedCase::id).toList();
        if (ids.stream().distinct().count() != ids.size()) throw new IllegalStateException("published case ids repeat");
        return List.copyOf(cases);
    }

    /** Whitespace-separated rows of a text block; blank lines and lines starting with # are skipped. */
    private static List<String[]> rows(String block) {
        List<String[]> out = new ArrayList<>();
        for (String line : block.strip().split("\n")) {
            String l = line.strip();
            if (!l.isEmpty() && !l.startsWith("#")) out.add(l.split("\\s+"));
        }
        return out;
    }

    private static String id(String prefix, int n) {
        return prefix + "-" + (n < 10 ? "0" : "") + n;
    }

    private static double num(String s) {
        return Double.parseDouble(s);
    }

    private static String size(double mm2) {
        return ReferenceData.sizeKey(mm2);
    }

    // ------------------------------------------------------------------ IEC 60228 Table 2

    private static void conductorResistance(List<PublishedCase> cases) {
        Source source = new Source("IEC 60228:2004", "Table 2, class 2 conductors",
                "copies named in conductor-resistance.csv: mycableengineering.com, kabelmetal-indonesia.com, uecables.com");
        int n = 0;
        for (String[] r : rows("""
                copper 1.5 12.1
                copper 2.5 7.41
                copper 4 4.61
                copper 6 3.08
                copper 10 1.83
                copper 16 1.15
                copper 25 0.727
                copper 35 0.524
                copper 50 0.387
                copper 95 0.193
                copper 240 0.0754
                aluminium 16 1.91
                aluminium 95 0.320
                aluminium 240 0.125
                copper 1 18.1
                """)) {
            Conductor conductor = Conductor.valueOf(r[0].toUpperCase(Locale.ROOT));
            double mm2 = num(r[1]);
            cases.add(new PublishedCase(id("R20", ++n), "d.c. resistance at 20 °C, " + r[0] + " " + r[1] + " mm²", source,
                    num(r[2]), "Ω/km", Tolerance.exact(), data -> data.resistance20("t", conductor, mm2).value()));
        }
    }

    // ------------------------------------------------------------------ BS 7671 Appendix 4, r of multicore cables

    /** A multicore copper cable of one circuit, 10 m, 10 A, on the engine: its r or x in mV/A/m. */
    private static CircuitResult multicore(ReferenceData data, String insulation, int phases, double mm2) {
        String cable = "{conductor: copper, insulation: %s, type: multicore, cores: %d, size_mm2: %s, cpc_mm2: %s}"
                .formatted(insulation, phases == 1 ? 2 : 4, size(mm2), size(Math.min(mm2, 16)));
        String load = "{kind: other, current_a: 10, power_factor: 0.9, phases: %d}".formatted(phases);
        Result r = InventedInputs.run(data, InventedInputs.oneBoard("", "utility: {fault_level_ka: 10, loop_impedance_ohm: 0.3}",
                InventedInputs.circuit("B0", load, 10, cable, "C", "{kind: mcb, curve: B, rating_a: 32, breaking_capacity_ka: 10}")));
        return InventedInputs.circuit(r, "C1");
    }

    private static void resistiveDrop(List<PublishedCase> cases) {
        // The tables round to two or three significant figures; sizes to 16 mm² print one figure (resistance dominates).
        Tolerance rounding = Tolerance.relative(0.03, "the table rounds to two significant figures");
        Source pvc = Source.recalled("BS 7671:2018", "Appendix 4, Table 4D2B (70 °C thermoplastic multicore, copper), r");
        Source xlpe = Source.recalled("BS 7671:2018", "Appendix 4, Table 4E2B (90 °C thermosetting multicore, copper), r");
        int n = 0;
        for (String[] r : rows("""
                pvc 1.5 1 29
                pvc 2.5 1 18
                pvc 4 1 11
                pvc 6 1 7.3
                pvc 10 1 4.4
                pvc 16 1 2.8
                pvc 1.5 3 25
                pvc 2.5 3 15
                pvc 4 3 9.5
                pvc 6 3 6.4
                pvc 10 3 3.8
                pvc 16 3 2.4
                pvc 25 3 1.50
                pvc 35 3 1.10
                pvc 50 3 0.81
                pvc 95 3 0.41
                pvc 240 3 0.165
                xlpe 1.5 1 31
                xlpe 2.5 1 19
                xlpe 4 1 12
                xlpe 6 1 7.9
                xlpe 10 1 4.7
                xlpe 16 1 2.9
                xlpe 1.5 3 27
                xlpe 2.5 3 16
                xlpe 4 3 10
                xlpe 6 3 6.8
                xlpe 10 3 4.0
                xlpe 16 3 2.5
                """)) {
            String insulation = r[0];
            double mm2 = num(r[1]);
            int phases = Integer.parseInt(r[2]);
            cases.add(new PublishedCase(id("VD", ++n), "r of a " + (insulation.equals("pvc") ? "PVC" : "XLPE") + " multicore " + r[1]
                    + " mm², " + (phases == 1 ? "single" : "three") + "-phase", insulation.equals("pvc") ? pvc : xlpe, num(r[3]),
                    "mV/A/m", rounding, data -> multicore(data, insulation, phases, mm2).impedance().r().value()));
        }
        // Single-core cables in trefoil, the engine on a 100 A three-phase circuit.
        Source trefoil = Source.recalled("BS 7671:2018", "Appendix 4, Table 4E1B (90 °C thermosetting single-core, copper, trefoil touching)");
        for (String[] r : rows("""
                95 0.41 0.150
                240 0.170 0.140
                """)) {
            double mm2 = num(r[0]);
            cases.add(new PublishedCase(id("VD", ++n), "r of XLPE single-core " + r[0] + " mm² in trefoil", trefoil, num(r[1]), "mV/A/m",
                    Tolerance.relative(0.05, "rounding of the table and the a.c. resistance"),
                    data -> trefoil(data, mm2).impedance().r().value()));
            cases.add(new PublishedCase(id("VD", ++n), "x of XLPE single-core " + r[0] + " mm² in trefoil", trefoil, num(r[2]), "mV/A/m",
                    Tolerance.relative(0.15, "conductor diameter and insulation thickness nominal, not the maker's"),
                    data -> trefoil(data, mm2).impedance().x().value()));
        }
    }

    private static CircuitResult trefoil(ReferenceData data, double mm2) {
        String cable = "{conductor: copper, insulation: xlpe, type: single-core, formation: trefoil, size_mm2: %s, cpc_mm2: 50}"
                .formatted(size(mm2));
        Result r = InventedInputs.run(data, InventedInputs.oneBoard("", "utility: {fault_level_ka: 10, loop_impedance_ohm: 0.3}",
                InventedInputs.circuit("B0", "{kind: other, current_a: 100, power_factor: 0.9, phases: 3}", 10, cable, "C",
                        "{kind: mcb, curve: B, rating_a: 32, breaking_capacity_ka: 10}")));
        return InventedInputs.circuit(r, "C1");
    }

    private static void multicoreReactance(List<PublishedCase> cases) {
        Source source = Source.recalled("BS 7671:2018", "Appendix 4, Table 4D2B (70 °C thermoplastic multicore, copper), three-phase x");
        // The derivation assumes round conductors touching; shaped conductors sit closer, so up to 20 % lower.
        Tolerance shaped = Tolerance.relative(0.20, "round conductors assumed; shaped ones sit closer");
        int n = 0;
        for (String[] r : rows("""
                25 0.145
                50 0.140
                95 0.135
                240 0.130
                """)) {
            double mm2 = num(r[0]);
            cases.add(new PublishedCase(id("XM", ++n), "x of a PVC multicore " + r[0] + " mm², three-phase", source, num(r[1]), "mV/A/m",
                    shaped, data -> multicore(data, "pvc", 3, mm2).impedance().x().value()));
        }
    }

    // ------------------------------------------------------------------ reactance from the cable's geometry

    /**
     * A row of the x columns of BS 7671:2018 Appendix 4 (copper, 50 Hz) and how the program's x is
     * derived for it: a three-phase flat group of Table 4E1B is the table's mean of the phases; the
     * design itself uses the outer pair, the larger.
     */
    public record ReactanceRow(String table, String column, Insulation insulation, CableType type, Formation formation, int phases,
                               double mm2, String printed, boolean meanOfPhases) {
        public double published() {
            return Double.parseDouble(printed);
        }

        /** A printed 0.24 stands for 0.235 to 0.245: the allowance is taken from the edge of that interval. */
        public double halfLastDigit() {
            int decimals = printed.length() - printed.indexOf('.') - 1;
            return 0.5 * Math.pow(10, -decimals);
        }

        public ImpedanceResult derive(ReferenceData data, CableImpedance.FlatGroup flat) {
            Cable cable = new Cable(Conductor.COPPER, insulation, type, type == CableType.MULTICORE ? phases + 1 : 0, SizeChoice.of(mm2),
                    SizeChoice.of(16), 1, formation, CpcKind.SEPARATE, false);
            return CableImpedance.at(data, cable, 70, 50, phases, flat);
        }

        public Source source() {
            String place = "Appendix 4, Table " + table + ", " + column;
            return table.equals("4D1B") ? Source.recalled("BS 7671:2018", place)
                    : new Source("BS 7671:2018", place, "copy: CSE Distributors \"Table " + table + "\", cse-distributors.co.uk");
        }
    }

    private static final String REACTANCE_ROWS = """
            # table, column, insulation, type, formation (- for multicore), phases, printed x by size (25 35 50 70 95 120 150 185 240 300 400; - none)
            # 4E1B (single-core 90 °C thermosetting, non-armoured), read from the CSE copy (cut off after 240 mm² single-phase).
            # The copy prints the 25 mm² trefoil x as "1.165", read as 0.165 (its neighbours and r = 1.60 make 1.165 impossible).
            4E1B col.4:two-cables-single-phase-touching xlpe single-core flat-touching 1 0.190 0.180 0.180 0.175 0.170 0.165 0.165 0.165 0.160 - -
            4E1B col.5:two-cables-single-phase-spaced   xlpe single-core flat-spaced   1 0.28 0.27 0.27 0.26 0.26 0.25 0.25 0.25 0.25 - -
            4E1B col.7:three-phase-trefoil              xlpe single-core trefoil       3 0.165 0.155 0.155 0.150 0.145 0.140 0.140 0.140 - - -
            4E1B col.8:three-phase-flat-touching(mean)  xlpe single-core flat-touching 3 0.190 0.180 0.180 0.175 0.170 0.165 0.165 0.165 - - -
            4E1B col.9:three-phase-flat-spaced(mean)    xlpe single-core flat-spaced   3 0.27 0.26 0.26 0.25 0.25 0.24 0.24 0.24 - - -
            # 4D1B (single-core 70 °C thermoplastic, non-armoured), from memory; the 70 and 185 mm² flat-touching values also in issue 23.
            4D1B single-phase-touching         pvc single-core flat-touching 1 0.200 0.195 0.190 0.185 0.180 0.175 0.175 0.170 0.165 0.165 -
            4D1B single-phase-spaced           pvc single-core flat-spaced   1 0.29 0.28 0.28 0.27 0.27 0.26 0.26 0.26 0.25 0.25 -
            4D1B three-phase-trefoil           pvc single-core trefoil       3 0.175 0.170 0.165 0.160 0.155 0.150 0.150 0.145 0.145 0.140 -
            4D1B three-phase-flat-touching     pvc single-core flat-touching 3 0.25 0.24 0.24 0.24 0.23 0.23 0.23 0.22 0.22 0.22 -
            4D1B three-phase-flat-spaced       pvc single-core flat-spaced   3 0.32 0.32 0.32 0.31 0.31 0.30 0.30 0.30 0.29 0.29 -
            # 4E4B (multicore 90 °C thermosetting, armoured), read from the CSE copy.
            4E4B col.3:two-core-single-phase   xlpe multicore - 1 0.160 0.155 0.155 0.150 0.150 0.145 0.145 0.145 0.140 0.140 0.140
            4E4B col.4:three-or-four-core      xlpe multicore - 3 0.140 0.135 0.135 0.130 0.130 0.130 0.125 0.125 0.125 0.120 0.120
            """;

    private static final double[] REACTANCE_SIZES = {25, 35, 50, 70, 95, 120, 150, 185, 240, 300, 400};

    /** Every reactance row, in the order of the tables above. */
    public static List<ReactanceRow> reactanceRows() {
        List<ReactanceRow> out = new ArrayList<>();
        for (String[] r : rows(REACTANCE_ROWS)) {
            Insulation insulation = Insulation.valueOf(r[2].toUpperCase(Locale.ROOT));
            CableType type = r[3].equals("multicore") ? CableType.MULTICORE : CableType.SINGLE_CORE;
            Formation formation = r[4].equals("-") ? null : Formation.valueOf(r[4].toUpperCase(Locale.ROOT).replace('-', '_'));
            int phases = Integer.parseInt(r[5]);
            boolean mean = r[1].contains("(mean)");
            for (int i = 0; i < REACTANCE_SIZES.length; i++) {
                String printed = r[6 + i];
                if (printed.equals("-")) continue;
                out.add(new ReactanceRow(r[0], r[1].replace("(mean)", " (mean of the phases)").replace(':', ' ').replace('-', ' '), insulation, type, formation, phases,
                        REACTANCE_SIZES[i], printed, mean));
            }
        }
        return List.copyOf(out);
    }

    private static void reactanceFromGeometry(List<PublishedCase> cases) {
        int n = 0;
        for (ReactanceRow row : reactanceRows()) {
            CableImpedance.FlatGroup flat = row.meanOfPhases() ? CableImpedance.FlatGroup.MEAN_OF_PHASES : CableImpedance.FlatGroup.OUTER_PAIR;
            String what = "x of " + row.insulation().token().toUpperCase(Locale.ROOT) + " " + row.type().token() + " "
                    + size(row.mm2()) + " mm², " + row.column();
            cases.add(new PublishedCase(id("XG", ++n), what, row.source(), row.published(), "mV/A/m",
                    new Tolerance(row.halfLastDigit(), 0.05, "5 % from the edge of the printed value's rounding"),
                    data -> row.derive(data, flat).x().value()));
        }
    }

    // ------------------------------------------------------------------ fault levels, IEC 60909-0

    private static final String TWIN_25 = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5}";
    private static final String MCB_B16 = "{kind: mcb, curve: B, rating_a: 16, breaking_capacity_ka: 10}";
    private static final String LOAD_10A = "{kind: other, current_a: 10, power_factor: 0.9, phases: 1}";

    private static void faultLevels(List<PublishedCase> cases) {
        // Hand calculation, IEC 60909-0:2016 eq. (29) with c_max = 1.10 (Table 1) and an infinite MV network:
        // Z_T = 0.06 × 400² / 1 000 000 = 0.0096 Ω; x_T = 0.06 × 6/√37 = 0.05918; K_T = 0.95 × 1.10 / (1 + 0.6 × 0.05918)
        // = 1.00917 (6.3.3, eq. (12a), from memory); I_k3 = 1.1 × 400 / (√3 × 1.00917 × 0.0096) = 26.22 kA.
        cases.add(new PublishedCase("IK-01", "I_k3 at a 1 000 kVA, 6 %, X/R 6 transformer's LV terminals",
                new Source("IEC 60909-0:2016", "eq. (29), Table 1 c_max, 6.3.3 eq. (12a) K_T", "hand calculation; K_T from memory"),
                26.22, "kA", Tolerance.absolute(0.01, "the hand calculation's rounding"),
                data -> originFault(data, "transformer: {rating_kva: 1000, impedance_percent: 6, x_r_ratio: 6}")));
        // Hand calculation, IEC 60909-0:2016, 6.2 (from memory): S″_kQ = 250 MVA referred to 400 V, Z_Qt = 1.1 × 400² / 250·10⁶
        // = 0.000704 Ω, X_Qt = 0.995 Z_Qt, R_Qt = 0.1 X_Qt; the transformer as above; I_k3 = 1.1 × 400 / (√3 × |Z_Qt + K_T Z_T|).
        cases.add(new PublishedCase("IK-02", "I_k3 as IK-01 with a 250 MVA network at the primary",
                new Source("IEC 60909-0:2016", "6.2 (network feeder), eq. (29)", "hand calculation; 6.2 from memory"),
                24.45, "kA", Tolerance.absolute(0.01, "the hand calculation's rounding"),
                data -> originFault(data, "transformer: {rating_kva: 1000, impedance_percent: 6, x_r_ratio: 6, network_fault_level_mva: 250}")));
    }

    private static double originFault(ReferenceData data, String source) {
        Result r = InventedInputs.run(data, InventedInputs.subBoard("", source, InventedInputs.circuit("B1", LOAD_10A, 10, TWIN_25, "C", MCB_B16)));
        return r.boards().get(0).faultKa().value();
    }

    // ------------------------------------------------------------------ k of the protective conductor

    private static void adiabaticK(List<PublishedCase> cases) {
        Source source = Source.recalled("IEC 60364-5-54:2011", "Tables A.54.2 to A.54.4 (BS 7671:2018 Tables 54.3, 54.4)");
        Tolerance whole = Tolerance.absolute(0.6, "the table rounds to whole numbers");
        int n = 0;
        for (String[] r : rows("""
                copper pvc multicore 115
                copper xlpe multicore 143
                aluminium pvc multicore 76
                aluminium xlpe multicore 94
                copper pvc single-core 143
                copper xlpe single-core 176
                """)) {
            String conductor = r[0];
            String insulation = r[1];
            boolean single = r[2].equals("single-core");
            String what = "k of the cpc, " + conductor + " " + insulation.toUpperCase(Locale.ROOT) + (single
                    ? " (separate single-core cpc)" : " (core of a multicore cable)");
            cases.add(new PublishedCase(id("K", ++n), what, source, num(r[3]), "A·s^0.5/mm²", whole,
                    data -> cpcK(data, conductor, insulation, single)));
        }
    }

    private static double cpcK(ReferenceData data, String conductor, String insulation, boolean single) {
        String size = conductor.equals("aluminium") ? "25" : "2.5";
        String cable = single
                ? "{conductor: %s, insulation: %s, type: single-core, formation: trefoil, size_mm2: 25, cpc_mm2: 16}".formatted(conductor, insulation)
                : "{conductor: %s, insulation: %s, type: multicore, cores: 2, size_mm2: %s, cpc_mm2: %s}".formatted(conductor, insulation, size, size);
        String load = "{kind: other, current_a: 10, power_factor: 0.9, phases: %d}".formatted(single ? 3 : 1);
        Result r = InventedInputs.run(data, InventedInputs.subBoard("", "utility: {fault_level_ka: 6, loop_impedance_ohm: 0.3}",
                InventedInputs.circuit("B1", load, 10, cable, single ? "F" : "C", MCB_B16)));
        return InventedInputs.step(r, "C1/fault/pc/k");
    }

    // ------------------------------------------------------------------ earth-fault loop impedance

    private static void loopImpedance(List<PublishedCase> cases) {
        // Maximum Zs for MCBs at 0.4 s, BS 7671:2018 Table 41.3 (C_min 0.95, U_0 230 V): Z_s,max = 0.95 × 230 / (m × I_n),
        // m = 5, 10, 20 for types B, C, D.
        Source table413 = Source.recalled("BS 7671:2018", "Table 41.3, MCBs, 0.4 s, U_0 = 230 V, C_min = 0.95");
        int n = 0;
        for (String[] r : rows("""
                B 6 7.28
                B 10 4.37
                B 16 2.73
                B 20 2.19
                B 32 1.37
                B 40 1.09
                C 16 1.37
                C 32 0.68
                D 16 0.68
                D 32 0.34
                """)) {
            String curve = r[0];
            int rating = Integer.parseInt(r[1]);
            cases.add(new PublishedCase(id("ZS", ++n), "Z_s,max of a type " + curve + " " + rating + " A MCB", table413, num(r[2]), "Ω",
                    Tolerance.absolute(0.006, "the table's two decimals"), data -> mcbMaxZs(data, curve, rating)));
        }
        // Hand calculation: 2.5/1.5 mm² PVC at 70 °C, 30 m, on a board with Z_e = 0.3 Ω: R1 + R2 = (7.41 + 12.1) Ω/km
        // × (1 + 0.00393 × 50) × 0.030 km = 0.7003 Ω; Z_s = 0.3 + 0.7003 = 1.000 Ω (the loop reactance of a twin cable adds
        // under a milliohm here).
        cases.add(new PublishedCase(id("ZS", ++n), "Z_s = Z_e + R1 + R2 of 30 m of 2.5/1.5 mm² PVC twin at 70 °C",
                new Source("IEC 60228:2004 Table 2; IEC 60287-1-1:2006 Table 1 (α_20 = 0.00393 /K)", "BS 7671:2018 Appendix 3 method",
                        "hand calculation"),
                1.000, "Ω", Tolerance.absolute(0.01, "the loop reactance neglected by hand"), PublishedCases::twinLoop));
    }

    private static double mcbMaxZs(ReferenceData data, String curve, int rating) {
        String device = "{kind: mcb, curve: %s, rating_a: %d, breaking_capacity_ka: 10, let_through_a2s: 10000}".formatted(curve, rating);
        Result r = InventedInputs.run(data, InventedInputs.subBoard("", "utility: {fault_level_ka: 6, loop_impedance_ohm: 0.1}",
                InventedInputs.circuit("B1", LOAD_10A, 5, "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 10, cpc_mm2: 4}",
                        "C", device)));
        return InventedInputs.circuit(r, "C1").maxLoopImpedance().value();
    }

    private static double twinLoop(ReferenceData data) {
        Result r = InventedInputs.run(data, InventedInputs.oneBoard("", "utility: {fault_level_ka: 6, loop_impedance_ohm: 0.3, x_r_ratio: 1}",
                InventedInputs.circuit("B0", LOAD_10A, 30, TWIN_25, "C", MCB_B16)));
        return InventedInputs.circuit(r, "C1").loopImpedance().value();
    }

    // ------------------------------------------------------------------ disconnection

    private static void disconnection(List<PublishedCase> cases) {
        // BS 7671:2008+A1:2011 Table 41.2: a 32 A BS 88-2 fuse, Z_s,max 1.04 Ω at 0.4 s with U_0 = 230 V, so I_a = 230 / 1.04
        // = 221.2 A; with c_min = 0.95 the program's limit is 0.95 × 230 / 221.2 = 0.988 Ω.
        cases.add(new PublishedCase("DC-01", "Z_s limit of a 32 A BS 88-2 fuse, 0.4 s (c_min 0.95 × 230 V / I_a)",
                new Source("BS 7671:2008+A1:2011", "Table 41.2, BS 88-2 fuses, 0.4 s",
                        "copy: NICEIC Connections Winter 2011-12 p. 60 Table 2; c_min of IEC 60364-4-41:2005 411.4.4"),
                0.988, "Ω", Tolerance.absolute(0.001, "the third decimal"), data -> {
                    Result r = InventedInputs.run(data, InventedInputs.oneBoard("", "utility: {fault_level_ka: 10, loop_impedance_ohm: 0.3}",
                            InventedInputs.circuit("B0", "{kind: socket, current_a: 25, power_factor: 0.9, phases: 1}", 20,
                                    "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 6, cpc_mm2: 2.5}", "C",
                                    "{kind: fuse, rating_a: 32, breaking_capacity_ka: 80}")));
                    return InventedInputs.circuit(r, "C1").check("disconnection").limit();
                }));
        // IEC 60364-4-43:2008, 433.1: an adjustable device's I_n is its setting; IEC 60947-2:2016, 8.3.3.1.2: short-time
        // pick-up within +20 %, so I_a = 1.2 × 600 A = 720 A and Z_s,max = 0.95 × 230 / 720 = 0.3035 Ω.
        cases.add(new PublishedCase("DC-02", "Z_s limit of an MCCB with a 600 A short-time setting (+20 % tolerance)",
                Source.recalled("IEC 60947-2:2016", "8.3.3.1.2 (±20 % release tolerance); IEC 60364-4-41:2005 411.4.4 (c_min 0.95)"),
                0.3035, "Ω", Tolerance.absolute(0.0005, "the fourth decimal"), data -> {
                    Result r = InventedInputs.run(data, InventedInputs.head("", "transformer: {rating_kva: 630, impedance_percent: 5}") + """
                            boards:
                              - id: B0
                              - id: B1
                            circuits:
                              - id: F1
                                from: B0
                                to: B1
                                length_m: 30
                                cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 25, cpc_mm2: 16}
                                installation: {method: E}
                                device: {kind: mccb, rating_a: 160, long_time_a: 100, short_time_a: 600, short_time_delay_s: 0.2, breaking_capacity_ka: 36}
                            """ + InventedInputs.circuit("B1", "{kind: other, current_a: 60, power_factor: 0.9, phases: 3}", 10,
                            "{conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 16, cpc_mm2: 16}", "C",
                            "{kind: mcb, curve: C, rating_a: 63, breaking_capacity_ka: 10}").indent(2));
                    return InventedInputs.circuit(r, "F1").check("disconnection").limit();
                }));
        // IEC 60364-4-41:2005, Table 41.1: TT, 230 V, final circuits up to 32 A: 0.2 s.
        cases.add(new PublishedCase("DC-03", "maximum disconnection time, TT final circuit ≤ 32 A at 230 V",
                Source.recalled("IEC 60364-4-41:2005", "Table 41.1"), 0.2, "s", Tolerance.exact(), data -> {
                    Result r = InventedInputs.run(data, InventedInputs.oneBoard("earthing: TT, earth_electrode_resistance_ohm: 20",
                            "utility: {fault_level_ka: 3, loop_impedance_ohm: 21}",
                            InventedInputs.circuit("B0", "{kind: socket, current_a: 16, power_factor: 0.9, phases: 1}", 25, TWIN_25, "C",
                                    "{kind: rcbo, curve: B, rating_a: 20, residual_current_a: 0.03, breaking_capacity_ka: 6}")));
                    return InventedInputs.step(r, "C1/fault/t");
                }));
    }

    // ------------------------------------------------------------------ capacity and correction factors (a sample)

    private static void capacityAndFactors(List<PublishedCase> cases) {
        String uk4c1 = "copy: BS 7671:2008 Appendix 4 Table 4C1 (reproduces B.52.17), fliphtml5.com/glisk/snup";
        int n = 0;
        for (String[] r : rows("""
                bunched 2 0.80
                bunched 3 0.70
                bunched 6 0.57
                bunched 20 0.38
                wall-single-layer 3 0.79
                tray-single-layer 4 0.77
                ladder-single-layer 9 0.78
                """)) {
            Arrangement arrangement = Arrangement.valueOf(r[0].toUpperCase(Locale.ROOT).replace('-', '_'));
            int circuits = Integer.parseInt(r[1]);
            cases.add(new PublishedCase(id("CG", ++n), "grouping factor, " + r[0] + ", " + circuits + " circuits",
                    new Source("IEC 60364-5-52:2009", "Table B.52.17", uk4c1), num(r[2]), "", Tolerance.exact(),
                    data -> new CapacityData(data).grouping("t", Method.C, arrangement, circuits).value()));
        }
        String uk4b1 = "copy: BS 7671:2008 Appendix 4 Table 4B1 (reproduces B.52.14 from 30 °C), vi.scribd.com/document/344602377";
        n = 0;
        for (String[] r : rows("""
                pvc 40 0.87
                xlpe 40 0.91
                pvc 50 0.71
                xlpe 70 0.58
                """)) {
            Insulation insulation = Insulation.valueOf(r[0].toUpperCase(Locale.ROOT));
            double ambient = num(r[1]);
            cases.add(new PublishedCase(id("CA", ++n), "ambient air factor, " + r[0].toUpperCase(Locale.ROOT) + " at " + r[1] + " °C",
                    new Source("IEC 60364-5-52:2009", "Table B.52.14", uk4b1), num(r[2]), "", Tolerance.exact(),
                    data -> new CapacityData(data).ambientAir("t", insulation, ambient).value()));
        }
        String uk4e1a = "copy: BS 7671:2018 Appendix 4 Table 4E1A, doncastercables.squarecloudmedia.com and cse-distributors.co.uk";
        String atlas = "copy: Atlas Copco GA 45+ instruction book 2920 7109 51 p. 164, easymanua.ls";
        n = 0;
        for (String[] r : rows("""
                # insulation method loaded type formation size amperes copy
                xlpe F 3 single-core trefoil 95 328 4e1a
                xlpe F 3 single-core trefoil 240 607 4e1a
                xlpe F 2 single-core flat-touching 50 242 4e1a
                xlpe G 3 single-core flat-spaced 120 500 4e1a
                xlpe B1 2 single-core - 2.5 31 4e1a
                xlpe B1 2 single-core - 16 100 4e1a
                xlpe A1 2 single-core - 35 131 4e1a
                pvc F 3 single-core trefoil 120 308 atlas
                pvc F 3 single-core trefoil 240 485 atlas
                """)) {
            Insulation insulation = Insulation.valueOf(r[0].toUpperCase(Locale.ROOT));
            Method method = Method.valueOf(r[1]);
            int loaded = Integer.parseInt(r[2]);
            Formation formation = r[4].equals("-") ? null : Formation.valueOf(r[4].toUpperCase(Locale.ROOT).replace('-', '_'));
            double mm2 = num(r[5]);
            boolean fromAtlas = r[7].equals("atlas");
            cases.add(new PublishedCase(id("IT", ++n), "I_t, " + r[0].toUpperCase(Locale.ROOT) + " copper " + r[5] + " mm², method " + r[1]
                    + ", " + loaded + " loaded" + (formation == null ? "" : ", " + r[4]),
                    new Source("IEC 60364-5-52:2009", insulation == Insulation.XLPE ? (method == Method.F || method == Method.G ? "Table B.52.12"
                            : "Table B.52.3") : "Table B.52.10", fromAtlas ? atlas : uk4e1a),
                    num(r[6]), "A", Tolerance.exact(), data -> new CapacityData(data).tabulated("t", insulation, Conductor.COPPER, method, loaded,
                    CableType.SINGLE_CORE, formation, mm2).value()));
        }
    }

    // ------------------------------------------------------------------ protective devices (a sample)

    private static void deviceData(List<PublishedCase> cases) {
        Source bands = new Source("IEC 60898-1:2015", "Table 7, instantaneous tripping ranges",
                "copies: panelcraft.eu \"How to Select the Right Circuit Breaker\"; electrotechnik.net \"B C and D types\"");
        int n = 0;
        for (String[] r : rows("""
                B 3 5
                C 5 10
                D 10 20
                """)) {
            Curve curve = Curve.valueOf(r[0]);
            cases.add(new PublishedCase(id("DV", ++n), "type " + r[0] + " MCB, lower limit of instantaneous tripping (× I_n)", bands, num(r[1]), "",
                    Tolerance.exact(), data -> new DeviceData(data).instantaneousLowerMultiple("t", curve).value()));
            cases.add(new PublishedCase(id("DV", ++n), "type " + r[0] + " MCB, upper limit of instantaneous tripping (× I_n)", bands, num(r[2]), "",
                    Tolerance.exact(), data -> new DeviceData(data).instantaneousUpperMultiple("t", curve).value()));
        }
        cases.add(new PublishedCase(id("DV", ++n), "MCB conventional tripping current (× I_n)",
                new Source("IEC 60898-1:2015", "Table 7", "copy: sparkyhub.co.uk \"MCB Time-Current Curves\""), 1.45, "", Tolerance.exact(),
                data -> new DeviceData(data).conventionalTrippingMultiple("t", Curve.B).value()));
        Source classThree = new Source("BS EN 60898-1:2003", "Annex ZA, energy limiting class 3, 10 kA",
                "copy: electriciansforums.net \"adiabatic equation\", post 146036");
        cases.add(new PublishedCase(id("DV", ++n), "class 3 let-through I²t, type B 16 A at 10 kA", classThree, 70000, "A²s", Tolerance.exact(),
                data -> new DeviceData(data).classThreeLetThrough("t", Curve.B, 16, 10000).value()));
        cases.add(new PublishedCase(id("DV", ++n), "class 3 let-through I²t, type C 16 A at 10 kA", classThree, 84000, "A²s", Tolerance.exact(),
                data -> new DeviceData(data).classThreeLetThrough("t", Curve.C, 16, 10000).value()));
        Source rcd = new Source("IEC 61008-1 / IEC 61009-1", "Table 1, RCD break and non-actuating times",
                "copies: barfuse.com ?p=4963; Kewtech KT64 manual p. 35; Kyoritsu 5406A manual p. 14");
        for (String[] r : rows("""
                general ONE 0.3
                general TWO 0.15
                general FIVE 0.04
                s ONE 0.5
                s TWO 0.2
                s FIVE 0.15
                s-min ONE 0.13
                s-min TWO 0.06
                s-min FIVE 0.05
                """)) {
            DeviceData.Residual at = DeviceData.Residual.valueOf(r[1]);
            String multiple = at == DeviceData.Residual.ONE ? "I_Δn" : at == DeviceData.Residual.TWO ? "2 I_Δn" : "5 I_Δn";
            boolean min = r[0].equals("s-min");
            boolean typeS = r[0].startsWith("s");
            String what = min ? "type S RCD, minimum non-actuating time at " + multiple
                    : (typeS ? "type S" : "general") + " RCD, maximum break time at " + multiple;
            cases.add(new PublishedCase(id("DV", ++n), what, rcd, num(r[2]), "s", Tolerance.exact(), data -> min
                    ? new DeviceData(data).rcdMinimumNonActuatingTime("t", at).value()
                    : new DeviceData(data).rcdMaximumBreakTime("t", typeS, at).value()));
        }
        String connections = "copies: NICEIC Connections Winter 2011-12 p. 60 Table 2; Metrel MI 3000 manual p. 57";
        String metrel = "copy: Metrel MI 3000 manual p. 57 (each value there / 0.8)";
        for (String[] r : rows("""
                BS88_2 6 0.4 8.21 41.2 c
                BS88_2 32 0.4 1.04 41.2 c
                BS88_2 63 5 0.82 41.4 m
                BS88_2 200 5 0.19 41.4 m
                BS88_3 16 0.4 2.42 41.2 m
                BS88_3 100 5 0.40 41.4 m
                """)) {
            FuseSystem system = FuseSystem.valueOf(r[0]);
            double rating = num(r[1]);
            double seconds = num(r[2]);
            cases.add(new PublishedCase(id("DV", ++n), "Z_s,max of a " + system.token() + " " + r[1] + " A fuse, " + r[2] + " s",
                    new Source("BS 7671:2008+A1:2011", "Table " + r[4] + ", U_0 = 230 V", r[5].equals("c") ? connections : metrel),
                    num(r[3]), "Ω", Tolerance.exact(), data -> new DeviceData(data).fuseMaxLoopImpedance("t", system, rating, seconds).value()));
        }
    }
}
