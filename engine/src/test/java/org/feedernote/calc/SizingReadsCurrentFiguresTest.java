package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputReader;
import org.feedernote.model.Installation;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * The sizing decides on the figures of the circuits upstream as they are after every enlargement,
 * never on figures left from an earlier size. Seen on a generated installation (invented data,
 * 10 000 circuits, seed 1): once the feeders above C-3599 had grown, a smaller protective
 * conductor passed, but the search read the fault levels of the feeders' first sizes and stopped
 * a size too large. Checked by the program's own rule (IEC 60364-5-54:2011, 543.1.2, selection by
 * calculation: the smallest size that passes), with every other size held as chosen.
 */
class SizingReadsCurrentFiguresTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @Test
    void theProtectiveConductorChosenByCalculationIsTheSmallestThatPassesWithTheFinalUpstreamSizes() throws Exception {
        // C-3599 is a motor circuit on a 4-core cable, whose fourth core would be its protective
        // conductor by default: stated as a separate conductor, it is again chosen by calculation.
        ObjectNode generated = (ObjectNode) JSON.readTree(SyntheticInstallation.toJson(SyntheticInstallation.generate(10_000, 1)));
        for (JsonNode n : generated.get("circuits")) {
            if (n.get("id").asText().equals("C-3599")) ((ObjectNode) n.get("cable")).put("cpc_kind", "separate");
        }
        String json = JSON.writeValueAsString(generated);
        Engine engine = new Engine(ReferenceData.standard());
        Result sized = engine.run(InputReader.parse("g.json", json, true), false);
        CircuitResult c = sized.circuits().stream().filter(r -> r.id().equals("C-3599")).findFirst().orElseThrow();
        double chosen = c.circuit().cable().cpc().mm2();
        assertTrue(c.check("protective-conductor").pass() && c.check("disconnection").pass());
        java.util.List<Double> sizes = ReferenceData.standardSizes();
        double smallerSize = sizes.get(sizes.indexOf(chosen) - 1);
        assertTrue(smallerSize >= 4, "a separate protective conductor, not in conduit or trunking (method C), is not below 4 mm² "
                + "(IEC 60364-5-54:2011, 543.1.3): " + chosen + " mm² must be above it for the check below");

        // Every size fixed as chosen, and C-3599's protective conductor one standard size smaller.
        ObjectNode root = (ObjectNode) JSON.readTree(json);
        java.util.Map<String, CircuitResult> byId = new java.util.HashMap<>();
        for (CircuitResult r : sized.circuits()) byId.put(r.id(), r);
        for (JsonNode n : root.get("circuits")) {
            CircuitResult r = byId.get(n.get("id").asText());
            ObjectNode cable = (ObjectNode) n.get("cable");
            cable.put("size_mm2", r.circuit().cable().size().mm2());
            cable.put("cpc_mm2", n.get("id").asText().equals("C-3599") ? smallerSize : r.circuit().cable().cpc().mm2());
            // The construction the sizing took, stated: a given size alone would not say it.
            if (r.circuit().cable().cpcKind() != null) cable.put("cpc_kind", r.circuit().cable().cpcKind().token());
            ((ObjectNode) n.get("device")).put("rating_a", r.rating().value());
        }
        Installation smaller;
        try {
            smaller = InputReader.parse("g-fixed.json", JSON.writeValueAsString(root), true);
        } catch (org.feedernote.input.InputException e) {
            fail(e.errors().stream().limit(3).map(org.feedernote.input.InputError::text).toList().toString());
            return;
        }
        CircuitResult again = engine.run(smaller, false).circuits().stream().filter(r -> r.id().equals("C-3599")).findFirst().orElseThrow();
        assertFalse(again.check("protective-conductor").pass() && again.check("disconnection").pass(),
                smallerSize + " mm² must fail, or " + chosen + " mm² was not the smallest that passes");
    }
}
