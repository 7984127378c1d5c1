package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.RuleSources;

/**
 * The shipped set is read at run time from a compact JSON form the build makes from the YAML files. It must be the
 * very same set: record equality covers every parameter, rule, source and basis; the recorded hash must be the
 * hash of the YAML files a user can read and a worksheet names.
 */
class CompactRuleSetTest {
    private static RuleSet loaded(LoadResult r) {
        if (r instanceof LoadResult.Refused refused) {
            fail(String.join("\n", refused.problems().stream().map(RuleProblem::toString).toList()));
        }
        return ((LoadResult.Loaded) r).ruleSet();
    }

    @Test
    @DisplayName("the compact form the build wrote is in the class path and gives the set the YAML copy gives")
    void buildCompactEqualsYaml() {
        assertNotNull(RuleSources.class.getClassLoader()
                .getResource(RuleSources.SHIPPED_ROOT + RuleSources.COMPACT), "the build step did not run");
        RuleSet fromCompact = loaded(RuleSources.shipped());
        RuleSet fromYaml = loaded(RuleSources.shippedFromYaml());
        assertEquals(fromYaml, fromCompact);
        assertEquals(RuleSetLoader.sha256(RuleSources.shippedFiles()), fromCompact.provenance().sha256());
        assertEquals(fromCompact.provenance().sha256(), RuleSources.shippedSha256());
        assertFalse(fromCompact.provenance().local());
    }

    @Test
    @DisplayName("the rules/ folder of the source tree compacts to what the class path holds (no stale build)")
    void sourceFolderMatchesBuild() throws Exception {
        Map<String, byte[]> files = RuleSources.readFolder(Path.of("rules")).files();
        byte[] fresh = RuleSetLoader.compact(files);
        try (var in = RuleSources.class.getClassLoader()
                .getResourceAsStream(RuleSources.SHIPPED_ROOT + RuleSources.COMPACT)) {
            assertArrayEquals(fresh, in.readAllBytes());
        }
    }

    @Test
    @DisplayName("a local set keeps its own hash and counts as local; compacting it round-trips")
    void localSetRoundTrips() {
        Map<String, byte[]> files = new TreeMap<>(RuleSources.shippedFiles());
        String manifest = new String(files.get(RuleSetLoader.MANIFEST), StandardCharsets.UTF_8);
        files.put(RuleSetLoader.MANIFEST, (manifest + "\n# a local edit\n").getBytes(StandardCharsets.UTF_8));
        RuleSet yaml = loaded(RuleSetLoader.load(files, Optional.of(RuleSources.shippedSha256())));
        assertTrue(yaml.provenance().local());
        RuleSet compact = loaded(RuleSetLoader.loadCompact(RuleSetLoader.compact(files)));
        assertEquals(yaml.parameters(), compact.parameters());
        assertEquals(yaml.rules(), compact.rules());
        assertEquals(yaml.provenance().sha256(), compact.provenance().sha256());
    }

    @Test
    @DisplayName("a refused set is not compacted, and the message names its problems")
    void refusedSetNotCompacted() {
        Map<String, byte[]> files = new TreeMap<>(RuleSources.shippedFiles());
        files.put("apl.yaml", "rules: [ {id: x} ]\n".getBytes(StandardCharsets.UTF_8));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RuleSetLoader.compact(files));
        assertTrue(e.getMessage().contains("apl.yaml"), e.getMessage());
    }

    @Test
    @DisplayName("a damaged compact form is refused whole, with a message that says to rebuild")
    void damagedCompactRefused() throws Exception {
        byte[] good = RuleSetLoader.compact(RuleSources.shippedFiles());
        String text = new String(good, StandardCharsets.UTF_8);
        for (byte[] bad : new byte[][] {
                new byte[0],
                "{}".getBytes(StandardCharsets.UTF_8),
                java.util.Arrays.copyOf(good, good.length / 2),
                text.replace("stasis-rules-compact/1", "stasis-rules-compact/9").getBytes(StandardCharsets.UTF_8),
                text.replaceFirst("\"sha256\":\"[0-9a-f]{64}\"", "\"sha256\":\"nope\"").getBytes(StandardCharsets.UTF_8),
                // a rule's level changed to a word the loader does not know: the same checks as for YAML refuse it
                text.replaceFirst("\"level\":\"[a-z-]+\"", "\"level\":\"whatever\"").getBytes(StandardCharsets.UTF_8)}) {
            LoadResult r = RuleSetLoader.loadCompact(bad);
            assertInstanceOf(LoadResult.Refused.class, r, () -> new String(bad, StandardCharsets.UTF_8));
        }
        LoadResult r = RuleSetLoader.loadCompact("{}".getBytes(StandardCharsets.UTF_8));
        assertTrue(((LoadResult.Refused) r).problems().get(0).message().contains("rebuild"));
    }

    @Test
    @DisplayName("the build step writes the compact form of a folder, and refuses a broken folder")
    void compactorWritesAndRefuses(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Path out = dir.resolve("out.json");
        org.stasissheet.files.ShippedRulesCompactor.main(new String[] {"rules", out.toString()});
        assertArrayEquals(RuleSetLoader.compact(RuleSources.readFolder(Path.of("rules")).files()),
                Files.readAllBytes(out));
        Path broken = dir.resolve("broken");
        Files.createDirectories(broken);
        Files.writeString(broken.resolve("manifest.yaml"), "format: stasis-rules/1\n");
        assertThrows(IllegalArgumentException.class, () -> org.stasissheet.files.ShippedRulesCompactor.main(
                new String[] {broken.toString(), dir.resolve("never.json").toString()}));
        assertFalse(Files.exists(dir.resolve("never.json")));
    }
}
