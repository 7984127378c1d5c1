package org.stasissheet.ui.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.apheresis.EstimateFixtures;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Cautions;

/** The form's worksheet side (toolkit-free model): both exchange projections and the unverified grade mark. */
@DisplayName("form worksheet: exchange projections and unverified grades")
class SheetContentProjectionTest {
    private final SheetContent content = SheetContent.of(
            Assessor.assess(EstimateFixtures.formatExample(), EstimateFixtures.rules()), List.of());

    @Test
    @DisplayName("each exchange line has the paraprotein and the viscosity right after and after redistribution")
    void exchangeLines() {
        SheetContent.ExchangeLine one = content.exchanges().get(0);
        // by hand (CASE-FORMAT example, IgM 59 g/L, SV 5.6, f = 0.78 Reverberi 2007 as quoted, V = 1):
        // 59 × e^−1 = 21.7; 59 × 0.506946 = 29.9; 1.6 × 3.5^0.367879 = 2.54; 1.6 × 3.5^0.506946 = 3.02
        assertEquals("21.7 g/L", one.paraproteinImmediate());
        assertEquals("29.9 g/L", one.paraproteinAfterRedistribution());
        assertEquals("2.54", one.viscosityImmediate());
        assertEquals("3.02", one.viscosityAfterRedistribution());
    }

    @Test
    @DisplayName("the leukostasis card says its descriptors and combination rule are unverified")
    void leukostasisCard() {
        SheetContent.VerdictCard card = content.verdicts().stream().filter(v -> v.id().equals("leukostasis"))
                .findFirst().orElseThrow();
        assertTrue(card.lines().contains(Cautions.GRADING_UNVERIFIED), card.lines().toString());
    }

    @Test
    @DisplayName("the leukocrit note gives a range, not one number (ALL 82–250 fL, DOMAIN.md §6)")
    void leukocritNote() {
        SheetContent leukemic = SheetContent.of(Assessor.assess(EstimateFixtures.aCase()
                .leukemia(org.stasissheet.intake.Leukemia.ALL)
                .lab(org.stasissheet.measure.Analyte.HEMATOCRIT, 0.25, "1")
                .lab(org.stasissheet.measure.Analyte.WBC, 300, "10*9/L").build(), EstimateFixtures.rules()),
                List.of());
        // by hand: 300 × 82e-6 = 0.0246, 300 × 250e-6 = 0.075
        assertTrue(leukemic.flow().notes().stream().anyMatch(n -> n.startsWith("Leukocrit 0.0246–0.075")),
                leukemic.flow().notes().toString());
    }
}
