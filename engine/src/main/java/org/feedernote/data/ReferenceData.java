package org.feedernote.data;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;

import org.feedernote.model.Conductor;
import org.feedernote.model.Insulation;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.TableRef;
import org.feedernote.trace.Trace;

/**
 * The reference tables the engine uses, read once from the packaged resources. Immutable; the
 * lookups return trace steps that name table, row and column.
 */
public final class ReferenceData {
    static final List<String> TABLE_FILES = List.of("conductor-resistance.csv", "conductor-materials.csv",
            "insulation-temperatures.csv", "insulation-thickness.csv", "capacity-pvc-2.csv", "capacity-pvc-3.csv",
            "capacity-xlpe-2.csv", "capacity-xlpe-3.csv", "capacity-pvc-efg.csv", "capacity-xlpe-efg.csv",
            "capacity-pvc-efg-aluminium.csv", "capacity-xlpe-efg-aluminium.csv",
            "ambient-air.csv", "ambient-ground.csv", "grouping.csv", "grouping-ground.csv", "soil-resistivity.csv",
            "thermal-insulation.csv", "harmonics.csv", "devices.csv", "adiabatic.csv",
            "mcb-time-current.csv", "mcb-let-through.csv", "rcd-operating-times.csv", "gg-fuse-disconnection.csv",
            "gg-fuse-gates.csv", "twin-earth-cpc.csv", "conductor-wires.csv", "stranding-inductance.csv",
            "drop-pvc-single-core.csv", "drop-xlpe-single-core.csv", "drop-pvc-multicore.csv", "drop-xlpe-multicore.csv");

    /**
     * Tables read and looked up ({@link DeviceData}, {@link CableBuildData}) but not yet used by the
     * calculation. They are left out of {@link #version()} so that adding them changes no note's
     * fingerprint; when the calculation starts citing one, move it to {@link #TABLE_FILES} (a
     * deliberate change of the fingerprint and of the golden files).
     */
    static final List<String> NOT_YET_CALCULATED_FILES = List.of("mccb-releases.csv",
            "armour-steel-wire.csv", "k-protective-layers.csv");

    private final java.util.Map<String, ReferenceTable> byFile = new java.util.LinkedHashMap<>();
    private final ReferenceTable resistance;
    private final ReferenceTable materials;
    private final ReferenceTable temperatures;
    private final ReferenceTable thickness;
    private final ReferenceTable wires;
    private final ReferenceTable stranding;
    private final List<ReferenceTable> all;

    private ReferenceData() {
        for (String f : TABLE_FILES) byFile.put(f, ReferenceTable.resource(f));
        all = List.copyOf(byFile.values());
        for (String f : NOT_YET_CALCULATED_FILES) byFile.put(f, ReferenceTable.resource(f));
        resistance = byFile.get("conductor-resistance.csv");
        materials = byFile.get("conductor-materials.csv");
        temperatures = byFile.get("insulation-temperatures.csv");
        thickness = byFile.get("insulation-thickness.csv");
        wires = byFile.get("conductor-wires.csv");
        stranding = byFile.get("stranding-inductance.csv");
    }

    ReferenceTable table(String file) {
        ReferenceTable t = byFile.get(file);
        if (t == null) throw new IllegalStateException("no reference table " + file);
        return t;
    }

    private static final class Holder {
        static final ReferenceData INSTANCE = new ReferenceData();
    }

    /** The packaged reference data (immutable, loaded on first use). */
    public static ReferenceData standard() {
        return Holder.INSTANCE;
    }

    /** The tables the calculation uses, which {@link #version()} hashes. */
    public List<ReferenceTable> tables() { return all; }

    /** The tables read for lookups the calculation does not make yet (not in {@link #version()}). */
    public List<ReferenceTable> notYetCalculatedTables() {
        return NOT_YET_CALCULATED_FILES.stream().map(byFile::get).toList();
    }

    public List<TableRef> refs() { return all.stream().map(ReferenceTable::ref).toList(); }

    /** The IEC 60228 nominal cross-sections the program accepts, in mm². */
    public static List<Double> standardSizes() {
        return standard().resistance.rowKeys().stream().map(Double::parseDouble).toList();
    }

    public boolean hasResistance(Conductor conductor, double sizeMm2) {
        return resistance.value(sizeKey(sizeMm2), conductor.token()) != null;
    }

    /** The keys of the common sizes, made once: the sizing asks for them hundreds of thousands of times. */
    private static final double[] COMMON_SIZES = {0.5, 0.75, 1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240,
            300, 400, 500, 630, 800, 1000};
    private static final String[] COMMON_KEYS = java.util.Arrays.stream(COMMON_SIZES).mapToObj(ReferenceData::key).toArray(String[]::new);

    /** A size as the tables' rows name it: "2.5", "16". */
    public static String sizeKey(double mm2) {
        for (int i = 0; i < COMMON_SIZES.length; i++) if (COMMON_SIZES[i] == mm2) return COMMON_KEYS[i];
        return key(mm2);
    }

    private static String key(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }

    /** {@link #resistance20(String, Conductor, double)} as the quantity owner + step, recorded in t (see {@link ReferenceTable#quantity}). */
    public Q resistance20(Trace t, String owner, String step, Conductor conductor, double sizeMm2) {
        return resistance.quantity(t, owner, step, "R_20", "Ω/km", sizeKey(sizeMm2), conductor.token(),
                () -> resistance20(owner + step, conductor, sizeMm2));
    }

    public Step.Lookup resistance20(String stepId, Conductor conductor, double sizeMm2) {
        return resistance.lookup(stepId, "Conductor resistance at 20 °C", "R_20", "Ω/km", sizeKey(sizeMm2), conductor.token(),
                sizeKey(sizeMm2) + " mm²", "class 2, " + (conductor == Conductor.COPPER ? "plain copper" : "aluminium"));
    }

    /** {@link #alpha20(String, Conductor)} as the quantity owner + step, recorded in t. */
    public Q alpha20(Trace t, String owner, String step, Conductor conductor) {
        return materials.quantity(t, owner, step, "α_20", "1/K", conductor.token(), "alpha20", () -> alpha20(owner + step, conductor));
    }

    public Step.Lookup alpha20(String stepId, Conductor conductor) {
        return materials.lookup(stepId, "Temperature coefficient of resistance at 20 °C", "α_20", "1/K",
                conductor.token(), "alpha20", conductor.token(), "α_20");
    }

    public Step.Lookup skinCoefficient(String stepId, Conductor conductor) {
        return materials.lookup(stepId, "Skin effect coefficient", "k_s", "", conductor.token(), "ks",
                conductor.token() + ", round stranded", "k_s");
    }

    public Step.Lookup proximityCoefficient(String stepId, Conductor conductor) {
        return materials.lookup(stepId, "Proximity effect coefficient", "k_p", "", conductor.token(), "kp",
                conductor.token() + ", round stranded", "k_p");
    }

    /** {@link #maxTemperature(String, Insulation)} as the quantity owner + step, recorded in t. */
    public Q maxTemperature(Trace t, String owner, String step, Insulation insulation) {
        return temperatures.quantity(t, owner, step, "θ_max", "°C", insulation.token(), "theta_max",
                () -> maxTemperature(owner + step, insulation));
    }

    public Step.Lookup maxTemperature(String stepId, Insulation insulation) {
        return temperatures.lookup(stepId, "Maximum conductor temperature", "θ_max", "°C", insulation.token(), "theta_max",
                insulation == Insulation.PVC ? "PVC (thermoplastic)" : "XLPE (thermosetting)", "normal operation");
    }

    /** {@link #insulationThickness(String, Insulation, double)} as the quantity owner + step, recorded in t. */
    public Q insulationThickness(Trace t, String owner, String step, Insulation insulation, double sizeMm2) {
        return thickness.quantity(t, owner, step, "t_i", "mm", sizeKey(sizeMm2), insulation.token(),
                () -> insulationThickness(owner + step, insulation, sizeMm2));
    }

    public Step.Lookup insulationThickness(String stepId, Insulation insulation, double sizeMm2) {
        return thickness.lookup(stepId, "Insulation thickness", "t_i", "mm", sizeKey(sizeMm2), insulation.token(),
                sizeKey(sizeMm2) + " mm²", insulation == Insulation.PVC ? "PVC/A" : "XLPE");
    }

    /** {@link #wireCount(String, double)} as the quantity owner + step, recorded in t. */
    public Q wireCount(Trace t, String owner, String step, double sizeMm2) {
        return wires.quantity(t, owner, step, "n_w", "", sizeKey(sizeMm2), "wires", () -> wireCount(owner + step, sizeMm2));
    }

    public Step.Lookup wireCount(String stepId, double sizeMm2) {
        return wires.lookup(stepId, "Number of wires in the conductor", "n_w", "", sizeKey(sizeMm2), "wires",
                sizeKey(sizeMm2) + " mm²", "circular, not compacted");
    }

    /** {@link #strandingConstant(String, Q)} as the quantity owner + step, recorded in t. */
    public Q strandingConstant(Trace t, String owner, String step, Q wireCount) {
        String row = sizeKey(wireCount.value());
        return stranding.quantity(t, owner, step, "K", "mH/km", row, "k", () -> strandingConstant(owner + step, wireCount));
    }

    public Step.Lookup strandingConstant(String stepId, Q wireCount) {
        String row = sizeKey(wireCount.value());
        Step.Lookup s = stranding.lookup(stepId, "Inductance constant of the conductor", "K", "mH/km", row, "k",
                row + (row.equals("1") ? " wire (solid)" : " wires"), "K");
        return new Step.Lookup(s.result(), s.title(), s.table(), s.row(), s.column(), s.method(), List.of(wireCount.id()));
    }

    /** The file of the BS 7671 Appendix 4 voltage-drop table (mV/A/m) of a copper cable of this insulation and type. */
    public static String dropTableFile(Insulation insulation, boolean multicore) {
        return "drop-" + insulation.token() + (multicore ? "-multicore.csv" : "-single-core.csv");
    }

    /** The reference of a voltage-drop table, for naming it in a decision or a data gap. */
    public TableRef dropTableRef(String file) {
        return table(file).ref();
    }

    /** Whether the voltage-drop table holds a figure in this cell (up to 16 mm² it prints r alone). */
    public boolean hasDropFigure(String file, double sizeMm2, String column) {
        return table(file).value(sizeKey(sizeMm2), column) != null;
    }

    /**
     * A voltage-drop figure (mV/A/m) read from the table file at the size's row and the column, as the
     * quantity owner + step, recorded in t with the table, row and column and whether the cell is
     * recalled; a cell the table lacks is a {@link DataGapException} naming the table.
     */
    public Q dropPerAmpereMetre(Trace t, String owner, String step, String title, String symbol, String file, double sizeMm2,
                                String column, String columnLabel) {
        ReferenceTable tab = table(file);
        String row = sizeKey(sizeMm2);
        return tab.quantity(t, owner, step, symbol, "mV/A/m", row, column,
                () -> Provenance.lookup(tab, owner + step, title, symbol, "mV/A/m", row, column, row + " mm²", columnLabel));
    }

    /**
     * SHA-256 over the tables: their provenance (source, edition, table, title, notes, the "from
     * memory" flag) and every value. Changes whenever any of them changes, so a note's fingerprint
     * names the reference data it was calculated and cited with.
     */
    public String version() {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            for (ReferenceTable t : all) {
                md.update(t.ref().toString().getBytes(StandardCharsets.UTF_8));
                for (String row : t.rowKeys()) {
                    for (String col : t.columns()) {
                        String cell = t.text(row, col);
                        md.update((row + "|" + col + "|" + cell + "\n").getBytes(StandardCharsets.UTF_8));
                    }
                }
            }
            return HexFormat.of().formatHex(md.digest()).substring(0, 16);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
