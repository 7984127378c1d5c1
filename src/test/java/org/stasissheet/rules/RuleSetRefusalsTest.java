package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.files.RuleSources;

/**
 * One edit of the shipped set per row, each a mistake a person editing a local protocol could make; the set
 * must be refused, and the problem must name the edited file and say what is wrong in the words given
 * (the schema documented at the top of manifest.yaml).
 */
class RuleSetRefusalsTest {

    @ParameterizedTest(name = "{0}: ''{1}'' -> ''{2}''")
    @CsvSource(delimiter = '|', textBlock = """
        manifest.yaml       | format: stasis-rules/1       | format: stasis-rules/9       | format must be stasis-rules/1
        manifest.yaml       | format: stasis-rules/1       | formt: stasis-rules/1        | formt
        manifest.yaml       | files:                       | filez:                       | missing key "files"
        manifest.yaml       | files:                       | files: 7\\nfilez:            | "files" must be a list
        manifest.yaml       |   - artefacts.yaml           |   - [artefacts.yaml]         | must be a relative path
        manifest.yaml       |   - artefacts.yaml           |   - /etc/artefacts.yaml      | must be a relative path inside the rule folder
        manifest.yaml       |   - artefacts.yaml           |   - manifest.yaml            | does not list itself
        manifest.yaml       |   - artefacts.yaml           |   - hyperviscosity.yaml      | listed twice
        tumor-lysis.yaml    | value: 476                   | value: lots                  | is not a number
        tumor-lysis.yaml    | value: 476                   | value: .inf                  | value ".inf" is not a number
        tumor-lysis.yaml    | value: 476                   | value: 1e999                 | finite number
        tumor-lysis.yaml    | equivalents: [{value: 8.0, unit: "mg/dL"}] | equivalents: [8.0] | each equivalent must be a mapping
        tumor-lysis.yaml    | equivalents: [{value: 8.0, unit: "mg/dL"}] | equivalents: 8.0   | "equivalents" must be a list
        tumor-lysis.yaml    | parameters:                  | parameters: 5\\nparameterz:  | "parameters" must be a list
        tumor-lysis.yaml    | parameters:                  | parameters:\\n  - 5\\nparameterz: | each entry of "parameters" must be a mapping
        leukostasis.yaml    |     level: review            |     level: urgent            | level "urgent" is not one of
        leukostasis.yaml    |     when:                    |     whenever:                | missing key "when"
        leukostasis.yaml    |       all:                   |       every:                 | unknown condition "every"
        leukostasis.yaml    |       all:                   |       all: []\\n      x:     | unknown condition "all, x"
        leukostasis.yaml    |         - {field: condition.leukemia, is: APL}\\n        - {field: hyperleukocytosis, is: true} |         [] | needs a non-empty list of conditions
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: hyperleukocytosis, is: true, above: 3} | exactly one of
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: hyperleukocytosis, si: true} | unknown key "si"
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: hyperleukocytosis, is: {a: 1}} | takes a word or a list of words
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: hyperleukocytosis, is: [{a: 1}]} | takes a word or a list of words
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: hyperleukocytosis, is: maybe} | "maybe" is not a value of hyperleukocytosis
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: labs.igm, is: high} | field "labs.igm" is
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: hyperleukocytosis, above: 3 cP} | cannot be compared
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {is: true}            | unknown condition "is"
        leukostasis.yaml    | {field: hyperleukocytosis, is: true} | {field: [x], is: true} | a field name is needed
        leukostasis.yaml    | {field: condition.leukemia, is: AML} | 7                     | a condition must be a mapping
        hyperviscosity.yaml | {field: labs.igm, above: hyperviscosity.igmFlare} | {field: labs.igm, above: 40} | needs a unit for field labs.igm
        hyperviscosity.yaml | {field: labs.igm, above: hyperviscosity.igmFlare} | {field: labs.igm, above: "40 mm[Hg]"} | wrong dimension for labs.igm
        hyperviscosity.yaml | {field: labs.igm, above: hyperviscosity.igmFlare} | {field: labs.igm, above: [40]} | a comparison takes a number with its unit
        hyperviscosity.yaml | {field: labs.igm, above: hyperviscosity.igmFlare} | {field: labs.igm, above: 1e999 g/L} | too large a number for a comparison
        leukostasis.yaml    |     topic: leukostasis       |     topic: [leukostasis]     | must be a single value
        """)
    void oneEdit_isRefusedWithItsReason(String file, String from, String to, String fragment) {
        Map<String, byte[]> files = new TreeMap<>(RuleSources.shippedFiles());
        String text = new String(files.get(file), StandardCharsets.UTF_8);
        String needle = from.replace("\\n", "\n");
        assertTrue(text.contains(needle), "fixture text not found in " + file + ": " + needle);
        files.put(file, text.replaceFirst(java.util.regex.Pattern.quote(needle),
                java.util.regex.Matcher.quoteReplacement(to.replace("\\n", "\n"))).getBytes(StandardCharsets.UTF_8));

        LoadResult.Refused refused = assertInstanceOf(LoadResult.Refused.class,
                RuleSetLoader.load(files, Optional.empty()));
        assertTrue(refused.problems().stream().anyMatch(p -> p.file().equals(file) && p.message().contains(fragment)),
                () -> "expected a problem in " + file + " containing '" + fragment + "', got " + refused.problems());
    }

    @Test
    @DisplayName("the rule-set hash is SHA-256 over path, zero byte, 8-byte big-endian length and bytes, by path")
    void sha256_followsItsDocumentedLayout() throws Exception {
        Map<String, byte[]> files = new LinkedHashMap<>();
        // given out of order on purpose: the hash is over the files sorted by path
        files.put("b.yaml", "rules: []\n".getBytes(StandardCharsets.UTF_8));
        files.put("a.yaml", new byte[300]);
        ByteArrayOutputStream layout = new ByteArrayOutputStream();
        for (String path : new TreeMap<>(files).keySet()) {
            layout.write(path.getBytes(StandardCharsets.UTF_8));
            layout.write(0);
            layout.write(ByteBuffer.allocate(8).putLong(files.get(path).length).array());
            layout.write(files.get(path));
        }
        // reference: the JDK's own SHA-256 (FIPS 180-4) over the documented byte layout
        String expected = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(layout.toByteArray()));
        assertEquals(expected, RuleSetLoader.sha256(files));
        assertEquals(64, expected.length());
        assertEquals(expected.toLowerCase(java.util.Locale.ROOT), expected);
    }
}
