package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.Locale;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import org.feedernote.data.ReferenceData;
import org.feedernote.formula.Units;
import org.feedernote.model.Cable;
import org.feedernote.model.CableType;
import org.feedernote.model.Conductor;
import org.feedernote.model.CpcKind;
import org.feedernote.model.Formation;
import org.feedernote.model.Insulation;
import org.feedernote.model.SizeChoice;
import org.feedernote.trace.Q;
import org.feedernote.trace.Trace;

/**
 * The reactive part x (mV/A/m) derived from the cable's geometry, against the x columns of the
 * voltage-drop tables of BS 7671:2018 Appendix 4 (copper conductors, 50 Hz), within ±5 % of the
 * printed value (measured from the edge of its rounding interval: 0.24 stands for 0.235 to 0.245),
 * for every size and formation found. Four cells, all of the recalled Table 4D1B, need that
 * rounding allowance (70 mm² single-phase touching, trefoil and flat touching; 150 mm² single-phase
 * touching: derived 5.0–5.3 % below the printed value).
 *
 * <p>Sources, beside each value below:
 * <ul>
 * <li>4E1B: BS 7671:2018 Table 4E1B (single-core 90 °C thermosetting, non-armoured), read from its
 * reproduction by CSE Distributors ("Table 4E1B", cse-distributors.co.uk, technical tables); rows
 * 25–185 mm² whole, 240 mm² single-phase only (the copy is cut off there). The copy prints the
 * 25 mm² trefoil x as "1.165", read as 0.165 (its neighbours and r = 1.60 make 1.165 impossible).
 * <li>4D1B: BS 7671:2018 Table 4D1B (single-core 70 °C thermoplastic, non-armoured), from memory;
 * the 70 and 185 mm² flat-touching values (0.24, 0.22) are also those quoted in issue 23.
 * <li>4E4B: BS 7671:2018 Table 4E4B (multicore 90 °C thermosetting, armoured), read from its
 * reproduction by CSE Distributors ("Table 4E4B").
 * </ul>
 * Three-phase flat groups: Table 4D1B prints the drop between the two outer phases (s_g = 2s),
 * Table 4E1B the mean of the three phases (s_g = ³√2·s). The design uses the outer pair, the larger;
 * the 4E1B flat rows are compared with the mean and the design value is held at or above them.
 */
class PublishedReactanceTest {
    private static final double TOLERANCE = 0.05;

    /** A printed 0.24 stands for 0.235 to 0.245: the ±5 % is taken from the edge of that interval. */
    private static double halfLastDigit(String printed) {
        int decimals = printed.length() - printed.indexOf('.') - 1;
        return 0.5 * Math.pow(10, -decimals);
    }

    private static ImpedanceResult derive(String insulation, String type, String formation, int phases, double size,
                                          ImpedanceCalc.FlatPhases flat) {
        Cable cable = new Cable(Conductor.COPPER, Insulation.valueOf(insulation.toUpperCase(Locale.ROOT)),
                type.equals("multicore") ? CableType.MULTICORE : CableType.SINGLE_CORE, type.equals("multicore") ? phases + 1 : 0,
                SizeChoice.of(size), SizeChoice.of(16), 1,
                formation.equals("-") ? null : Formation.valueOf(formation.toUpperCase(Locale.ROOT).replace('-', '_')),
                CpcKind.SEPARATE, false);
        Q theta = new Q("T/theta", "θ", 70, Units.DEG_C);
        Q f = new Q("T/f", "f", 50, Units.HZ);
        return new ImpedanceCalc(ReferenceData.standard()).impedance(Trace.noop(), "T", cable, theta, f, phases, flat);
    }

    @ParameterizedTest(name = "BS 7671 {0} {1} {2} {3} {4}-phase {5} mm²: x = {6} mV/A/m")
    @CsvSource({
            // table, insulation, type, formation, phases, size, published x, treatment of a flat group
            // 4E1B col. 4 (2 cables single-phase, touching), read from the CSE copy
            "4E1B, xlpe, single-core, flat-touching, 1, 25, 0.190, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 35, 0.180, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 50, 0.180, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 70, 0.175, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 95, 0.170, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 120, 0.165, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 150, 0.165, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 185, 0.165, outer",
            "4E1B, xlpe, single-core, flat-touching, 1, 240, 0.160, outer",
            // 4E1B col. 5 (2 cables single-phase, spaced), read from the CSE copy
            "4E1B, xlpe, single-core, flat-spaced, 1, 25, 0.28, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 35, 0.27, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 50, 0.27, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 70, 0.26, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 95, 0.26, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 120, 0.25, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 150, 0.25, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 185, 0.25, outer",
            "4E1B, xlpe, single-core, flat-spaced, 1, 240, 0.25, outer",
            // 4E1B col. 7 (3 cables three-phase, trefoil touching), read from the CSE copy
            "4E1B, xlpe, single-core, trefoil, 3, 25, 0.165, outer",
            "4E1B, xlpe, single-core, trefoil, 3, 35, 0.155, outer",
            "4E1B, xlpe, single-core, trefoil, 3, 50, 0.155, outer",
            "4E1B, xlpe, single-core, trefoil, 3, 70, 0.150, outer",
            "4E1B, xlpe, single-core, trefoil, 3, 95, 0.145, outer",
            "4E1B, xlpe, single-core, trefoil, 3, 120, 0.140, outer",
            "4E1B, xlpe, single-core, trefoil, 3, 150, 0.140, outer",
            "4E1B, xlpe, single-core, trefoil, 3, 185, 0.140, outer",
            // 4E1B col. 8 (three-phase, flat touching; the table's mean of the phases), read from the CSE copy
            "4E1B, xlpe, single-core, flat-touching, 3, 25, 0.190, mean",
            "4E1B, xlpe, single-core, flat-touching, 3, 35, 0.180, mean",
            "4E1B, xlpe, single-core, flat-touching, 3, 50, 0.180, mean",
            "4E1B, xlpe, single-core, flat-touching, 3, 70, 0.175, mean",
            "4E1B, xlpe, single-core, flat-touching, 3, 95, 0.170, mean",
            "4E1B, xlpe, single-core, flat-touching, 3, 120, 0.165, mean",
            "4E1B, xlpe, single-core, flat-touching, 3, 150, 0.165, mean",
            "4E1B, xlpe, single-core, flat-touching, 3, 185, 0.165, mean",
            // 4E1B col. 9 (three-phase, flat spaced; the table's mean of the phases), read from the CSE copy
            "4E1B, xlpe, single-core, flat-spaced, 3, 25, 0.27, mean",
            "4E1B, xlpe, single-core, flat-spaced, 3, 35, 0.26, mean",
            "4E1B, xlpe, single-core, flat-spaced, 3, 50, 0.26, mean",
            "4E1B, xlpe, single-core, flat-spaced, 3, 70, 0.25, mean",
            "4E1B, xlpe, single-core, flat-spaced, 3, 95, 0.25, mean",
            "4E1B, xlpe, single-core, flat-spaced, 3, 120, 0.24, mean",
            "4E1B, xlpe, single-core, flat-spaced, 3, 150, 0.24, mean",
            "4E1B, xlpe, single-core, flat-spaced, 3, 185, 0.24, mean",
            // 4D1B single-phase touching, single-phase spaced, trefoil, flat touching, flat spaced: from memory
            "4D1B, pvc, single-core, flat-touching, 1, 25, 0.200, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 35, 0.195, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 50, 0.190, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 70, 0.185, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 95, 0.180, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 120, 0.175, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 150, 0.175, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 185, 0.170, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 240, 0.165, outer",
            "4D1B, pvc, single-core, flat-touching, 1, 300, 0.165, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 25, 0.29, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 35, 0.28, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 50, 0.28, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 70, 0.27, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 95, 0.27, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 120, 0.26, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 150, 0.26, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 185, 0.26, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 240, 0.25, outer",
            "4D1B, pvc, single-core, flat-spaced, 1, 300, 0.25, outer",
            "4D1B, pvc, single-core, trefoil, 3, 25, 0.175, outer",
            "4D1B, pvc, single-core, trefoil, 3, 35, 0.170, outer",
            "4D1B, pvc, single-core, trefoil, 3, 50, 0.165, outer",
            "4D1B, pvc, single-core, trefoil, 3, 70, 0.160, outer",
            "4D1B, pvc, single-core, trefoil, 3, 95, 0.155, outer",
            "4D1B, pvc, single-core, trefoil, 3, 120, 0.150, outer",
            "4D1B, pvc, single-core, trefoil, 3, 150, 0.150, outer",
            "4D1B, pvc, single-core, trefoil, 3, 185, 0.145, outer",
            "4D1B, pvc, single-core, trefoil, 3, 240, 0.145, outer",
            "4D1B, pvc, single-core, trefoil, 3, 300, 0.140, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 25, 0.25, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 35, 0.24, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 50, 0.24, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 70, 0.24, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 95, 0.23, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 120, 0.23, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 150, 0.23, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 185, 0.22, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 240, 0.22, outer",
            "4D1B, pvc, single-core, flat-touching, 3, 300, 0.22, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 25, 0.32, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 35, 0.32, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 50, 0.32, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 70, 0.31, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 95, 0.31, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 120, 0.30, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 150, 0.30, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 185, 0.30, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 240, 0.29, outer",
            "4D1B, pvc, single-core, flat-spaced, 3, 300, 0.29, outer",
            // 4E4B col. 3 (two-core, single-phase) and col. 4 (three- or four-core, three-phase), read from the CSE copy
            "4E4B, xlpe, multicore, -, 1, 25, 0.160, outer",
            "4E4B, xlpe, multicore, -, 1, 35, 0.155, outer",
            "4E4B, xlpe, multicore, -, 1, 50, 0.155, outer",
            "4E4B, xlpe, multicore, -, 1, 70, 0.150, outer",
            "4E4B, xlpe, multicore, -, 1, 95, 0.150, outer",
            "4E4B, xlpe, multicore, -, 1, 120, 0.145, outer",
            "4E4B, xlpe, multicore, -, 1, 150, 0.145, outer",
            "4E4B, xlpe, multicore, -, 1, 185, 0.145, outer",
            "4E4B, xlpe, multicore, -, 1, 240, 0.140, outer",
            "4E4B, xlpe, multicore, -, 1, 300, 0.140, outer",
            "4E4B, xlpe, multicore, -, 1, 400, 0.140, outer",
            "4E4B, xlpe, multicore, -, 3, 25, 0.140, outer",
            "4E4B, xlpe, multicore, -, 3, 35, 0.135, outer",
            "4E4B, xlpe, multicore, -, 3, 50, 0.135, outer",
            "4E4B, xlpe, multicore, -, 3, 70, 0.130, outer",
            "4E4B, xlpe, multicore, -, 3, 95, 0.130, outer",
            "4E4B, xlpe, multicore, -, 3, 120, 0.130, outer",
            "4E4B, xlpe, multicore, -, 3, 150, 0.125, outer",
            "4E4B, xlpe, multicore, -, 3, 185, 0.125, outer",
            "4E4B, xlpe, multicore, -, 3, 240, 0.125, outer",
            "4E4B, xlpe, multicore, -, 3, 300, 0.120, outer",
            "4E4B, xlpe, multicore, -, 3, 400, 0.120, outer"})
    void derivedReactanceIsWithinFivePerCentOfTheTable(String table, String insulation, String type, String formation, int phases,
                                                       double size, String printed, String treatment) {
        double published = Double.parseDouble(printed);
        ImpedanceCalc.FlatPhases flat = treatment.equals("mean") ? ImpedanceCalc.FlatPhases.MEAN : ImpedanceCalc.FlatPhases.OUTER_PAIR;
        double x = derive(insulation, type, formation, phases, size, flat).x().value();
        assertEquals(published, x, published * TOLERANCE + halfLastDigit(printed), () -> "derived x = " + x + " mV/A/m");
        if (flat == ImpedanceCalc.FlatPhases.MEAN) {
            double design = derive(insulation, type, formation, phases, size, ImpedanceCalc.FlatPhases.OUTER_PAIR).x().value();
            assertTrue(design >= published, () -> "the design's x (outer phases) " + design + " is not below the table's mean " + published);
        }
    }
}
