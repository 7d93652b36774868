package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The sizing's notes write gains and volumes with three decimals without the JDK's formatter:
 * the text must be exactly what String.format(Locale.ROOT, "%.3f", v) writes, or the trace of a
 * note written by an earlier version would no longer recompute byte for byte.
 */
class FixedDecimalsTest {
    private static String formatter(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, -0.0, 0.0005, -0.0005, 0.0004999, 1.0005, 2.0005, 1.2345, -1.2345, 0.1 + 0.2, 999.9995,
            1e7, 1.23456789e9, 5e-324, -5e-324, 0.125, 0.0625, 4.35, 1.005, 123456.0004999})
    void writesWhatTheFormatterWritesForEdgeValues(double v) {
        assertEquals(formatter(v), Decimals.fixed3(v));
    }

    /** Seeded values of every kind the working meets: small, with a half at the fourth decimal, negative, large, tiny. */
    private static double[] sample(long seed, int count) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] values = new double[count];
        for (int i = 0; i < count; i++) {
            values[i] = switch (i % 5) {
                case 0 -> random.nextDouble() * 10;
                case 1 -> Math.round(random.nextDouble() * 1e7) / 1e4 + 0.0005;
                case 2 -> -random.nextDouble() * 1000;
                case 3 -> random.nextDouble() * 2e7;
                default -> Math.scalb(random.nextDouble(), random.nextInt(-30, 30));
            };
        }
        return values;
    }

    @Test
    void writesWhatTheFormatterWritesForManyValues() {
        for (double v : sample(20261202, 100_000)) assertEquals(formatter(v), Decimals.fixed3(v), () -> "for " + v);
    }

    @Test
    void writesWhatTheFormatterWritesForNonFiniteValues() {
        assertEquals(formatter(Double.NaN), Decimals.fixed3(Double.NaN));
        assertEquals(formatter(Double.POSITIVE_INFINITY), Decimals.fixed3(Double.POSITIVE_INFINITY));
        assertEquals(formatter(Double.NEGATIVE_INFINITY), Decimals.fixed3(Double.NEGATIVE_INFINITY));
    }

    /** trim: the formatter's three decimals with the trailing zeros stripped; "-0" for a negative value that rounds to zero. */
    private static String trimmed(double v) {
        java.math.BigDecimal d = new java.math.BigDecimal(formatter(v));
        if (d.signum() == 0) return v < 0 || 1 / v < 0 ? "-0" : "0";
        return d.stripTrailingZeros().toPlainString();
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, -0.0, 1, -1, 16, 100, 2500, 1e7, 1e14, 999_999_999_999_999.0, 1e15, 1e16, 0.5, 16.0004, 16.0005,
            -2.5, 1.23456789e9, 0.001, 0.0009, 0.0005, 0.0004999, -0.0004, 0.9995, 9.9995, 9_999_999.9995, 9_999_999.9994,
            1e-3, 0.00099999, 6_999_999.9999, 0.125, 0.1 + 0.2, 4.35, 1.005, -1.0005, 12.3456789})
    void trimWritesWhatTheFormatterWritesWithoutTrailingZeros(double v) {
        assertEquals(trimmed(v), Decimals.trim(v));
    }

    @Test
    void trimWritesWholeNumbersAsTheFormatterDoes() {
        SplittableRandom random = new SplittableRandom(20261203);
        for (int i = 0; i < 20_000; i++) {
            double v = i % 2 == 0 ? random.nextInt(-100_000, 100_000) : Math.rint(random.nextDouble() * 1e12);
            assertEquals(trimmed(v), Decimals.trim(v), () -> "for " + v);
        }
    }

    @Test
    void trimWritesWhatTheFormatterWritesForManyValues() {
        for (double v : sample(202612031, 200_000)) assertEquals(trimmed(v), Decimals.trim(v), () -> "for " + v);
    }

    /**
     * Values at and a few ulps either side of a half thousandth, and running sums of thirds (a
     * board's phase loads): where the text is decided by the decimal form rather than the binary
     * value, and where a shortcut through the binary value would go wrong.
     */
    @Test
    void bothWriteWhatTheFormatterWritesNearHalfThousandths() {
        SplittableRandom random = new SplittableRandom(20261204);
        double load = 0;
        for (int i = 0; i < 50_000; i++) {
            double half = (random.nextInt(-2_000_000, 2_000_000) + 0.5) / 1000;
            double v = switch (i % 4) {
                case 0 -> half;
                case 1 -> Math.nextUp(half);
                case 2 -> Math.nextDown(half);
                default -> load += random.nextDouble() * 10 / 3;
            };
            assertEquals(formatter(v), Decimals.fixed3(v), () -> "fixed3 for " + v);
            assertEquals(trimmed(v), Decimals.trim(v), () -> "trim for " + v);
        }
    }
}
