package org.feedernote.data;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.feedernote.model.Arrangement;
import org.feedernote.model.CableType;
import org.feedernote.model.Conductor;
import org.feedernote.model.DeviceKind;
import org.feedernote.model.Formation;
import org.feedernote.model.Insulation;
import org.feedernote.model.Method;
import org.feedernote.trace.Q;
import org.feedernote.trace.Step;
import org.feedernote.trace.TableRef;
import org.feedernote.trace.Trace;

/**
 * Lookups for current-carrying capacity (IEC 60364-5-52 Annex B), its correction factors and the
 * protective devices. Where a table is entered at the next higher row (ambient, grouping,
 * resistivity, length), the step says so: that choice is on the safe side.
 */
public final class CapacityData {
    private static final String NEXT_HIGHER = "next higher tabulated row (on the safe side)";
    private final ReferenceData data;
    private final ReferenceTable devices;

    public CapacityData(ReferenceData data) {
        this.data = data;
        this.devices = data.table("devices.csv");
    }

    /** The column of the capacity tables for a cable and method, or a data gap. */
    public Step.Lookup tabulated(String id, Insulation insulation, Conductor conductor, Method method, int loaded,
                                 CableType type, Formation formation, double size) {
        return tabulated(id, insulation, conductor, method, loaded, type, formation, false, size);
    }

    /** @param vertical for method G: single-core cables spaced vertically rather than horizontally */
    public Step.Lookup tabulated(String id, Insulation insulation, Conductor conductor, Method method, int loaded,
                                 CableType type, Formation formation, boolean vertical, double size) {
        Column c = column(insulation, conductor, method, loaded, formation, vertical);
        String row = ReferenceData.sizeKey(size);
        return c.table().lookup(id, "Tabulated current-carrying capacity", "I_t", "A", row, c.column(), row + " mm²", c.label());
    }

    /** {@link #tabulated} as the quantity owner + step, recorded in t (see {@link ReferenceTable#quantity}). */
    public Q tabulated(Trace t, String owner, String step, Insulation insulation, Conductor conductor, Method method, int loaded,
                       CableType type, Formation formation, boolean vertical, double size) {
        Column c = column(insulation, conductor, method, loaded, formation, vertical);
        return c.table().quantity(t, owner, step, "I_t", "A", ReferenceData.sizeKey(size), c.column(),
                () -> tabulated(owner + step, insulation, conductor, method, loaded, type, formation, vertical, size));
    }

    /** The table and column of a cable and method, and the column in words. */
    private record Column(ReferenceTable table, String column, String label) {}

    /** equals and hashCode written out, as the sizing's other lookup keys (see TermFormulas). */
    private record ColumnKey(Insulation insulation, Conductor conductor, Method method, int loaded, Formation formation,
                             boolean vertical) {
        @Override public boolean equals(Object o) {
            return o instanceof ColumnKey k && insulation == k.insulation && conductor == k.conductor && method == k.method
                    && loaded == k.loaded && formation == k.formation && vertical == k.vertical;
        }

        @Override public int hashCode() {
            return ((((insulation.ordinal() * 31 + conductor.ordinal()) * 31 + method.ordinal()) * 31 + loaded) * 31
                    + (formation == null ? -1 : formation.ordinal())) * 2 + (vertical ? 1 : 0);
        }
    }

    /** Columns by cable and method: every sizing candidate looks one up. */
    private final java.util.Map<ColumnKey, Column> columns = new java.util.concurrent.ConcurrentHashMap<>();

    private Column column(Insulation insulation, Conductor conductor, Method method, int loaded, Formation formation, boolean vertical) {
        boolean v = vertical && method == Method.G;
        return columns.computeIfAbsent(new ColumnKey(insulation, conductor, method, loaded, formation, v),
                k -> columnOf(insulation, conductor, method, loaded, formation, v));
    }

    private Column columnOf(Insulation insulation, Conductor conductor, Method method, int loaded, Formation formation, boolean vertical) {
        String ins = insulation.token();
        ReferenceTable table;
        String column;
        String label;
        switch (method) {
            case E:
                // Method E of aluminium cables has its own table (IEC 60364-5-52 Table B.52.11 or B.52.13), so that
                // each cell cites the table it comes from.
                table = data.table("capacity-" + ins + "-efg" + (conductor == Conductor.ALUMINIUM ? "-aluminium" : "") + ".csv");
                column = conductor.token() + "_E" + loaded;
                label = "method E, multicore, " + loaded + " loaded conductors";
                break;
            case F:
                table = data.table("capacity-" + ins + "-efg.csv");
                if (loaded == 2) {
                    column = conductor.token() + "_F2";
                    label = "method F, single-core touching, 2 loaded conductors";
                } else if (formation == Formation.TREFOIL) {
                    column = conductor.token() + "_F3-trefoil";
                    label = "method F, single-core in trefoil, 3 loaded conductors";
                } else {
                    column = conductor.token() + "_F3-flat";
                    label = "method F, single-core flat touching, 3 loaded conductors";
                }
                break;
            case G:
                table = data.table("capacity-" + ins + "-efg.csv");
                column = conductor.token() + (vertical ? "_G-vertical" : "_G-horizontal");
                label = "method G, single-core spaced, " + (vertical ? "vertical" : "horizontal");
                break;
            default:
                table = data.table("capacity-" + ins + "-" + loaded + ".csv");
                column = conductor.token() + "_" + method.token();
                label = "method " + method.token() + ", " + loaded + " loaded conductors, " + conductor.token();
        }
        if (!table.columns().contains(column)) {
            throw new DataGapException(table.ref().citation() + " has no column for " + label
                    + " in the packaged data; give a copper cable or another method");
        }
        // Interned, as the table's column names are: every candidate's lookup finds it by identity.
        return new Column(table, column.intern(), label);
    }

    /** A column and a size (equals and hashCode written out, as ColumnKey's). */
    private record Coverage(ColumnKey column, double size) {
        @Override public boolean equals(Object o) {
            return o instanceof Coverage k && column.equals(k.column) && Double.compare(size, k.size) == 0;
        }

        @Override public int hashCode() {
            return column.hashCode() * 31 + Double.hashCode(size);
        }
    }

    /** Whether the capacity table has a value for the cable, method and size; asked once per combination. */
    private final java.util.concurrent.ConcurrentHashMap<Coverage, Boolean> covered = new java.util.concurrent.ConcurrentHashMap<>();

    public boolean covers(Insulation insulation, Conductor conductor, Method method, int loaded, Formation formation, boolean vertical,
                          double size) {
        return covered.computeIfAbsent(new Coverage(new ColumnKey(insulation, conductor, method, loaded, formation, vertical), size),
                k -> probe(insulation, conductor, method, loaded, formation, vertical, size));
    }

    private boolean probe(Insulation insulation, Conductor conductor, Method method, int loaded, Formation formation, boolean vertical,
                          double size) {
        try {
            tabulated("probe", insulation, conductor, method, loaded,
                    method == Method.E ? CableType.MULTICORE : CableType.SINGLE_CORE, formation, vertical, size);
            return true;
        } catch (DataGapException e) {
            return false;
        }
    }

    /** Where a next-higher lookup lands: asked for once per table, column and key (the sizing asks thousands of times). */
    private record Landing(String row, double value, String rowLabel, String method, org.feedernote.trace.TableRef ref) {}

    private static final class LandingKey {
        final ReferenceTable table;
        final String column;
        final double key;
        final String keyUnit;
        final String what;

        LandingKey(ReferenceTable table, String column, double key, String keyUnit, String what) {
            this.table = table;
            this.column = column;
            this.key = key;
            this.keyUnit = keyUnit;
            this.what = what;
        }

        @Override public boolean equals(Object o) {
            return o instanceof LandingKey k && k.table == table && Double.compare(k.key, key) == 0 && k.column.equals(column)
                    && k.keyUnit.equals(keyUnit) && k.what.equals(what);
        }

        @Override public int hashCode() {
            return (System.identityHashCode(table) * 31 + column.hashCode()) * 31 + Double.hashCode(key);
        }
    }

    private final java.util.Map<LandingKey, Landing> landings = new java.util.concurrent.ConcurrentHashMap<>();

    private Step.Lookup nextHigher(ReferenceTable table, String id, String title, String symbol, double key, String column,
                                   String keyUnit, String columnLabel, String what) {
        LandingKey k = new LandingKey(table, column, key, keyUnit, what);
        Landing landing = landings.get(k);
        if (landing == null) {
            Step.Lookup s = landingOf(table, id, title, symbol, key, column, keyUnit, columnLabel, what);
            landings.putIfAbsent(k, new Landing(s.row(), s.value(), s.row(), s.method(), s.table()));
            return s;
        }
        return new Step.Lookup(id, title, symbol, landing.value(), "", landing.ref(), landing.rowLabel(), columnLabel, landing.method(),
                List.of());
    }

    private Step.Lookup landingOf(ReferenceTable table, String id, String title, String symbol, double key, String column,
                                  String keyUnit, String columnLabel, String what) {
        List<String> rows = table.rowKeys();
        String chosen = null;
        for (String r : rows) {
            if (Double.parseDouble(r) >= key - 1e-9 && table.value(r, column) != null) {
                chosen = r;
                break;
            }
        }
        if (chosen == null) {
            throw new DataGapException(table.ref().citation() + " does not cover " + what + " = " + num(key) + " " + keyUnit
                    + " for " + columnLabel);
        }
        boolean exact = Math.abs(Double.parseDouble(chosen) - key) < 1e-9;
        Step.Lookup s = table.lookup(id, title, symbol, "", chosen, column, chosen + " " + keyUnit
                + (exact ? "" : " (" + what + " " + num(key) + " " + keyUnit + ")"), columnLabel);
        return new Step.Lookup(s.result(), s.title(), s.table(), s.row(), s.column(), exact ? "exact" : NEXT_HIGHER, s.uses());
    }

    private static String num(double v) {
        return ReferenceData.sizeKey(v);
    }

    public Step.Lookup ambientAir(String id, Insulation insulation, double ambient) {
        return nextHigher(data.table("ambient-air.csv"), id, "Correction for ambient air temperature", "C_a",
                Math.max(ambient, 10), insulation.token(), "°C", insulation.token().toUpperCase(Locale.ROOT), "θ_a");
    }

    public Step.Lookup ambientGround(String id, Insulation insulation, double ground) {
        return nextHigher(data.table("ambient-ground.csv"), id, "Correction for ground temperature", "C_a",
                Math.max(ground, 10), insulation.token(), "°C", insulation.token().toUpperCase(Locale.ROOT), "θ_a");
    }

    public Step.Lookup grouping(String id, Method method, Arrangement arrangement, int circuits) {
        if (method == Method.D1 || method == Method.D2) {
            return nextHigher(data.table("grouping-ground.csv"), id, "Reduction for grouping in the ground", "C_g",
                    circuits, method.token(), "circuits", method == Method.D1 ? "ducts touching" : "cables touching", "n");
        }
        boolean singleLayer = arrangement != Arrangement.BUNCHED;
        int n = singleLayer ? Math.min(circuits, 9) : circuits;
        return nextHigher(data.table("grouping.csv"), id, "Reduction for grouping", "C_g", n, arrangement.token(),
                "circuits", arrangement.token() + (singleLayer && circuits > 9 ? " (no further reduction beyond nine)" : ""), "n");
    }

    public Step.Lookup thermalInsulation(String id, double lengthMm) {
        return nextHigher(data.table("thermal-insulation.csv"), id, "Reduction for thermal insulation", "C_i",
                Math.min(lengthMm, 500), "factor", "mm", "surrounded length", "length");
    }

    public Step.Lookup soil(String id, Method method, double resistivity) {
        return nextHigher(data.table("soil-resistivity.csv"), id, "Correction for soil thermal resistivity", "C_s",
                resistivity, method.token(), "K·m/W", method == Method.D1 ? "buried ducts" : "direct in the ground", "ρ_T");
    }

    /** The harmonic band: factor, and whether the neutral current decides the size. */
    public record Harmonic(Step.Lookup factor, boolean neutralBasis) {}

    public Harmonic harmonic(String id, double percent) {
        ReferenceTable t = data.table("harmonics.csv");
        Step.Lookup s = nextHigher(t, id, "Reduction for third-harmonic currents", "C_h", Math.max(percent, 0.0001), "factor",
                "%", "third-harmonic content " + num(percent) + " %", "band up to");
        String band = s.row().split(" ")[0];
        return new Harmonic(s, "neutral".equals(t.text(band, "basis")));
    }

    private final java.util.Map<String, TableRef> deviceRefs = new java.util.concurrent.ConcurrentHashMap<>();

    /** The row of the devices table, with its own standard as the citation. */
    private TableRef deviceRef(DeviceKind kind, String column) {
        return deviceRefs.computeIfAbsent(kind.token() + "/" + column, k -> deviceRefOf(kind, column));
    }

    /** The row's reference as it holds for one column: recalled or confirmed, as the table's memory column says. */
    private TableRef deviceRefOf(DeviceKind kind, String column) {
        ReferenceTable t = data.table("devices.csv");
        String k = kind.token();
        return new TableRef("devices-" + k, "Conventional tripping current and standard ratings, " + k,
                t.text(k, "standard"), t.text(k, "edition"), t.text(k, "clause"), Provenance.recalled(t, k, column), t.ref().notes());
    }

    public Step.Lookup k2(String id, DeviceKind kind) {
        return new Step.Lookup(id, "Conventional tripping current factor", "k_2", devices.value(kind.token(), "k2"), "", deviceRef(kind, "k2"),
                kind.token(), "I_2 / I_n", "exact", List.of());
    }

    private final java.util.Map<DeviceKind, List<Double>> ratings = new java.util.concurrent.ConcurrentHashMap<>();

    public List<Double> ratings(DeviceKind kind) {
        // Read for every sizing candidate, from the threads that size side by side: no lock once made.
        return ratings.computeIfAbsent(kind, k -> {
            String text = data.table("devices.csv").text(k.token(), "ratings");
            return Arrays.stream(text.trim().split("\\s+")).map(Double::parseDouble).toList();
        });
    }

    /** The standard the table's ratings of a device kind come from (IEC 60898-1, …). */
    public String ratingsStandard(DeviceKind kind) {
        return devices.text(kind.token(), "standard");
    }

    /** The smallest standard rating at least the current, as a lookup step; a gap above the largest. */
    public Step.Lookup ratingAtLeast(String id, DeviceKind kind, double current) {
        List<Double> r = ratings(kind);
        for (double v : r) {
            if (v >= current - 1e-9) {
                return new Step.Lookup(id, "Rated current of the device (smallest standard rating ≥ I_b)", "I_n", v, "A",
                        deviceRef(kind, "ratings"), num(v) + " A", "standard ratings of " + kind.token(), "next higher (smallest ≥ I_b)", List.of());
            }
        }
        throw new DataGapException("no standard " + kind.token() + " rating reaches " + num(current) + " A (largest "
                + num(r.get(r.size() - 1)) + " A); give rating_a or use parallel circuits");
    }
}
