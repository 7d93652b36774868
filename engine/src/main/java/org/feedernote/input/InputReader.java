package org.feedernote.input;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.data.CableBuildData;
import org.feedernote.data.CapacityData;
import org.feedernote.data.ReferenceData;
import org.feedernote.model.*;

/**
 * Reads a design input (YAML or JSON, format 1), validates it completely and binds it to the
 * model. Every problem is collected; the model is returned only when there are none.
 */
public final class InputReader {
    private final String file;
    private final List<InputError> errors = new ArrayList<>();
    private final List<InputWarning> warnings = new ArrayList<>();

    private final Locator locator;

    private InputReader(String file, Locator locator) {
        this.file = file;
        this.locator = locator;
    }

    public static Installation read(Path path) throws InputException {
        String name = path.toString();
        String text;
        try {
            text = Files.readString(path, StandardCharsets.UTF_8);
        } catch (java.nio.charset.MalformedInputException e) {
            throw new InputException(List.of(new InputError(name, 1, 1, "", "the file is not UTF-8 text")));
        } catch (IOException e) {
            throw new InputException(List.of(new InputError(name, 1, 1, "", "cannot read the file: " + e.getMessage())));
        }
        return parse(name, text, name.toLowerCase(java.util.Locale.ROOT).endsWith(".json"));
    }

    /**
     * Runs the structure check on a thread of its own. Its failure reaches the reader through the
     * future; the thread itself reports nothing (with the heap exhausted, the JVM's report of it
     * would be written beside the command's own message).
     */
    private static void alongside(Runnable task) {
        Thread t = new Thread(task, "feedernote-structure-check");
        t.setDaemon(true);
        t.setUncaughtExceptionHandler((thread, e) -> { });
        t.start();
    }

    public static Installation parse(String name, String text, boolean json) throws InputException {
        List<InputError> errors = new ArrayList<>();
        Node root = TreeReader.read(name, text, json, errors);
        if (root == null) throw new InputException(errors);
        return parse(name, root, () -> text, () -> TreeReader.read(name, text, json, new ArrayList<>()), null, errors);
    }

    /**
     * Says where a position of a tree not read from text (a spreadsheet's cell) is, for messages:
     * the place ("circuits!F12") and the key path as the place's reader knows it ("cable.size_mm2").
     */
    public interface Locator {
        Located locate(int line, int column, String path);

        record Located(String place, String path) {}
    }

    /**
     * Validates and binds a located tree made by another reader (a workbook's, CSV files'): the same
     * rules and messages as a YAML or JSON file. sourceText gives what the note lists and embeds as the
     * input (asked for only by a note); again makes the tree anew for the canonical form; locator
     * gives the places of errors.
     */
    public static Installation parse(String name, Node root, java.util.function.Supplier<String> sourceText, java.util.function.Supplier<Node> again,
                                     Locator locator) throws InputException {
        return parse(name, root, sourceText, again, locator, List.of());
    }

    /** found: errors the tree's reader found already (a key given twice), reported with the others. */
    private static Installation parse(String name, Node root, java.util.function.Supplier<String> sourceText, java.util.function.Supplier<Node> again,
                                      Locator locator, List<InputError> found) throws InputException {
        InputReader r = new InputReader(name, locator);
        r.errors.addAll(found);
        Installation model = null;
        if (root instanceof Node.Obj) {
            // The structure check and the binding only read the tree: side by side. The binding
            // stops short of some checks once there are errors, so where the structure check finds
            // any it is bound again after it, as one after the other would.
            List<InputError> structural = new ArrayList<>();
            java.util.concurrent.CompletableFuture<Void> check = java.util.concurrent.CompletableFuture.runAsync(
                    () -> new StructureValidator(name, structural).check(root, InputSchema.ROOT, ""), InputReader::alongside);
            InputReader alongside = new InputReader(name, locator);
            RuntimeException failure = null;
            try {
                model = alongside.bind(root, sourceText, again);
            } catch (RuntimeException e) {
                failure = e;
            }
            try {
                check.join();
            } catch (java.util.concurrent.CompletionException e) {
                // The structure check's own failure (out of memory, a fault of this program), as if
                // it had run on this thread.
                if (e.getCause() instanceof Error err) throw err;
                if (e.getCause() instanceof RuntimeException run) throw run;
                throw e;
            }
            r.errors.addAll(structural);
            if (structural.isEmpty()) {
                if (failure != null) throw failure;
                r.errors.addAll(alongside.errors);
            } else {
                model = r.bind(root, sourceText, again);
            }
        } else {
            new StructureValidator(name, r.errors).check(root, InputSchema.ROOT, "");
            model = r.errors.isEmpty() ? r.bind(root, sourceText, again) : null;
        }
        if (!r.errors.isEmpty() || model == null) {
            List<InputError> sorted = new ArrayList<>(new java.util.LinkedHashSet<>(located(r.errors, locator)));
            Collections.sort(sorted);
            throw new InputException(sorted);
        }
        return model;
    }

    private static List<InputError> located(List<InputError> errors, Locator locator) {
        if (locator == null) return errors;
        List<InputError> out = new ArrayList<>(errors.size());
        for (InputError e : errors) {
            Locator.Located at = locator.locate(e.line(), e.column(), e.path());
            out.add(new InputError(e.file(), e.line(), e.column(), at.path(), e.message(), at.place()));
        }
        return out;
    }

    /** The tree of a YAML or JSON text already read without errors once, or null. */
    static Node treeOrNull(String name, String text) {
        return TreeReader.read(name, text, false, new ArrayList<>());
    }

    /** Parses a document into the located tree only (for canonical forms and diffs). */
    public static Node tree(String name, String text, boolean json) throws InputException {
        List<InputError> errs = new ArrayList<>();
        Node root = TreeReader.read(name, text, json, errs);
        if (root == null) throw new InputException(errs);
        return root;
    }

    // ---- navigation helpers: they tolerate structurally wrong nodes (already reported) ----

    private void error(Node node, String path, String message) {
        Node.Pos p = node == null ? new Node.Pos(1, 1) : node.pos();
        errors.add(new InputError(file, p.line(), p.column(), path, message));
    }

    private static Node at(Node node, String key) {
        return node instanceof Node.Obj o ? o.get(key) : null;
    }

    private static Node.Pos keyPos(Node node, String key) {
        if (node instanceof Node.Obj o && o.entries().get(key) != null) return o.entries().get(key).keyPos();
        return node == null ? new Node.Pos(1, 1) : node.pos();
    }

    private static String str(Node node) {
        if (node instanceof Node.Scalar s && s.value() != null && !(s.value() instanceof Boolean)) {
            return s.value() instanceof String t ? t : s.describe();
        }
        return null;
    }

    private static String str(Node node, String key, String fallback) {
        String s = str(at(node, key));
        return s == null ? fallback : s;
    }

    private static Double num(Node node) {
        return node instanceof Node.Scalar s && s.isNumber() ? s.number() : null;
    }

    private static Double num(Node node, String key) {
        return num(at(node, key));
    }

    private static <E extends Enum<E> & Token> E word(Node node, String key, Class<E> type, E fallback) {
        String s = str(at(node, key));
        if (s == null) return fallback;
        return Token.parse(type, s).orElse(fallback);
    }

    private static List<Node> list(Node node, String key) {
        Node n = at(node, key);
        return n instanceof Node.Arr a ? a.items() : List.of();
    }

    private static String join(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    private Setting<Double> setting(Node node, String path, String key, double fallback) {
        Double v = num(node, key);
        return new Setting<>(v == null ? fallback : v, v != null, join(path, key));
    }

    private <E extends Enum<E> & Token> Setting<E> setting(Node node, String path, String key, Class<E> type, E fallback) {
        E v = word(node, key, type, null);
        return new Setting<>(v == null ? fallback : v, v != null, join(path, key));
    }

    private Where where(Node node, String path) {
        Node.Pos p = node == null ? new Node.Pos(1, 1) : node.pos();
        return locator == null ? new Where(file, p.line(), p.column(), path)
                : new Where(file, p.line(), p.column(), path, locator.locate(p.line(), p.column(), path).place());
    }

    // ---- binding and the rules that span several keys ----

    /** The tree of an input already read without errors. */
    private Node reread(java.util.function.Supplier<Node> again) {
        Node root = again.get();
        if (root == null) throw new IllegalStateException(file + ": read once, but not again");
        return root;
    }

    private Installation bind(Node root, java.util.function.Supplier<String> text, java.util.function.Supplier<Node> again) {
        Project project = project(at(root, "project"));
        Basis basis = basis(at(root, "basis"));
        Supply supply = supply(at(root, "supply"));
        List<Board> boards = new ArrayList<>();
        Map<String, Node> idNodes = new HashMap<>();
        Map<String, String> idPaths = new HashMap<>();
        List<Node> boardNodes = list(root, "boards");
        for (int i = 0; i < boardNodes.size(); i++) {
            Node b = boardNodes.get(i);
            String path = "boards[" + i + "]";
            String id = str(at(b, "id"));
            if (id == null) continue;
            unique(id, at(b, "id"), path + ".id", idNodes, idPaths);
            boards.add(new Board(id, str(b, "description", ""), setting(b, path, "diversity", 1.0),
                    num(b, "fault_rating_ka"), where(b, path)));
        }
        List<Circuit> circuits = new ArrayList<>();
        List<Node> circuitNodes = list(root, "circuits");
        for (int i = 0; i < circuitNodes.size(); i++) {
            Node c = circuitNodes.get(i);
            String path = "circuits[" + i + "]";
            String id = str(at(c, "id"));
            if (id != null) unique(id, at(c, "id"), path + ".id", idNodes, idPaths);
            Circuit circuit = circuit(c, path, basis, supply);
            if (circuit != null) circuits.add(circuit);
        }
        topology(boards, circuits, circuitNodes);
        if (errors.isEmpty()) singlePhaseBoards(circuits);
        voltages(at(root, "supply"), supply);
        return errors.isEmpty()
                ? new Installation(file, project, basis, supply, List.copyOf(boards), List.copyOf(circuits), Canonical.lazy(() -> reread(again)),
                        text, sortedWarnings())
                : null;
    }

    /**
     * A single-phase board supplies single-phase circuits only, all on its feeder's phase: a
     * three-phase load or feeder below it, or a phase other than its feeder's, is an error.
     */
    private void singlePhaseBoards(List<Circuit> circuits) {
        Map<String, Circuit> feederOf = new HashMap<>();
        for (Circuit c : circuits) if (c.isFeeder()) feederOf.put(c.to(), c);
        for (Circuit c : circuits) {
            Circuit feeder = feederOf.get(c.from());
            if (feeder == null || !feeder.singlePhaseFeeder()) continue;
            Where w = c.where();
            if (c.phases() == 3) {
                errors.add(new InputError(w.file(), w.line(), w.column(), w.path(), "board '" + c.from() + "' is single-phase (fed by '"
                        + feeder.id() + "', a " + feeder.cable().cores() + "-core cable): it cannot supply the three-phase "
                        + (c.isFeeder() ? "board '" + c.to() + "'" : "load of '" + c.id() + "'")));
            } else if (c.phase() != Phase.AUTO && feeder.phase() != Phase.AUTO && c.phase() != feeder.phase()) {
                errors.add(new InputError(w.file(), w.line(), w.column(), w.path() + ".phase", "board '" + c.from()
                        + "' is fed on " + feeder.phase().token() + " by '" + feeder.id() + "'; a circuit on it cannot be on " + c.phase().token()
                        + " (give " + feeder.phase().token() + " or leave phase out)"));
            }
        }
    }

    private List<InputWarning> sortedWarnings() {
        List<InputWarning> sorted = new ArrayList<>(warnings);
        sorted.sort(java.util.Comparator.comparingInt((InputWarning w) -> w.where().line()).thenComparingInt(w -> w.where().column()));
        return List.copyOf(sorted);
    }

    private void unique(String id, Node node, String path, Map<String, Node> seen, Map<String, String> paths) {
        if (seen.containsKey(id)) {
            error(node, path, "the id '" + id + "' is already used at " + paths.get(id) + " (line " + seen.get(id).pos().line()
                    + "); ids must be unique across boards and circuits");
        } else {
            seen.put(id, node);
            paths.put(id, path);
        }
    }

    private Project project(Node p) {
        List<Project.Revision> revisions = new ArrayList<>();
        for (Node r : list(p, "revisions")) {
            revisions.add(new Project.Revision(str(r, "revision", ""), str(r, "date", ""), str(r, "description", "")));
        }
        return new Project(str(p, "title", ""), str(p, "reference", ""), str(p, "revision", ""), str(p, "date", ""),
                str(p, "client", ""), str(p, "prepared_by", ""), str(p, "checked_by", ""), str(p, "approved_by", ""),
                word(p, "status", Status.class, Status.DRAFT), List.copyOf(revisions));
    }

    private Basis basis(Node b) {
        String path = "basis";
        Map<String, Double> byKind = null;
        Node limits = at(b, "voltage_drop_limits_percent");
        if (limits instanceof Node.Obj o) {
            byKind = new LinkedHashMap<>();
            for (Node.Entry e : o.entries().values()) {
                Double v = num(e.value());
                if (v != null) byKind.put(e.key(), v);
            }
            if (at(b, "voltage_drop_limit_percent") != null) {
                error(at(b, "voltage_drop_limit_percent"), "basis.voltage_drop_limit_percent",
                        "give either voltage_drop_limit_percent (one limit) or voltage_drop_limits_percent (per load kind), not both");
            }
            byKind = Collections.unmodifiableMap(byKind);
        }
        if (word(b, "earthing", Earthing.class, null) == Earthing.TT && num(b, "earth_electrode_resistance_ohm") == null) {
            error(at(b, "earthing"), "basis.earthing", "a TT system needs basis.earth_electrode_resistance_ohm (R_A) for the RCD check R_A · I_Δn ≤ 50 V");
        }
        return new Basis(setting(b, path, "frequency_hz", 50), setting(b, path, "earthing", Earthing.class, Earthing.TN_S),
                setting(b, path, "voltage_drop_limit_percent", 4), byKind, "basis.voltage_drop_limits_percent",
                setting(b, path, "ambient_air_c", 30), setting(b, path, "ambient_ground_c", 20),
                setting(b, path, "conductor_temperature", ConductorTemperature.class, ConductorTemperature.MAXIMUM),
                setting(b, path, "disconnection_time_final_s", 0.4), setting(b, path, "disconnection_time_distribution_s", 5),
                setting(b, path, "motor_starting_limit_percent", 10),
                setting(b, path, "voltage_drop_method", DropMethod.class, DropMethod.APPROXIMATE),
                setting(b, path, "voltage_factor_max", 1.10), setting(b, path, "voltage_factor_min", 0.95),
                num(b, "earth_electrode_resistance_ohm"),
                setting(b, path, "impedance", ImpedanceBasis.class, ImpedanceBasis.DERIVED),
                setting(b, path, "minimum_size_mm2", Basis.DEFAULT_MINIMUM_SIZE_MM2));
    }

    private Supply supply(Node s) {
        Node source = at(s, "source");
        Supply.Source src = null;
        Node t = at(source, "transformer");
        Node u = at(source, "utility");
        if (t instanceof Node.Obj) {
            Double kva = num(t, "rating_kva");
            Double z = num(t, "impedance_percent");
            src = new Supply.Transformer(kva == null ? 0 : kva, z == null ? 0 : z, num(t, "x_r_ratio"), num(t, "network_fault_level_mva"));
        } else if (u instanceof Node.Obj) {
            Double fl = num(u, "fault_level_ka");
            Double ze = num(u, "loop_impedance_ohm");
            if (fl == null && ze == null) {
                error(u, "supply.source.utility", "give fault_level_ka, loop_impedance_ohm or both");
            }
            src = new Supply.Utility(fl, ze, num(u, "x_r_ratio"));
        }
        Double ul = num(s, "line_voltage_v");
        Double u0 = num(s, "phase_voltage_v");
        return new Supply(ul == null ? 0 : ul, u0 == null ? 0 : u0, src);
    }

    private void voltages(Node s, Supply supply) {
        if (supply.lineVoltageV() > 0 && supply.phaseVoltageV() > 0) {
            double ratio = supply.lineVoltageV() / supply.phaseVoltageV();
            if (Math.abs(ratio / Math.sqrt(3) - 1) > 0.02) {
                error(at(s, "phase_voltage_v"), "supply.phase_voltage_v", String.format(java.util.Locale.ROOT,
                        "line and phase voltages of a three-phase supply differ by √3 (400 V / 230 V, say); %s V / %s V is %.3f",
                        StructureValidator.num(supply.lineVoltageV()), StructureValidator.num(supply.phaseVoltageV()), ratio));
            }
        }
    }

    private Circuit circuit(Node c, String path, Basis basis, Supply supply) {
        String id = str(at(c, "id"));
        String from = str(at(c, "from"));
        String to = str(at(c, "to"));
        Double length = num(c, "length_m");
        Cable cable = cable(at(c, "cable"), path + ".cable");
        Conditions conditions = conditions(at(c, "installation"), path + ".installation");
        Device device = device(at(c, "device"), path + ".device");
        Node loadNode = at(c, "load");
        Load load = null;
        if (loadNode instanceof Node.Obj) load = load(loadNode, path + ".load", cable, basis);
        Phase phase = word(c, "phase", Phase.class, Phase.AUTO);
        boolean multicore = cable != null && cable.type() == CableType.MULTICORE;
        if (to != null) {
            // A feeder of a 2-core cable, or of a 3-core one with its phase given, supplies a single-phase board.
            boolean onePhase = multicore && (cable.cores() == 2 || cable.cores() == 3 && at(c, "phase") != null);
            if (at(c, "phase") != null && !onePhase) {
                error(at(c, "phase"), path + ".phase", "phase applies to a feeder only where it supplies a single-phase board "
                        + "(a 2- or 3-core cable); remove it for a three-phase feeder");
            }
            phase = onePhase ? phase : null;
        } else if (at(c, "phase") != null && load != null && load.phases() == 3) {
            error(at(c, "phase"), path + ".phase", "phase applies to single-phase circuits only; remove it for a three-phase load");
        }
        if (cable != null && conditions != null && (load != null || to != null)) {
            cable = cpcConstruction(at(c, "cable"), path + ".cable", cable, conditions.method(), to != null ? (phase != null ? 1 : 3) : load.phases(),
                    load != null && load.kind() == LoadKind.MOTOR);
        }
        // An invalid basis.minimum_size_mm2 is reported where it stands; the sizes are not held to it.
        boolean minimumValid = ReferenceData.standardSizes().contains(basis.minimumSizeMm2().value()) && basis.minimumSizeMm2().value() <= 16;
        if (cable != null && !cable.size().auto() && minimumValid && cable.size().mm2() < basis.minimumSizeMm2().value() - 1e-9) {
            error(at(at(c, "cable"), "size_mm2"), path + ".cable.size_mm2", StructureValidator.num(cable.size().mm2())
                    + " mm² is below the smallest line conductor of the design basis, " + StructureValidator.num(basis.minimumSizeMm2().value())
                    + " mm² (basis.minimum_size_mm2" + (basis.minimumSizeMm2().given() ? "" : ", by default: " + Basis.MINIMUM_SIZE_SOURCE)
                    + "); give " + StructureValidator.num(basis.minimumSizeMm2().value()) + " mm² or more, or, where the applicable wiring rules "
                    + "allow a smaller conductor for this circuit (BS 7671 Table 52.3: 1.0 mm² copper for lighting), set basis.minimum_size_mm2");
        }
        if (cable != null && conditions != null) methodSuitsCable(at(c, "installation"), path + ".installation.method", conditions.method(), cable);
        if (conditions != null) {
            boolean ground = conditions.method() == Method.D1 || conditions.method() == Method.D2;
            int limit = ground ? 6 : 20;
            if (conditions.groupedCircuits() > limit) {
                error(at(at(c, "installation"), "grouped_circuits"), path + ".installation.grouped_circuits",
                        "IEC 60364-5-52 grouping tables go to " + limit + " circuits" + (ground ? " in the ground" : "")
                                + "; found " + conditions.groupedCircuits() + " (split the group or give the manufacturer's rating)");
            }
        }
        if (id == null || from == null || length == null || cable == null || conditions == null || device == null
                || (load == null && to == null)) {
            return null;
        }
        Circuit circuit = new Circuit(id, str(c, "description", ""), from, to, load, phase, length, cable, conditions, device,
                num(c, "design_current_a"), where(c, path));
        unusual(c, path, circuit, supply);
        return circuit;
    }

    // ---- warnings: legal but unusual values ----

    /**
     * A design current this many times the device rating is no design but a slip (kW typed for
     * W, say): far past what any overload check would weigh. Common practice, no source.
     */
    static final double FAR_ABOVE_RATING = 10;
    /**
     * A lighting or socket-outlet final circuit carrying more than this (kW or kVA) is unusual:
     * such circuits carry some kW. Common practice, no source.
     */
    static final double MOST_FOR_LIGHTING_OR_SOCKETS_KW = 50;

    private CapacityData devices;

    private void warn(Node node, String path, String message) {
        warnings.add(new InputWarning(where(node, path), message));
    }

    private void unusual(Node c, String path, Circuit circuit, Supply supply) {
        Device device = circuit.device();
        Node deviceNode = at(c, "device");
        if (device.ratingA() != null) {
            if (devices == null) devices = new CapacityData(ReferenceData.standard());
            List<Double> standard = devices.ratings(device.kind());
            if (!standard.contains(device.ratingA())) {
                warn(at(deviceNode, "rating_a"), path + ".device.rating_a", StructureValidator.num(device.ratingA())
                        + " A is not a standard " + device.kind().token() + " rating (" + devices.ratingsStandard(device.kind())
                        + ": " + String.join(", ", standard.stream().map(StructureValidator::num).toList())
                        + " A); check it against the device's data");
            }
        }
        Load load = circuit.load();
        if (load == null) return;
        String key = load.powerKw() != null ? "power_kw" : load.apparentKva() != null ? "apparent_kva" : "current_a";
        Node loadNode = at(c, "load");
        List<String> why = new ArrayList<>();
        double current = roughCurrent(load, supply);
        if (circuit.designCurrentA() != null) current = circuit.designCurrentA();
        if (device.ratingA() != null && current > FAR_ABOVE_RATING * device.ratingA()) {
            why.add(String.format(java.util.Locale.ROOT, "its current, about %s A, is more than %s times the device rating of %s A",
                    StructureValidator.num(Math.round(current)), StructureValidator.num(FAR_ABOVE_RATING),
                    StructureValidator.num(device.ratingA())));
        }
        if (load.kind() == LoadKind.LIGHTING || load.kind() == LoadKind.SOCKET) {
            double kw = load.powerKw() != null ? load.powerKw() : load.apparentKva() != null ? load.apparentKva()
                    : current * (load.phases() == 3 ? Math.sqrt(3) * supply.lineVoltageV() : supply.phaseVoltageV()) / 1000;
            if (kw > MOST_FOR_LIGHTING_OR_SOCKETS_KW) {
                why.add(String.format(java.util.Locale.ROOT, "%s %s of %s on one circuit is unusual (such a circuit carries some kW)",
                        StructureValidator.num(Math.round(kw)), load.powerKw() != null ? "kW" : "kVA",
                        load.kind() == LoadKind.LIGHTING ? "lighting" : "socket outlets"));
            }
        }
        if (!why.isEmpty()) {
            warn(at(loadNode, key), path + ".load." + key, String.join("; ", why)
                    + ": check the figure and its unit (" + key + " is in " + ("current_a".equals(key) ? "A" : key.endsWith("kw") ? "kW, not W" : "kVA, not VA") + ")");
        }
    }

    /** The load's current as the engine will derive it, near enough for a warning (no trace). */
    private static double roughCurrent(Load load, Supply supply) {
        if (load.currentA() != null) return load.currentA();
        double volts = load.phases() == 3 ? Math.sqrt(3) * supply.lineVoltageV() : supply.phaseVoltageV();
        if (volts <= 0 || load.phases() == 0) return 0;
        if (load.apparentKva() != null) return load.apparentKva() * 1000 / volts;
        if (load.powerKw() == null || load.powerFactor() == null) return 0;
        double efficiency = load.kind() == LoadKind.MOTOR && load.efficiency() != null ? load.efficiency() : 1;
        return load.powerKw() * 1000 / efficiency / (volts * load.powerFactor());
    }


    private void methodSuitsCable(Node installation, String path, Method method, Cable cable) {
        Node at = at(installation, "method");
        if (method == Method.E && cable.type() != CableType.MULTICORE) {
            error(at, path, "method E is a multicore cable in free air; single-core cables are method F (touching) or G (spaced)");
        } else if ((method == Method.F || method == Method.G) && cable.type() != CableType.SINGLE_CORE) {
            error(at, path, "method " + method.token() + " is for single-core cables; a multicore cable in free air is method E");
        } else if (method == Method.F && cable.formation() == Formation.FLAT_SPACED) {
            error(at, path, "method F is single-core cables touching; spaced cables (formation: flat-spaced) are method G");
        } else if (method == Method.G && cable.formation() != null && cable.formation() != Formation.FLAT_SPACED) {
            error(at, path, "method G is single-core cables spaced one diameter apart: give formation: flat-spaced, or method F for touching cables");
        }
    }

    private CableBuildData builds;

    private CableBuildData builds() {
        if (builds == null) builds = new CableBuildData(ReferenceData.standard());
        return builds;
    }

    /**
     * The cable with its protective conductor's construction: the stated cpc_kind checked against
     * the cable, or the default derived from the cable and the circuit (InputSchema.DEFAULT_CPC_KIND).
     * phases is 0 where the load's phases are unknown (an error has been reported).
     */
    private Cable cpcConstruction(Node c, String path, Cable cable, Method method, int phases, boolean motor) {
        Node kindNode = at(c, "cpc_kind");
        boolean multicore = cable.type() == CableType.MULTICORE;
        SizeChoice size = cable.size();
        SizeChoice cpc = cable.cpc();
        if (!cable.cpcKindStated()) {
            CpcKind kind;
            // Live conductors for the default: L and N single-phase; three-phase with a neutral,
            // except a motor, which is connected to the lines only (common practice, no source).
            int live = phases == 1 ? 2 : motor ? 3 : 4;
            boolean spareCore = multicore && cable.cores() >= live + 1;
            if (!multicore) {
                kind = CpcKind.SEPARATE;
            } else if (cpc.auto()) {
                kind = spareCore ? CpcKind.CORE : CpcKind.SEPARATE;
            } else if (spareCore && !size.auto() && cpc.mm2() == size.mm2()) {
                kind = CpcKind.CORE;
            } else if (twinAndEarthBuild(cable) && !size.auto() && Double.valueOf(cpc.mm2()).equals(builds().twinAndEarthCpcMm2(size.mm2()))) {
                kind = CpcKind.TWIN_AND_EARTH;
            } else {
                kind = null;
            }
            if (kind == CpcKind.SEPARATE && !cpc.auto() && cpc.mm2() < CpcKind.separateMinimumMm2(cable.conductor(), method) - 1e-9) {
                warn(at(c, "cpc_mm2"), join(path, "cpc_mm2"), "a protective conductor not part of a cable is at least "
                        + StructureValidator.num(CpcKind.separateMinimumMm2(cable.conductor(), method)) + " mm² " + cable.conductor().token()
                        + separateMinimumWhy(cable.conductor(), method) + " (IEC 60364-5-54, 543.1.3); found "
                        + StructureValidator.num(cpc.mm2()) + " mm²: check it, or state cable.cpc_kind");
            }
            return new Cable(cable.conductor(), cable.insulation(), cable.type(), cable.cores(), size, cpc, cable.parallel(),
                    cable.formation(), kind, false);
        }
        String kindPath = join(path, "cpc_kind");
        String cpcPath = join(path, "cpc_mm2");
        switch (cable.cpcKind()) {
            case ARMOUR -> error(kindNode, kindPath, "the steel-wire armour cannot be calculated as the protective conductor: the packaged "
                    + "armour table (BS 5467) gives no armour resistance, so neither Zs nor the armour's withstand is known; "
                    + "give core, twin-and-earth or separate");
            case CORE -> {
                int lines = phases == 1 ? 2 : 3;
                if (!multicore) {
                    error(kindNode, kindPath, "single-core cables have no core for the protective conductor: give cpc_kind: separate");
                } else if (phases != 0 && cable.cores() < lines + 1) {
                    error(kindNode, kindPath, "a " + cable.cores() + "-core cable on a " + (phases == 1 ? "single" : "three")
                            + "-phase circuit has no core left for the protective conductor (" + (phases == 1 ? "L, N" : "L1, L2, L3")
                            + " and the cpc need " + (lines + 1) + " cores): give cpc_kind: separate" + (twinAndEarthBuild(cable) ? " or twin-and-earth" : ""));
                } else if (!cpc.auto() && (size.auto() || cpc.mm2() != size.mm2())) {
                    error(at(c, "cpc_mm2"), cpcPath, "cpc_kind: core: the protective conductor is a core of the cable, equal to the line conductors ("
                            + (size.auto() ? "size_mm2: auto" : "size_mm2: " + StructureValidator.num(size.mm2())) + "); found "
                            + StructureValidator.num(cpc.mm2()) + ": give cpc_mm2: auto or the line size");
                }
            }
            case TWIN_AND_EARTH -> {
                if (!twinAndEarthBuild(cable)) {
                    error(kindNode, kindPath, "flat twin-and-earth cables (BS 6004) are 70 °C PVC with copper conductors, 2-core or 3-core with cpc; found "
                            + cable.conductor().token() + ", " + cable.insulation().token() + ", "
                            + (multicore ? cable.cores() + "-core" : "single-core") + ": give cpc_kind: core or separate");
                } else if (!size.auto()) {
                    Double teCpc = builds().twinAndEarthCpcMm2(size.mm2());
                    if (teCpc == null) {
                        error(at(c, "size_mm2"), join(path, "size_mm2"), "flat twin-and-earth cables (BS 6004) are made up to "
                                + StructureValidator.num(CableBuildData.TWIN_AND_EARTH_LARGEST_MM2) + " mm²; found " + StructureValidator.num(size.mm2()));
                    } else if (!ReferenceData.standard().hasResistance(cable.conductor(), teCpc)) {
                        error(at(c, "size_mm2"), join(path, "size_mm2"), "a " + StructureValidator.num(size.mm2()) + " mm² twin-and-earth cable has a "
                                + StructureValidator.num(teCpc) + " mm² cpc (BS 6004), whose resistance the packaged table (IEC 60228) does not give; "
                                + "choose a larger cable");
                    } else if (!cpc.auto() && cpc.mm2() != teCpc) {
                        error(at(c, "cpc_mm2"), cpcPath, "a " + StructureValidator.num(size.mm2()) + " mm² twin-and-earth cable has a "
                                + StructureValidator.num(teCpc) + " mm² cpc (BS 6004); found " + StructureValidator.num(cpc.mm2()) + ": give auto or "
                                + StructureValidator.num(teCpc));
                    }
                } else if (!cpc.auto()) {
                    error(at(c, "cpc_mm2"), cpcPath, "cpc_kind: twin-and-earth: the cpc follows the cable's size (BS 6004); with size_mm2: auto give cpc_mm2: auto");
                }
            }
            case SEPARATE -> {
                double minimum = CpcKind.separateMinimumMm2(cable.conductor(), method);
                if (!cpc.auto() && cpc.mm2() < minimum - 1e-9) {
                    error(at(c, "cpc_mm2"), cpcPath, "a protective conductor not part of a cable is at least " + StructureValidator.num(minimum)
                            + " mm² " + cable.conductor().token() + separateMinimumWhy(cable.conductor(), method)
                            + " (IEC 60364-5-54, 543.1.3); found " + StructureValidator.num(cpc.mm2()));
                }
            }
        }
        return cable;
    }

    private static String separateMinimumWhy(Conductor conductor, Method method) {
        if (conductor == Conductor.ALUMINIUM) return "";
        return CpcKind.mechanicallyProtected(method) ? " where protected against mechanical damage (method " + method.token() + ": in conduit or trunking)"
                : " where not protected against mechanical damage (method " + method.token() + " is not in conduit or trunking)";
    }

    /** Whether flat twin-and-earth cables (BS 6004: 70 °C PVC, copper, 2-core or 3-core with cpc) have this construction. */
    private static boolean twinAndEarthBuild(Cable cable) {
        return cable.type() == CableType.MULTICORE && cable.conductor() == Conductor.COPPER && cable.insulation() == Insulation.PVC
                && (cable.cores() == 2 || cable.cores() == 3);
    }

    private SizeChoice size(Node node) {
        if (node instanceof Node.Scalar s && "auto".equals(s.value())) return SizeChoice.automatic();
        Double v = num(node);
        return v == null ? null : SizeChoice.of(v);
    }

    private Cable cable(Node c, String path) {
        Conductor conductor = word(c, "conductor", Conductor.class, null);
        Insulation insulation = word(c, "insulation", Insulation.class, null);
        CableType type = word(c, "type", CableType.class, null);
        Double cores = num(c, "cores");
        Formation formation = word(c, "formation", Formation.class, null);
        if (type == CableType.MULTICORE) {
            if (at(c, "cores") == null) error(c, join(path, "cores"), "a multicore cable needs 'cores' (2, 3, 4 or 5)");
        } else if (type == CableType.SINGLE_CORE) {
            if (at(c, "formation") == null) error(c, join(path, "formation"), "single-core cables need 'formation' (trefoil, flat-touching or flat-spaced)");
        }
        SizeChoice size = size(at(c, "size_mm2"));
        SizeChoice cpc = size(at(c, "cpc_mm2"));
        if (conductor == Conductor.ALUMINIUM) {
            for (String key : List.of("size_mm2", "cpc_mm2")) {
                SizeChoice s = size(at(c, key));
                if (s != null && !s.auto() && !ReferenceData.standard().hasResistance(conductor, s.mm2())) {
                    error(at(c, key), join(path, key), "aluminium class 2 conductors start at 10 mm² (IEC 60228, Table 2); found "
                            + StructureValidator.num(s.mm2()));
                }
            }
        }
        Double parallel = num(c, "parallel");
        if (conductor == null || insulation == null || type == null || size == null || cpc == null) return null;
        CpcKind kind = word(c, "cpc_kind", CpcKind.class, null);
        return new Cable(conductor, insulation, type, cores == null ? 0 : cores.intValue(), size, cpc,
                parallel == null ? 1 : parallel.intValue(), formation, kind, kind != null);
    }

    private Conditions conditions(Node i, String path) {
        Method method = word(i, "method", Method.class, null);
        if (method == null) return null;
        if (method != Method.G && at(i, "orientation") != null) {
            error(at(i, "orientation"), join(path, "orientation"), "orientation applies to method G (single-core cables spaced one "
                    + "diameter apart, horizontally or vertically) only");
        }
        Double ambient = num(i, "ambient_c");
        Double grouped = num(i, "grouped_circuits");
        Double insulationMm = num(i, "thermal_insulation_mm");
        return new Conditions(method, new Setting<>(ambient, ambient != null, join(path, "ambient_c")),
                grouped == null ? 1 : grouped.intValue(),
                word(i, "group_arrangement", Arrangement.class, Arrangement.BUNCHED),
                insulationMm == null ? 0 : insulationMm, setting(i, path, "soil_thermal_resistivity_kmw", 2.5),
                num(i, "third_harmonic_percent"),
                word(i, "orientation", Orientation.class, Orientation.HORIZONTAL));
    }

    private Device device(Node d, String path) {
        DeviceKind kind = word(d, "kind", DeviceKind.class, null);
        Curve curve = word(d, "curve", Curve.class, null);
        if (kind == DeviceKind.MCB || kind == DeviceKind.RCBO) {
            if (at(d, "curve") == null) error(d, join(path, "curve"), "an " + kind.token() + " needs 'curve' (B, C or D)");
        } else if (kind != null && at(d, "curve") != null) {
            error(at(d, "curve"), join(path, "curve"), "curve applies to mcb and rcbo only");
        }
        if (kind != null && kind != DeviceKind.MCCB && at(d, "instantaneous_a") != null) {
            error(at(d, "instantaneous_a"), join(path, "instantaneous_a"), "instantaneous_a is the trip setting of an mccb; for "
                    + kind.token() + " it follows from the " + (kind == DeviceKind.FUSE ? "fuse characteristic (give disconnection_current_a)" : "curve"));
        }
        Node rating = at(d, "rating_a");
        Double ratingA = num(rating);
        for (String key : List.of("long_time_a", "short_time_a", "short_time_delay_s")) {
            if (kind != null && kind != DeviceKind.MCCB && at(d, key) != null) {
                error(at(d, key), join(path, key), key + " is a setting of an mccb's release; " + kind.token() + " has none");
            }
        }
        if ((at(d, "short_time_a") == null) != (at(d, "short_time_delay_s") == null)) {
            Node given = at(d, "short_time_a") != null ? at(d, "short_time_a") : at(d, "short_time_delay_s");
            error(given, join(path, at(d, "short_time_a") != null ? "short_time_a" : "short_time_delay_s"),
                    "give short_time_a and short_time_delay_s together (the short-time pick-up and its delay)");
        }
        Double longTime = num(d, "long_time_a");
        if (longTime != null && at(d, "long_time_a") != null) {
            if (ratingA == null) {
                error(at(d, "long_time_a"), join(path, "long_time_a"), "long_time_a needs the frame's rating_a (not auto)");
            } else if (longTime > ratingA + 1e-9) {
                error(at(d, "long_time_a"), join(path, "long_time_a"), "the long-time setting " + StructureValidator.num(longTime)
                        + " A is above the rating " + StructureValidator.num(ratingA) + " A");
            }
        }
        if (kind == null || (rating == null)) return null;
        return new Device(kind, ratingA, curve, num(d, "instantaneous_a"), num(d, "breaking_capacity_ka"),
                num(d, "disconnection_current_a"), num(d, "residual_current_a"), num(d, "let_through_a2s"),
                word(d, "protection", Protection.class, Protection.OVERLOAD_AND_FAULT),
                word(d, "residual_type", ResidualType.class, ResidualType.GENERAL),
                num(d, "long_time_a"), num(d, "short_time_a"), num(d, "short_time_delay_s"), backup(at(d, "backup")));
    }

    private Device.Backup backup(Node b) {
        if (b == null) return null;
        String upstream = str(at(b, "upstream_circuit"));
        Double combined = num(b, "combined_breaking_capacity_ka");
        return upstream == null || combined == null ? null : new Device.Backup(upstream, combined);
    }

    private Load load(Node l, String path, Cable cable, Basis basis) {
        LoadKind kind = word(l, "kind", LoadKind.class, null);
        if (kind == null) return null;
        if (kind != LoadKind.MOTOR) {
            for (String key : List.of("efficiency", "starting_current_multiple", "starting_power_factor")) {
                if (at(l, key) != null) error(at(l, key), join(path, key), key + " applies to motors only (kind: motor)");
            }
        }
        if (at(l, "power_kw") != null && at(l, "power_factor") == null) {
            error(l, join(path, "power_factor"), "a load given by power_kw needs power_factor to give its current");
        }
        Double phasesGiven = num(l, "phases");
        int phases;
        if (phasesGiven != null) {
            phases = phasesGiven.intValue();
        } else if (cable != null && cable.type() == CableType.MULTICORE && cable.cores() == 2) {
            phases = 1;
        } else if (cable != null && (cable.type() == CableType.SINGLE_CORE || cable.cores() >= 4)) {
            phases = 3;
        } else {
            if (cable != null) error(l, join(path, "phases"), "give phases (1 or 3): a 3-core cable may carry either");
            phases = 0;
        }
        if (cable != null && cable.type() == CableType.MULTICORE && phases == 3 && cable.cores() == 2) {
            error(at(l, "phases"), join(path, "phases"), "a three-phase load cannot be supplied by a 2-core cable");
        }
        if (basis.limitsByKind() && !basis.voltageDropLimitsByKind().containsKey(kind.token())
                && !basis.voltageDropLimitsByKind().containsKey(LoadKind.OTHER.token())) {
            error(at(l, "kind"), join(path, "kind"), "basis.voltage_drop_limits_percent gives no limit for '" + kind.token()
                    + "' and no 'other' limit; add one of them");
        }
        Double eff = num(l, "efficiency");
        if (kind == LoadKind.MOTOR && at(l, "power_kw") != null && eff == null) {
            error(l, join(path, "efficiency"), "a motor given by its output power_kw needs efficiency to give its input power");
        }
        return new Load(kind, num(l, "power_kw"), num(l, "apparent_kva"), num(l, "current_a"), num(l, "power_factor"),
                eff, phases, num(l, "starting_current_multiple"), setting(l, path, "starting_power_factor", 0.3));
    }

    /**
     * Every loop of boards, once each (a board that reaches a loop it is not part of belongs to
     * none), written from the board first in the input back round to it.
     */
    private static List<List<String>> loops(List<String> boardIds, Map<String, List<String>> feeds) {
        Map<String, Integer> order = new HashMap<>();
        for (int i = 0; i < boardIds.size(); i++) order.putIfAbsent(boardIds.get(i), i);
        java.util.Set<String> done = new java.util.HashSet<>();
        List<List<String>> found = new ArrayList<>();
        for (String start : boardIds) {
            if (done.contains(start)) continue;
            // Up from the board, one feeding board at a time, every way once (a board fed twice has
            // two ways up), among boards written after it: each loop is found from its first board.
            Map<String, String> reachedFrom = new HashMap<>();
            java.util.Deque<String> open = new java.util.ArrayDeque<>();
            open.push(start);
            String closing = null;
            while (!open.isEmpty() && closing == null) {
                String board = open.pop();
                for (String up : feeds.getOrDefault(board, List.of())) {
                    if (up.equals(start)) {
                        closing = board;
                        break;
                    }
                    if (!done.contains(up) && order.get(up) > order.get(start) && !reachedFrom.containsKey(up)) {
                        reachedFrom.put(up, board);
                        open.push(up);
                    }
                }
            }
            if (closing != null) {
                List<String> chain = new ArrayList<>();
                for (String b = closing; b != null; b = reachedFrom.get(b)) chain.add(0, b);
                // start ← its feeding board ← … ← the board start feeds ← start
                List<String> loop = new ArrayList<>(chain);
                loop.add(start);
                found.add(loop);
                done.addAll(chain);
            }
            done.add(start);
        }
        return found;
    }

    /** A back-up device must be upstream: the device of a feeder on the path from the origin to the circuit's board. */
    private void backupOnPath(List<Node> circuitNodes, Map<String, String> fedBy) {
        Map<String, String> fromOf = new HashMap<>();
        for (Node c : circuitNodes) {
            String id = str(at(c, "id"));
            if (id != null) fromOf.put(id, str(at(c, "from")));
        }
        for (int i = 0; i < circuitNodes.size(); i++) {
            Node c = circuitNodes.get(i);
            Node d = at(c, "device");
            Node b = d == null ? null : at(d, "backup");
            Node up = b == null ? null : at(b, "upstream_circuit");
            String upstream = str(up);
            if (upstream == null) continue;
            String from = str(at(c, "from"));
            List<String> path = new ArrayList<>();
            for (String board = from; board != null && fedBy.containsKey(board) && path.size() <= fedBy.size(); board = fromOf.get(fedBy.get(board))) {
                path.add(fedBy.get(board));
            }
            if (path.contains(upstream)) continue;
            String where = "circuits[" + i + "].device.backup.upstream_circuit";
            if (path.isEmpty()) {
                error(up, where, "'" + upstream + "' is not upstream: circuit '" + str(at(c, "id")) + "' starts at the origin board '" + from
                        + "', which no feeder of this input supplies; remove backup (the supply's own device is outside the input)");
            } else {
                error(up, where, "'" + upstream + "' is not a feeder on the path from the origin to board '" + from + "'"
                        + Suggest.hint(upstream, path) + "; the feeders on the path: " + String.join(", ", path));
            }
        }
    }

    private void topology(List<Board> boards, List<Circuit> circuits, List<Node> circuitNodes) {
        Map<String, Board> byId = new HashMap<>();
        boards.forEach(b -> byId.put(b.id(), b));
        List<String> boardIds = boards.stream().map(Board::id).toList();
        Map<String, String> fedBy = new HashMap<>();
        java.util.Set<String> circuitIds = new java.util.HashSet<>();
        for (Node c : circuitNodes) {
            String cid = str(at(c, "id"));
            if (cid != null) circuitIds.add(cid);
        }
        for (int i = 0; i < circuitNodes.size(); i++) {
            Node c = circuitNodes.get(i);
            // The key path is written only for a message: most inputs need none.
            String id = str(at(c, "id"));
            String from = str(at(c, "from"));
            String to = str(at(c, "to"));
            if (from != null && !byId.containsKey(from)) {
                String what = circuitIds.contains(from) ? "'" + from + "' is a circuit, not a board" : "no board has the id '" + from + "'";
                error(at(c, "from"), "circuits[" + i + "].from", what + Suggest.hint(from, boardIds) + "; boards: " + String.join(", ", boardIds));
            }
            if (to != null) {
                if (!byId.containsKey(to)) {
                    error(at(c, "to"), "circuits[" + i + "].to", "no board has the id '" + to + "'" + Suggest.hint(to, boardIds)
                            + "; boards: " + String.join(", ", boardIds));
                } else if (fedBy.containsKey(to)) {
                    error(at(c, "to"), "circuits[" + i + "].to", "board '" + to + "' is fed twice: by '" + fedBy.get(to) + "' and by '" + id
                            + "'; a board has one feeding circuit");
                } else if (to.equals(from)) {
                    error(at(c, "to"), "circuits[" + i + "].to", "circuit '" + id + "' starts and ends at board '" + to + "'");
                } else {
                    fedBy.put(to, id);
                }
            }
        }
        // Loops are looked for over every feeder whose ends are boards, a board fed twice included:
        // a loop is a mistake of its own and is told beside the other.
        Map<String, List<String>> feeds = new LinkedHashMap<>();
        for (Node c : circuitNodes) {
            String from = str(at(c, "from"));
            String to = str(at(c, "to"));
            if (from != null && to != null && !from.equals(to) && byId.containsKey(from) && byId.containsKey(to)) {
                feeds.computeIfAbsent(to, k -> new ArrayList<>()).add(from);
            }
        }
        boolean looped = false;
        for (List<String> loop : loops(boardIds, feeds)) {
            looped = true;
            Board first = byId.get(loop.get(0));
            errors.add(new InputError(file, first.where().line(), first.where().column(), first.where().path(),
                    "the boards form a loop: " + String.join(" ← ", loop) + "; every board must trace back to the origin"));
        }
        if (looped || !errors.isEmpty()) return;
        backupOnPath(circuitNodes, fedBy);
        List<String> origins = boardIds.stream().filter(b -> !fedBy.containsKey(b)).toList();
        if (origins.size() > 1) {
            Board second = byId.get(origins.get(1));
            errors.add(new InputError(file, second.where().line(), second.where().column(), second.where().path(),
                    "boards " + String.join(", ", origins) + " have no feeding circuit; only the origin board may be unfed "
                            + "(add a feeder with to: " + origins.get(1) + ")"));
        }
    }
}
