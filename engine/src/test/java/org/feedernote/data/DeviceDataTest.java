package org.feedernote.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import org.feedernote.model.Curve;
import org.feedernote.trace.Step;

/**
 * Every cell of the device tables held to the value a published copy shows (the copy named beside
 * it), or marked "from memory" where none was seen, so that a wrong edit of a table fails here.
 */
class DeviceDataTest {
    private static final DeviceData DEVICES = new DeviceData(ReferenceData.standard());

    private static final String CONFIRMED = "checked against a published copy";
    private static final String RECALLED = "from memory";

    private static void assertCell(double expected, Step.Lookup s, String provenance, String source) {
        assertEquals(expected, s.value(), 1e-9, source);
        assertTrue(s.method().contains(provenance), source + ": " + s.method());
    }

    @Test
    void mcbBandsAreThoseOfIec60898Table7() {
        // IEC 60898-1:2015 Table 7, instantaneous ranges B 3-5, C 5-10, D 10-20 I_n: panelcraft.eu "How to Select the
        // Right Circuit Breaker"; electrotechnik.net "B C and D types in Miniature Circuit Breakers".
        double[][] ranges = {{3, 5}, {5, 10}, {10, 20}};
        Curve[] curves = {Curve.B, Curve.C, Curve.D};
        for (int i = 0; i < 3; i++) {
            assertCell(ranges[i][0], DEVICES.instantaneousLowerMultiple("x", curves[i]), CONFIRMED, "lower limit " + curves[i]);
            assertCell(ranges[i][1], DEVICES.instantaneousUpperMultiple("x", curves[i]), CONFIRMED, "upper limit " + curves[i]);
            // 0.1 s at the limits, 1.13 / 1.45 I_n: sparkyhub.co.uk "MCB Time-Current Curves".
            assertCell(0.1, DEVICES.instantaneousTime("x", curves[i]), CONFIRMED, "0.1 s");
            assertCell(1.13, DEVICES.conventionalNonTrippingMultiple("x", curves[i]), CONFIRMED, "1.13 I_n");
            assertCell(1.45, DEVICES.conventionalTrippingMultiple("x", curves[i]), CONFIRMED, "1.45 I_n");
        }
        ReferenceTable t = ReferenceData.standard().table("mcb-time-current.csv");
        for (Curve c : curves) {
            assertEquals(2.55, t.value("test_c_multiple", c.token()), "2.55 I_n, sparkyhub.co.uk MCB curves");
            assertEquals(1.0, t.value("test_c_min_s", c.token()), "1 s at 2.55 I_n, sparkyhub.co.uk MCB curves");
            // From memory: IEC 60898-1 Table 7 conventional times and the upper time at 2.55 I_n by rating.
            assertEquals(1.0, t.value("conventional_time_up_to_63a_h", c.token()), "from memory");
            assertEquals(2.0, t.value("conventional_time_over_63a_h", c.token()), "from memory");
            assertEquals(60.0, t.value("test_c_max_up_to_32a_s", c.token()), "from memory");
            assertEquals(120.0, t.value("test_c_max_over_32a_s", c.token()), "from memory");
            assertTrue(Provenance.recalled(t, "test_c_max_up_to_32a_s", c.token()));
        }
    }

    @Test
    void classThreeLimitsAtTheTabulatedCurrents() {
        // BS EN 60898-1:2003 Annex ZA class 3 at 10 kA: B 70 000 A²s, C 84 000 A²s (up to 16 A), quoted in
        // electriciansforums.net "adiabatic equation" post 146036.
        assertCell(70000, DEVICES.classThreeLetThrough("x", Curve.B, 16, 10000), CONFIRMED, "B16 10 kA");
        assertCell(84000, DEVICES.classThreeLetThrough("x", Curve.C, 16, 10000), CONFIRMED, "C16 10 kA");
        // From memory: every other cell.
        double[][] recalled = {{3000, 15000, 17000, 18000, 20000}, {4500, 25000, 28000, 32000, 37000},
                {6000, 35000, 40000, 45000, 50000}, {10000, 70000, 84000, 90000, 100000}};
        for (double[] r : recalled) {
            assertEquals(r[1], DEVICES.classThreeLetThrough("x", Curve.B, 10, r[0]).value(), "from memory B16 " + r[0]);
            assertEquals(r[2], DEVICES.classThreeLetThrough("x", Curve.C, 10, r[0]).value(), "from memory C16 " + r[0]);
            assertEquals(r[3], DEVICES.classThreeLetThrough("x", Curve.B, 32, r[0]).value(), "from memory B32 " + r[0]);
            assertEquals(r[4], DEVICES.classThreeLetThrough("x", Curve.C, 20, r[0]).value(), "from memory C32 " + r[0]);
        }
        assertTrue(DEVICES.classThreeLetThrough("x", Curve.B, 32, 10000).method().contains(RECALLED));
    }

    @Test
    void classThreeLimitFollowsTheProspectiveCurrent() {
        // Linear in the prospective current between rows: halfway from 6 kA (35 000) to 10 kA (70 000).
        Step.Lookup mid = DEVICES.classThreeLetThrough("x", Curve.B, 16, 8000);
        assertEquals(52500, mid.value(), 1e-6);
        assertTrue(mid.method().startsWith("interpolated linearly in the prospective current"));
        // Below the first row: the first row's limit, said so.
        Step.Lookup low = DEVICES.classThreeLetThrough("x", Curve.C, 16, 850);
        assertEquals(17000, low.value());
        assertTrue(low.row().contains("at or below the first row"), low.row());
        // Not covered: type D, above 32 A, above 10 kA.
        assertNull(DEVICES.classThreeLetThrough("x", Curve.D, 16, 3000));
        assertNull(DEVICES.classThreeLetThrough("x", Curve.B, 40, 3000));
        assertNull(DEVICES.classThreeLetThrough("x", Curve.B, 16, 12000));
    }

    @Test
    void fuseOperatingCurrentsAreThoseTheMaximumZsTablesImply() {
        // BS 7671:2008 (2011) Table 41.2, BS 88-2 systems E and G, 0.4 s, U_0 = 230 V: NICEIC Connections
        // Winter 2011-12 p. 60 Table 2; also the Metrel MI 3000 manual p. 57 (values × 0.8).
        double[][] bs882at04 = {{6, 8.21}, {10, 4.89}, {16, 2.56}, {20, 1.77}, {25, 1.35}, {32, 1.04}};
        for (double[] r : bs882at04) zsAndIa(FuseSystem.BS88_2, r[0], 0.4, r[1], "Connections 2011-12 / Metrel p. 57");
        // Table 41.4, 5 s: Metrel MI 3000 manual p. 57 (each value there / 0.8).
        double[][] bs882at5 = {{6, 12.8}, {10, 7.19}, {16, 4.18}, {20, 2.95}, {25, 2.30}, {32, 1.84}, {40, 1.35}, {50, 1.04},
                {63, 0.82}, {80, 0.57}, {100, 0.46}, {125, 0.34}, {160, 0.28}, {200, 0.19}};
        for (double[] r : bs882at5) zsAndIa(FuseSystem.BS88_2, r[0], 5, r[1], "Metrel p. 57");
        double[][] bs883at04 = {{5, 10.45}, {16, 2.42}, {20, 2.04}, {32, 0.96}};
        for (double[] r : bs883at04) zsAndIa(FuseSystem.BS88_3, r[0], 0.4, r[1], "Metrel p. 57");
        double[][] bs883at5 = {{5, 15.33}, {16, 4.11}, {20, 3.38}, {32, 1.64}, {45, 1.04}, {63, 0.72}, {80, 0.53}, {100, 0.40}};
        for (double[] r : bs883at5) zsAndIa(FuseSystem.BS88_3, r[0], 5, r[1], "Metrel p. 57");
        // The 32 A BS 88-3 fuse: NICEIC Connections Spring 2015 p. 61 gives 0.72 Ω as 0.8 × 0.95 × 230 V / I_a.
        double ia = DEVICES.fuseOperatingCurrent("x", FuseSystem.BS88_3, 32, 0.4).value();
        assertEquals(0.72, Math.floor(0.8 * 0.95 * 230 / ia * 100) / 100, 1e-9);
        // Not tabulated: 0.4 s above 32 A, 1 s.
        assertNull(DEVICES.fuseOperatingCurrent("x", FuseSystem.BS88_2, 63, 0.4));
        assertNull(DEVICES.fuseOperatingCurrent("x", FuseSystem.BS88_2, 16, 1));
    }

    private static void zsAndIa(FuseSystem system, double rating, double seconds, double zs, String source) {
        assertCell(zs, DEVICES.fuseMaxLoopImpedance("x", system, rating, seconds), CONFIRMED, source + " " + rating + " A " + seconds + " s");
        Step.Lookup ia = DEVICES.fuseOperatingCurrent("x", system, rating, seconds);
        assertEquals(230 / zs, ia.value(), 0.05, "I_a = U_0/Z_s, " + rating + " A " + seconds + " s");
    }

    @Test
    void gGatesAndConventionalCurrentsAreRecalled() {
        // From memory: IEC 60269-1:2006+A1 Table 3 (gates) and Table 2 (conventional currents); no copy seen.
        double[][] gates = {{16, 33, 65, 85, 150}, {20, 42, 85, 110, 200}, {25, 52, 110, 150, 260}, {32, 75, 150, 200, 350},
                {40, 95, 190, 260, 450}, {50, 125, 250, 350, 610}, {63, 160, 320, 450, 820}, {80, 215, 425, 610, 1100},
                {100, 290, 580, 820, 1450}, {125, 355, 715, 1100, 1910}, {160, 460, 950, 1450, 2590}, {200, 610, 1250, 1910, 3420},
                {250, 750, 1650, 2590, 4500}, {315, 1050, 2200, 3420, 6000}, {400, 1420, 2840, 4500, 8060},
                {500, 1780, 3800, 6000, 10600}, {630, 2200, 5100, 8060, 14140}};
        for (double[] g : gates) {
            assertCell(g[1], DEVICES.fuseGate("x", g[0], DeviceData.Gate.MIN_10S), RECALLED, "from memory " + g[0]);
            assertCell(g[2], DEVICES.fuseGate("x", g[0], DeviceData.Gate.MAX_5S), RECALLED, "from memory " + g[0]);
            assertCell(g[3], DEVICES.fuseGate("x", g[0], DeviceData.Gate.MIN_01S), RECALLED, "from memory " + g[0]);
            assertCell(g[4], DEVICES.fuseGate("x", g[0], DeviceData.Gate.MAX_01S), RECALLED, "from memory " + g[0]);
            assertCell(1.6, DEVICES.fuseConventionalFusingMultiple("x", g[0]), RECALLED, "from memory " + g[0]);
        }
        assertThrows(DataGapException.class, () -> DEVICES.fuseGate("x", 10, DeviceData.Gate.MAX_5S));
    }

    @Test
    void mccbReleaseMultiplesConfirmedToleranceRecalled() {
        // IEC 60947-2 Table 6, 1.05 / 1.3 I_n: Schneider Electric FAQ FA369327 (se.com/in/en/faqs/FA369327/).
        assertCell(1.05, DEVICES.mccbConventionalNonTrippingMultiple("x"), CONFIRMED, "FAQ FA369327");
        assertCell(1.30, DEVICES.mccbConventionalTrippingMultiple("x"), CONFIRMED, "FAQ FA369327");
        // From memory: IEC 60947-2:2016 8.3.3.1.2 (±20 %); no copy seen.
        assertCell(0.2, DEVICES.mccbInstantaneousTolerance("x"), RECALLED, "from memory");
    }

    @Test
    void rcdTimesAreThoseOfIec61008Table1() {
        // IEC 61008-1 / IEC 61009-1 Table 1: barfuse.com ?p=4963 (whole table); html.pdfcookie.com rvr7mmqer72o
        // (300/150/40 ms and 500/200/150 ms); Kewtech KT64 p. 35 and Kyoritsu 5406A p. 14 (300/40, 500/150, 130/50 ms).
        DeviceData.Residual[] at = DeviceData.Residual.values();
        double[] general = {0.3, 0.15, 0.04, 0.04};
        double[] sMax = {0.5, 0.2, 0.15, 0.15};
        double[] sMin = {0.13, 0.06, 0.05, 0.04};
        for (int i = 0; i < at.length; i++) {
            assertCell(general[i], DEVICES.rcdMaximumBreakTime("x", false, at[i]), CONFIRMED, "general " + at[i]);
            assertCell(sMax[i], DEVICES.rcdMaximumBreakTime("x", true, at[i]), CONFIRMED, "type S " + at[i]);
            assertCell(sMin[i], DEVICES.rcdMinimumNonActuatingTime("x", at[i]), CONFIRMED, "type S minimum " + at[i]);
        }
    }
}
