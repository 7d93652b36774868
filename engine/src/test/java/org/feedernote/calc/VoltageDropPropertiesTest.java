package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.Fixtures;
import org.feedernote.data.ReferenceData;

/**
 * Invariants of the physics (common practice, no source): the drop grows in proportion to length
 * and current, a larger conductor never drops more, the cumulative drop is the sum of its path,
 * and the exact form agrees with a phasor calculation.
 */
class VoltageDropPropertiesTest {
    /**
     * Sizes the packaged capacity tables cover for multicore cables clipped direct (IEC 60364-5-52 Tables B.52.2
     * to B.52.5, 1.5 to 300 mm²), at or above the default smallest line conductor (1.5 mm², Table 52.2).
     */
    private static final List<Double> SIZES = ReferenceData.standardSizes().stream().filter(s -> s >= 1.5 && s <= 300).toList();

    record Case(String insulation, int phases, double pf, double current, double length) {}

    static Stream<Case> cases() {
        Random random = new Random(20261201L);
        return IntStream.range(0, 25).mapToObj(i -> new Case(random.nextBoolean() ? "pvc" : "xlpe",
                random.nextBoolean() ? 1 : 3, 0.6 + 0.4 * random.nextDouble(), 5 + 200 * random.nextDouble(),
                5 + 150 * random.nextDouble()));
    }

    private static CircuitResult run(Case c, double size, double current, double length) {
        String cable = "{conductor: copper, insulation: %s, type: multicore, cores: %d, size_mm2: %s, cpc_mm2: %s}"
                .formatted(c.insulation(), c.phases() == 1 ? 2 : 4, ReferenceData.sizeKey(size), ReferenceData.sizeKey(Math.min(size, 16)));
        String load = "{kind: other, current_a: %s, power_factor: %s, phases: %d}".formatted(current, c.pf(), c.phases());
        return Fixtures.run(Fixtures.oneBoard("", Fixtures.circuit("C1", load, length, cable))).circuits().get(0);
    }

    @ParameterizedTest
    @MethodSource("cases")
    void dropIsProportionalToLengthAndCurrent(Case c) {
        double base = run(c, 16, c.current(), c.length()).dropV().value();
        assertEquals(2 * base, run(c, 16, c.current(), 2 * c.length()).dropV().value(), base * 1e-9);
        assertEquals(3 * base, run(c, 16, 3 * c.current(), c.length()).dropV().value(), base * 1e-9);
    }

    @ParameterizedTest
    @MethodSource("cases")
    void aLargerSizeNeverDropsMore(Case c) {
        double previous = Double.POSITIVE_INFINITY;
        for (double size : SIZES) {
            double drop = run(c, size, c.current(), c.length()).dropV().value();
            assertTrue(drop <= previous + 1e-12, "size " + size + " drops " + drop + " after " + previous);
            previous = drop;
        }
    }

    @ParameterizedTest
    @MethodSource("cases")
    void exactFormEqualsAPhasorCalculation(Case c) {
        CircuitResult r = run(c, 10, c.current(), c.length());
        double un = c.phases() == 3 ? 400 : 230;
        double rr = r.impedance().r().value() * c.length() / 1000;
        double xx = r.impedance().x().value() * c.length() / 1000;
        // Sending end fixed at Un; find receiving voltage Ur with Us = Ur + I·Z, current lagging Ur by φ.
        double phi = Math.acos(c.pf());
        double lo = 0;
        double hi = un;
        for (int i = 0; i < 200; i++) {
            double ur = (lo + hi) / 2;
            Complex us = new Complex(ur, 0).add(new Complex(c.current() * Math.cos(-phi), c.current() * Math.sin(-phi)).multiply(new Complex(rr, xx)));
            if (us.abs() > un) hi = ur; else lo = ur;
        }
        double exact = un - (lo + hi) / 2;
        assertEquals(exact * 100 / un, r.dropExactPercent().value(), 1e-6);
        assertTrue(r.dropExactPercent().value() >= r.dropPercent().value() - 1e-9,
                "the exact drop adds the quadrature term to the approximate projection, so it is never smaller");
    }

    @Test
    void cumulativeDropIsTheSumOfItsPath() throws Exception {
        Result result = new Engine(ReferenceData.standard()).run(org.feedernote.input.InputReader.read(Fixtures.inputs().resolve("sports-hall.yaml")));
        for (CircuitResult c : result.circuits()) {
            double sum = c.dropPercent().value();
            String board = c.circuit().from();
            while (true) {
                String b = board;
                CircuitResult feeder = result.circuits().stream().filter(f -> b.equals(f.circuit().to())).findFirst().orElse(null);
                if (feeder == null) break;
                sum += feeder.dropPercent().value();
                board = feeder.circuit().from();
            }
            assertEquals(sum, c.cumulativePercent().value(), 1e-9, c.id());
        }
    }
}
