package org.feedernote.input;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Every class of bad input is refused with the file, line and column, the key path, what was
 * expected and, where obvious, a suggestion. All errors are reported at once.
 */
class BadInputTest {

    private static final String GOOD_CIRCUIT = """
              - id: C1
                from: B0
                load: {kind: lighting, power_kw: 1.0, power_factor: 0.9, phases: 1}
                length_m: 20
                cable: {conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: 1.5}
                installation: {method: C}
                device: {kind: mcb, curve: B, rating_a: 6}
            """;

    private static String doc(String boards, String circuits) {
        return """
                format: 1
                project: {title: T, reference: R, revision: A, date: 2026-01-01}
                supply:
                  line_voltage_v: 400
                  phase_voltage_v: 230
                  source: {utility: {fault_level_ka: 10}}
                boards:
                %s
                circuits:
                %s""".formatted(boards, circuits);
    }

    private static List<InputError> errors(String yaml) {
        InputException e = assertThrows(InputException.class, () -> InputReader.parse("bad.yaml", yaml, false));
        return e.errors();
    }

    private static InputError only(String yaml) {
        List<InputError> errors = errors(yaml);
        assertEquals(1, errors.size(), () -> "expected one error, got " + errors);
        return errors.get(0);
    }

    @Test
    void unknownKeyIsRefusedWithASuggestion() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("length_m: 20", "lenght_m: 20\n    length_m: 20")));
        assertEquals("circuits[0].lenght_m", e.path());
        assertEquals(13, e.line());
        assertEquals(5, e.column());
        assertTrue(e.message().contains("did you mean 'length_m'?"), e.message());
    }

    @Test
    void wrongTypeNamesWhatWasExpected() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("length_m: 20", "length_m: twenty")));
        assertEquals("circuits[0].length_m", e.path());
        assertTrue(e.message().startsWith("expected a number greater than 0"), e.message());
        assertTrue(e.message().contains("'twenty'"), e.message());
    }

    @Test
    void powerFactorOutsideZeroToOneIsRefused() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("power_factor: 0.9", "power_factor: 1.2")));
        assertEquals("circuits[0].load.power_factor", e.path());
        assertTrue(e.message().contains("from 0.1 to 1"), e.message());
        assertEquals(12, e.line());
    }

    @Test
    void zeroOrNegativeLengthIsRefused() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("length_m: 20", "length_m: 0")));
        assertEquals("circuits[0].length_m", e.path());
        assertTrue(e.message().contains("greater than 0"), e.message());
    }

    @Test
    void nonStandardSizeNamesTheNearestStandardSizes() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("size_mm2: 1.5", "size_mm2: 3")));
        assertEquals("circuits[0].cable.size_mm2", e.path());
        assertTrue(e.message().contains("nearest: 2.5 or 4"), e.message());
        assertEquals(14, e.line());
    }

    @Test
    void unknownBoardReferenceSuggestsTheNearestId() {
        InputError e = only(doc("  - id: DB-1", GOOD_CIRCUIT.replace("from: B0", "from: DB-2")));
        assertEquals("circuits[0].from", e.path());
        assertTrue(e.message().contains("no board has the id 'DB-2'"), e.message());
        assertTrue(e.message().contains("did you mean 'DB-1'?"), e.message());
    }

    @Test
    void duplicateIdsNameBothPlaces() {
        InputError e = only(doc("  - id: B0\n  - id: C1", GOOD_CIRCUIT));
        assertEquals("circuits[0].id", e.path());
        assertTrue(e.message().contains("already used at boards[1].id"), e.message());
    }

    @Test
    void boardFedTwiceNamesBothFeeders() {
        String feeder = """
                  - id: F%d
                    from: B0
                    to: B1
                    length_m: 10
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 16, cpc_mm2: 16}
                    installation: {method: C}
                    device: {kind: mcb, curve: C, rating_a: 63}
                """;
        InputError e = only(doc("  - id: B0\n  - id: B1", feeder.formatted(1) + feeder.formatted(2)));
        assertEquals("circuits[1].to", e.path());
        assertTrue(e.message().contains("fed twice: by 'F1' and by 'F2'"), e.message());
    }

    @Test
    void loopOfBoardsIsRefused() {
        String feeder = """
                  - id: %s
                    from: %s
                    to: %s
                    length_m: 10
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 16, cpc_mm2: 16}
                    installation: {method: C}
                    device: {kind: mcb, curve: C, rating_a: 63}
                """;
        List<InputError> errors = errors(doc("  - id: B0\n  - id: B1\n  - id: B2",
                feeder.formatted("F1", "B1", "B2") + feeder.formatted("F2", "B2", "B1") + GOOD_CIRCUIT));
        assertTrue(errors.stream().anyMatch(e -> e.message().contains("loop") && e.message().contains("B1")
                && e.message().contains("B2")), errors.toString());
    }

    @Test
    void missingRequiredKeyIsNamed() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("    length_m: 20\n", "")));
        assertEquals("circuits[0].length_m", e.path());
        assertTrue(e.message().startsWith("missing required key 'length_m'"), e.message());
    }

    @Test
    void unknownWordSuggestsTheSpelling() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("conductor: copper", "conductor: Copper")));
        assertTrue(e.message().contains("did you mean 'copper'?"), e.message());
    }

    /** IEC 60364-5-52:2009, Table B.52.1 (from memory): method D is D1 (in ducts in the ground) or D2 (direct in the ground); no plain D. */
    @Test
    void aMethodCutShortNamesEveryMethodItBegins() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("method: C", "method: D")));
        assertEquals("circuits[0].installation.method", e.path());
        assertEquals(15, e.line());
        assertEquals(28, e.column());
        assertTrue(e.message().contains("found 'D' (did you mean 'D1' or 'D2'?)"), e.message());
        assertFalse(e.message().contains("'C'?"), e.message());
    }

    /** IEC 60364-4-43:2008, 434.5.1 (from memory): the back-up device is on the supply side. */
    @Test
    void aBackupDeviceMustBeUpstream() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("device: {kind: mcb, curve: B, rating_a: 6}",
                "device: {kind: mcb, curve: B, rating_a: 6, backup: {upstream_circuit: F9, combined_breaking_capacity_ka: 25}}")));
        assertEquals("circuits[0].device.backup.upstream_circuit", e.path());
        assertEquals(16, e.line());
        assertTrue(e.message().startsWith("'F9' is not upstream: circuit 'C1' starts at the origin board 'B0'"), e.message());
    }

    @Test
    void malformedYamlGivesThePosition() {
        List<InputError> errors = errors("format: 1\nproject: {title: [unclosed\n");
        assertEquals(1, errors.size());
        assertTrue(errors.get(0).message().startsWith("the file is not valid YAML"), errors.toString());
        assertTrue(errors.get(0).line() >= 2, errors.toString());
    }

    @Test
    void allErrorsAreReportedAtOnceInFileOrder() {
        String bad = GOOD_CIRCUIT.replace("length_m: 20", "length_m: -1").replace("size_mm2: 1.5", "size_mm2: 7")
                .replace("kind: mcb", "kind: breaker");
        List<InputError> errors = errors(doc("  - id: B0", bad));
        assertEquals(3, errors.size(), errors.toString());
        assertTrue(errors.get(0).line() < errors.get(1).line() && errors.get(1).line() < errors.get(2).line(), errors.toString());
        for (InputError e : errors) assertTrue(e.text().startsWith("bad.yaml:" + e.line() + ":" + e.column() + ": circuits[0]."), e.text());
    }

    @Test
    void jsonInputGivesPositionsToo() {
        String json = """
                {"format": 1,
                 "project": {"title": "T", "reference": "R", "revision": "A", "date": "2026-01-01"},
                 "supply": {"line_voltage_v": 400, "phase_voltage_v": 230, "source": {"utility": {"fault_level_ka": 10}}},
                 "boards": [{"id": "B0"}],
                 "circuits": [{"id": "C1", "from": "B0", "length_m": 5,
                   "load": {"kind": "lighting", "power_kw": 1, "power_factor": 0.9, "phases": 1},
                   "cable": {"conductor": "copper", "insulation": "pvc", "type": "multicore", "cores": 2, "size_mm2": 1.5, "cpc_mm2": 1.5},
                   "installation": {"method": "Q"},
                   "device": {"kind": "mcb", "curve": "B", "rating_a": 6}}]}
                """;
        InputException ex = assertThrows(InputException.class, () -> InputReader.parse("bad.json", json, true));
        InputError e = ex.errors().get(0);
        assertEquals("circuits[0].installation.method", e.path());
        assertEquals(8, e.line());
    }

    @Test
    void lineAndPhaseVoltagesMustDifferByRootThree() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT).replace("phase_voltage_v: 230", "phase_voltage_v: 400"));
        assertEquals("supply.phase_voltage_v", e.path());
    }

    @Test
    void aThreePhaseLoadOnATwoCoreCableIsRefused() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("phases: 1", "phases: 3")));
        assertEquals("circuits[0].load.phases", e.path());
    }

    @Test
    void singleCoreCablesNeedAFormation() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("type: multicore, cores: 2", "type: single-core")
                .replace("phases: 1", "phases: 3")));
        assertEquals("circuits[0].cable.formation", e.path());
    }

    // ---- numbers: every one has a plausible range, and nothing beyond a double gets through ----

    @Test
    void aLengthOfAMillionKilometresIsRefusedWithItsRange() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("length_m: 20", "length_m: 1e12")));
        assertEquals("circuits[0].length_m", e.path());
        assertEquals(13, e.line());
        assertEquals(15, e.column());
        assertTrue(e.message().startsWith("expected a number greater than 0 and at most 10000, found"), e.message());
    }

    @org.junit.jupiter.params.ParameterizedTest(name = "{0}: {1}")
    @org.junit.jupiter.params.provider.CsvSource({
            "length_m: 20, circuits[0].length_m",
            "power_kw: 1.0, circuits[0].load.power_kw",
            "rating_a: 6, circuits[0].device.rating_a",
            "fault_level_ka: 10, supply.source.utility.fault_level_ka",
            "line_voltage_v: 400, supply.line_voltage_v",
            "power_factor: 0.9, circuits[0].load.power_factor"})
    void theLargestDoubleIsRefusedWhereverANumberIsRead(String written, String path) {
        String key = written.substring(0, written.indexOf(':'));
        InputError e = errors(doc("  - id: B0", GOOD_CIRCUIT).replace(written, key + ": 1e308")).stream()
                .filter(x -> x.path().equals(path)).findFirst().orElseThrow();
        assertTrue(e.message().startsWith("expected a number"), e.message());
        assertTrue(e.message().endsWith("found 1.0E308"), e.message());
    }

    @Test
    void yamlNotANumberAndInfinityAreRefusedWithTheKeyPath() {
        InputError nan = only(doc("  - id: B0", GOOD_CIRCUIT.replace("length_m: 20", "length_m: .nan")));
        assertEquals("circuits[0].length_m", nan.path());
        assertTrue(nan.message().contains("found not-a-number"), nan.message());
        InputError inf = only(doc("  - id: B0", GOOD_CIRCUIT.replace("length_m: 20", "length_m: 1e400")));
        assertEquals("circuits[0].length_m", inf.path());
        assertTrue(inf.message().contains("found a number too large to hold"), inf.message());
    }

    @Test
    void aSupplyOutsideLowVoltageIsRefused() {
        // IEC 60038, Table 1: low-voltage a.c. systems go up to 1 000 V between lines.
        List<InputError> both = errors(doc("  - id: B0", GOOD_CIRCUIT).replace("line_voltage_v: 400", "line_voltage_v: 11000"));
        assertEquals("supply.line_voltage_v", both.get(0).path());
        assertTrue(both.get(0).message().contains("from 100 to 1000"), both.toString());
    }

    // ---- dates exist ----

    @Test
    void aDateThatDoesNotExistIsRefused() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT).replace("date: 2026-01-01", "date: 2026-02-30"));
        assertEquals("project.date", e.path());
        assertEquals(2, e.line());
        assertTrue(e.message().contains("'2026-02-30'") && e.message().contains("February 2026 has 28 days"), e.message());
    }

    @Test
    void aRevisionDateIsCheckedAlikeAndTheTwentyNinthOfFebruaryOfALeapYearExists() {
        String text = doc("  - id: B0", GOOD_CIRCUIT).replace("date: 2026-01-01}",
                "date: 2028-02-29, revisions: [{revision: 0, date: 2025-04-31}]}");
        InputError e = only(text);
        assertEquals("project.revisions[0].date", e.path());
        assertTrue(e.message().contains("April 2025 has 30 days"), e.message());
    }

    // ---- one mistake, one message ----

    @Test
    void aMisspeltRequiredKeyIsOneMessageThatSaysBoth() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("length_m: 20", "lenght_m: 20")));
        assertEquals("circuits[0].lenght_m", e.path());
        assertEquals(13, e.line());
        assertEquals(5, e.column());
        assertTrue(e.message().startsWith("'lenght_m' is not a key: did you mean 'length_m', which is required?"), e.message());
    }

    @Test
    void aMisspeltLoadOfACircuitWithoutToIsOneMessage() {
        InputError e = only(doc("  - id: B0", GOOD_CIRCUIT.replace("load:", "laod:")));
        assertEquals("circuits[0].laod", e.path());
        assertTrue(e.message().contains("did you mean 'load', which is required unless 'to' is given?"), e.message());
    }

    @Test
    void aLoopAndABoardFedTwiceAreBothReported() {
        String feeder = """
                  - id: %s
                    from: %s
                    to: %s
                    length_m: 10
                    cable: {conductor: copper, insulation: xlpe, type: multicore, cores: 4, size_mm2: 16, cpc_mm2: 16}
                    installation: {method: C}
                    device: {kind: mcb, curve: C, rating_a: 63}
                """;
        // B1 is fed by F1 from B0 and by F3 from B2, which B1 itself feeds through F2.
        List<InputError> errors = errors(doc("  - id: B0\n  - id: B1\n  - id: B2", feeder.formatted("F1", "B0", "B1")
                + feeder.formatted("F2", "B1", "B2") + feeder.formatted("F3", "B2", "B1") + GOOD_CIRCUIT));
        assertEquals(2, errors.size(), errors.toString());
        assertTrue(errors.stream().anyMatch(e -> e.message().contains("fed twice: by 'F1' and by 'F3'")), errors.toString());
        assertTrue(errors.stream().anyMatch(e -> e.message().contains("the boards form a loop: B1 ← B2 ← B1")), errors.toString());
    }

    // ---- YAML syntax errors in plain words ----

    private static InputError syntax(String yaml) {
        InputError e = only(yaml);
        assertTrue(e.message().startsWith("the file is not valid YAML: "), e.message());
        assertFalse(e.message().contains("while parsing") || e.message().contains("while scanning"), e.message());
        return e;
    }

    @Test
    void aBadlyIndentedLineIsNamedWithItsPosition() {
        InputError e = syntax(doc("  - id: B0\n   description: x", GOOD_CIRCUIT));
        assertEquals(9, e.line());
        assertEquals(4, e.column());
        assertTrue(e.message().contains("indented differently"), e.message());
    }

    @Test
    void aTabIsNamedAsATab() {
        InputError e = syntax("format: 1\nproject:\n\ttitle: T\n");
        assertEquals(3, e.line());
        assertEquals(1, e.column());
        assertTrue(e.message().contains("a tab character") && e.message().contains("spaces"), e.message());
    }

    @Test
    void aKeyWithoutItsColonIsNamedOnItsLine() {
        InputError e = syntax("format: 1\nproject\nsupply: {}\n");
        assertEquals(2, e.line());
        assertEquals(1, e.column());
        assertTrue(e.message().contains("without ':'"), e.message());
    }

    @Test
    void anUnclosedQuoteIsNamedWhereItOpens() {
        InputError e = syntax("format: 1\nproject: {title: \"Bakery, reference: R}\nsupply: {}\n");
        assertEquals(2, e.line());
        assertEquals(18, e.column());
        assertTrue(e.message().contains("quote opened here is never closed"), e.message());
    }

    @Test
    void anUnclosedBracketNamesWhereItOpened() {
        InputError e = syntax("format: 1\nboards: [{id: B0}\ncircuits: []\n");
        assertTrue(e.message().contains("the list opened with '[' at line 2, column 9 is not closed"), e.message());
    }

    // ---- cable.cpc_kind: the construction of the protective conductor ----

    /** The one circuit with its cable replaced, and the error it must give. */
    private static InputError cableError(String cable) {
        return only(doc("  - id: B0", GOOD_CIRCUIT.replace(
                "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: 1.5}", cable)));
    }

    /** The column where text starts on the cable's line (line 14), as "    cable: " + the mapping. */
    private static int columnOf(String cable, String text) {
        return "    cable: ".length() + cable.indexOf(text) + 1;
    }

    private static void assertAt(InputError e, String path, String cable, String valueText, String... words) {
        assertEquals(path, e.path());
        assertEquals(14, e.line());
        assertEquals(columnOf(cable, valueText), e.column());
        for (String w : words) assertTrue(e.message().contains(w), e.message());
    }

    @Test
    void armourAsTheCpcIsRefusedWithTheReason() {
        String cable = "{conductor: copper, insulation: xlpe, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 2.5, cpc_kind: armour}";
        assertAt(cableError(cable), "circuits[0].cable.cpc_kind", cable, "armour", "no armour resistance", "core, twin-and-earth or separate");
    }

    @Test
    void aCoreNeedsACoreToSpare() {
        // Single-phase: L, N and the cpc need 3 cores.
        String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: auto, cpc_kind: core}";
        assertAt(cableError(cable), "circuits[0].cable.cpc_kind", cable, "core}", "no core left", "need 3 cores");
    }

    @Test
    void aCoreOtherThanTheLineSizeContradictsTheConstruction() {
        String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 3, size_mm2: 2.5, cpc_mm2: 1.5, cpc_kind: core}";
        assertAt(cableError(cable), "circuits[0].cable.cpc_mm2", cable, "1.5, cpc_kind", "equal to the line conductors", "found 1.5");
    }

    @Test
    void twinAndEarthIsPvcCopperTwoOrThreeCore() {
        String cable = "{conductor: copper, insulation: xlpe, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 1.5, cpc_kind: twin-and-earth}";
        assertAt(cableError(cable), "circuits[0].cable.cpc_kind", cable, "twin-and-earth}", "70 °C PVC", "found copper, xlpe, 2-core");
    }

    @Test
    void twinAndEarthIsMadeUpTo16() {
        String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 25, cpc_mm2: auto, cpc_kind: twin-and-earth}";
        assertAt(only(doc("  - id: B0", GOOD_CIRCUIT.replace("rating_a: 6", "rating_a: 63").replace(
                        "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: 1.5}", cable))),
                "circuits[0].cable.size_mm2", cable, "25,", "up to 16 mm²");
    }

    @Test
    void twinAndEarthOf15HasItsOneSquareMillimetreCpc() {
        // BS 6004: the 1.5 mm² cable has a 1.0 mm² cpc (twin-earth-cpc.csv, from memory), whose resistance IEC 60228:2004
        // Table 2 gives (18.1 Ω/km, copies on mycableengineering.com and uecables.com): accepted, given or auto.
        for (String cpc : List.of("auto", "1")) {
            String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: " + cpc + ", cpc_kind: twin-and-earth}";
            assertDoesNotThrow(() -> InputReader.parse("ok.yaml", doc("  - id: B0", GOOD_CIRCUIT.replace(
                    "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: 1.5}", cable)), false), cpc);
        }
    }

    @Test
    void aGivenSizeBelowTheSmallestLineConductorIsRefused() {
        // IEC 60364-5-52:2009, Table 52.2 (from memory): 1.5 mm² copper for fixed power and lighting circuits, the default.
        String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1, cpc_mm2: 1}";
        assertAt(cableError(cable), "circuits[0].cable.size_mm2", cable, "1, cpc", "1 mm² is below the smallest line conductor",
                "1.5 mm²", "basis.minimum_size_mm2", "Table 52.2", "BS 7671 Table 52.3");
    }

    @Test
    void aSmallestLineConductorOfOneAdmitsOneSquareMillimetre() {
        // BS 7671 Table 52.3 (from memory): 1.0 mm² copper allowed for lighting circuits in the UK; the designer says so.
        String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1, cpc_mm2: 1}";
        String yaml = doc("  - id: B0", GOOD_CIRCUIT.replace(
                "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: 1.5}", cable))
                .replace("supply:", "basis: {minimum_size_mm2: 1}\nsupply:");
        assertDoesNotThrow(() -> InputReader.parse("ok.yaml", yaml, false));
    }

    @Test
    void theSmallestLineConductorIsAStandardSizeUpTo16() {
        for (String v : List.of("3", "25", "auto")) {
            String yaml = doc("  - id: B0", GOOD_CIRCUIT).replace("supply:", "basis: {minimum_size_mm2: " + v + "}\nsupply:");
            InputError e = only(yaml);
            assertEquals("basis.minimum_size_mm2", e.path(), v);
            assertEquals(3, e.line(), v);
        }
    }

    @Test
    void twinAndEarthWithAnotherCpcContradictsTheCable() {
        // BS 6004: 2.5 mm² twin and earth has a 1.5 mm² cpc (engx.theiet.org thread 31720).
        String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 2.5, cpc_mm2: 2.5, cpc_kind: twin-and-earth}";
        assertAt(cableError(cable), "circuits[0].cable.cpc_mm2", cable, "2.5, cpc_kind", "1.5 mm² cpc (BS 6004)", "found 2.5");
    }

    @Test
    void aSeparateConductorBelowTheMinimumIsRefused() {
        // IEC 60364-5-54:2011, 543.1.3 (from memory): 4 mm² copper where not protected against mechanical damage (method C).
        String cable = "{conductor: copper, insulation: pvc, type: multicore, cores: 2, size_mm2: 1.5, cpc_mm2: 2.5, cpc_kind: separate}";
        assertAt(cableError(cable), "circuits[0].cable.cpc_mm2", cable, "2.5, cpc_kind", "at least 4 mm²", "543.1.3", "found 2.5");
    }
}
