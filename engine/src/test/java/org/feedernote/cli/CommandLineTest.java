package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.feedernote.Fixtures;

/** The command line in process: exit statuses and messages as the contract fixes them. */
class CommandLineTest {
    record Run(int status, String out, String err) {}

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(status, out.toString(), err.toString());
    }

    @Test
    void checkOfAConformingExampleExitsZero() {
        Run r = run("check", Fixtures.inputs().resolve("bakery-small.yaml").toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("M-MIX"), r.out());
    }

    @Test
    void jsonFollowsTheContract() throws Exception {
        Run r = run("check", Fixtures.inputs().resolve("sports-hall.yaml").toString(), "--json");
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertEquals(1, json.get("format").asInt());
        assertEquals("PASS", json.get("verdict").asText());
        JsonNode c = json.get("circuits").get(0);
        for (String key : new String[] {"id", "design_current_a", "device_rating_a", "cable_size_mm2", "cpc_size_mm2",
                "tabulated_capacity_a", "correction_factor", "capacity_a", "voltage_drop_v", "voltage_drop_percent",
                "cumulative_voltage_drop_percent", "loop_impedance_ohm", "max_loop_impedance_ohm", "prospective_fault_ka",
                "governing_check", "verdict", "checks"}) {
            assertTrue(c.has(key), "circuit result lacks " + key);
        }
        JsonNode b = json.get("boards").get(0);
        for (String key : new String[] {"id", "voltage_drop_percent", "prospective_fault_ka", "loop_impedance_ohm"}) {
            assertTrue(b.has(key), "board result lacks " + key);
        }
    }

    @Test
    void theNoteCommandWarnsOfCharactersItsFontsCannotShow(@TempDir Path dir) throws Exception {
        String text = Files.readString(Fixtures.inputs().resolve("bakery-small.yaml"))
                .replace("description: Shop lighting", "description: 泵房 shop lighting");
        Path input = dir.resolve("cjk.yaml");
        Files.writeString(input, text);
        Run r = run("note", input.toString(), "-o", dir.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.err().contains("warning") && r.err().contains("U+6CF5 泵") && r.err().contains("U+623F 房"), r.err());
    }

    @Test
    void aFailingCheckExitsOne(@TempDir Path dir) throws Exception {
        String text = Files.readString(Fixtures.inputs().resolve("bakery-small.yaml")).replace("length_m: 24", "length_m: 240");
        Path input = dir.resolve("long.yaml");
        Files.writeString(input, text);
        Run r = run("check", input.toString());
        assertEquals(1, r.status(), r.out());
        assertTrue(r.out().contains("FAIL"), r.out());
    }

    @Test
    void badInputExitsTwoWithPositionsAndWritesNothing(@TempDir Path dir) throws Exception {
        Path input = dir.resolve("bad.yaml");
        Files.writeString(input, Files.readString(Fixtures.inputs().resolve("bakery-small.yaml")).replace("length_m: 26", "length_m: -26"));
        Path trace = dir.resolve("trace.json");
        Run r = run("check", input.toString(), "--trace", trace.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("bad.yaml:"), r.err());
        assertTrue(r.err().contains("circuits[0].length_m"), r.err());
        assertEquals("", r.out());
        assertFalse(Files.exists(trace));
    }

    @Test
    void missingFileAndUnknownOptionExitTwo() {
        assertEquals(2, run("check", "no-such-file.yaml").status());
        assertEquals(2, run("check", "--frobnicate").status());
    }

    @Test
    void anOutputFolderThatCannotBeMadeIsReportedNotTakenForABug(@TempDir Path dir) throws Exception {
        Path notAFolder = dir.resolve("plain-file");
        Files.writeString(notAFolder, "");
        Run r = run("note", Fixtures.inputs().resolve("bakery-small.yaml").toString(), "-o", notAFolder.resolve("notes").toString());
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("cannot write the output: " + notAFolder), r.err());
        assertFalse(r.err().contains("bug"), r.err());
    }

    @Test
    void aHeapTooSmallForTheInstallationIsReportedInWordsWithExitTwo(@TempDir Path dir) throws Exception {
        Path input = dir.resolve("large.json");
        Files.writeString(input, org.feedernote.synthetic.SyntheticInstallation.toJson(
                org.feedernote.synthetic.SyntheticInstallation.generate(3000, 1)));
        // A JVM of its own: the heap limit is the point, and the message is written by main.
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx16m",
                "-cp", System.getProperty("java.class.path"), Main.class.getName(), "check", input.toString())
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String err = new String(p.getErrorStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertEquals(2, p.waitFor(), err);
        assertTrue(err.startsWith("feedernote: not enough memory for this installation: the Java heap is limited to "), err);
        assertTrue(err.contains("FEEDERNOTE_JAVA_OPTS"), err);
        assertFalse(err.contains("at org."), "no stack trace: " + err);
    }

    @Test
    void traceIsWrittenAsVersionedJson(@TempDir Path dir) throws Exception {
        Path trace = dir.resolve("t.json");
        assertEquals(0, run("check", Fixtures.inputs().resolve("bakery-small.yaml").toString(), "--trace", trace.toString()).status());
        JsonNode json = new ObjectMapper().readTree(trace.toFile());
        assertEquals("feedernote-trace", json.get("format").asText());
        assertEquals(1, json.get("version").asInt());
    }

    @Test
    void versionAndHelpWork() {
        assertTrue(run("--version").out().startsWith("feedernote "));
        assertTrue(run("--help").out().contains("check"));
        assertTrue(run("check", "--help").out().contains("--json"));
    }

    @Test
    void aWarningGoesToStandardErrorAndLeavesTheExitStatus(@TempDir Path dir) throws Exception {
        // L-SHOP's 10 A breaker written as 11 A: not a standard rating, but a legal one.
        String text = Files.readString(Fixtures.inputs().resolve("bakery-small.yaml"))
                .replace("device: {kind: mcb, curve: B, rating_a: 10,", "device: {kind: mcb, curve: B, rating_a: 11,");
        Path input = dir.resolve("odd.yaml");
        Files.writeString(input, text);
        Run r = run("check", input.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.err().startsWith(input + ":48:45: warning: circuits[1].device.rating_a: 11 A is not a standard mcb rating"), r.err());
    }
}
