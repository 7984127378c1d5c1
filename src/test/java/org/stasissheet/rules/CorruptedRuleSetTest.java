package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.RuleSources;

/** Broken copies of the shipped set: each is refused whole, with the file, line and column of the fault. */
class CorruptedRuleSetTest {
    private static Map<String, byte[]> shipped() {
        return new TreeMap<>(RuleSources.shippedFiles());
    }

    private static String text(Map<String, byte[]> files, String path) {
        return new String(files.get(path), StandardCharsets.UTF_8);
    }

    /** Replaces the first occurrence of {@code from} in {@code path}; fails if it is not there. */
    private static Map<String, byte[]> edit(String path, String from, String to) {
        Map<String, byte[]> files = shipped();
        String s = text(files, path);
        assertTrue(s.contains(from), "fixture text not found: " + from);
        files.put(path, s.replaceFirst(java.util.regex.Pattern.quote(from),
                java.util.regex.Matcher.quoteReplacement(to)).getBytes(StandardCharsets.UTF_8));
        return files;
    }

    private static int lineOf(Map<String, byte[]> files, String path, String needle) {
        String[] lines = text(files, path).split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(needle)) {
                return i + 1;
            }
        }
        throw new AssertionError(needle + " not in " + path);
    }

    private static List<RuleProblem> refused(Map<String, byte[]> files) {
        LoadResult r = RuleSetLoader.load(files, Optional.empty());
        assertInstanceOf(LoadResult.Refused.class, r, "a broken set must be refused whole");
        return ((LoadResult.Refused) r).problems();
    }

    private static RuleProblem only(List<RuleProblem> problems) {
        assertEquals(1, problems.size(), problems.toString());
        return problems.get(0);
    }

    @Test
    @DisplayName("YAML syntax error: refused with the file and a line")
    void syntaxError() {
        Map<String, byte[]> files = edit("leukostasis.yaml", "    unit: \"10*9/L\"\n", "    unit: [\"10*9/L\"\n");
        RuleProblem p = only(refused(files));
        assertEquals("leukostasis.yaml", p.file());
        assertTrue(p.line() > 0 && p.column() > 0, p.toString());
        assertTrue(p.message().startsWith("YAML syntax error"), p.message());
    }

    @Test
    @DisplayName("missing source on a parameter: refused at that parameter")
    void missingSource() {
        Map<String, byte[]> files = edit("hyperviscosity.yaml",
                "    source: \"Crawford J, Cox EB, Cohen HJ, Am J Med 1985;79(1):13-22 (symptoms usually at 4-5 cP)\"\n",
                "");
        RuleProblem p = only(refused(files));
        assertEquals("hyperviscosity.yaml", p.file());
        assertEquals(lineOf(files, "hyperviscosity.yaml", "id: hyperviscosity.serumViscosity.symptomatic"), p.line());
        assertTrue(p.message().contains("missing key \"source\""), p.message());
    }

    @Test
    @DisplayName("empty source on a rule: refused at the source value")
    void emptySource() {
        Map<String, byte[]> files = edit("hyperviscosity.yaml",
                "    source: \"Menke MN et al., Arch Ophthalmol 2006;124(11):1601-1606\"", "    source: \"\"");
        RuleProblem p = only(refused(files));
        assertEquals(lineOf(files, "hyperviscosity.yaml", "source: \"\""), p.line());
        assertEquals(13, p.column(), p.toString());
    }

    @Test
    @DisplayName("missing basis: refused")
    void missingBasis() {
        Map<String, byte[]> files = edit("artefacts.yaml", "    basis: from-memory\n", "");
        assertTrue(only(refused(files)).message().contains("missing key \"basis\""));
    }

    @Test
    @DisplayName("unknown basis word: refused with the allowed words")
    void unknownBasis() {
        Map<String, byte[]> files = edit("artefacts.yaml", "    basis: from-memory\n", "    basis: verified\n");
        RuleProblem p = only(refused(files));
        assertTrue(p.message().contains("published | published-secondary | common-practice | from-memory"));
    }

    @Test
    @DisplayName("unknown field in a condition: refused at the field name")
    void unknownField() {
        Map<String, byte[]> files = edit("hyperviscosity.yaml", "{field: condition.cryoglobulin, is: present}",
                "{field: condition.cryoglobulins, is: present}");
        RuleProblem p = only(refused(files));
        assertEquals(lineOf(files, "hyperviscosity.yaml", "condition.cryoglobulins"), p.line());
        assertTrue(p.message().contains("unknown field \"condition.cryoglobulins\""), p.message());
    }

    @Test
    @DisplayName("unknown key (a typo): refused at the key")
    void unknownKey() {
        Map<String, byte[]> files = edit("tumor-lysis.yaml", "    what: uric acid", "    wat: uric acid");
        RuleProblem p = only(refused(files));
        assertEquals(lineOf(files, "tumor-lysis.yaml", "wat: uric acid"), p.line());
        assertEquals(5, p.column());
        assertTrue(p.message().contains("unknown key \"wat\""), p.message());
    }

    @Test
    @DisplayName("a required parameter in the wrong kind of unit: refused at its unit")
    void wrongUnitDimension() {
        Map<String, byte[]> files = edit("leukostasis.yaml", "    value: 200\n    unit: \"10*9/L\"",
                "    value: 200\n    unit: \"g/L\"");
        RuleProblem p = only(refused(files));
        assertEquals("leukostasis.yaml", p.file());
        assertEquals(lineOf(files, "leukostasis.yaml", "unit: \"g/L\""), p.line());
        assertTrue(p.message().contains("wrong kind of unit"), p.message());
    }

    @Test
    @DisplayName("a comparison in the wrong dimension for its field: refused at the threshold")
    void wrongComparisonDimension() {
        Map<String, byte[]> files = edit("artefacts.yaml", "{field: labs.totalProtein, atLeast: artefact.pseudohyponatraemia.totalProtein}",
                "{field: labs.totalProtein, atLeast: \"100 mmol/L\"}");
        RuleProblem p = only(refused(files));
        assertEquals(lineOf(files, "artefacts.yaml", "100 mmol/L"), p.line());
        assertTrue(p.message().contains("wrong dimension"), p.message());
    }

    @Test
    @DisplayName("an unknown unit: refused")
    void unknownUnit() {
        Map<String, byte[]> files = edit("estimates.yaml", "unit: \"fL\"", "unit: \"femtolitre\"");
        assertTrue(refused(files).stream().anyMatch(p -> p.message().contains("unknown unit \"femtolitre\"")));
    }

    @Test
    @DisplayName("duplicate id, across files: refused at the second, naming the first")
    void duplicateId() {
        Map<String, byte[]> files = edit("artefacts.yaml", "  - id: artefact.pseudohyponatraemia\n",
                "  - id: hyperviscosity.likely\n");
        RuleProblem p = only(refused(files));
        assertEquals("artefacts.yaml", p.file());
        assertEquals(lineOf(files, "artefacts.yaml", "id: hyperviscosity.likely"), p.line());
        assertTrue(p.message().contains("first defined at hyperviscosity.yaml:"), p.message());
    }

    @Test
    @DisplayName("duplicate key in one mapping: refused")
    void duplicateKey() {
        Map<String, byte[]> files = edit("estimates.yaml", "    what: intravascular fraction of IgA\n",
                "    what: intravascular fraction of IgA\n    what: again\n");
        assertTrue(only(refused(files)).message().contains("duplicate key \"what\""));
    }

    @Test
    @DisplayName("a parameter the code needs is missing: refused, naming it")
    void missingRequiredParameter() {
        Map<String, byte[]> files = edit("estimates.yaml", "  - id: transfusion.unitVolume\n",
                "  - id: transfusion.unitVolumeRenamed\n");
        RuleProblem p = only(refused(files));
        assertEquals("manifest.yaml", p.file());
        assertTrue(p.message().contains("\"transfusion.unitVolume\" is missing"), p.message());
    }

    @Test
    @DisplayName("an unknown parameter named in a rule: refused")
    void unknownParameterReference() {
        Map<String, byte[]> files = edit("hyperviscosity.yaml", "above: hyperviscosity.igmFlare",
                "above: hyperviscosity.igmFlair");
        assertTrue(only(refused(files)).message().contains("unknown parameter \"hyperviscosity.igmFlair\""));
    }

    @Test
    @DisplayName("a word that the field does not have: refused")
    void unknownWord() {
        Map<String, byte[]> files = edit("leukostasis.yaml", "{field: condition.leukemia, is: APL}\n",
                "{field: condition.leukemia, is: AP}\n");
        assertTrue(only(refused(files)).message().contains("\"AP\" is not a value of condition.leukemia"));
    }

    @Test
    @DisplayName("an equivalent that is not the same amount: refused")
    void inconsistentEquivalent() {
        Map<String, byte[]> files = edit("tumor-lysis.yaml", "{value: 8.0, unit: \"mg/dL\"}",
                "{value: 80, unit: \"mg/dL\"}");
        assertTrue(only(refused(files)).message().contains("is not the same amount"));
    }

    @Test
    @DisplayName("a file in the folder that the manifest does not list: refused")
    void unlistedFile() {
        Map<String, byte[]> files = shipped();
        files.put("extra.yaml", "rules: []\n".getBytes(StandardCharsets.UTF_8));
        RuleProblem p = only(refused(files));
        assertEquals("extra.yaml", p.file());
    }

    @Test
    @DisplayName("a listed file that is missing: refused at the manifest line")
    void listedFileMissing() {
        Map<String, byte[]> files = shipped();
        files.remove("apheresis.yaml");
        RuleProblem p = only(refused(files));
        assertEquals("manifest.yaml", p.file());
        assertEquals(lineOf(files, "manifest.yaml", "  - apheresis.yaml"), p.line());
    }

    @Test
    @DisplayName("several faults are all reported at once")
    void severalFaults() {
        Map<String, byte[]> files = edit("artefacts.yaml", "    basis: from-memory\n", "");
        files.put("estimates.yaml", text(files, "estimates.yaml").replace("  - id: transfusion.unitVolume\n",
                "  - id: transfusion.unitVolumeX\n").getBytes(StandardCharsets.UTF_8));
        assertEquals(2, refused(files).size());
    }

    @Test
    @DisplayName("a changed but valid set loads and is marked local")
    void localWhenChanged() {
        Map<String, byte[]> files = edit("hyperviscosity.yaml", "    value: 4.0\n", "    value: 3.5\n");
        LoadResult r = RuleSetLoader.load(files, Optional.of(RuleSources.shippedSha256()));
        RuleSet set = ((LoadResult.Loaded) r).ruleSet();
        assertTrue(set.provenance().local());
        assertNotEquals(RuleSources.shippedSha256(), set.provenance().sha256());
        assertEquals(3.5, set.value("hyperviscosity.serumViscosity.symptomatic", "cP"), 0.0); // exact: as written
    }
}
