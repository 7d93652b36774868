package org.feedernote.calc;

import java.util.List;

import org.feedernote.model.Installation;
import org.feedernote.trace.Section;

/**
 * The calculation of a whole installation: boards and circuits (in input order) and the trace.
 * notPerformed names the contract's checks this version does not make yet, so that no reader
 * takes a partial calculation for a complete one. sourceAssumptions: what the source's figures rest
 * on that the input does not give.
 */
public record Result(Installation input, List<BoardResult> boards, List<CircuitResult> circuits, Section trace,
                     List<String> notPerformed, List<Assumption> sourceAssumptions) {

    /**
     * Every assumption a verdict or a size rests on, one line each, the key that would replace it
     * named: the source's first, then each circuit's (see {@link CircuitResult#assumptionsBearing}).
     */
    public List<String> assumptionLines() {
        List<String> out = new java.util.ArrayList<>();
        for (Assumption a : sourceAssumptions) out.add("supply: " + a.text());
        for (CircuitResult c : circuits) for (String line : c.assumptionsBearing()) out.add(c.id() + " " + line);
        return out;
    }

    public boolean pass() {
        return circuits.stream().allMatch(CircuitResult::pass) && boards.stream().allMatch(BoardResult::pass);
    }

    public int failingChecks() {
        return circuits.stream().mapToInt(c -> c.failing().size()).sum()
                + boards.stream().mapToInt(b -> (int) b.checks().stream().filter(k -> !k.pass()).count()).sum();
    }
}
