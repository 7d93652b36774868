package org.feedernote.input;

import java.util.ArrayList;
import java.util.List;

import org.feedernote.data.ReferenceData;
import org.feedernote.model.*;

/** Design input format 1, described once (documented for users in docs/input-format.md, which InputFormatDocTest keeps in step). */
public final class InputSchema {
    private InputSchema() {}

    public static final Spec.Obj ROOT = build();

    private static Spec.Field req(String name, Spec spec) { return new Spec.Field(name, spec, true, null); }
    private static Spec.Field opt(String name, Spec spec, String defaultText) { return new Spec.Field(name, spec, false, defaultText); }

    private static Spec.Obj obj(String description, Spec.Field... fields) {
        return new Spec.Obj(description, List.of(fields), List.of());
    }
    private static Spec.Obj objOne(String description, List<List<String>> exactlyOne, Spec.Field... fields) {
        return new Spec.Obj(description, List.of(fields), exactlyOne);
    }
    private static Spec.Str text(String description) { return new Spec.Str(description, List.of(), null, null, true); }
    private static Spec.Str id(String description) {
        return new Spec.Str(description, List.of(), "[A-Za-z0-9][A-Za-z0-9_.\\-/]{0,39}",
                "an id of 1 to 40 letters, digits, '-', '_', '.', '/' starting with a letter or digit", true);
    }
    private static <E extends Enum<E> & Token> Spec.Str word(String description, Class<E> type) {
        return new Spec.Str(description, Token.tokens(type), null, null, false);
    }
    /** Above 0 and at most max: a quantity that cannot be zero, with a plausible ceiling. */
    private static Spec.Num upTo(String description, double max) {
        return new Spec.Num(description, 0.0, true, max, false, false, List.of(), null, false);
    }
    /** From min to max, both included. */
    private static Spec.Num between(String description, double min, double max) {
        return new Spec.Num(description, min, false, max, false, false, List.of(), null, false);
    }
    private static Spec.Num range(String description, double min, boolean minEx, double max, boolean maxEx) {
        return new Spec.Num(description, min, minEx, max, maxEx, false, List.of(), null, false);
    }
    private static Spec.Num whole(String description, double min, double max) {
        return new Spec.Num(description, min, false, max, false, true, List.of(), null, false);
    }
    private static Spec.Num oneOf(String description, double... values) {
        List<Double> list = new ArrayList<>();
        for (double v : values) list.add(v);
        return new Spec.Num(description, null, false, null, false, false, list, null, false);
    }
    private static Spec.Num size(String description) {
        return new Spec.Num(description, null, false, null, false, false, ReferenceData.standardSizes(),
                "a standard size in mm²", true);
    }

    /** A standard size up to 16 mm², never auto: the smallest sizes the wiring rules set lie there (IEC 60364-5-52:2009, Table 52.2: 1.5 to 16 mm²). */
    private static Spec.Num smallSize(String description) {
        return new Spec.Num(description, null, false, null, false, false,
                ReferenceData.standardSizes().stream().filter(s -> s <= 16).toList(), "a standard size in mm², at most 16", false);
    }

    /*
     * Where the ranges come from. Every number has one, so that no value a double cannot carry
     * through the calculation (1e308, .nan) reaches it and a slip of units (m for km) is refused
     * with its place. Those of the design basis and the installation conditions: voltage-drop and
     * starting limits, ambient and ground temperatures, soil resistivity, thermal insulation and
     * disconnection times bound what a design basis sets in practice (common practice, no source;
     * the tables themselves then say where they end); c_max 1.0–1.2 and c_min 0.8–1.0 bracket
     * IEC 60909-0, Table 1 (from memory); grouping to 100 and 12 conductors in parallel are
     * common practice, no source. The others are stated beside their keys below.
     */
    /** The default of cable.cpc_kind, as the reader derives it (InputReader.cpcConstruction). */
    static final String DEFAULT_CPC_KIND = "core where a multicore cable has a core more than the circuit's live conductors (3 cores single-phase; "
            + "5 cores three-phase, 4 for a three-phase motor, taken without neutral); otherwise separate, and single-core cables separate. "
            + "With cpc_mm2 given: core only where it equals size_mm2, twin-and-earth where it is that cable's cpc, otherwise not assumed "
            + "(the conductor is taken to run with the cable)";

    private static Spec.Obj build() {
        Spec.Obj revision = obj("an entry of the revision history",
                req("revision", text("revision letter or number")),
                req("date", isoDate("date of that revision")),
                opt("description", text("what changed"), "empty"));
        Spec.Obj project = obj("the title block of the note",
                req("title", text("project title")),
                req("reference", text("calculation note number")),
                req("revision", text("revision of this note")),
                req("date", isoDate("date of the note")),
                opt("client", text("client name"), "empty"),
                opt("prepared_by", text("name of the person who prepared the note"), "empty"),
                opt("checked_by", text("name of the checker"), "empty"),
                opt("approved_by", text("name of the approver"), "empty"),
                opt("status", word("status of the note", Status.class), "draft"),
                opt("revisions", new Spec.Arr("earlier revisions, for the cover", revision, 0), "none"));

        Spec.Map limitsByKind = new Spec.Map("voltage-drop limits per load kind, in per cent; 'other' applies to every kind not listed",
                Token.tokens(LoadKind.class), range("voltage-drop limit in per cent of nominal voltage", 0, true, 25, false));
        Spec.Obj basis = obj("the design basis; every key is optional",
                opt("frequency_hz", oneOf("supply frequency in Hz", 50, 60), "50"),
                opt("earthing", word("system earthing", Earthing.class), "TN-S"),
                opt("voltage_drop_limit_percent", range("voltage-drop limit from origin to terminals, per cent of nominal", 0, true, 25, false), "4"),
                opt("voltage_drop_limits_percent", limitsByKind, "none (one limit for all loads)"),
                opt("ambient_air_c", range("ambient air temperature in °C", -30, false, 80, false), "30"),
                opt("ambient_ground_c", range("ground temperature in °C", -10, false, 50, false), "20"),
                opt("conductor_temperature", word("conductor temperature for the resistance used in the voltage drop", ConductorTemperature.class), "maximum"),
                opt("disconnection_time_final_s", range("maximum disconnection time of final circuits in s", 0, true, 5, false), "0.4"),
                opt("disconnection_time_distribution_s", range("maximum disconnection time of distribution circuits in s", 0, true, 5, false), "5"),
                opt("motor_starting_limit_percent", range("limit of the voltage dip at a motor's terminals while it starts, per cent of nominal", 0, true, 50, false), "10"),
                opt("voltage_drop_method", word("which voltage-drop form is checked against the limit", DropMethod.class), "approximate"),
                opt("minimum_size_mm2", smallSize("smallest line-conductor cross-section: the sizing never chooses less, and a given size_mm2 below it is refused (IEC 60364-5-52:2009, Table 52.2: 1.5 mm² copper for fixed power and lighting circuits; where the wiring rules allow 1 mm² copper for lighting, as BS 7671 Table 52.3 does, give 1)"), "1.5"),
                opt("impedance", word("where r and x of the voltage drop come from: derived from the conductor and the cables' geometry, or read from the published mV/A/m tables", ImpedanceBasis.class), "derived"),
                opt("voltage_factor_max", range("IEC 60909 voltage factor c_max for maximum fault currents", 1, false, 1.2, false), "1.10"),
                opt("voltage_factor_min", range("IEC 60909 voltage factor c_min for minimum fault currents and maximum Zs", 0.8, false, 1, false), "0.95"),
                // R_A · IΔn ≤ 50 V (IEC 60364-4-41, 411.5.3) with the smallest common IΔn of 6 mA allows some 8 kΩ.
                opt("earth_electrode_resistance_ohm", upTo("resistance R_A of the installation's earth electrode (TT systems) in Ω", 10_000), "none (required for TT)"));

        Spec.Obj transformer = obj("a transformer at the origin",
                // Distribution transformers feeding an LV switchboard: some kVA to a few MVA (the
                // largest LV units are 3 150–4 000 kVA; common practice, no source).
                req("rating_kva", between("rated power in kVA", 1, 5_000)),
                // IEC 60076-5, Table 1 (from memory): 4 % up to 630 kVA, 5–6.25 % above; special units go higher.
                req("impedance_percent", between("short-circuit impedance in per cent", 1, 25)),
                // X/R of LV sources, from a few tenths (long overhead lines) to some tens (large transformers); common practice, no source.
                opt("x_r_ratio", between("X/R ratio of the transformer", 0.1, 50), "5 (assumption, common practice)"),
                // MV networks at the primary: some tens to some thousands of MVA; common practice, no source.
                opt("network_fault_level_mva", between("short-circuit power of the MV network at the transformer's primary in MVA", 1, 100_000), "infinite (the network's impedance neglected)"));
        Spec.Obj utility = obj("a supply from the distribution network",
                // LV switchgear is rated up to 100–150 kA (IEC 60947-2 frames); common practice, no source.
                opt("fault_level_ka", between("prospective fault current at the origin in kA", 0.1, 200), "none"),
                // From about 1 mΩ (next to a large transformer) to the 200 Ω of a TT supply's electrode; common practice, no source.
                opt("loop_impedance_ohm", between("external earth-fault loop impedance Ze in Ω", 0.001, 200), "none"),
                opt("x_r_ratio", between("X/R ratio of the network", 0.1, 50), "1 (assumption, common practice)"));
        Spec.Obj source = objOne("the source at the origin", List.of(List.of("transformer", "utility")),
                opt("transformer", transformer, null),
                opt("utility", utility, null));
        Spec.Obj supply = obj("the supply at the origin",
                // Low voltage: a.c. systems up to 1 000 V (IEC 60038, Table 1 and clause 1); from 100 V
                // (100/200 V and 120/208 V systems) upward, so the phase voltage is that range / √3.
                req("line_voltage_v", between("nominal line-to-line voltage in V", 100, 1_000)),
                req("phase_voltage_v", between("nominal line-to-neutral voltage in V", 57, 600)),
                req("source", source));

        Spec.Obj board = obj("a distribution board",
                req("id", id("board id, unique across boards and circuits")),
                opt("description", text("what the board is"), "empty"),
                opt("diversity", range("diversity factor applied to the sum of the board's circuits", 0, true, 1, false), "1"),
                opt("fault_rating_ka", upTo("rated short-circuit withstand of the board in kA", 200), "none"));

        Spec.Obj load = objOne("what the circuit supplies", List.of(List.of("power_kw", "apparent_kva", "current_a")),
                req("kind", word("load kind", LoadKind.class)),
                // One LV circuit carries at most some MW: 5 MW is about 7 kA at 400 V; common practice, no source.
                opt("power_kw", upTo("active input power in kW (motors: rated shaft output)", 5_000), null),
                opt("apparent_kva", upTo("apparent power in kVA", 5_000), null),
                opt("current_a", upTo("load current in A", 10_000), null),
                // Below 0.1 no load is run (even a starting motor is about 0.2); common practice, no source.
                opt("power_factor", between("power factor", 0.1, 1), "unknown (voltage drop then uses z)"),
                // IEC 60034-30-1 (from memory): the smallest motors are about 50 % efficient.
                opt("efficiency", between("motor efficiency", 0.3, 1), "1 (motors: give it)"),
                opt("phases", oneOf("number of phases", 1, 3), "1 for a 2-core cable, 3 for 4- and 5-core cables and single-core cables; else required"),
                opt("starting_current_multiple", range("motor starting current as a multiple of full-load current", 1, false, 20, false), "none (starting dip not checked)"),
                opt("starting_power_factor", between("power factor while starting", 0.05, 1), "0.3"));
        Spec.Obj cable = obj("the cable",
                req("conductor", word("conductor material", Conductor.class)),
                req("insulation", word("insulation (pvc 70 °C thermoplastic, xlpe 90 °C thermosetting)", Insulation.class)),
                req("type", word("cable construction", CableType.class)),
                opt("cores", oneOf("number of cores of a multicore cable", 2, 3, 4, 5), "required for multicore"),
                req("size_mm2", size("line conductor size in mm², or auto")),
                req("cpc_mm2", size("protective conductor size in mm², or auto")),
                opt("cpc_kind", word("how the protective conductor is made: a core of the cable equal to the line conductors, the reduced cpc of a flat twin-and-earth cable (BS 6004), or a separate conductor; armour is refused (its resistance is not in the packaged tables)", CpcKind.class),
                        DEFAULT_CPC_KIND),
                opt("parallel", whole("conductors in parallel per phase", 1, 12), "1"),
                opt("formation", word("formation of single-core cables", Formation.class), "required for single-core"));
        Spec.Obj installation = obj("installation conditions",
                req("method", word("IEC 60364-5-52 reference installation method", Method.class)),
                opt("ambient_c", range("ambient temperature in °C (air, or ground for D1/D2)", -30, false, 80, false), "basis.ambient_air_c or basis.ambient_ground_c"),
                opt("grouped_circuits", whole("circuits in the group, this one included", 1, 100), "1 (alone)"),
                opt("group_arrangement", word("arrangement of the group", Arrangement.class), "bunched"),
                opt("thermal_insulation_mm", range("length of run surrounded by thermal insulation in mm", 0, false, 100000, false), "0"),
                opt("soil_thermal_resistivity_kmw", range("soil thermal resistivity in K·m/W (buried methods)", 0, true, 10, false), "2.5"),
                opt("third_harmonic_percent", range("third-harmonic content of the line current in per cent", 0, false, 100, false), "0"),
                opt("orientation", word("method G only: single-core cables spaced one diameter apart horizontally or vertically (the vertical capacity is lower)", Orientation.class), "horizontal"));
        Spec.Obj device = obj("the protective device at the origin of the circuit",
                req("kind", word("device kind", DeviceKind.class)),
                // From the smallest miniature breakers and fuses (0.5 A) to the largest air circuit-breakers
                // (6 300 A, IEC 60947-2 frames); common practice, no source.
                req("rating_a", new Spec.Num("rated current In in A, or auto", 0.5, false, 6_300.0, false, false, List.of(), null, true)),
                opt("curve", word("MCB/RCBO instantaneous tripping type", Curve.class), "required for mcb and rcbo"),
                // Up to some tens of In of the largest breakers; common practice, no source.
                opt("instantaneous_a", between("MCCB instantaneous (magnetic) trip setting in A", 1, 200_000), "none"),
                opt("breaking_capacity_ka", upTo("rated breaking capacity in kA", 200), "none"),
                opt("disconnection_current_a", between("current that operates the device within the required disconnection time, from the manufacturer's curve, in A (required for fuses; for circuit-breakers it replaces the instantaneous basis)", 1, 200_000), "none"),
                // IEC 61008-1 / 61009-1 (from memory): IΔn from 6 mA; industrial relays go to 30 A.
                opt("residual_current_a", between("rated residual operating current IΔn of an RCD or RCBO in A", 0.006, 30), "none"),
                // k²S² of the largest conductors (143² × 630² × 12 parallel) is about 1e11 A²s; common practice, no source.
                opt("let_through_a2s", upTo("let-through energy I²t from the manufacturer's data in A²s", 1e11), "none"),
                opt("protection", word("what the device protects against: overload-and-fault, or fault-only where a separate overload relay protects the circuit against overload", Protection.class), "overload-and-fault"),
                opt("residual_type", word("break-time type of an RCD or RCBO: general, or S (time-delayed)", ResidualType.class), "general"),
                // MCCB release settings: up to the largest frames; a delay up to the 1 s of selective breakers (common practice, no source).
                opt("long_time_a", between("MCCB long-time (overload) current setting I_r in A, at most rating_a", 0.5, 6_300), "rating_a"),
                opt("short_time_a", between("MCCB short-time pick-up current I_sd in A", 1, 200_000), "none"),
                opt("short_time_delay_s", between("MCCB short-time delay t_sd in s", 0.01, 1), "none"),
                opt("backup", obj("back-up protection (IEC 60364-4-43, 434.5.1): an upstream device that, with this one, breaks the combined current the manufacturer states",
                        req("upstream_circuit", id("id of the feeder, on the path from the origin to this circuit's board, whose device gives the back-up")),
                        // The same ceiling as breaking_capacity_ka.
                        req("combined_breaking_capacity_ka", upTo("the combination's breaking capacity in kA, from the manufacturer's back-up (cascading) data", 200))),
                        "none (the device's own breaking capacity must reach the prospective fault current)"));
        Spec.Obj circuit = objOne("a circuit", List.of(List.of("load", "to")),
                req("id", id("circuit id, unique across boards and circuits")),
                opt("description", text("what the circuit is"), "empty"),
                req("from", id("id of the board the circuit starts at")),
                opt("to", id("id of the board a feeder supplies"), null),
                opt("phase", word("phase of a single-phase circuit", Phase.class), "auto"),
                opt("load", load, null),
                // An LV circuit runs some hundreds of metres, rarely a few km; common practice, no source.
                req("length_m", upTo("route length in m", 10_000)),
                req("cable", cable),
                req("installation", installation),
                req("device", device),
                opt("design_current_a", upTo("design current given by the designer, overriding the derived value, in A", 10_000), "derived"));

        return obj("a feedernote design input, format 1",
                req("format", oneOf("input format version", 1)),
                req("project", project),
                opt("basis", basis, "all defaults"),
                req("supply", supply),
                req("boards", new Spec.Arr("the distribution boards", board, 1)),
                req("circuits", new Spec.Arr("the circuits", circuit, 1)));
    }

    private static Spec.Date isoDate(String description) {
        return new Spec.Date(description);
    }
}
