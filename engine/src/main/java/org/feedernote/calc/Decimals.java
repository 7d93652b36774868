package org.feedernote.calc;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * The number texts the calculation writes into its decisions and notes (sizes, ratings, loads):
 * three decimals, with or without the trailing zeros. Made without the formatter, since the
 * sizing writes them for every candidate it tries.
 */
final class Decimals {
    private Decimals() {}

    /**
     * A value with three decimals and no trailing zeros ("1.25", "16", "-0"): the same text as
     * String.format("%.3f") with the zeros stripped, without the formatter (this runs for every
     * candidate the sizing tries).
     */
    static String trim(double v) {
        if (!Double.isFinite(v)) return Double.toString(v);
        // Whole numbers (ratings, sizes, lengths) are most of them: the same text without BigDecimal.
        if (v != 0 && v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        long k = thousandths(v);
        if (k != UNSURE) return k == 0 ? zero(v, "0") : withThousandths(k, true);
        BigDecimal d = threeDecimals(v);
        if (d.signum() == 0) return zero(v, "0");
        return d.stripTrailingZeros().toPlainString();
    }

    /**
     * A value with three decimals ("1.250", "-0.000"): the same text as String.format(Locale.ROOT,
     * "%.3f", v), without the formatter, which costs tens of microseconds a call before the JIT has
     * compiled it (the balancing writes several per step). Both round half up the shortest decimal
     * form of the value, Double.toString's.
     */
    static String fixed3(double v) {
        if (!Double.isFinite(v)) return Double.isNaN(v) ? "NaN" : v > 0 ? "Infinity" : "-Infinity";
        long k = thousandths(v);
        if (k != UNSURE) return k == 0 ? zero(v, "0.000") : withThousandths(k, false);
        BigDecimal d = threeDecimals(v);
        String plain = d.toPlainString();
        return d.signum() == 0 ? zero(v, plain) : plain;
    }

    private static final long UNSURE = Long.MIN_VALUE;

    /**
     * The value in thousandths, rounded as threeDecimals rounds it, or UNSURE. The shortest decimal
     * form lies within an ulp of the value and 1000 · v is within an ulp of its product: where no
     * rounding boundary (a half thousandth) lies within those distances of the product, both round
     * the same way, and no decimal string need be made. Near a boundary the caller takes the
     * decimal route.
     */
    private static long thousandths(double v) {
        double x = v * 1000;
        if (!(Math.abs(x) < 0x1p52)) return UNSURE;
        double below = Math.floor(x);
        double fromHalf = Math.abs(x - below - 0.5);
        if (fromHalf <= 2 * (Math.ulp(x) + 1000 * Math.ulp(v))) return UNSURE;
        return (long) (x - below < 0.5 ? below : below + 1);
    }

    /** "-0" style text for a value that rounds to zero: negative values keep their sign, as BigDecimal's text does not. */
    private static String zero(double v, String plain) {
        return v < 0 || (v == 0 && 1 / v < 0) ? "-" + plain : plain;
    }

    /** k thousandths as plain text: "12.5" (trailing zeros stripped) or "12.500". */
    private static String withThousandths(long k, boolean strip) {
        long a = Math.abs(k);
        long whole = a / 1000;
        int frac = (int) (a % 1000);
        StringBuilder b = new StringBuilder(24);
        if (k < 0) b.append('-');
        b.append(whole);
        if (strip && frac == 0) return b.toString();
        b.append('.');
        int digits = 3;
        if (strip) while (frac % 10 == 0) { frac /= 10; digits--; }
        String f = Integer.toString(frac);
        for (int i = f.length(); i < digits; i++) b.append('0');
        return b.append(f).toString();
    }

    /** The shortest decimal form of a finite value (Double.toString's) rounded half up to three decimals. */
    private static BigDecimal threeDecimals(double v) {
        return new BigDecimal(Double.toString(v)).setScale(3, RoundingMode.HALF_UP);
    }
}
