package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.Fixtures;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputReader;
import org.feedernote.model.Installation;
import org.feedernote.report.ResultJson;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * check without --trace calculates with the no-op trace (and reuses the sizing's evaluations);
 * the note records every step. Both must reach the same figures and the same verdict, check by
 * check, boards included: a design the note fails must never pass check.
 */
class FiguresAgreeWithTheTraceTest {

    @ParameterizedTest
    @MethodSource("org.feedernote.Fixtures#examples")
    void theExamplesGiveTheSameResultWithAndWithoutTheTrace(Path input) throws Exception {
        assertSameResult(InputReader.read(input));
    }

    @Test
    void aGeneratedInstallationGivesTheSameResultWithAndWithoutTheTrace() throws Exception {
        assertSameResult(InputReader.parse("synthetic.json",
                SyntheticInstallation.toJson(SyntheticInstallation.generate(600, 3)), true));
    }

    /** A design with every size given has nothing to choose: the sizing evaluates nothing, the final pass every circuit once. */
    @Test
    void aDesignWithEverySizeGivenGivesTheSameResultWithAndWithoutTheTrace() throws Exception {
        Installation generated = InputReader.parse("synthetic.json",
                SyntheticInstallation.toJson(SyntheticInstallation.generate(400, 6)), true);
        Engine engine = new Engine(org.feedernote.data.ReferenceData.standard());
        assertSameResult(SyntheticInstallation.asSized(generated, engine.run(generated, false)));
    }

    @Test
    void boardsWithAWithstandRatingGiveTheSameVerdictWithAndWithoutTheTrace() throws Exception {
        // Sub-boards rated 10 kA and 60 kA by turns: a 1 600 kVA, 6 % transformer gives about 42 kA at
        // its terminals (IEC 60909-0:2016, eq. (29), c_max = 1.10: 1.1 × 400 V / (√3 × 0.006 Ω)), so the
        // 10 kA boards near the origin fail and the 60 kA ones pass.
        String yaml = java.util.regex.Pattern.compile("\\{id: (DB-\\d*[02468]), diversity: 0.6}")
                .matcher(SyntheticInstallation.generate(300, 4)).replaceAll("{id: $1, diversity: 0.6, fault_rating_ka: 10}")
                .replaceAll("\\{id: (DB-\\d*[13579]), diversity: 0.6}", "{id: $1, diversity: 0.6, fault_rating_ka: 60}");
        Installation inst = InputReader.parse("synthetic.yaml", yaml, false);
        Result figures = new Engine(ReferenceData.standard()).run(inst, false);
        long failingBoards = figures.boards().stream().filter(b -> !b.pass()).count();
        long passingRated = figures.boards().stream().filter(b -> b.pass() && !b.checks().isEmpty()).count();
        org.junit.jupiter.api.Assertions.assertTrue(failingBoards > 0 && passingRated > 0,
                "the case should hold failing and passing boards: " + failingBoards + " failing, " + passingRated + " passing");
        assertSameResult(inst);
    }

    private static void assertSameResult(Installation inst) {
        Engine engine = new Engine(ReferenceData.standard());
        assertEquals(ResultJson.write(engine.run(inst, true)), ResultJson.write(engine.run(inst, false)));
    }
}
