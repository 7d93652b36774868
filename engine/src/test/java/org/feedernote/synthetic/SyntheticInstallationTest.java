package org.feedernote.synthetic;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.input.InputReader;

/** The generator: seeded, valid input, and a design the engine can size (common practice, no source). */
class SyntheticInstallationTest {
    @Test
    void theSameSeedGivesTheSameFile() {
        assertEquals(SyntheticInstallation.generate(300, 7), SyntheticInstallation.generate(300, 7));
        assertNotEquals(SyntheticInstallation.generate(300, 7), SyntheticInstallation.generate(300, 8));
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(ints = {1, 2, 39, 60, 81})
    void smallInstallationsAreGeneratedToo(int circuits) throws Exception {
        var inst = InputReader.parse("g.json", SyntheticInstallation.toJson(SyntheticInstallation.generate(circuits, 1)), true);
        assertEquals(circuits, inst.circuits().size());
    }

    @Test
    void aGeneratedInstallationIsValidInBothFormsAndSizes() throws Exception {
        String yaml = SyntheticInstallation.generate(400, 3);
        var fromYaml = Fixtures.parse(yaml);
        var fromJson = InputReader.parse("g.json", SyntheticInstallation.toJson(yaml), true);
        assertEquals(fromYaml.canonicalJson(), fromJson.canonicalJson());
        assertEquals(400, fromYaml.circuits().size());
        var result = new org.feedernote.calc.Engine(org.feedernote.data.ReferenceData.standard()).run(fromJson, false);
        assertTrue(result.pass(), () -> result.circuits().stream().filter(c -> !c.pass()).map(c -> c.id() + " " + c.failing()).toList().toString());
    }

    /**
     * The benchmark's traced check of given sizes checks the design the sizing chose: with those
     * sizes and ratings given, every circuit has the same figures and outcome (common practice,
     * no source: a chosen design, checked again, is the same design).
     */
    @Test
    void theSizedInstallationIsTheDesignTheSizingChose() throws Exception {
        var engine = new org.feedernote.calc.Engine(org.feedernote.data.ReferenceData.standard());
        var input = InputReader.parse("g.json", SyntheticInstallation.toJson(SyntheticInstallation.generate(300, 5)), true);
        var chosen = engine.run(input, false);
        var sized = SyntheticInstallation.asSized(input, chosen);
        assertTrue(sized.circuits().stream().noneMatch(c -> c.cable().size().auto() || c.cable().cpc().auto() || c.device().ratingA() == null));
        var checked = engine.run(sized, false);
        for (int i = 0; i < chosen.circuits().size(); i++) {
            var a = chosen.circuits().get(i);
            var b = checked.circuits().get(i);
            assertEquals(a.circuit().cable(), b.circuit().cable(), a.id());
            assertEquals(a.rating().value(), b.rating().value(), a.id());
            assertEquals(a.cumulativePercent().value(), b.cumulativePercent().value(), a.id());
            assertEquals(a.loopImpedance().value(), b.loopImpedance().value(), a.id());
            assertEquals(a.pass(), b.pass(), a.id());
        }
    }
}
