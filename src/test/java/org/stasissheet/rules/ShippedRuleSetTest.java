package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.RuleSources;

class ShippedRuleSetTest {
    @Test
    @DisplayName("the shipped set loads whole, is not local, and has every required parameter")
    void shippedLoads() {
        LoadResult r = RuleSources.shipped();
        if (r instanceof LoadResult.Refused refused) {
            fail(String.join("\n", refused.problems().stream().map(RuleProblem::toString).toList()));
        }
        RuleSet set = ((LoadResult.Loaded) r).ruleSet();
        assertFalse(set.provenance().local());
        assertEquals("stasis-sheet-shipped", set.provenance().name());
        assertEquals(64, set.provenance().sha256().length());
        RequiredParameters.ALL.forEach(req -> assertTrue(set.parameters().containsKey(req.id()), req.id()));
    }

    @Test
    @DisplayName("the rules/ folder in the source tree is the same set as the class-path copy (not local)")
    void folderEqualsShipped() {
        LoadResult r = RuleSources.folder(Path.of("rules"));
        assertInstanceOf(LoadResult.Loaded.class, r, () -> r.toString());
        assertFalse(((LoadResult.Loaded) r).ruleSet().provenance().local());
    }
}
