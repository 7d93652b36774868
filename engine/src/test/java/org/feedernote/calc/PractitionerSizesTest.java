package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputReader;
import org.feedernote.model.Circuit;
import org.feedernote.model.Installation;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * Sizes a practitioner would sign, on an invented office-and-workshop building (transformer, six
 * boards, a single-phase sub-board, 50 circuits, sizes 'auto', no catalogue data;
 * engine/src/test/resources/trial): every auto-sized cable is needed. Property (common practice, no
 * source): one standard size smaller, a check that depends on the size fails — capacity, overload,
 * voltage drop, motor starting, disconnection or the protective conductor's withstand — never the
 * line conductors' withstand alone, which the overload device covers (IEC 60364-4-43, 435.1).
 */
class PractitionerSizesTest {

    private static final Set<String> SIZE_CHECKS = Set.of("capacity", "overload", "voltage-drop", "motor-starting", "disconnection",
            "protective-conductor");

    @Test
    void everyAutoSizedCableIsTheSmallestThatItsLoadItsDropAndItsDisconnectionAllow() throws Exception {
        String yaml = Files.readString(Fixtures.root().resolve("engine/src/test/resources/trial/kestrel-yard.yaml"));
        Installation input = InputReader.parse("kestrel-yard.yaml", yaml, false);
        Engine engine = new Engine(ReferenceData.standard());
        Result sized = engine.run(input, false);
        Installation fixed = SyntheticInstallation.asSized(input, sized);
        List<Double> sizes = ReferenceData.standardSizes();
        List<String> unexplained = new ArrayList<>();
        for (int i = 0; i < fixed.circuits().size(); i++) {
            Circuit c = fixed.circuits().get(i);
            if (!input.circuits().get(i).cable().size().auto()) continue;
            double size = c.cable().size().mm2();
            int at = sizes.indexOf(size);
            if (at <= 0 || size <= 1.5) continue;
            double smaller = sizes.get(at - 1);
            List<Circuit> circuits = new ArrayList<>(fixed.circuits());
            circuits.set(i, c.withCable(c.cable().withSize(smaller).withCpc(Math.min(smaller, c.cable().cpc().mm2()))));
            Installation trial = new Installation(fixed.sourceName(), fixed.project(), fixed.basis(), fixed.supply(), fixed.boards(),
                    List.copyOf(circuits), fixed.canonical(), fixed.sourceText(), fixed.warnings());
            Result r = engine.run(trial, false);
            boolean needed = r.circuits().stream().anyMatch(x -> x.checks().stream()
                    .anyMatch(k -> !k.pass() && SIZE_CHECKS.contains(k.name())
                            && sized.circuits().stream().filter(y -> y.id().equals(x.id())).findFirst().orElseThrow().check(k.name()).pass()));
            if (!needed) unexplained.add(c.id() + " " + ReferenceData.sizeKey(size) + " mm²");
        }
        assertEquals(List.of(), unexplained, "cables larger than any size-dependent check needs");
    }

    @Test
    void theBuildingIsCalculatedWithItsSinglePhaseSubBoardAndNoCableAbove300() throws Exception {
        String yaml = Files.readString(Fixtures.root().resolve("engine/src/test/resources/trial/kestrel-yard.yaml"));
        Result r = new Engine(ReferenceData.standard()).run(InputReader.parse("kestrel-yard.yaml", yaml, false), false);
        assertTrue(r.circuits().size() >= 40);
        assertTrue(r.circuits().stream().allMatch(c -> c.circuit().cable().size().mm2() <= 300));
        CircuitResult cafe = r.circuits().stream().filter(c -> c.id().equals("F-CAFE")).findFirst().orElseThrow();
        assertEquals(1, cafe.phases());
        assertTrue(cafe.pass());
    }
}
