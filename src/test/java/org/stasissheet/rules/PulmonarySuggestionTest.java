package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.measure.Analyte;

/**
 * The pulmonary grade suggested from the oxygen values. Cut-offs, both from memory and tagged so in the rule set: a
 * saturation target of 94–98 % in acute oxygen guidelines for adults (below 94 % oxygen is needed), and hypoxaemic
 * respiratory failure as PaO2 below 60 mmHg (8 kPa). The artefacts at very high counts: Van de Louw A et al., Respir
 * Care 2016;61(1):8-14 [published]. Grade 3's descriptor: {@link LeukostasisVerdict#DESCRIPTORS}.
 */
class PulmonarySuggestionTest {
    private static PulmonarySuggestion suggest(TestCases t) {
        return PulmonarySuggestion.of(t.build(), TestCases.SHIPPED);
    }

    @ParameterizedTest(name = "SpO2 {0} % -> grade {1}")
    @CsvSource(nullValues = "-", value = {
        // at the lower end of the 94-98 % target range (from memory): no oxygen need shown
        "94, -",
        "93.9, 3",
        "94.1, -",
        // the saturation of the night resident's case
        "88, 3",
        "98, -"})
    void saturationCutOff(double spo2, Integer grade) {
        PulmonarySuggestion s = suggest(TestCases.a().lab(Analyte.SPO2, spo2, "%"));
        assertEquals(Optional.ofNullable(grade), s.suggested());
        assertEquals(Optional.ofNullable(grade), s.calledFor());
        assertEquals(grade != null, s.oxygenNeed().startsWith("Oxygen needed"), s.oxygenNeed());
    }

    @ParameterizedTest(name = "PaO2 {0} {1} -> grade {2}")
    @CsvSource(nullValues = "-", value = {
        // hypoxaemic respiratory failure below 60 mmHg / 8 kPa (from memory)
        "60, mm[Hg], -",
        "59.9, mm[Hg], 3",
        "60.1, mm[Hg], -",
        // the kPa figure is compared as written, so 8 kPa (= 60.0 mmHg by UCUM, 1 mm[Hg] = 133.322 Pa) is at the limit
        "8, kPa, -",
        "7.9, kPa, 3",
        "8.1, kPa, -"})
    void tensionCutOff(double value, String unit, Integer grade) {
        PulmonarySuggestion s = suggest(TestCases.a().lab(Analyte.PAO2, value, unit));
        assertEquals(Optional.ofNullable(grade), s.suggested());
    }

    @ParameterizedTest(name = "grade set {0}, SpO2 88 % -> suggested {1}")
    @CsvSource(nullValues = "-", value = {"-, 3", "0, 3", "1, 3", "2, 3", "3, -"})
    @DisplayName("a suggestion is only ever higher than the grade the clinician set")
    void neverLowersTheGradeSet(Integer set, Integer suggested) {
        PulmonarySuggestion s = suggest(TestCases.a().grades(set, null, null).lab(Analyte.SPO2, 88, "%"));
        assertEquals(Optional.ofNullable(suggested), s.suggested());
        assertEquals(Optional.of(3), s.calledFor(), "the oxygen need is still shown");
        assertEquals(Optional.ofNullable(set), s.gradeSet());
    }

    @Test
    @DisplayName("normal values never suggest a lower grade than the one set")
    void normalValuesLeaveAHighGradeAlone() {
        PulmonarySuggestion s = suggest(TestCases.a().grades(3, null, null).lab(Analyte.SPO2, 97, "%")
                .lab(Analyte.PAO2, 90, "mm[Hg]"));
        assertFalse(s.offered());
        assertTrue(s.oxygenNeed().contains("If they were measured on oxygen"), s.oxygenNeed());
    }

    @Test
    @DisplayName("no oxygen values: nothing suggested, and the sheet says what to measure")
    void noValuesSaysWhatToCheck() {
        PulmonarySuggestion s = suggest(TestCases.a());
        assertFalse(s.offered());
        assertTrue(s.oxygenNeed().contains("Measure the saturation"), s.oxygenNeed());
        assertTrue(s.cautions().isEmpty());
    }

    @Test
    @DisplayName("above WBC 100 a low PaO2 is still suggested, with both artefact cautions (Van de Louw 2016)")
    void highCountCautions() {
        PulmonarySuggestion s = suggest(TestCases.a().leukemia(Leukemia.AML, false).lab(Analyte.WBC, 150, "10*9/L")
                .lab(Analyte.PAO2, 50, "mm[Hg]").lab(Analyte.SPO2, 96, "%"));
        assertEquals(Optional.of(3), s.suggested(), "true hypoxaemia also occurs: never dismissed");
        assertEquals(2, s.cautions().size(), s.cautions().toString());
        assertTrue(s.cautions().get(0).contains("may be spurious"), s.cautions().get(0));
        assertTrue(s.cautions().get(1).contains("mislead either way"), s.cautions().get(1));
        assertTrue(String.join(" ", s.cautions()).contains("Van de Louw"));
    }

    @Test
    @DisplayName("at WBC 100 exactly ('above 100') no artefact caution; without a count the doubt is named")
    void cautionLimits() {
        assertTrue(suggest(TestCases.a().lab(Analyte.WBC, 100, "10*9/L").lab(Analyte.PAO2, 50, "mm[Hg]"))
                .cautions().isEmpty());
        PulmonarySuggestion noCount = suggest(TestCases.a().lab(Analyte.PAO2, 50, "mm[Hg]"));
        assertEquals(1, noCount.cautions().size());
        assertTrue(noCount.cautions().get(0).startsWith("White count not entered"), noCount.cautions().get(0));
    }

    @Test
    @DisplayName("the basis names both cut-offs, their from-memory source and the grade 3 descriptor")
    void basisIsShown() {
        PulmonarySuggestion s = suggest(TestCases.a().lab(Analyte.SPO2, 88, "%"));
        assertTrue(s.basis().contains("94 %"), s.basis());
        assertTrue(s.basis().contains("60 mmHg / 8 kPa"), s.basis());
        assertTrue(s.basis().contains(Basis.FROM_MEMORY.words()), s.basis());
        assertTrue(s.basis().contains(LeukostasisVerdict.descriptor(LeukostasisVerdict.Organ.PULMONARY, 3)));
        assertTrue(s.headline().orElseThrow().startsWith("Suggested pulmonary grade 3"));
    }

    @Test
    @DisplayName("a local protocol's own target moves the cut-off (for example 88 % where hypercapnia is a risk)")
    void localTargetIsUsed() {
        java.util.Map<String, Parameter> p = new java.util.LinkedHashMap<>(TestCases.SHIPPED.parameters());
        Parameter old = p.get(RequiredParameters.SUGGEST_SPO2_TARGET_LOW);
        p.put(old.id(), new Parameter(old.id(), new org.stasissheet.measure.Quantity(88, "%"), "local protocol",
                Basis.COMMON_PRACTICE, ""));
        RuleSet local = new RuleSet(TestCases.SHIPPED.provenance(), "local", p, TestCases.SHIPPED.rules());
        assertFalse(PulmonarySuggestion.of(TestCases.a().lab(Analyte.SPO2, 90, "%").build(), local).offered());
        assertTrue(PulmonarySuggestion.of(TestCases.a().lab(Analyte.SPO2, 87, "%").build(), local).offered());
    }

    @Test
    @DisplayName("the shipped cut-offs are tagged from memory, as no source in our reference gives them")
    void shippedCutOffsAreFromMemory() {
        for (String id : new String[] {RequiredParameters.SUGGEST_SPO2_TARGET_LOW,
                RequiredParameters.SUGGEST_PAO2_FAILURE}) {
            assertEquals(Basis.FROM_MEMORY, TestCases.SHIPPED.parameter(id).basis(), id);
        }
    }
}
