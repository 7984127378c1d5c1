package org.stasissheet.intake;

import static org.junit.jupiter.api.Assertions.*;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * {@code extra} is kept as compact JSON by the streaming writer alone (a mapper costs a cold run its start-up).
 * Reference: Jackson's own object mapper writing the same tree must give exactly the same text.
 */
class ExtraKeptAsWrittenTest {
    private static final ObjectMapper REFERENCE = new ObjectMapper();

    private static void sameAsReference(String json) throws Exception {
        byte[] bytes = json.getBytes(StandardCharsets.UTF_8);
        var tree = CaseReader.parse(bytes).tree().orElseThrow();
        String expected = tree.has("extra") && !tree.get("extra").isNull()
                ? REFERENCE.writeValueAsString(tree.get("extra")) : "{}";
        var result = CaseReader.read(bytes);
        assertInstanceOf(CaseReader.Accepted.class, result, () -> result.toString());
        assertEquals(expected, ((CaseReader.Accepted) result).c().extraJson());
    }

    @Test
    @DisplayName("the demo cases' extra is kept exactly as the reference mapper writes it")
    void samples() throws Exception {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("samples"))) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(files.isEmpty());
        for (Path p : files) {
            sameAsReference(Files.readString(p));
        }
    }

    @Test
    @DisplayName("nested, escaped, non-ASCII and exact-decimal extras (fixed seed) match the reference mapper")
    void generated() throws Exception {
        String base = Files.readString(Path.of("samples/igm-symptomatic.json"));
        int at = base.indexOf("\"extra\"");
        assertTrue(at > 0, "the sample has an extra to replace");
        Random random = new Random(20261204L);
        List<String> values = new ArrayList<>(List.of("\"a \\\"quoted\\\" \\\\ word\"", "\"µmol/L ≥ 10⁹ ✓\"",
                "\"line\\nbreak\\ttab\"", "\"\\u0001\"", "1.50", "-0.0", "1e3", "12345678901234567890", "true",
                "false", "null", "[]", "{}"));
        for (int i = 0; i < 300; i++) {
            StringBuilder sb = new StringBuilder("{");
            int n = 1 + random.nextInt(4);
            for (int k = 0; k < n; k++) {
                if (k > 0) {
                    sb.append(',');
                }
                sb.append("\"k").append(k).append("\":");
                String v = values.get(random.nextInt(values.size()));
                sb.append(random.nextInt(4) == 0 ? "[" + v + "," + v + ",{\"in\":" + v + "}]" : v);
            }
            sb.append('}');
            String json = base.substring(0, at) + "\"extra\": " + sb + base.substring(endOfValue(base, at)) ;
            sameAsReference(json);
        }
    }

    /** The index just past the extra object's closing brace (the sample's extra holds no braces in strings). */
    private static int endOfValue(String json, int keyAt) {
        int depth = 0;
        for (int i = json.indexOf('{', keyAt); i < json.length(); i++) {
            char c = json.charAt(i);
            if (c == '{') {
                depth++;
            } else if (c == '}' && --depth == 0) {
                return i + 1;
            }
        }
        throw new IllegalStateException("no end");
    }
}
