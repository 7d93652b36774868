package org.feedernote.calc;

import java.util.List;

import org.feedernote.model.Installation;
import org.feedernote.trace.Section;

/**
 * The calculation of a whole installation: boards and circuits (in input order) and the trace.
 * notPerformed names the contract's checks this version does not make yet, so that no reader
 * takes a partial calculation for a complete one.
 */
public record Result(Installation input, List<BoardResult> boards, List<CircuitResult> circuits, Section trace,
                     List<String> notPerformed) {
    public boolean pass() {
        return circuits.stream().allMatch(CircuitResult::pass) && boards.stream().allMatch(BoardResult::pass);
    }

    public int failingChecks() {
        return circuits.stream().mapToInt(c -> c.failing().size()).sum()
                + boards.stream().mapToInt(b -> (int) b.checks().stream().filter(k -> !k.pass()).count()).sum();
    }
}
