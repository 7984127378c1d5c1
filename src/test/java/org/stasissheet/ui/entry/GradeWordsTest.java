package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The grade pickers' hint: Novotny 2005's wording was not found, so the form says so beside the pickers. */
class GradeWordsTest {
    @Test
    @DisplayName("the grade hint keeps the 0–3 meaning and marks the descriptors unverified")
    void hintMarksUnverified() {
        // 0 none · 1 slight · 2 marked · 3 severe: the limitation scale as quoted by Piccirillo et al. 2009
        assertTrue(GradeWords.HINT.startsWith("0 none · 1 slight · 2 marked · 3 severe"), GradeWords.HINT);
        assertTrue(GradeWords.HINT.contains("unverified — check the source"), GradeWords.HINT);
    }
}
