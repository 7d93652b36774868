package org.feedernote.calc;

import static org.junit.jupiter.api.Assertions.*;

import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import org.feedernote.Fixtures;
import org.feedernote.synthetic.SyntheticInstallation;

/**
 * Properties of the sizing's judgement on generated installations (invented data): an enlargement
 * the sizing keeps for the voltage drop never leaves a device unable to break the fault current it
 * could break before (IEC 60364-4-43, 434.5.1), and no cable is enlarged for it.
 */
class SizingJudgementPropertiesTest {

    /** A generated installation with long routes (drops fail) and 10 kA miniature breakers (breaking capacity matters). */
    private static String stressed(long seed) {
        String yaml = SyntheticInstallation.generate(240, seed);
        Matcher m = Pattern.compile("length_m: (\\d+(?:\\.\\d+)?)").matcher(yaml);
        StringBuilder b = new StringBuilder();
        while (m.find()) m.appendReplacement(b, "length_m: " + Math.min(600, Double.parseDouble(m.group(1)) * 3));
        m.appendTail(b);
        return b.toString().replaceAll("(kind: (?:mcb|rcbo), [^}]*?)breaking_capacity_ka: 50", "$1breaking_capacity_ka: 10");
    }

    private static Map<String, Boolean> breaking(Result r) {
        return r.circuits().stream().collect(Collectors.toMap(CircuitResult::id, c -> c.check("breaking-capacity").pass()));
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3})
    void anEnlargementKeptForTheDropNeverLeavesADeviceUnableToBreakTheFaultCurrent(long seed) {
        String yaml = stressed(seed);
        // The same installation with limits no drop reaches: the sizes of the first pass, no enlargement for the drop.
        String relaxed = yaml.replace("voltage_drop_limits_percent: {lighting: 3, other: 5}", "voltage_drop_limits_percent: {lighting: 25, other: 25}");
        Result sized = Fixtures.run(yaml);
        Result firstPass = Fixtures.run(relaxed);
        Map<String, Boolean> before = breaking(firstPass);
        Map<String, Boolean> after = breaking(sized);
        for (Map.Entry<String, Boolean> e : before.entrySet()) {
            if (e.getValue()) assertTrue(after.get(e.getKey()), e.getKey() + " could break its fault current before the drop enlargements, and not after");
        }
        Map<String, Double> first = firstPass.circuits().stream().collect(Collectors.toMap(CircuitResult::id, c -> c.circuit().cable().size().mm2()));
        assertTrue(sized.circuits().stream().anyMatch(c -> c.circuit().cable().size().mm2() > first.get(c.id())),
                "the stressed installation exercises the drop balancing");
    }
}
