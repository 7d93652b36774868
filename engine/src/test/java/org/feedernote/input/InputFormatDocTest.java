package org.feedernote.input;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import org.feedernote.Fixtures;
import org.feedernote.calc.Engine;
import org.feedernote.calc.Result;
import org.feedernote.data.ReferenceData;

/**
 * docs/input-format.md is the user's description of the design input: every key the reader knows
 * ({@link InputSchema}) has a row in its key tables, with every word the key allows, and the
 * tables name no key the reader does not know. A new key fails here, named, until its row is
 * written. The example in the document reads and passes as written.
 */
class InputFormatDocTest {
    private static final String KEY_TABLES = "## Every key";

    @Test
    void everyKeyOfTheFormatIsDocumentedWithItsAllowedWords() throws Exception {
        Map<String, String> rows = keyRows();
        List<String> missing = new ArrayList<>();
        for (Map.Entry<String, Spec> key : keysOf(InputSchema.ROOT).entrySet()) {
            String row = rows.get(key.getKey());
            if (row == null) {
                missing.add(key.getKey() + ": no row in the key tables");
                continue;
            }
            if (key.getValue() instanceof Spec.Str word) {
                for (String allowed : word.allowed()) {
                    if (!row.contains("`" + allowed + "`")) missing.add(key.getKey() + ": allowed word `" + allowed + "` not listed in its row");
                }
            }
        }
        assertTrue(missing.isEmpty(), "docs/input-format.md (section \"" + KEY_TABLES.substring(3) + "\") does not document:\n  "
                + String.join("\n  ", missing) + "\nadd a row whose first cell is the key path in backticks, e.g. `circuits[].device.kind`");
    }

    @Test
    void theKeyTablesNameOnlyKeysTheReaderKnows() throws Exception {
        List<String> unknown = new ArrayList<>(keyRows().keySet());
        unknown.removeAll(keysOf(InputSchema.ROOT).keySet());
        assertTrue(unknown.isEmpty(), "docs/input-format.md documents keys the input format does not have: " + unknown);
    }

    @Test
    void theDocumentsExampleReadsAndPasses() throws Exception {
        String text = document();
        int start = text.indexOf("```yaml") + "```yaml".length();
        String yaml = text.substring(start, text.indexOf("```", start));
        Result result = new Engine(ReferenceData.standard()).run(InputReader.parse("input-format.md", yaml, false));
        assertTrue(result.pass(), "the example of docs/input-format.md should show a design that passes");
    }

    /** Every key path of the format, as the document writes it: circuits[].cable.size_mm2, basis.voltage_drop_limits_percent.other. */
    static Map<String, Spec> keysOf(Spec.Obj root) {
        Map<String, Spec> keys = new LinkedHashMap<>();
        walk("", root, keys);
        return keys;
    }

    private static void walk(String prefix, Spec spec, Map<String, Spec> keys) {
        if (spec instanceof Spec.Obj obj) {
            for (Spec.Field f : obj.fields()) {
                String path = prefix.isEmpty() ? f.name() : prefix + "." + f.name();
                keys.put(path, f.spec());
                walk(path, f.spec(), keys);
            }
        } else if (spec instanceof Spec.Map map) {
            for (String key : map.keys()) {
                keys.put(prefix + "." + key, map.value());
                walk(prefix + "." + key, map.value(), keys);
            }
        } else if (spec instanceof Spec.Arr arr) {
            walk(prefix + "[]", arr.item(), keys);
        }
    }

    /** The rows of the key tables, by each key path in backticks in the row's first cell. */
    private static Map<String, String> keyRows() throws Exception {
        String text = document();
        int start = text.indexOf("\n" + KEY_TABLES + "\n");
        assertTrue(start >= 0, "docs/input-format.md has no section \"" + KEY_TABLES + "\"");
        int end = text.indexOf("\n## ", start + 1);
        Map<String, String> rows = new LinkedHashMap<>();
        Pattern key = Pattern.compile("`([^`]+)`");
        for (String line : text.substring(start, end < 0 ? text.length() : end).split("\n")) {
            if (!line.startsWith("| `")) continue;
            Matcher m = key.matcher(line.substring(0, line.indexOf('|', 1)));
            while (m.find()) rows.put(m.group(1), line);
        }
        return rows;
    }

    private static String document() throws Exception {
        Path doc = Fixtures.root().resolve("docs/input-format.md");
        assertTrue(Files.exists(doc), "docs/input-format.md is missing");
        return Files.readString(doc);
    }
}
