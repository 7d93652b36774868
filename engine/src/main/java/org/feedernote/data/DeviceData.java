package org.feedernote.data;

import java.util.List;

import org.feedernote.model.Curve;
import org.feedernote.trace.Step;

/**
 * Lookups of protective-device characteristics from the product standards: the time-current bands
 * of MCBs and RCBOs, the class 3 let-through energy, the operating currents and gates of gG fuses,
 * the tolerances of MCCB releases and the operating times of RCDs. Each returns a step naming the
 * table, row and column, and whether the value was confirmed by a published copy or recalled.
 */
public final class DeviceData {
    private final ReferenceTable mcb;
    private final ReferenceTable letThrough;
    private final ReferenceTable fuseZs;
    private final ReferenceTable fuseGates;
    private final ReferenceTable mccb;
    private final ReferenceTable rcd;

    public DeviceData(ReferenceData data) {
        this.mcb = data.table("mcb-time-current.csv");
        this.letThrough = data.table("mcb-let-through.csv");
        this.fuseZs = data.table("gg-fuse-disconnection.csv");
        this.fuseGates = data.table("gg-fuse-gates.csv");
        this.mccb = data.table("mccb-releases.csv");
        this.rcd = data.table("rcd-operating-times.csv");
    }

    // --- MCB and RCBO: IEC 60898-1 Table 7 ------------------------------------------------------

    /**
     * The upper limit m of the instantaneous tripping range (B 5, C 10, D 20): a current of at
     * least m·I_n operates the breaker within 0.1 s.
     */
    public Step.Lookup instantaneousUpperMultiple(String id, Curve curve) {
        return mcbRow(id, "Upper limit of the instantaneous tripping range (operation within 0.1 s)", "m",
                "instantaneous_upper_multiple", curve);
    }

    /** The lower limit of the instantaneous tripping range (B 3, C 5, D 10): below it the breaker does not trip within 0.1 s. */
    public Step.Lookup instantaneousLowerMultiple(String id, Curve curve) {
        return mcbRow(id, "Lower limit of the instantaneous tripping range (no tripping within 0.1 s)", "m_low",
                "instantaneous_lower_multiple", curve);
    }

    /** The time within which a current at or above the instantaneous upper limit operates the breaker (0.1 s). */
    public Step.Lookup instantaneousTime(String id, Curve curve) {
        return Provenance.lookup(mcb, id, "Operating time at the upper limit of the instantaneous range", "t", "s",
                "instantaneous_time_s", curve.token(), "test e (upper limit of the instantaneous range)", "type " + curve.token());
    }

    /** The conventional tripping current as a multiple of I_n (1.45). */
    public Step.Lookup conventionalTrippingMultiple(String id, Curve curve) {
        return mcbRow(id, "Conventional tripping current", "k_2", "tripping_multiple", curve);
    }

    /** The conventional non-tripping current as a multiple of I_n (1.13). */
    public Step.Lookup conventionalNonTrippingMultiple(String id, Curve curve) {
        return mcbRow(id, "Conventional non-tripping current", "k_1", "non_tripping_multiple", curve);
    }

    private Step.Lookup mcbRow(String id, String title, String symbol, String row, Curve curve) {
        return Provenance.lookup(mcb, id, title, symbol, "", row, curve.token(), row.replace('_', ' '), "type " + curve.token());
    }

    // --- Energy-limiting class 3: BS EN 60898-1 Annex ZA -----------------------------------------

    /**
     * The class 3 let-through energy of a type B or C breaker up to 32 A at the prospective current
     * {@code prospectiveA}, or null where the table does not cover the device (type D, above 32 A)
     * or the current (above the last row, 10 kA). Between rows the limit is interpolated linearly
     * in the prospective current. At or below the first row (3 kA) the first row's limit is used:
     * the let-through energy of a current-limiting breaker rises with the prospective current, so
     * the limit at 3 kA bounds it at lower currents (common practice, no source); the caller must
     * first have shown that the current is in the instantaneous range, where the limits apply.
     */
    public Step.Lookup classThreeLetThrough(String id, Curve curve, double ratingA, double prospectiveA) {
        if (curve == null || curve == Curve.D || ratingA > 32) return null;
        String column = curve.token() + (ratingA <= 16 ? "16" : "32");
        String label = "type " + curve.token() + (ratingA <= 16 ? ", up to 16 A" : ", above 16 A up to 32 A");
        String title = "Let-through energy, energy-limiting class 3";
        List<String> rows = letThrough.rowKeys();
        String first = rows.get(0);
        if (prospectiveA > Double.parseDouble(rows.get(rows.size() - 1)) + 1e-9) return null;
        if (prospectiveA <= Double.parseDouble(first)) {
            return new Step.Lookup(id, title, "I²t", letThrough.value(first, column), "A²s", letThrough.cellRef(first, column),
                    first + " A (prospective " + amps(prospectiveA) + " A, at or below the first row)", label,
                    "the first row's limit, which bounds the let-through at lower prospective currents (it rises with the current); "
                            + Provenance.method(letThrough, first, column), List.of());
        }
        for (int i = 1; i < rows.size(); i++) {
            double lo = Double.parseDouble(rows.get(i - 1));
            double hi = Double.parseDouble(rows.get(i));
            if (Math.abs(prospectiveA - hi) <= 1e-9) {
                return Provenance.lookup(letThrough, id, title, "I²t", "A²s", rows.get(i), column, rows.get(i) + " A", label);
            }
            if (prospectiveA < hi) {
                double vlo = letThrough.value(rows.get(i - 1), column);
                double vhi = letThrough.value(rows.get(i), column);
                double v = vlo + (vhi - vlo) * (prospectiveA - lo) / (hi - lo);
                boolean recalled = Provenance.recalled(letThrough, rows.get(i - 1), column)
                        || Provenance.recalled(letThrough, rows.get(i), column);
                return new Step.Lookup(id, title, "I²t", v, "A²s", recalled ? letThrough.ref() : letThrough.cellRef(rows.get(i), column),
                        rows.get(i - 1) + " to " + rows.get(i) + " A (prospective " + amps(prospectiveA) + " A)", label,
                        "interpolated linearly in the prospective current between " + ReferenceData.sizeKey(vlo) + " and "
                                + ReferenceData.sizeKey(vhi) + " A²s; " + (recalled ? "from memory (no published copy seen)"
                                : "checked against a published copy (see the table's notes)"), List.of());
            }
        }
        return null;
    }

    // --- gG fuses: BS 7671 Tables 41.2 and 41.4, IEC 60269-1 Tables 2 and 3 -----------------------

    /**
     * The current that operates a gG fuse within {@code seconds} (0.4 or 5), I_a = U_0/Z_s,max from
     * the wiring regulations' maximum Z_s, or null where the table has no value for that fuse and time.
     */
    public Step.Lookup fuseOperatingCurrent(String id, FuseSystem system, double ratingA, double seconds) {
        return fuseCell(id, "Current that operates the fuse within the time (I_a = U_0/Z_s,max, U_0 = 230 V)", "I_a", "A",
                system, ratingA, seconds, "ia");
    }

    /** The tabulated maximum earth fault loop impedance for the fuse and time (U_0 = 230 V), or null where there is none. */
    public Step.Lookup fuseMaxLoopImpedance(String id, FuseSystem system, double ratingA, double seconds) {
        return fuseCell(id, "Maximum earth fault loop impedance (U_0 = 230 V)", "Z_s,max", "Ω", system, ratingA, seconds, "zs");
    }

    private Step.Lookup fuseCell(String id, String title, String symbol, String unit, FuseSystem system, double ratingA,
                                 double seconds, String prefix) {
        String column = seconds == 0.4 ? prefix + "_04" : seconds == 5 ? prefix + "_5" : null;
        String row = system.token() + "/" + ReferenceData.sizeKey(ratingA);
        if (column == null || fuseZs.value(row, column) == null) return null;
        return Provenance.lookup(fuseZs, id, title, symbol, unit, row, column,
                (system == FuseSystem.BS88_2 ? "BS 88-2 (systems E and G) " : "BS 88-3 (system C) ") + ReferenceData.sizeKey(ratingA) + " A",
                "disconnection within " + ReferenceData.sizeKey(seconds) + " s");
    }

    /** The gates of a gG fuse-link's pre-arcing characteristic (IEC 60269-1 Table 3). */
    public enum Gate {
        MIN_10S("imin_10s", "I_min(10 s)", "not melted within 10 s"),
        MAX_5S("imax_5s", "I_max(5 s)", "melted within 5 s"),
        MIN_01S("imin_01s", "I_min(0.1 s)", "not melted within 0.1 s"),
        MAX_01S("imax_01s", "I_max(0.1 s)", "melted within 0.1 s");

        final String column;
        final String symbol;
        final String meaning;
        Gate(String column, String symbol, String meaning) { this.column = column; this.symbol = symbol; this.meaning = meaning; }
    }

    /** A gate current of a gG fuse-link of 16 A to 630 A (A); a rating the table lacks is a {@link DataGapException}. */
    /** Whether the gates table has the rating. */
    public boolean hasFuseGates(double ratingA) {
        return fuseGates.value(ReferenceData.sizeKey(ratingA), Gate.MAX_01S.column) != null;
    }

    public Step.Lookup fuseGate(String id, double ratingA, Gate gate) {
        return Provenance.lookup(fuseGates, id, "Gate current of the gG pre-arcing characteristic (" + gate.meaning + ")", gate.symbol, "A",
                ReferenceData.sizeKey(ratingA), gate.column, ReferenceData.sizeKey(ratingA) + " A gG", gate.symbol);
    }

    /** The conventional fusing current of a gG fuse-link as a multiple of I_n (1.6 from 16 A). */
    public Step.Lookup fuseConventionalFusingMultiple(String id, double ratingA) {
        return Provenance.lookup(fuseGates, id, "Conventional fusing current", "k_f", "", ReferenceData.sizeKey(ratingA), "k_f",
                ReferenceData.sizeKey(ratingA) + " A gG", "I_f/I_n");
    }

    // --- MCCB: IEC 60947-2 -----------------------------------------------------------------------

    /** The tolerance of the instantaneous release on its setting (0.2, i.e. ±20 %): operation is certain from (1 + 0.2)·I_i. */
    public Step.Lookup mccbInstantaneousTolerance(String id) {
        return Provenance.lookup(mccb, id, "Tolerance of the instantaneous release on its setting", "δ_i", "", "instantaneous_tolerance",
                "value", "instantaneous release", "tolerance");
    }

    /** The conventional tripping current of the inverse-time release as a multiple of its setting (1.30). */
    public Step.Lookup mccbConventionalTrippingMultiple(String id) {
        return Provenance.lookup(mccb, id, "Conventional tripping current of the inverse-time release", "k_2", "", "tripping_multiple",
                "value", "inverse-time release", "I_2/I_r");
    }

    /** The conventional non-tripping current of the inverse-time release as a multiple of its setting (1.05). */
    public Step.Lookup mccbConventionalNonTrippingMultiple(String id) {
        return Provenance.lookup(mccb, id, "Conventional non-tripping current of the inverse-time release", "k_1", "",
                "non_tripping_multiple", "value", "inverse-time release", "I_1/I_r");
    }

    // --- RCD: IEC 61008-1 / IEC 61009-1 Table 1 --------------------------------------------------

    /** The residual current at which an RCD time is tabulated. */
    public enum Residual {
        ONE("t_1", "I_Δn"), TWO("t_2", "2 I_Δn"), FIVE("t_5", "5 I_Δn"), HIGH("t_high", "5 A to 500 A");

        final String column;
        final String label;
        Residual(String column, String label) { this.column = column; this.label = label; }
    }

    /** The maximum break time (s) of a general (undelayed) or type S (time-delayed) RCD at the residual current. */
    public Step.Lookup rcdMaximumBreakTime(String id, boolean typeS, Residual residual) {
        String row = typeS ? "s/max" : "general/max";
        return Provenance.lookup(rcd, id, "Maximum break time of the RCD", "t_Δ,max", "s", row, residual.column,
                typeS ? "type S (time-delayed)" : "general type", residual.label);
    }

    /** The minimum non-actuating time (s) of a type S RCD at the residual current. */
    public Step.Lookup rcdMinimumNonActuatingTime(String id, Residual residual) {
        return Provenance.lookup(rcd, id, "Minimum non-actuating time of the type S RCD", "t_Δ,min", "s", "s/min_non_actuating",
                residual.column, "type S (time-delayed)", residual.label);
    }

    private static String amps(double v) {
        return ReferenceData.sizeKey(Math.round(v * 10) / 10.0);
    }
}
