package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.measure.Analyte;

/**
 * The same invented patient entered in SI and in conventional units gives the same verdicts and flags.
 * Conversions: UCUM definitions and IUPAC molar masses (uric acid 168.11, phosphorus 30.974, calcium 40.078,
 * creatinine 113.12 g/mol); the figure pairs are Cairo–Bishop's own SI/conventional pairs where they exist.
 */
class UnitVariantsTest {
    private static TestCases base() {
        return TestCases.a().age(60).findings(TestCases.noSigns()).grades(2, 1, 0)
                .signs(Observation.YES, Observation.NO, Retinopathy.VENOUS_DILATION, Observation.NO)
                .leukemia(Leukemia.AML, false).paraprotein(Paraprotein.IGM).plan(true, true);
    }

    private static TestCases si(TestCases t) {
        return t.lab(Analyte.WBC, 160, "10*9/L").lab(Analyte.IGM, 45, "g/L")
                .lab(Analyte.URIC_ACID, 476, "umol/L").lab(Analyte.PHOSPHATE, 1.45, "mmol/L")
                .lab(Analyte.CALCIUM, 2.2, "mmol/L").lab(Analyte.POTASSIUM, 5.0, "mmol/L")
                .lab(Analyte.CREATININE, 159.12, "umol/L").lab(Analyte.CREATININE_UPPER_LIMIT, 106.08, "umol/L")
                .lab(Analyte.TOTAL_PROTEIN, 110, "g/L").lab(Analyte.PAO2, 6.0, "kPa").lab(Analyte.SPO2, 97, "%");
    }

    private static TestCases conventional(TestCases t) {
        return t.lab(Analyte.WBC, 160000, "/uL").lab(Analyte.IGM, 4500, "mg/dL")
                .lab(Analyte.URIC_ACID, 8.0, "mg/dL").lab(Analyte.PHOSPHATE, 4.5, "mg/dL")
                .lab(Analyte.CALCIUM, 8.8176, "mg/dL").lab(Analyte.POTASSIUM, 5.0, "meq/L")
                .lab(Analyte.CREATININE, 1.8, "mg/dL").lab(Analyte.CREATININE_UPPER_LIMIT, 1.2, "mg/dL")
                .lab(Analyte.TOTAL_PROTEIN, 11, "g/dL").lab(Analyte.PAO2, 45, "mm[Hg]").lab(Analyte.SPO2, 97, "%");
    }

    @Test
    @DisplayName("SI and conventional units give the same verdicts and the same flags")
    void sameVerdicts() {
        Verdicts.Outcome a = si(base()).assess();
        Verdicts.Outcome b = conventional(base()).assess();
        assertEquals(a.hyperviscosity().assessment(), b.hyperviscosity().assessment());
        assertEquals(a.leukostasis().probability(), b.leukostasis().probability());
        assertEquals(a.leukostasis().score(), b.leukostasis().score());
        assertEquals(a.tumorLysis().laboratory(), b.tumorLysis().laboratory());
        assertEquals(a.tumorLysis().clinical(), b.tumorLysis().clinical());
        assertEquals(a.flags(), b.flags());
        // the case is built to sit on several limits at once, so the comparison is not vacuous
        assertEquals(java.util.Optional.of(true), a.tumorLysis().clinical());
        assertEquals("likely", a.hyperviscosity().assessment().code());
        assertTrue(a.flags().stream().anyMatch(f -> f.id().equals("artefact.spurious-hypoxaemia")));
        assertTrue(a.flags().stream().anyMatch(f -> f.id().equals("hyperviscosity.igm-flare")));
    }
}
