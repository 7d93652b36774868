package org.feedernote.report.figure;

import java.util.stream.Collectors;

import org.feedernote.calc.CheckResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.data.ReferenceData;
import org.feedernote.formula.Units;
import org.feedernote.model.Cable;
import org.feedernote.model.CableType;
import org.feedernote.model.Conductor;
import org.feedernote.model.Device;
import org.feedernote.model.DeviceKind;
import org.feedernote.report.NumberFormatPolicy;
import org.feedernote.trace.Q;

/** The words the figures print for a circuit's device and cable, from the calculated result. */
final class Labels {
    private Labels() {}

    /** "MCB B 16 A", "MCCB 80 A", "fuse 63 A": the kind, the curve where it has one, the rating used. */
    static String device(CircuitResult c) {
        Device d = c.circuit().device();
        String kind = d.kind() == DeviceKind.FUSE ? "fuse" : d.kind().token().toUpperCase(java.util.Locale.ROOT);
        String curve = d.curve() == null ? "" : " " + d.curve().token();
        String rating = c.rating() != null ? NumberFormatPolicy.given(c.rating().value(), Units.A)
                : d.ratingA() != null ? NumberFormatPolicy.given(d.ratingA(), Units.A) : "";
        return kind + curve + (rating.isEmpty() ? "" : " " + rating);
    }

    /** "25 mm² 4-core Cu XLPE, 26 m": size (parallel runs counted), cores, conductor, insulation, route length. */
    static String cable(CircuitResult c) {
        Cable k = c.circuit().cable();
        String size = (k.parallel() > 1 ? k.parallel() + " × " : "") + ReferenceData.sizeKey(k.size().mm2()) + " mm²";
        String cores = k.type() == CableType.SINGLE_CORE || k.cores() == 0 ? "single-core" : k.cores() + "-core";
        String conductor = k.conductor() == Conductor.COPPER ? "Cu" : "Al";
        String insulation = k.insulation().token().toUpperCase(java.util.Locale.ROOT);
        return size + " " + cores + " " + conductor + " " + insulation + ", " + metres(c.length());
    }

    static String metres(Q length) {
        return NumberFormatPolicy.number(length.value(), Units.M) + " m";
    }

    static String percent(Q q) {
        return NumberFormatPolicy.number(q.value(), Units.PERCENT) + " %";
    }

    static String amperes(Q q) {
        return NumberFormatPolicy.number(q.value(), q.unit()) + " " + q.unit();
    }

    /** The names of the failing checks, "voltage-drop, disconnection". */
    static String failing(java.util.List<CheckResult> checks) {
        return checks.stream().filter(k -> !k.pass()).map(CheckResult::name).collect(Collectors.joining(", "));
    }
}
