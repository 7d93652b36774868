package org.feedernote.report;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputReader;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * The sizing of a generated installation of 400 circuits (invented data, seed 5), summarised a
 * row per circuit and compared whole with golden-reports/synthetic-400.summary.txt: the sizes the
 * drop-balancing loop chooses must not change when the engine is made faster. Rewrite with
 * {@code -Dfeedernote.rewrite=true} only for a deliberate change, after reading the diff.
 */
class GoldenScaleTest {
    @Test
    void theSizesChosenForAGeneratedInstallationMatchTheGoldenSummary() throws Exception {
        String json = SyntheticInstallation.toJson(SyntheticInstallation.generate(400, 5));
        Result result = new Engine(ReferenceData.standard()).run(InputReader.parse("synthetic-400.json", json, true), false);
        GoldenNoteTest.compare(Fixtures.root().resolve("golden-reports/synthetic-400.summary.txt"),
                TerminalSummary.render(result, "synthetic-400.json"));
    }
}
