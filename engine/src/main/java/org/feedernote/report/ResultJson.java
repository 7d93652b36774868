package org.feedernote.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import org.feedernote.calc.BoardResult;
import org.feedernote.calc.CheckResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.trace.Q;

/** The result of {@code check --json}, exactly as the contract in input-format.md, plus documented additions. */
public final class ResultJson {
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultJson() {}

    public static String write(Result result) {
        java.io.StringWriter out = new java.io.StringWriter();
        try {
            write(result, out);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return out.toString();
    }

    /** Streams the result circuit by circuit: the same bytes as {@link #write(Result)}, without the whole tree in memory. */
    public static void write(Result result, java.io.Writer out) throws java.io.IOException {
        try (com.fasterxml.jackson.core.JsonGenerator g = MAPPER.getFactory().createGenerator(out)) {
            g.disable(com.fasterxml.jackson.core.JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeNumberField("format", 1);
            g.writeStringField("verdict", result.pass() ? "PASS" : "FAIL");
            g.writeArrayFieldStart("boards");
            for (BoardResult b : result.boards()) MAPPER.writeTree(g, board(b));
            g.writeEndArray();
            g.writeArrayFieldStart("circuits");
            for (CircuitResult c : result.circuits()) MAPPER.writeTree(g, circuit(c));
            g.writeEndArray();
            g.writeArrayFieldStart("checks_not_performed");
            for (String name : result.notPerformed()) g.writeString(name);
            g.writeEndArray();
            g.writeFieldName("source_assumptions");
            ArrayNode source = MAPPER.createArrayNode();
            assumptions(source, result.sourceAssumptions());
            MAPPER.writeTree(g, source);
            g.writeEndObject();
        }
        out.write("\n");
        out.flush();
    }

    public static ObjectNode tree(Result result) {
        ObjectNode out = MAPPER.createObjectNode();
        out.put("format", 1);
        out.put("verdict", result.pass() ? "PASS" : "FAIL");
        ArrayNode boards = out.putArray("boards");
        for (BoardResult b : result.boards()) boards.add(board(b));
        ArrayNode circuits = out.putArray("circuits");
        for (CircuitResult c : result.circuits()) circuits.add(circuit(c));
        ArrayNode missing = out.putArray("checks_not_performed");
        result.notPerformed().forEach(missing::add);
        assumptions(out.putArray("source_assumptions"), result.sourceAssumptions());
        return out;
    }

    private static ObjectNode board(BoardResult b) {
        {
            ObjectNode n = MAPPER.createObjectNode();
            n.put("id", b.id());
            put(n, "voltage_drop_percent", b.dropPercent());
            put(n, "prospective_fault_ka", b.faultKa());
            put(n, "loop_impedance_ohm", b.loopImpedance());
            if (!b.checks().isEmpty()) checks(n, b.checks());
            if (b.neutralCurrent() != null) put(n, "neutral_current_a", b.neutralCurrent());
            return n;
        }
    }

    private static ObjectNode circuit(CircuitResult c) {
        {
            ObjectNode n = MAPPER.createObjectNode();
            n.put("id", c.id());
            put(n, "design_current_a", c.designCurrent());
            put(n, "device_rating_a", c.rating());
            n.put("cable_size_mm2", c.circuit().cable().size().mm2());
            if (c.circuit().cable().cpc().auto()) n.putNull("cpc_size_mm2");
            else n.put("cpc_size_mm2", c.circuit().cable().cpc().mm2());
            put(n, "tabulated_capacity_a", c.tabulatedCapacity());
            put(n, "correction_factor", c.correctionFactor());
            put(n, "capacity_a", c.capacity());
            put(n, "voltage_drop_v", c.dropV());
            put(n, "voltage_drop_percent", c.dropPercent());
            put(n, "cumulative_voltage_drop_percent", c.cumulativePercent());
            put(n, "loop_impedance_ohm", c.loopImpedance());
            put(n, "max_loop_impedance_ohm", c.maxLoopImpedance());
            put(n, "prospective_fault_ka", c.faultAtOrigin());
            n.put("governing_check", c.governingCheck());
            n.put("verdict", c.pass() ? "PASS" : "FAIL");
            checks(n, c.checks());
            n.put("phase", c.connection());
            if (c.powerFactor() != null) put(n, "power_factor", c.powerFactor());
            if (c.dropExactPercent() != null) put(n, "voltage_drop_exact_percent", c.dropExactPercent());
            if (c.neutralCurrent() != null) put(n, "neutral_current_a", c.neutralCurrent());
            put(n, "conventional_tripping_current_a", c.conventionalTripping());
            put(n, "min_earth_fault_a", c.minEarthFault());
            put(n, "r_mv_per_a_m", c.impedance().r());
            put(n, "x_mv_per_a_m", c.impedance().x());
            put(n, "z_mv_per_a_m", c.impedance().z());
            put(n, "conductor_temperature_c", c.impedance().theta());
            return n;
        }
    }

    private static void checks(ObjectNode n, java.util.List<CheckResult> list) {
        ArrayNode checks = n.putArray("checks");
        for (CheckResult k : list) {
            ObjectNode cn = checks.addObject();
            cn.put("name", k.name());
            cn.put("verdict", k.pass() ? "PASS" : "FAIL");
            if (k.determined()) {
                cn.put("value", round(k.value()));
                cn.put("limit", round(k.limit()));
            } else {
                cn.putNull("value");
                cn.putNull("limit");
                cn.put("note", k.remark());
            }
            cn.put("unit", k.unit());
            if (!k.assumptions().isEmpty()) assumptions(cn.putArray("assumptions"), k.assumptions());
        }
    }

    /** What a figure rests on that is not data, with the key that would replace it. */
    private static void assumptions(ArrayNode into, java.util.List<org.feedernote.calc.Assumption> list) {
        for (org.feedernote.calc.Assumption a : list) {
            ObjectNode an = into.addObject();
            an.put("what", a.what());
            an.put("key", a.key());
            an.put("safe_side", a.safeSide());
        }
    }

    private static void put(ObjectNode n, String key, Q q) {
        if (q == null) n.putNull(key);
        else n.put(key, round(q.value()));
    }

    /** Six significant figures: far finer than any check tolerance, and stable across platforms. */
    static double round(double v) {
        if (v == 0 || !Double.isFinite(v)) return v;
        return new BigDecimal(v).round(new MathContext(6, RoundingMode.HALF_EVEN)).doubleValue();
    }
}
