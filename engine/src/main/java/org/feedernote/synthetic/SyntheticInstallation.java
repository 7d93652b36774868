package org.feedernote.synthetic;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.model.Circuit;
import org.feedernote.model.Device;
import org.feedernote.model.Installation;

/**
 * Writes a realistic synthetic installation as a design input (YAML, one circuit per line in
 * flow style): a tree of boards under a transformer, each board with a mix of lighting, socket,
 * motor, heating and feeder circuits, lengths and conditions drawn from plausible ranges. The same
 * seed gives the same file. Invented data, for benchmarks and scale tests only.
 */
public final class SyntheticInstallation {
    private SyntheticInstallation() {}

    private record Board(String id, int depth) {}

    public static String generate(int circuits, long seed) {
        if (circuits < 1) throw new IllegalArgumentException("at least one circuit");
        SplittableRandom rnd = new SplittableRandom(seed);
        StringBuilder b = new StringBuilder(circuits * 260);
        b.append("# Synthetic installation: ").append(circuits).append(" circuits, seed ").append(seed)
         .append(". Invented data for benchmarks; not a design.\n");
        b.append("format: 1\n");
        b.append("project: {title: Synthetic installation ").append(circuits).append(" circuits, reference: SYN-").append(circuits)
         .append(", revision: A, date: 2026-12-01, status: draft}\n");
        b.append("basis: {earthing: TN-S, voltage_drop_limits_percent: {lighting: 3, other: 5}}\n");
        b.append("supply:\n  line_voltage_v: 400\n  phase_voltage_v: 230\n  source: {transformer: {rating_kva: 1600, impedance_percent: 6, x_r_ratio: 7}}\n");

        List<Board> boards = new ArrayList<>();
        List<String> lines = new ArrayList<>();
        boards.add(new Board("MSB", 0));
        int perBoard = 40;
        int wantedBoards = Math.max(1, circuits / perBoard);
        int made = 0;
        int boardNo = 0;
        // Feeders first: a balanced tree, eight sub-boards (more for large files) under the origin, six under each of those, then four, then three.
        int parentIndex = 0;
        int childrenOfParent = 0;
        while (boards.size() < wantedBoards && made < circuits - 1 && parentIndex < boards.size()) {
            Board parent = boards.get(parentIndex);
            int[] children = {Math.max(8, wantedBoards / 30), 6, 4, 3, 3, 3};
            if (parent.depth() >= children.length - 1 || childrenOfParent >= children[parent.depth()]) {
                parentIndex++;
                childrenOfParent = 0;
                continue;
            }
            Board child = new Board("DB-" + (++boardNo), parent.depth() + 1);
            boards.add(child);
            childrenOfParent++;
            int len = 15 + rnd.nextInt(parent.depth() == 0 ? 60 : 30);
            lines.add("  - {id: F-" + boardNo + ", from: " + parent.id() + ", to: " + child.id() + ", length_m: " + len
                    + ", cable: {conductor: copper, insulation: xlpe, type: single-core, formation: trefoil, size_mm2: auto, cpc_mm2: auto, parallel: "
                    + (parent.depth() == 0 ? 4 : parent.depth() == 1 ? 2 : 1) + "}"
                    + ", installation: {method: F, grouped_circuits: " + (1 + rnd.nextInt(3)) + ", group_arrangement: ladder-single-layer}"
                    + ", device: {kind: mccb, rating_a: auto, breaking_capacity_ka: 50, let_through_a2s: 4000000, disconnection_current_a: 1200}}");
            made++;
        }
        int i = 0;
        while (made < circuits) {
            // Final circuits go round the sub-boards; with none, on the origin board.
            Board board = boards.size() == 1 ? boards.get(0) : boards.get(1 + i % (boards.size() - 1));
            i++;
            lines.add(finalCircuit("C-" + (made + 1), board.id(), rnd));
            made++;
        }
        b.append("boards:\n");
        for (Board board : boards) {
            b.append("  - {id: ").append(board.id()).append(board.depth() == 0 ? "" : ", diversity: 0.6").append("}\n");
        }
        b.append("circuits:\n");
        for (String line : lines) b.append(line).append('\n');
        return b.toString();
    }

    /** The same document as JSON (keys in canonical order). */
    public static String toJson(String yaml) {
        try {
            return org.feedernote.input.Canonical.json(org.feedernote.input.InputReader.tree("synthetic", yaml, false)) + "\n";
        } catch (org.feedernote.input.InputException e) {
            throw new IllegalStateException("the generator wrote invalid YAML: " + e.errors(), e);
        }
    }

    private static String finalCircuit(String id, String board, SplittableRandom rnd) {
        int kind = rnd.nextInt(10);
        String grouping = ", grouped_circuits: " + (1 + rnd.nextInt(4)) + ", group_arrangement: bunched";
        String common = "  - {id: " + id + ", from: " + board + ", ";
        if (kind < 3) {
            double kw = round(0.2 + rnd.nextDouble() * 0.8);
            int len = 8 + rnd.nextInt(35);
            return common + "load: {kind: lighting, power_kw: " + kw + ", power_factor: 0.95, phases: 1}, length_m: " + len
                    + ", cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: auto, cpc_mm2: auto}"
                    + ", installation: {method: B2" + grouping + "}, device: {kind: mcb, curve: B, rating_a: 10, breaking_capacity_ka: 50, let_through_a2s: 30000}}";
        }
        if (kind < 6) {
            int len = 8 + rnd.nextInt(30);
            return common + "load: {kind: socket, current_a: " + (4 + rnd.nextInt(8)) + ", power_factor: 0.9, phases: 1}, length_m: " + len
                    + ", cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: auto, cpc_mm2: auto}"
                    + ", installation: {method: C}, device: {kind: rcbo, curve: B, rating_a: 20, breaking_capacity_ka: 50, residual_current_a: 0.03, let_through_a2s: 40000}}";
        }
        if (kind < 8) {
            double kw = round(0.75 + rnd.nextDouble() * 7);
            int len = 10 + rnd.nextInt(40);
            return common + "load: {kind: motor, power_kw: " + kw + ", power_factor: 0.85, efficiency: 0.9, phases: 3, starting_current_multiple: 6}, length_m: " + len
                    + ", cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}"
                    + ", installation: {method: C}, device: {kind: mccb, rating_a: auto, instantaneous_a: 400, breaking_capacity_ka: 50, let_through_a2s: 500000}}";
        }
        double kw = round(1 + rnd.nextDouble() * 5);
        int len = 6 + rnd.nextInt(30);
        return common + "load: {kind: heating, power_kw: " + kw + ", power_factor: 1.0, phases: 3}, length_m: " + len
                + ", cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: auto, cpc_mm2: auto}"
                + ", installation: {method: C" + grouping + "}, device: {kind: mcb, curve: C, rating_a: auto, breaking_capacity_ka: 50, let_through_a2s: 80000}}";
    }

    /**
     * The installation with every size and rating given as 'auto' fixed to what the calculation
     * chose: checking it is the check of a designed installation, with no sizing search (the
     * benchmark's traced check of given sizes).
     */
    public static Installation asSized(Installation input, Result calculated) {
        List<Circuit> fixed = new ArrayList<>();
        for (CircuitResult r : calculated.circuits()) {
            Circuit c = r.circuit();
            Device d = c.device();
            if (d.ratingA() == null) {
                d = d.withRating(r.rating().value());
            }
            fixed.add(new Circuit(c.id(), c.description(), c.from(), c.to(), c.load(), c.phase(), c.lengthM(), c.cable(),
                    c.conditions(), d, c.designCurrentA(), c.where()));
        }
        return new Installation(input.sourceName(), input.project(), input.basis(), input.supply(), input.boards(),
                List.copyOf(fixed), input.canonical(), input.source(), input.warnings());
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }

}
