package org.feedernote.report;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import org.feedernote.calc.BoardResult;
import org.feedernote.calc.CheckResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.formula.Units;

/** The designer's summary: one row per circuit, the verdict, and what failed. */
public final class TerminalSummary {
    private TerminalSummary() {}

    public static String render(Result result, String fileName) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"circuit", "from", "to/load", "Ib A", "In A", "size mm²", "ΔU own %", "ΔU total %", "limit %", "verdict", "governing / failing"});
        // Rows are independent: made side by side (the numbers' formatting is most of the time for large installations).
        rows.addAll(result.circuits().parallelStream().map(TerminalSummary::row).toList());
        int[] width = new int[rows.get(0).length];
        for (String[] r : rows) for (int i = 0; i < r.length; i++) width[i] = Math.max(width[i], r[i].length());
        StringBuilder b = new StringBuilder();
        b.append(fileName).append(" — ").append(result.input().project().title()).append('\n');
        List<String> lines = rows.parallelStream().map(r -> line(r, width)).toList();
        for (int j = 0; j < lines.size(); j++) {
            b.append(lines.get(j)).append('\n');
            if (j == 0) b.append("-".repeat(lines.get(0).length())).append('\n');
        }
        int failing = result.failingChecks();
        long failingCircuits = result.circuits().stream().filter(c -> !c.pass()).count();
        List<BoardResult> failingBoards = result.boards().stream().filter(x -> !x.pass()).toList();
        if (!failingBoards.isEmpty()) b.append('\n');
        for (BoardResult board : failingBoards) {
            for (CheckResult k : board.checks()) {
                if (k.pass()) continue;
                b.append("board ").append(board.id()).append(": FAIL × ").append(k.name()).append(" (").append(k.title()).append(": ")
                 .append(NumberFormatPolicy.number(k.value(), k.unit())).append(' ').append(k.unit())
                 .append(k.atLeast() ? " < " : " > ").append(NumberFormatPolicy.number(k.limit(), k.unit())).append(' ')
                 .append(k.unit()).append(")\n");
            }
        }
        List<String> undetermined = new ArrayList<>();
        for (var c : result.circuits()) {
            for (CheckResult k : c.checks()) {
                if (!k.determined() && !k.pass()) undetermined.add(c.id() + " " + k.name() + ": " + k.remark());
            }
        }
        if (!undetermined.isEmpty()) {
            b.append('\n').append("Checks not determined (each fails until the input gives what it lacks):\n");
            int shown = Math.min(undetermined.size(), 40);
            for (int i = 0; i < shown; i++) b.append("  ").append(undetermined.get(i)).append('\n');
            if (shown < undetermined.size()) b.append("  … and ").append(undetermined.size() - shown).append(" more (see --json or the note)\n");
        }
        List<String> assumed = result.assumptionLines();
        if (!assumed.isEmpty()) {
            b.append('\n').append("Resting on assumptions, not data (the key named replaces each):\n");
            int shown = Math.min(assumed.size(), 40);
            for (int i = 0; i < shown; i++) b.append("  ").append(assumed.get(i)).append('\n');
            if (shown < assumed.size()) b.append("  … and ").append(assumed.size() - shown).append(" more (see the note, 1.4)\n");
        }
        b.append('\n');
        if (failing == 0) {
            b.append(result.notPerformed().isEmpty() ? "PASS: every check passes (" : "PASS: every check made passes (")
             .append(result.circuits().size()).append(" circuits).\n");
        } else {
            b.append("FAIL: ").append(failing).append(" check(s) fail in ").append(failingCircuits).append(" circuit(s)")
             .append(failingBoards.isEmpty() ? "" : " and " + failingBoards.size() + " board(s)").append(".\n");
        }
        if (!result.notPerformed().isEmpty()) {
            b.append("Not yet checked by this version: ").append(String.join(", ", result.notPerformed()))
             .append(". The design is not shown to conform until these are verified.\n");
        }
        return b.toString();
    }

    private static String[] row(CircuitResult c) {
        String to = c.circuit().isFeeder() ? "→ " + c.circuit().to() : c.circuit().load().kind().token() + " " + c.connection();
        String size = (c.circuit().cable().parallel() > 1 ? c.circuit().cable().parallel() + "×" : "")
                + ReferenceData.sizeKey(c.circuit().cable().size().mm2());
        String failing = c.failing().stream().map(CheckResult::name).collect(Collectors.joining(", "));
        return new String[] {c.id(), c.circuit().from(), to,
                NumberFormatPolicy.number(c.designCurrent().value(), Units.A), NoteBuilder.ratingText(c), size,
                NumberFormatPolicy.number(c.dropPercent().value(), Units.PERCENT),
                NumberFormatPolicy.number(c.cumulativePercent().value(), Units.PERCENT),
                c.limitPercent() == null ? "—" : NumberFormatPolicy.number(c.limitPercent().value(), Units.PERCENT),
                c.pass() ? "PASS" : "FAIL ×",
                c.pass() ? c.governingCheck() : failing};
    }

    private static String line(String[] r, int[] width) {
        StringBuilder line = new StringBuilder();
        for (int i = 0; i < r.length; i++) {
            boolean numeric = i >= 3 && i <= 8;
            line.append(pad(r[i], width[i], numeric)).append(i + 1 < r.length ? "  " : "");
        }
        return line.toString().stripTrailing();
    }

    private static String pad(String s, int w, boolean right) {
        if (s.length() >= w) return s;
        String space = " ".repeat(w - s.length());
        return right ? space + s : s + space;
    }
}
