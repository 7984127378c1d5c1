package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.worksheet.Cautions;

/** The text worksheet marks the leukostasis grading's descriptors and combination rule as unverified. */
class UnverifiedMarksTextTest {
    @Test
    @DisplayName("the leukostasis verdict in the text worksheet carries 'unverified — check the source'")
    void leukostasisGradingMarked() {
        // Novotny 2005's per-organ wording was not found in the stored sources (README, "Still unverified")
        String text = WorksheetText.render(Fixtures.sheet(Fixtures.igmCase("Invented patient, bed 3"),
                Fixtures.SHIPPED));
        int verdict = text.indexOf("  Leukostasis: ");
        int mark = text.indexOf(Cautions.GRADING_UNVERIFIED);
        assertTrue(verdict >= 0 && mark > verdict, text);
    }
}
