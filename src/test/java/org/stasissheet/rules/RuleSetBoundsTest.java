package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.RuleSources;

/** The rule-set bounds at their limit and one step beyond (the limits are ours; see README, Limits). */
class RuleSetBoundsTest {
    /** The shipped set plus {@code extra.yaml} listed in the manifest. */
    private static Map<String, byte[]> withExtraFile(String yaml) {
        Map<String, byte[]> files = new TreeMap<>(RuleSources.shippedFiles());
        String manifest = new String(files.get(RuleSetLoader.MANIFEST), StandardCharsets.UTF_8);
        files.put(RuleSetLoader.MANIFEST, manifest.replace("files:\n", "files:\n  - extra.yaml\n")
                .getBytes(StandardCharsets.UTF_8));
        files.put("extra.yaml", yaml.getBytes(StandardCharsets.UTF_8));
        return files;
    }

    private static List<RuleProblem> problems(Map<String, byte[]> files) {
        return assertInstanceOf(LoadResult.Refused.class, RuleSetLoader.load(files, Optional.empty())).problems();
    }

    private static String rules(int n) {
        StringBuilder sb = new StringBuilder("rules:\n");
        for (int i = 0; i < n; i++) {
            sb.append("  - {id: r").append(i).append("}\n");
        }
        return sb.toString();
    }

    private static int shippedRules() {
        return ((LoadResult.Loaded) RuleSources.shipped()).ruleSet().rules().size();
    }

    @Test
    @DisplayName("rule count: a set of exactly 2,000 rules is read rule by rule; 2,001 is refused as a whole")
    void ruleCount() {
        List<RuleProblem> atLimit = problems(withExtraFile(rules(RuleSetLoader.MAX_RULES - shippedRules())));
        assertTrue(atLimit.stream().noneMatch(p -> p.message().contains("at most 2000 rules")), atLimit.toString());
        List<RuleProblem> beyond = problems(withExtraFile(rules(RuleSetLoader.MAX_RULES - shippedRules() + 1)));
        assertEquals(1, beyond.size(), beyond.toString());
        assertTrue(beyond.get(0).message().contains("at most 2000 rules"), beyond.toString());
    }

    @Test
    @DisplayName("problems listed: at most 100, then one line '… and N more problems not listed'")
    void problemCount() {
        StringBuilder sb = new StringBuilder("parameters:\n  - {id: p0");
        for (int i = 0; i < 150; i++) {
            sb.append(", k").append(i).append(": 1");
        }
        List<RuleProblem> problems = problems(withExtraFile(sb.append("}\n").toString()));
        assertEquals(RuleSetLoader.MAX_PROBLEMS + 1, problems.size());
        assertTrue(problems.get(RuleSetLoader.MAX_PROBLEMS).message().matches("… and \\d+ more problems not listed"),
                problems.get(RuleSetLoader.MAX_PROBLEMS).message());
    }

    @Test
    @DisplayName("files: 50 YAML files are read, 51 are refused before parsing")
    void fileCount() {
        Map<String, byte[]> files = new TreeMap<>(RuleSources.shippedFiles());
        for (int i = files.size(); i < RuleSetLoader.MAX_FILES; i++) {
            files.put("unlisted-" + i + ".yaml", new byte[0]);
        }
        assertFalse(problems(files).get(0).message().contains("at most 50"));
        files.put("one-more.yaml", new byte[0]);
        List<RuleProblem> beyond = problems(files);
        assertEquals(1, beyond.size());
        assertTrue(beyond.get(0).message().contains("at most 50"), beyond.toString());
    }

    @Test
    @DisplayName("nodes: 50,000 keys, values and lists in a file parse; one more is refused")
    void nodeCount() throws YamlTree.Malformed {
        // a list of n-1 values is n nodes
        String atLimit = "[" + "1,".repeat(YamlTree.MAX_NODES - 2) + "1]";
        assertInstanceOf(YamlTree.Sequence.class, YamlTree.parse(atLimit.getBytes(StandardCharsets.UTF_8)));
        String beyond = "[" + "1,".repeat(YamlTree.MAX_NODES - 1) + "1]";
        YamlTree.Malformed e = assertThrows(YamlTree.Malformed.class,
                () -> YamlTree.parse(beyond.getBytes(StandardCharsets.UTF_8)));
        assertTrue(e.getMessage().contains("more than 50000"), e.getMessage());
    }

    @Test
    @DisplayName("one YAML document per file: a second one is refused at its line")
    void secondDocument() {
        YamlTree.Malformed e = assertThrows(YamlTree.Malformed.class,
                () -> YamlTree.parse("a: 1\n---\nb: 2\n".getBytes(StandardCharsets.UTF_8)));
        assertTrue(e.getMessage().contains("second YAML document"), e.getMessage());
        assertEquals(3, e.where.line());
    }

    @Test
    @DisplayName("ordered pairs: a red-cell volume above its unit's volume is refused; equal passes the check")
    void orderedPairs() {
        Map<String, byte[]> files = new TreeMap<>(RuleSources.shippedFiles());
        String estimates = new String(files.get("estimates.yaml"), StandardCharsets.UTF_8);
        String equal = estimates.replace("value: 0.21", "value: 0.35");
        assertTrue(equal.contains("value: 0.35\n    unit: \"L\"\n"), "the shipped red-cell volume is 0.21 L in a 0.35 L unit");
        files.put("estimates.yaml", equal.getBytes(StandardCharsets.UTF_8));
        assertInstanceOf(LoadResult.Loaded.class, RuleSetLoader.load(files, Optional.empty()));
        files.put("estimates.yaml", estimates.replace("value: 0.21", "value: 0.36").getBytes(StandardCharsets.UTF_8));
        List<RuleProblem> problems = problems(files);
        assertTrue(problems.stream().anyMatch(p -> p.message().contains("must not be larger than")), problems.toString());
    }
}
