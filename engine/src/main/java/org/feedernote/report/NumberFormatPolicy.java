package org.feedernote.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

import org.feedernote.formula.Units;

/**
 * The one rounding policy of the note and the terminal: a precision per unit, a thin space
 * between thousands, a decimal point. Values stay unrounded in the trace; only views round.
 */
public final class NumberFormatPolicy {
    public static final String THIN_SPACE = "\u2009";

    private NumberFormatPolicy() {}

    /** Decimal places for a unit, or -1 where the unit is shown to significant figures. */
    private static int decimals(String unit) {
        switch (unit) {
            case Units.A: return 1;
            case Units.V: return 2;
            case Units.PERCENT: return 2;
            case Units.KW: case Units.KVAR: case Units.KVA: return 2;
            case Units.KA: return 2;
            case Units.MM: return 2;
            case Units.DEG_C: return 1;
            default: return -1;
        }
    }

    private static int significant(String unit) {
        switch (unit) {
            case Units.OHM_PER_KM: case Units.OHM: case Units.MV_PER_AM: case Units.MH_PER_KM: return 3;
            case Units.PER_K: return 3;
            default: return 3;
        }
    }

    /** The number alone, rounded per its unit. */
    public static String number(double value, String unit) {
        if (Units.M.equals(unit) || Units.MM2.equals(unit) || Units.HZ.equals(unit) || Units.S.equals(unit)) {
            return group(trimmed(BigDecimal.valueOf(value).setScale(3, RoundingMode.HALF_UP)));
        }
        int places = decimals(unit);
        BigDecimal bd;
        if (places >= 0) {
            bd = BigDecimal.valueOf(value).setScale(places, RoundingMode.HALF_UP);
            if (Units.DEG_C.equals(unit)) return group(trimmed(bd));
            return group(bd.toPlainString());
        }
        if (value == 0) return "0";
        bd = new BigDecimal(value).round(new MathContext(significant(unit), RoundingMode.HALF_UP));
        if (Units.NONE.equals(unit)) return group(trimmed(bd));
        return group(bd.toPlainString());
    }

    /** A value as the designer wrote it: up to six significant figures, trailing zeros dropped. */
    public static String given(double value, String unit) {
        String n = group(trimmed(new BigDecimal(value).round(new MathContext(6, RoundingMode.HALF_UP))));
        return unit.isEmpty() ? n : n + " " + unit;
    }

    /** The number with its unit, as it appears in substituted working. */
    public static String quantity(double value, String unit) {
        String n = number(value, unit);
        return unit.isEmpty() ? n : n + " " + unit;
    }

    /**
     * To the significant figures given, trailing zeros dropped: a computed value set beside a
     * published one (the self-verification), where the unit's usual rounding could hide the difference.
     */
    public static String significant(double value, int figures) {
        if (value == 0) return "0";
        if (!Double.isFinite(value)) return "—";
        return group(trimmed(new BigDecimal(value).round(new MathContext(figures, RoundingMode.HALF_UP))));
    }

    private static String trimmed(BigDecimal bd) {
        String s = bd.stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    private static String group(String plain) {
        boolean negative = plain.startsWith("-");
        String body = negative ? plain.substring(1) : plain;
        int dot = body.indexOf('.');
        String whole = dot < 0 ? body : body.substring(0, dot);
        String frac = dot < 0 ? "" : body.substring(dot);
        if (whole.length() <= 4) return (negative ? "−" : "") + whole + frac;
        StringBuilder b = new StringBuilder();
        int lead = whole.length() % 3;
        if (lead > 0) b.append(whole, 0, lead);
        for (int i = lead; i < whole.length(); i += 3) {
            if (b.length() > 0) b.append(THIN_SPACE);
            b.append(whole, i, i + 3);
        }
        return (negative ? "−" : "") + b + frac;
    }
}
