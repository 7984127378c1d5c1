package org.stasissheet.apheresis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stasissheet.apheresis.EstimateFixtures.aCase;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.rules.RuleSet;

/**
 * What the apheresis numbers lack, said once. Nadler's blood volume needs sex, height and weight and Kaplan's plasma
 * volume weight and hematocrit (Nadler SB et al., Surgery 1962; Kaplan AA, Am J Kidney Dis 1990; DOMAIN.md §4).
 * Invented patients.
 */
class MissingInputsTest {
    private final RuleSet rules = EstimateFixtures.rules();

    @Test
    @DisplayName("no height and weight: one sentence names both fields, their section and what they give")
    void heightAndWeightMissing() {
        Case c = aCase().sex(Sex.FEMALE).leukemia(Leukemia.AML).lab(Analyte.HEMATOCRIT, 0.3, "1")
                .lab(Analyte.WBC, 150, "10*9/L").build();
        ApheresisPlan plan = ApheresisPlanner.plan(c, rules);
        assertEquals(Optional.of("Enter height and weight (Patient) to estimate the blood volume, the plasma volume,"
                + " the exchange volumes and the blood to process by leukapheresis."), plan.missing().sentence());
        assertTrue(plan.missing().covers(plan.bloodVolumeL()));
        assertTrue(plan.missing().covers(plan.plasmaVolumeL()));
        assertTrue(plan.missing().covers(plan.exchanges().get(0).volumeL()));
        assertTrue(plan.missing().covers(plan.leukapheresis().processVolumeL()));
        assertFalse(plan.missing().covers(plan.paraproteinGPerL()), "no isotype is not a missing field");
    }

    @Test
    @DisplayName("only the hematocrit missing: the sentence points to Laboratory values, the blood volume stands")
    void hematocritMissing() {
        Case c = aCase().sex(Sex.MALE).heightCm(180).weightKg(80).build();
        ApheresisPlan plan = ApheresisPlanner.plan(c, rules);
        assertEquals(Optional.of("Enter the hematocrit (Laboratory values) to estimate the plasma volume and the"
                + " exchange volumes."), plan.missing().sentence());
        assertTrue(plan.bloodVolumeL().isKnown());
        assertTrue(plan.missing().covers(plan.plasmaVolumeFromBloodVolumeL()));
    }

    @Test
    @DisplayName("everything entered, or a child (the adult formulas do not apply): no sentence")
    void nothingToEnter() {
        Case complete = aCase().sex(Sex.MALE).heightCm(180).weightKg(80).lab(Analyte.HEMATOCRIT, 0.4, "1").build();
        assertEquals(MissingInputs.NONE, ApheresisPlanner.plan(complete, rules).missing());
        Case child = aCase().age(9).lab(Analyte.HEMATOCRIT, 0.4, "1").build();
        assertEquals(MissingInputs.NONE, ApheresisPlanner.plan(child, rules).missing());
    }
}
