package org.feedernote.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

import com.fasterxml.jackson.core.JsonProcessingException;
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
        try {
            return MAPPER.writeValueAsString(tree(result)) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    public static ObjectNode tree(Result result) {
        ObjectNode out = MAPPER.createObjectNode();
        out.put("format", 1);
        out.put("verdict", result.pass() ? "PASS" : "FAIL");
        ArrayNode boards = out.putArray("boards");
        for (BoardResult b : result.boards()) {
            ObjectNode n = boards.addObject();
            n.put("id", b.id());
            put(n, "voltage_drop_percent", b.dropPercent());
            n.putNull("prospective_fault_ka");
            n.putNull("loop_impedance_ohm");
            if (b.neutralCurrent() != null) put(n, "neutral_current_a", b.neutralCurrent());
        }
        ArrayNode circuits = out.putArray("circuits");
        for (CircuitResult c : result.circuits()) {
            ObjectNode n = circuits.addObject();
            n.put("id", c.id());
            put(n, "design_current_a", c.designCurrent());
            if (c.circuit().device().ratingA() == null) n.putNull("device_rating_a");
            else n.put("device_rating_a", round(c.circuit().device().ratingA()));
            n.put("cable_size_mm2", c.circuit().cable().size().mm2());
            if (c.circuit().cable().cpc().auto()) n.putNull("cpc_size_mm2");
            else n.put("cpc_size_mm2", c.circuit().cable().cpc().mm2());
            n.putNull("tabulated_capacity_a");
            n.putNull("correction_factor");
            n.putNull("capacity_a");
            put(n, "voltage_drop_v", c.dropV());
            put(n, "voltage_drop_percent", c.dropPercent());
            put(n, "cumulative_voltage_drop_percent", c.cumulativePercent());
            n.putNull("loop_impedance_ohm");
            n.putNull("max_loop_impedance_ohm");
            n.putNull("prospective_fault_ka");
            n.put("governing_check", c.governingCheck());
            n.put("verdict", c.pass() ? "PASS" : "FAIL");
            ArrayNode checks = n.putArray("checks");
            for (CheckResult k : c.checks()) {
                ObjectNode cn = checks.addObject();
                cn.put("name", k.name());
                cn.put("verdict", k.pass() ? "PASS" : "FAIL");
                cn.put("value", round(k.value()));
                cn.put("limit", round(k.limit()));
                cn.put("unit", k.unit());
            }
            n.put("phase", c.connection());
            if (c.powerFactor() != null) put(n, "power_factor", c.powerFactor());
            if (c.dropExactPercent() != null) put(n, "voltage_drop_exact_percent", c.dropExactPercent());
            if (c.neutralCurrent() != null) put(n, "neutral_current_a", c.neutralCurrent());
            put(n, "r_mv_per_a_m", c.impedance().r());
            put(n, "x_mv_per_a_m", c.impedance().x());
            put(n, "z_mv_per_a_m", c.impedance().z());
            put(n, "conductor_temperature_c", c.impedance().theta());
        }
        ArrayNode missing = out.putArray("checks_not_performed");
        result.notPerformed().forEach(missing::add);
        return out;
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
