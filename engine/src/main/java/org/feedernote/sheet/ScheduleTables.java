package org.feedernote.sheet;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.calc.BoardResult;
import org.feedernote.calc.CheckResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.model.Circuit;
import org.feedernote.trace.Q;

/**
 * The result as schedules: every circuit on one sheet, the circuits of each board on a sheet of
 * their own, and the boards (fault levels, Ze, demand per phase, drop). Every figure is the
 * Result's own value (each from a trace step), never calculated here; a failing row says FAIL and
 * is filled, and the governing check's cell is filled.
 */
public final class ScheduleTables {
    private ScheduleTables() {}

    public static final String ALL = "schedule";
    public static final String BOARDS = "boards";

    private static Table.Column col(String heading, String unit, String comment, String format) {
        return new Table.Column(heading, unit, comment, List.of(), format);
    }

    private static final String A = "0.0";
    private static final String PCT = "0.00";
    private static final String OHM = "0.0000";
    private static final String KA = "0.00";

    static final List<Table.Column> CIRCUIT_COLUMNS = List.of(
            col("board", null, "The board the circuit starts at (from).", null),
            col("circuit", null, "The circuit's id.", null),
            col("description", null, "What the circuit is.", null),
            col("supplies", null, "A feeder: the board it supplies; a final circuit: its load kind.", null),
            col("phase", null, "The phase of a single-phase circuit (allocated where auto), L1 L2 L3 for a three-phase one.", null),
            col("length", "m", "Route length.", "0.0"),
            col("size", "mm²", "Line conductor cross-section (the chosen one where the input says auto).", "0.0##"),
            col("cpc", "mm²", "Protective conductor cross-section.", "0.0##"),
            col("parallel", null, "Conductors in parallel per phase.", "0"),
            col("method", null, "IEC 60364-5-52 reference installation method.", null),
            col("device", null, "Device kind and curve.", null),
            col("I_n", "A", "Rated current of the device (the chosen one where the input says auto).", A),
            col("I_b", "A", "Design current.", A),
            col("I_t", "A", "Tabulated current-carrying capacity.", A),
            col("factor", null, "Product of the correction factors applied to I_t.", "0.000"),
            col("I_z", "A", "Current-carrying capacity I_z = I_t × factor.", A),
            col("drop", "%", "The circuit's own voltage drop, per cent of nominal.", PCT),
            col("cumulative drop", "%", "Voltage drop from the origin to the circuit's far end.", PCT),
            col("drop limit", "%", "The limit the cumulative drop is checked against.", PCT),
            col("starting dip", "%", "Voltage dip at a motor's terminals while it starts.", PCT),
            col("Zs", "Ω", "Earth-fault loop impedance at the far end.", OHM),
            col("max Zs", "Ω", "The largest Zs for which the device disconnects in time.", OHM),
            col("Ik max", "kA", "Maximum prospective fault current at the circuit's origin.", KA),
            col("I_f min", "A", "Minimum earth-fault current at the far end.", A),
            col("governing check", null, "The check closest to (or furthest past) its limit; its cell is filled.", null),
            col("verdict", null, "PASS or FAIL; a failing row is filled.", null),
            col("failing checks", null, "The checks that fail, with value and limit (or why not determined).", null));

    /**
     * A board's own sheet: the schedule's columns without their comments (the whole schedule has
     * them). An installation has hundreds of boards, and each sheet's comments are parts of their
     * own in the workbook: with them, writing 10 000 circuits took twice as long (bench/SHEETS.md).
     */
    static final List<Table.Column> BOARD_SHEET_COLUMNS = CIRCUIT_COLUMNS.stream()
            .map(c -> new Table.Column(c.heading(), c.unit(), null, c.choices(), c.format())).toList();

    static final List<Table.Column> BOARD_COLUMNS = List.of(
            col("board", null, "The board's id.", null),
            col("description", null, "What the board is.", null),
            col("fed by", null, "The feeder that supplies it (none at the origin).", null),
            col("Ik3", "kA", "Maximum three-phase prospective fault current at the board.", KA),
            col("Ik1", "kA", "Maximum line-to-neutral prospective fault current at the board.", KA),
            col("Ze", "Ω", "Earth-fault loop impedance at the board (the external loop impedance at the origin).", OHM),
            col("drop", "%", "Cumulative voltage drop from the origin to the board.", PCT),
            col("demand L1", "A", "Demand on L1 after diversity.", A),
            col("demand L2", "A", "Demand on L2 after diversity.", A),
            col("demand L3", "A", "Demand on L3 after diversity.", A),
            col("neutral", "A", "Neutral current (phasor sum of the phase currents).", A),
            col("rating", "kA", "The board's rated short-circuit withstand, where given.", KA),
            col("verdict", null, "PASS or FAIL of the board's withstand (PASS where none is given).", null),
            col("failing checks", null, "The board checks that fail.", null));

    /** The column of the governing check's name. */
    static final int GOVERNING = 24;

    public static List<Table> of(Result result) {
        List<Table> out = new ArrayList<>();
        List<Table.Row> all = new ArrayList<>();
        Map<String, List<Table.Row>> byBoard = new LinkedHashMap<>();
        for (BoardResult b : result.boards()) byBoard.put(b.id(), new ArrayList<>());
        for (CircuitResult c : result.circuits()) {
            Table.Row row = circuitRow(c);
            all.add(row);
            byBoard.computeIfAbsent(c.circuit().from(), k -> new ArrayList<>()).add(row);
        }
        out.add(new Table(ALL, CIRCUIT_COLUMNS, all, false, 0));
        List<Table.Row> boards = new ArrayList<>();
        for (BoardResult b : result.boards()) boards.add(boardRow(b));
        out.add(new Table(BOARDS, BOARD_COLUMNS, boards, false, 0));
        List<String> used = new ArrayList<>(List.of(ALL, BOARDS));
        for (Map.Entry<String, List<Table.Row>> e : byBoard.entrySet()) {
            out.add(new Table(sheetName(e.getKey(), used), BOARD_SHEET_COLUMNS, e.getValue(), false, 0));
        }
        return out;
    }

    /** A board's sheet name: its id with the characters a sheet name cannot hold replaced, at most 31 long, unique. */
    static String sheetName(String id, List<String> used) {
        String base = ("board " + id).replaceAll("[\\\\/?*\\[\\]:]", "_");
        if (base.length() > 31) base = base.substring(0, 31);
        String name = base;
        for (int i = 2; used.stream().anyMatch(name::equalsIgnoreCase); i++) {
            String suffix = " (" + i + ")";
            name = base.substring(0, Math.min(base.length(), 31 - suffix.length())) + suffix;
        }
        used.add(name);
        return name;
    }

    private static Double v(Q q) {
        return q == null ? null : q.value();
    }

    private static Table.Row circuitRow(CircuitResult r) {
        Circuit c = r.circuit();
        List<Object> cells = new ArrayList<>(CIRCUIT_COLUMNS.size());
        cells.add(c.from());
        cells.add(r.id());
        cells.add(c.description());
        cells.add(c.isFeeder() ? "board " + c.to() : c.load().kind().token());
        cells.add(r.connection());
        cells.add(v(r.length()));
        cells.add(c.cable().size().mm2());
        cells.add(c.cable().cpc().auto() ? null : c.cable().cpc().mm2());
        cells.add((double) c.cable().parallel());
        cells.add(c.conditions().method().token());
        cells.add(c.device().kind().token() + (c.device().curve() == null ? "" : " " + c.device().curve().token()));
        cells.add(v(r.rating()));
        cells.add(v(r.designCurrent()));
        cells.add(v(r.tabulatedCapacity()));
        cells.add(v(r.correctionFactor()));
        cells.add(v(r.capacity()));
        cells.add(v(r.dropPercent()));
        cells.add(v(r.cumulativePercent()));
        cells.add(v(r.limitPercent()));
        cells.add(v(r.startingDipPercent()));
        cells.add(v(r.loopImpedance()));
        cells.add(v(r.maxLoopImpedance()));
        cells.add(v(r.faultAtOrigin()));
        cells.add(v(r.minEarthFault()));
        cells.add(r.governingCheck());
        cells.add(r.pass() ? "PASS" : "FAIL");
        cells.add(failing(r.checks()));
        return new Table.Row(cells, !r.pass(), GOVERNING, List.of());
    }

    private static Table.Row boardRow(BoardResult b) {
        List<Object> cells = new ArrayList<>(BOARD_COLUMNS.size());
        cells.add(b.id());
        cells.add(b.description());
        cells.add(b.fedBy());
        cells.add(v(b.faultKa()));
        cells.add(v(b.faultLineNeutralKa()));
        cells.add(v(b.loopImpedance()));
        cells.add(v(b.dropPercent()));
        for (int i = 0; i < 3; i++) cells.add(b.phaseCurrents() != null && i < b.phaseCurrents().size() ? v(b.phaseCurrents().get(i)) : null);
        cells.add(v(b.neutralCurrent()));
        Double rating = null;
        for (CheckResult k : b.checks()) if (k.name().equals("breaking-capacity") && k.determined()) rating = k.value();
        cells.add(rating);
        cells.add(b.pass() ? "PASS" : "FAIL");
        cells.add(failing(b.checks()));
        return new Table.Row(cells, !b.pass(), -1, List.of());
    }

    /** The failing checks in words: name, value against limit with the unit, or the remark of one not determined. */
    private static String failing(List<CheckResult> checks) {
        StringBuilder b = new StringBuilder();
        for (CheckResult k : checks) {
            if (k.pass()) continue;
            if (b.length() > 0) b.append("; ");
            b.append(k.name()).append(": ");
            if (k.determined()) b.append(Double.toString(k.value())).append(' ').append(k.unit()).append(k.atLeast() ? " < " : " > ")
                    .append(Double.toString(k.limit())).append(' ').append(k.unit());
            else b.append(k.remark());
        }
        return b.length() == 0 ? null : b.toString();
    }
}
