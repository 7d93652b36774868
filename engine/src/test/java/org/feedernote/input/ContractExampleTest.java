package org.feedernote.input;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;

/** The example of the input contract (../shared/design/input-format.md) is accepted as written. */
class ContractExampleTest {
    @Test
    void theContractExampleReadsAndCalculates() throws Exception {
        Path doc = Fixtures.root().resolve("../shared/design/input-format.md").normalize();
        Assumptions.assumeTrue(Files.exists(doc), "the shared design documents are beside the project");
        String text = Files.readString(doc);
        int start = text.indexOf("```yaml") + "```yaml".length();
        String yaml = text.substring(start, text.indexOf("```", start)).strip() + "\n";
        var inst = InputReader.parse("input-format.md", yaml, false);
        Result r = new Engine(ReferenceData.standard()).run(inst);
        assertEquals(3, r.circuits().size());
        // CH-1: 55 kW output, η 0.94, cos φ 0.86: I_b = 55 000 / 0.94 / (√3 × 400 × 0.86) = 98.2 A (hand calculation)
        assertEquals(98.2, r.circuits().get(1).designCurrent().value(), 0.05);
        assertEquals(35, r.circuits().get(1).circuit().cable().size().mm2(), "auto-sized as the contract's illustration");
    }
}
