package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.measure.Analyte;

/** Novotny JR et al., Eur J Haematol 2005; meaning of 0–3 as quoted by Piccirillo N et al., Am J Hematol 2009. */
class LeukostasisVerdictTest {
    @ParameterizedTest(name = "grades {0}/{1}/{2} -> score {3}, {4}")
    @CsvSource(nullValues = "-", value = {
        "0, 0, 0, 0, none",
        "1, 0, 0, 1, possible",
        "0, 2, 1, 2, probable",
        "1, 1, 3, 3, highly-probable",
        // an unexamined system can only raise the score: a raised score stands
        "-, 2, -, 2, probable",
        // but nothing reassuring is said while a system is unexamined
        "0, 0, -, -, not-assessable",
        "-, -, -, -, not-assessable"})
    void scoreIsTheHighestAssessedGrade(Integer pulmonary, Integer neuro, Integer other, Integer score, String word) {
        LeukostasisVerdict v = TestCases.a().leukemia(Leukemia.AML, false).grades(pulmonary, neuro, other)
                .lab(Analyte.WBC, 120, "10*9/L").assess().leukostasis();
        assertEquals(word, v.probability().code());
        assertEquals(score == null ? java.util.Optional.empty() : java.util.Optional.of(score), v.score());
    }

    @Test
    @DisplayName("score 0 is withheld until every organ system is graded, and the sheet names what to examine")
    void noReassuranceWithoutExamination() {
        TestCases t = TestCases.a().leukemia(Leukemia.AML, false).grades(0, null, null).lab(Analyte.WBC, 120, "10*9/L");
        LeukostasisVerdict v = t.assess().leukostasis();
        assertEquals(java.util.List.of("findings.neurologicalGrade", "findings.otherOrganGrade"), v.toExamine());
        assertTrue(t.fires("leukostasis.examine-first"));
    }

    @ParameterizedTest(name = "WBC {0} {1}: assessed {2}")
    @CsvSource({
        // leukostasis.assessFrom 50 x 10^9/L, included (from memory)
        "50,     10*9/L, true",
        "49.99,  10*9/L, false",
        "50.01,  10*9/L, true",
        "50000,  /uL,    true",
        "49990,  /uL,    false",
        "50,     10*3/uL, true"})
    void assessedFromFifty(double wbc, String unit, boolean assessed) {
        LeukostasisVerdict v = TestCases.a().leukemia(Leukemia.AML, false).grades(2, 0, 0).lab(Analyte.WBC, wbc, unit)
                .assess().leukostasis();
        assertEquals(assessed, v.assessed());
        assertEquals(assessed ? "probable" : "not-assessable", v.probability().code());
    }

    @Test
    @DisplayName("without a WBC the grading is not assessable, with the reason")
    void noWbc() {
        LeukostasisVerdict v = TestCases.a().grades(3, 3, 3).assess().leukostasis();
        assertEquals("not-assessable", v.probability().code());
        assertTrue(v.reason().contains("no white cell count"), v.reason());
    }

    @Test
    @DisplayName("below the entry count the reason says other causes are likelier")
    void belowEntryCount_reason() {
        String reason = TestCases.a().grades(3, 0, 0).lab(Analyte.WBC, 20, "10*9/L").assess().leukostasis().reason();
        assertTrue(reason.contains("another cause"), reason);
    }

    @Test
    @DisplayName("every organ has a descriptor for each grade 0-3, marked from memory")
    void descriptors() {
        for (LeukostasisVerdict.Organ organ : LeukostasisVerdict.Organ.values()) {
            for (int g = 0; g <= 3; g++) {
                assertFalse(LeukostasisVerdict.descriptor(organ, g).isBlank());
            }
        }
        assertEquals(Basis.FROM_MEMORY, LeukostasisVerdict.DESCRIPTOR_BASIS);
    }

    @ParameterizedTest(name = "{0} monocytic={1} WBC {2} -> hyperleukocytosis {3}")
    @CsvSource({
        // "WBC > 100" (Röllig & Ehninger 2015): the level itself is excluded
        "AML, false, 100,    false",
        "AML, false, 100.01, true",
        "AML, false, 99.99,  false",
        // monocytic AML > 50 (Röllig 2015; Porcu 2000)
        "AML, true,  50,     false",
        "AML, true,  50.01,  true",
        "APL, false, 100,    false",
        "APL, false, 100.01, true",
        "ALL, false, 100,    false",
        "ALL, false, 100.01, true",
        // CML > 200, CLL > 400: lower ends of the from-memory ranges
        "CML, false, 200,    false",
        "CML, false, 200.01, true",
        "CLL, false, 400,    false",
        "CLL, false, 400.01, true",
        "none, false, 900,   false"})
    void hyperleukocytosisByType(String type, boolean monocytic, double wbc, boolean expected) {
        TestCases t = TestCases.a().leukemia(org.stasissheet.intake.Enums.parse(Leukemia.class, type).orElseThrow(),
                monocytic).lab(Analyte.WBC, wbc, "10*9/L");
        assertEquals(java.util.Optional.of(expected), Verdicts.hyperleukocytosis(t.build(), TestCases.SHIPPED));
        String rule = "hyperleukocytosis." + (monocytic ? "AMLMonocytic" : type);
        if (!type.equals("none")) {
            assertEquals(expected, t.fires(rule), rule);
        }
    }
}
