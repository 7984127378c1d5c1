package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** README's limits section must list exactly the from-memory rules and parameters of the shipped set. */
class FromMemoryReadmeTest {
    static final String START = "<!-- from-memory:start -->";
    static final String END = "<!-- from-memory:end -->";

    @Test
    @DisplayName("README's from-memory list equals the generated one")
    void readmeListIsCurrent() throws Exception {
        String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8);
        String generated = RuleListing.fromMemoryMarkdown(TestCases.SHIPPED);
        String howTo = "Regenerate it with `stasis-sheet rules list --basis from-memory --markdown` and paste the output"
                + " between " + START + " and " + END + " in README.md's limits section.";
        int s = readme.indexOf(START);
        int e = readme.indexOf(END);
        assertTrue(s >= 0 && e > s, "README.md has no from-memory markers. " + howTo);
        String inReadme = readme.substring(s + START.length(), e).strip();
        assertEquals(generated.strip(), inReadme, "README.md's from-memory list is out of date. " + howTo);
    }

    @Test
    @DisplayName("the generated list names every from-memory parameter and rule of the shipped set")
    void generatedListIsComplete() {
        String generated = RuleListing.fromMemoryMarkdown(TestCases.SHIPPED);
        TestCases.SHIPPED.parameters().values().stream().filter(p -> p.basis() == Basis.FROM_MEMORY)
                .forEach(p -> assertTrue(generated.contains("`" + p.id() + "`"), p.id()));
        TestCases.SHIPPED.rules().stream().filter(r -> r.basis() == Basis.FROM_MEMORY)
                .forEach(r -> assertTrue(generated.contains("`" + r.id() + "`"), r.id()));
        assertFalse(generated.contains("`hyperviscosity.likely`"), "a published rule is not listed");
        assertTrue(generated.contains("`leukocrit.volume.lymphoblast.high` = 250 fL"));
        // published or secondary since issue 12: no longer listed
        assertFalse(generated.contains("`exchange.intravascularFraction.IgM`"), "IgM 0.78 is published, secondary");
        assertFalse(generated.contains("`apheresis.leukostasis`"), "ASFA categories are a secondary transcription");
    }
}
