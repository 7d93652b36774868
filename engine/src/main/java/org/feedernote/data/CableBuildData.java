package org.feedernote.data;

import org.feedernote.model.Insulation;
import org.feedernote.trace.Step;

/**
 * Lookups of cable builds for the protective-conductor checks: the cpc of flat twin and earth
 * cables, the steel wire armour of multicore cables, and the k factors of metal layers and of the
 * line conductors of further insulations.
 */
public final class CableBuildData {
    private final ReferenceTable twinEarth;
    private final ReferenceTable armour;
    private final ReferenceTable kLayers;

    public CableBuildData(ReferenceData data) {
        this.twinEarth = data.table("twin-earth-cpc.csv");
        this.armour = data.table("armour-steel-wire.csv");
        this.kLayers = data.table("k-protective-layers.csv");
    }

    /** The largest flat twin and earth cable in the table (BS 6004), line conductor mm². */
    public static final double TWIN_AND_EARTH_LARGEST_MM2 = 16;

    /** The cpc of a flat twin and earth cable (mm²) without a step, or null where no such cable has that line size. */
    public Double twinAndEarthCpcMm2(double lineMm2) {
        return twinEarth.value(ReferenceData.sizeKey(lineMm2), "cpc_mm2");
    }

    /** The nominal area of the cpc of a flat twin and earth cable (mm²), or null where no such cable has that line size. */
    public Step.Lookup twinAndEarthCpc(String id, double lineMm2) {
        String row = ReferenceData.sizeKey(lineMm2);
        if (twinEarth.value(row, "cpc_mm2") == null) return null;
        return Provenance.lookup(twinEarth, id, "Circuit protective conductor of the flat twin and earth cable", "S_PE", "mm²", row,
                "cpc_mm2", row + " mm² twin and earth", "cpc");
    }

    /** Whether the armour table gives the gross cross-section of a cable of this size and number of cores. */
    public boolean hasArmourArea(double sizeMm2, int cores) {
        return armour.value(ReferenceData.sizeKey(sizeMm2), "area_" + cores + "c") != null;
    }

    /** The gross cross-section of the steel wire armour (mm²); a cell the table lacks is a {@link DataGapException}. */
    public Step.Lookup armourArea(String id, double sizeMm2, int cores) {
        String row = ReferenceData.sizeKey(sizeMm2);
        return Provenance.lookup(armour, id, "Gross cross-section of the steel wire armour", "S_a", "mm²", row, "area_" + cores + "c",
                row + " mm², copper, XLPE (BS 5467)", cores + "-core");
    }

    /** Whether the armour table gives the armour resistance of a cable of this size and number of cores. */
    public boolean hasArmourResistance(double sizeMm2, int cores) {
        return armour.value(ReferenceData.sizeKey(sizeMm2), "r20_" + cores + "c") != null;
    }

    /** The maximum resistance of the steel wire armour at 20 °C (Ω/km); a cell the table lacks is a {@link DataGapException}. */
    public Step.Lookup armourResistance20(String id, double sizeMm2, int cores) {
        String row = ReferenceData.sizeKey(sizeMm2);
        return Provenance.lookup(armour, id, "Resistance of the steel wire armour at 20 °C", "R_a,20", "Ω/km", row, "r20_" + cores + "c",
                row + " mm², copper, XLPE (BS 5467)", cores + "-core");
    }

    /** The metal of a cable's sheath or armour used as protective conductor. */
    public enum Metal {
        STEEL("steel"), ALUMINIUM("aluminium"), LEAD("lead"), COPPER("copper");

        final String token;
        Metal(String token) { this.token = token; }
    }

    /** k of a cable's sheath or armour as protective conductor, for a cable of 70 °C PVC or 90 °C XLPE insulation. */
    public Step.Lookup metalLayerK(String id, Metal metal, Insulation insulation) {
        return layer(id, metal, insulation, "k", "k factor of the sheath or armour as protective conductor", "k", "A·√s/mm²");
    }

    /** The initial temperature of a cable's sheath or armour for its k (°C). */
    public Step.Lookup metalLayerInitialTemperature(String id, Metal metal, Insulation insulation) {
        return layer(id, metal, insulation, "theta_i", "Initial temperature of the sheath or armour", "θ_i", "°C");
    }

    /** The final temperature of a cable's sheath or armour for its k (°C). */
    public Step.Lookup metalLayerFinalTemperature(String id, Metal metal, Insulation insulation) {
        return layer(id, metal, insulation, "theta_f", "Final temperature of the sheath or armour", "θ_f", "°C");
    }

    private Step.Lookup layer(String id, Metal metal, Insulation insulation, String column, String title, String symbol, String unit) {
        String ins = insulation == Insulation.PVC ? "pvc70" : "xlpe90";
        return Provenance.lookup(kLayers, id, title, symbol, unit, "armour/" + metal.token + "/" + ins, column,
                metal.token + " sheath or armour", insulation == Insulation.PVC ? "70 °C thermoplastic cable" : "90 °C thermosetting cable");
    }

    /**
     * A row of the k table by its key ("conduit/steel/pvc70", "line/copper/pvc90", "line/copper/rubber60",
     * "line/copper/mi-bare" ...) and column ("k", "k_over_300", "theta_i", "theta_f"); a cell the table
     * lacks is a {@link DataGapException}.
     */
    public Step.Lookup kTable(String id, String key, String column, String title, String symbol, String unit) {
        return Provenance.lookup(kLayers, id, title, symbol, unit, key, column, key, column);
    }
}
