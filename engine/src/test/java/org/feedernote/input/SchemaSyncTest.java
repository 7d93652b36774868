package org.feedernote.input;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;

/**
 * The JSON Schema comes from the same description that validates inputs; the copy in the
 * repository (for editors) must equal what {@code feedernote schema} prints. Rewrite it with
 * {@code -Dfeedernote.rewrite=true}.
 */
class SchemaSyncTest {
    @Test
    void committedSchemaEqualsTheGeneratedOne() throws Exception {
        Path file = Fixtures.inputs().resolve("feedernote-input.schema.json");
        String generated = JsonSchemaWriter.schema();
        if (Boolean.getBoolean("feedernote.rewrite")) Files.writeString(file, generated);
        assertTrue(Files.exists(file), "inputs/feedernote-input.schema.json is missing; run with -Dfeedernote.rewrite=true");
        assertEquals(generated, Files.readString(file), "the schema file is out of date; run with -Dfeedernote.rewrite=true");
    }

    @Test
    void everyContractKeyIsInTheSchema() {
        String schema = JsonSchemaWriter.schema();
        for (String key : new String[] {"frequency_hz", "earthing", "voltage_drop_limit_percent", "voltage_drop_limits_percent",
                "ambient_air_c", "ambient_ground_c", "conductor_temperature", "disconnection_time_final_s",
                "disconnection_time_distribution_s", "line_voltage_v", "phase_voltage_v", "transformer", "utility",
                "rating_kva", "impedance_percent", "x_r_ratio", "fault_level_ka", "loop_impedance_ohm", "diversity",
                "power_kw", "apparent_kva", "current_a", "power_factor", "efficiency", "phases", "starting_current_multiple",
                "starting_power_factor", "length_m", "conductor", "insulation", "cores", "size_mm2", "cpc_mm2", "parallel",
                "formation", "method", "ambient_c", "grouped_circuits", "group_arrangement", "thermal_insulation_mm",
                "kind", "rating_a", "instantaneous_a", "breaking_capacity_ka", "curve", "design_current_a", "revisions"}) {
            assertTrue(schema.contains("\"" + key + "\""), key);
        }
    }

    @Test
    void theSchemaCarriesTheRangeOfEveryNumber() throws Exception {
        com.fasterxml.jackson.databind.JsonNode circuit = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(JsonSchemaWriter.schema()).at("/properties/circuits/items/properties");
        assertEquals(0, circuit.at("/length_m/exclusiveMinimum").asDouble());
        assertEquals(10_000, circuit.at("/length_m/maximum").asDouble());
        assertEquals(5_000, circuit.at("/load/properties/power_kw/maximum").asDouble());
        assertEquals(6_300, circuit.at("/device/properties/rating_a/anyOf/1/maximum").asDouble());
        assertEquals("date", new com.fasterxml.jackson.databind.ObjectMapper().readTree(JsonSchemaWriter.schema())
                .at("/properties/project/properties/date/format").asText());
    }
}
