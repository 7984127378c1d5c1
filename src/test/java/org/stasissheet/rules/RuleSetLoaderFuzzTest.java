package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.RuleSources;
import org.stasissheet.fuzz.HostileInputs;
import org.stasissheet.fuzz.HostileInputs.Input;

/**
 * Hostile rule sets: one file of the shipped set at a time, mutated by the fixed-seed generator (5,000 inputs;
 * 100,000 with {@code -Pfuzz}). Every input must load or be refused with problems that name a file and say what
 * is wrong, never by an exception; deep and huge input is refused, not followed down the stack.
 */
class RuleSetLoaderFuzzTest {
    static final int COUNT = Integer.getInteger("stasis.fuzz.count", 5_000);
    static final long SEED = 0x5_7A515L + 1;
    /** Huge inputs go past the loader's per-file limit; a fortieth of it is past the value-length limit. */
    static final int HUGE = YamlTree.MAX_BYTES + 4_096;

    @Test
    @DisplayName("every mutated rule set loads or is refused with located, worded problems; nothing throws")
    void everyInput_loadsOrIsRefusedWithFiles() {
        Map<String, byte[]> shipped = RuleSources.shippedFiles();
        String sha = RuleSetLoader.sha256(shipped);
        assertInstanceOf(LoadResult.Loaded.class, RuleSetLoader.load(shipped, Optional.of(sha)),
                "sanity: the unmutated set loads");
        List<String> names = new ArrayList<>(shipped.keySet());
        HostileInputs inputs = new HostileInputs(names.stream().map(shipped::get).toList(), new YAMLMapper(), SEED, HUGE);
        List<String> failures = new ArrayList<>();
        int loaded = 0;
        int refused = 0;
        for (int i = 0; i < COUNT; i++) {
            Input input = inputs.next();
            Map<String, byte[]> files = new TreeMap<>(shipped);
            String mutated = names.get(input.seedIndex());
            files.put(mutated, input.bytes());
            LoadResult result;
            try {
                result = RuleSetLoader.load(files, Optional.of(sha));
            } catch (RuntimeException | StackOverflowError | OutOfMemoryError e) {
                failures.add(mutated + " " + input + " threw " + e);
                continue;
            }
            if (result instanceof LoadResult.Refused r) {
                refused++;
                r.problems().forEach(p -> checkProblem(mutated + " " + input, p, files, failures));
            } else if (result instanceof LoadResult.Loaded) {
                loaded++;
            } else {
                failures.add(mutated + " " + input + " gave neither outcome: " + result);
            }
        }
        assertEquals(List.of(), failures.stream().limit(20).toList(), failures.size() + " of " + COUNT + " inputs failed");
        assertTrue(refused > COUNT / 2, "refused " + refused + " of " + COUNT);
        assertTrue(loaded > 0, "loaded " + loaded + " of " + COUNT);
    }

    static void checkProblem(String input, RuleProblem p, Map<String, byte[]> files, List<String> failures) {
        if (p.file().isBlank() || p.message().isBlank()) {
            failures.add(input + " gave a problem without file or message: " + p);
        }
        if (!files.containsKey(p.file())) {
            failures.add(input + " blamed a file that is not in the set: " + p);
        }
        if (p.message().contains("Exception") || p.message().contains("com.fasterxml")
                || p.message().contains("org.yaml") || p.message().contains("\tat ") || p.message().contains(".java:")) {
            failures.add(input + " gave a message with Java internals: " + p);
        }
        if (p.message().length() > 2_000) {
            failures.add(input + " gave a " + p.message().length() + "-character message (echoes the input?)");
        }
    }

    @Test
    @DisplayName("a missing or an unlisted file is a refusal naming the file")
    void missingOrExtraFiles_areRefusals() {
        Map<String, byte[]> shipped = RuleSources.shippedFiles();
        String sha = RuleSetLoader.sha256(shipped);
        for (String name : shipped.keySet()) {
            Map<String, byte[]> without = new TreeMap<>(shipped);
            without.remove(name);
            assertRefusedNaming(RuleSetLoader.load(without, Optional.of(sha)), name);
        }
        Map<String, byte[]> extra = new TreeMap<>(shipped);
        extra.put("stray.yaml", "rules: []\n".getBytes(java.nio.charset.StandardCharsets.UTF_8));
        assertRefusedNaming(RuleSetLoader.load(extra, Optional.of(sha)), "stray.yaml");
        assertInstanceOf(LoadResult.Refused.class, RuleSetLoader.load(Map.of(), Optional.of(sha)));
    }

    private static void assertRefusedNaming(LoadResult result, String file) {
        LoadResult.Refused refused = assertInstanceOf(LoadResult.Refused.class, result, file);
        // a missing listed file is reported against the manifest that lists it
        assertTrue(refused.problems().stream().anyMatch(p -> p.file().equals(file)
                        || p.file().equals(RuleSetLoader.MANIFEST) && p.message().contains(file)),
                file + ": " + refused.problems());
    }
}
