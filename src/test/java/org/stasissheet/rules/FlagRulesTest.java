package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.intake.Cryoglobulin;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.measure.Analyte;

/** One test (fires / does not fire) for each shipped rule; the source of each is named beside it. */
class FlagRulesTest {
    private static TestCases symptomaticIgm() {
        return TestCases.a().findings(TestCases.noSigns())
                .signs(Observation.YES, Observation.NO, Retinopathy.NONE, Observation.NO)
                .paraprotein(Paraprotein.IGM).lab(Analyte.SERUM_VISCOSITY, 5.6, "cP");
    }

    private static TestCases aml(double wbc) {
        return TestCases.a().findings(TestCases.noSigns()).leukemia(Leukemia.AML, false).lab(Analyte.WBC, wbc, "10*9/L");
    }

    @Test
    @DisplayName("every shipped rule is covered by a test in this class")
    void everyRuleCovered() throws Exception {
        String source = new String(getClass().getResourceAsStream("FlagRulesTest.class").readAllBytes(),
                java.nio.charset.StandardCharsets.ISO_8859_1);
        List<String> missing = TestCases.SHIPPED.rules().stream().map(Rule::id).filter(id -> !source.contains(id))
                .toList();
        assertEquals(List.of(), missing, "rules without a test");
    }

    @Test
    @DisplayName("flags are sorted by level, then id")
    void sorted() {
        List<Flag> flags = symptomaticIgm().plan(false, true).assess().flags();
        for (int i = 1; i < flags.size(); i++) {
            Flag a = flags.get(i - 1);
            Flag b = flags.get(i);
            assertTrue(a.level().compareTo(b.level()) < 0
                    || a.level() == b.level() && a.id().compareTo(b.id()) < 0, a.id() + " before " + b.id());
        }
    }

    @Test
    @DisplayName("hyperviscosity.likely (Gertz 2018); no-diuretics, transfusion-caution (common practice)")
    void hyperviscosityCautions() {
        Set<String> on = ids(symptomaticIgm());
        assertTrue(on.containsAll(Set.of("hyperviscosity.likely", "hyperviscosity.no-diuretics",
                "hyperviscosity.transfusion-caution", "apheresis.hyperviscosity-symptomatic")), on.toString());
        assertFalse(on.contains("hyperviscosity.transfusion-planned"));
        Set<String> off = ids(TestCases.a().findings(TestCases.noSigns()).lab(Analyte.SERUM_VISCOSITY, 1.6, "cP"));
        assertFalse(off.contains("hyperviscosity.no-diuretics"));
        assertFalse(off.contains("hyperviscosity.likely"));
    }

    @Test
    @DisplayName("hyperviscosity.transfusion-planned is act-now (common practice)")
    void transfusionPlannedInHyperviscosity() {
        assertTrue(symptomaticIgm().plan(false, true).fires("hyperviscosity.transfusion-planned"));
    }

    @Test
    @DisplayName("hyperviscosity.measure-viscosity-now / measure-both-now (Gertz 2018)")
    void measureNow() {
        TestCases noSv = TestCases.a().findings(TestCases.noSigns()).paraprotein(Paraprotein.IGM)
                .lab(Analyte.IGM, 3.5, "g/dL");
        assertTrue(noSv.fires("hyperviscosity.measure-viscosity-now"));
        assertFalse(symptomaticIgm().fires("hyperviscosity.measure-viscosity-now"));
        assertFalse(symptomaticIgm().fires("hyperviscosity.measure-both-now"));
    }

    @Test
    @DisplayName("hyperviscosity.fundoscopy (Menke 2006) and signs-unassessed only with a paraprotein")
    void fundoscopy() {
        assertTrue(TestCases.a().paraprotein(Paraprotein.IGA).fires("hyperviscosity.fundoscopy"));
        assertFalse(TestCases.a().fires("hyperviscosity.fundoscopy"));
        assertFalse(symptomaticIgm().fires("hyperviscosity.fundoscopy"));
        assertFalse(symptomaticIgm().fires("hyperviscosity.signs-unassessed"));
    }

    @ParameterizedTest(name = "IgM {0} {1}, rituximab {2} -> {3}")
    @CsvSource({
        // IWWM-8 (Leblond 2016): "> 4000 mg/dL", so 40 g/L itself does not trigger
        "40,    g/L,   true,  false",
        "40.1,  g/L,   true,  true",
        "4001,  mg/dL, true,  true",
        "4000,  mg/dL, true,  false",
        "60,    g/L,   false, false"})
    void igmFlare(double igm, String unit, boolean rituximab, boolean expected) {
        TestCases t = TestCases.a().paraprotein(Paraprotein.IGM).lab(Analyte.IGM, igm, unit).plan(rituximab, false);
        assertEquals(expected, t.fires("hyperviscosity.igm-flare"));
        assertEquals(expected, t.fires("apheresis.rituximab-prophylaxis"));
    }

    @Test
    @DisplayName("hyperviscosity.cryoglobulin-warm (common practice)")
    void cryoglobulin() {
        assertTrue(TestCases.a().cryoglobulin(Cryoglobulin.PRESENT).fires("hyperviscosity.cryoglobulin-warm"));
        assertFalse(TestCases.a().cryoglobulin(Cryoglobulin.UNKNOWN).fires("hyperviscosity.cryoglobulin-warm"));
    }

    @Test
    @DisplayName("leukostasis.apl-no-leukapheresis (Blum & Porcu 2007) and leukostasis.dic-screen (common practice)")
    void apl() {
        TestCases apl = TestCases.a().leukemia(Leukemia.APL, false).lab(Analyte.WBC, 20, "10*9/L");
        assertTrue(apl.fires("leukostasis.apl-no-leukapheresis"));
        assertTrue(apl.fires("leukostasis.dic-screen"));
        assertTrue(aml(150).fires("leukostasis.dic-screen"));
        assertFalse(aml(80).fires("leukostasis.dic-screen"));
        assertFalse(aml(150).fires("leukostasis.apl-no-leukapheresis"));
    }

    @Test
    @DisplayName("leukostasis.transfusion-caution / transfusion-planned (Harris, BMJ 1978)")
    void transfusionInHyperleukocytosis() {
        assertTrue(aml(150).fires("leukostasis.transfusion-caution"));
        assertFalse(aml(150).fires("leukostasis.transfusion-planned"));
        assertTrue(aml(150).plan(false, true).fires("leukostasis.transfusion-planned"));
        assertFalse(aml(90).plan(false, true).fires("leukostasis.transfusion-planned"));
    }

    @Test
    @DisplayName("leukostasis.probable (common practice) at probable and highly probable only")
    void leukostasisProbable() {
        assertTrue(aml(150).grades(2, 0, 0).fires("leukostasis.probable"));
        assertTrue(aml(150).grades(0, 3, 0).fires("leukostasis.probable"));
        assertFalse(aml(150).grades(1, 0, 0).fires("leukostasis.probable"));
    }

    @Test
    @DisplayName("apheresis.leukostasis / hyperleukocytosis-prophylaxis (ASFA 2023, secondary transcription), never in APL")
    void leukapheresisIndications() {
        assertTrue(aml(150).grades(1, 0, 0).fires("apheresis.leukostasis"));
        assertFalse(aml(150).grades(1, 0, 0).fires("apheresis.hyperleukocytosis-prophylaxis"));
        assertTrue(aml(150).fires("apheresis.hyperleukocytosis-prophylaxis"));
        TestCases apl = TestCases.a().findings(TestCases.noSigns()).grades(2, 0, 0).leukemia(Leukemia.APL, false)
                .lab(Analyte.WBC, 150, "10*9/L");
        assertFalse(apl.fires("apheresis.leukostasis"));
        assertFalse(apl.fires("apheresis.hyperleukocytosis-prophylaxis"));
    }

    @Test
    @DisplayName("tumorLysis.screen (common practice) when hyperleukocytosis and too few values")
    void tumorLysisScreen() {
        assertTrue(aml(150).fires("tumorLysis.screen"));
        assertFalse(aml(150).lab(Analyte.POTASSIUM, 4, "mmol/L").lab(Analyte.CALCIUM, 2.3, "mmol/L")
                .fires("tumorLysis.screen"));
    }

    @ParameterizedTest(name = "WBC {0}, PaO2 {1} {2}, SpO2 {3} -> {4}")
    @CsvSource({
        // Van de Louw 2016: WBC > 100, PaO2 < 55 mmHg, SpO2 > 94 %
        "150,    50,  mm[Hg], 97, true",
        "100,    50,  mm[Hg], 97, false",
        "100.01, 50,  mm[Hg], 97, true",
        "150,    55,  mm[Hg], 97, false",
        "150,    54.9, mm[Hg], 97, true",
        "150,    50,  mm[Hg], 94, false",
        "150,    6.5, kPa,    97, true",
        "150,    7.4, kPa,    97, false"})
    void spuriousHypoxaemia(double wbc, double pao2, String unit, double spo2, boolean expected) {
        TestCases t = TestCases.a().lab(Analyte.WBC, wbc, "10*9/L").lab(Analyte.PAO2, pao2, unit)
                .lab(Analyte.SPO2, spo2, "%");
        assertEquals(expected, t.fires("artefact.spurious-hypoxaemia"));
    }

    @ParameterizedTest(name = "{0} WBC {1}, K {2} -> {3}")
    @CsvSource({
        // CLL from WBC 50 (series of 991 CLL patients, as quoted), any leukemia from 100 (common practice; Rifkin
        // 2011, Ku 2014); potassium from 6.0 (UK Kidney Association hyperkalaemia guideline, as quoted); all included
        "CLL, 300,   6.0,  true",
        "CLL, 300,   5.99, false",
        "CLL, 50,    6.5,  true",
        "CLL, 49.99, 6.5,  false",
        "AML, 99.99, 6.5,  false",
        "AML, 100,   6.5,  true"})
    void pseudohyperkalaemia(String type, double wbc, double k, boolean expected) {
        TestCases t = TestCases.a().leukemia(org.stasissheet.intake.Enums.parse(Leukemia.class, type).orElseThrow(),
                false).lab(Analyte.WBC, wbc, "10*9/L").lab(Analyte.POTASSIUM, k, "mmol/L");
        assertEquals(expected, t.fires("artefact.pseudohyperkalaemia"));
        // the ECG flag never depends on the doubt: a false reassurance here kills, a false alarm costs an ECG
        assertEquals(k >= 6.0, t.fires("hyperkalaemia.ecg-now") || t.fires("hyperkalaemia.severe-monitor"));
    }

    @ParameterizedTest(name = "total protein {0} {1} -> {2}")
    @CsvSource({"100, g/L, true", "99.9, g/L, false", "10, g/dL, true", "12, g/dL, true"})
    void pseudohyponatraemia(double tp, String unit, boolean expected) {
        // limit 100 g/L from memory, included
        assertEquals(expected, TestCases.a().lab(Analyte.TOTAL_PROTEIN, tp, unit).fires("artefact.pseudohyponatraemia"));
    }

    @ParameterizedTest(name = "WBC {0}, PaO2 {1} {2} -> {3}")
    @CsvSource({
        // Van de Louw 2016: WBC > 100, PaO2 < 55 mmHg; a low value is never dismissed, whatever the oximeter says
        "150,    50,   mm[Hg], true",
        "100,    50,   mm[Hg], false",
        "100.01, 50,   mm[Hg], true",
        "150,    55,   mm[Hg], false",
        "150,    54.9, mm[Hg], true",
        "150,    6.5,  kPa,    true"})
    void lowOxygenHighCount(double wbc, double pao2, String unit, boolean expected) {
        TestCases t = TestCases.a().lab(Analyte.WBC, wbc, "10*9/L").lab(Analyte.PAO2, pao2, unit)
                .lab(Analyte.SPO2, 88, "%");
        assertEquals(expected, t.fires("artefact.low-oxygen-high-count"));
        String explanation = TestCases.SHIPPED.rules().stream().filter(r -> r.id().equals("artefact.low-oxygen-high-count"))
                .findFirst().orElseThrow().flag().explanation();
        assertTrue(explanation.contains("true hypoxaemia"), explanation);
        assertFalse(explanation.contains("trust the pulse oximeter"), explanation);
    }

    @ParameterizedTest(name = "K {0} mmol/L -> ECG now {1}, severe {2}")
    @CsvSource({
        // UK Kidney Association, acute hyperkalaemia in adults (as quoted): moderate 6.0-6.4, severe >= 6.5
        "5.99, false, false",
        "6.0,  true,  false",
        "6.49, true,  false",
        "6.5,  false, true",
        "6.8,  false, true"})
    void hyperkalaemia(double k, boolean moderate, boolean severe) {
        TestCases t = TestCases.a().lab(Analyte.POTASSIUM, k, "mmol/L");
        assertEquals(moderate, t.fires("hyperkalaemia.ecg-now"));
        assertEquals(severe, t.fires("hyperkalaemia.severe-monitor"));
        assertEquals(moderate || severe, t.assess().flags().stream().anyMatch(f -> f.level() == Level.ACT_NOW));
    }

    @Test
    @DisplayName("tumorLysis.unconfirmed: a potassium at a count where it may leak is counted, flagged, never dropped")
    void tumorLysisUnconfirmed() {
        TestCases cll = TestCases.a().leukemia(Leukemia.CLL, false).lab(Analyte.WBC, 120, "10*9/L")
                .lab(Analyte.POTASSIUM, 6.8, "mmol/L").lab(Analyte.URIC_ACID, 500, "umol/L");
        assertTrue(cll.fires("tumorLysis.unconfirmed"));
        assertTrue(cll.fires("tumorLysis.laboratory"));
        assertTrue(cll.assess().tumorLysis().dependsOnUnconfirmed());
        // with two other criteria met the verdict no longer rests on the potassium
        assertFalse(cll.lab(Analyte.PHOSPHATE, 2.0, "mmol/L").fires("tumorLysis.unconfirmed"));
        TestCases lowCount = TestCases.a().leukemia(Leukemia.CLL, false).lab(Analyte.WBC, 30, "10*9/L")
                .lab(Analyte.POTASSIUM, 6.8, "mmol/L").lab(Analyte.URIC_ACID, 500, "umol/L");
        assertFalse(lowCount.fires("tumorLysis.unconfirmed"));
        assertTrue(lowCount.fires("tumorLysis.laboratory"));
    }

    @ParameterizedTest(name = "APL WBC {0}, fibrinogen {1} g/L, platelets {2} -> high risk {3}, coagulopathy {4}")
    @CsvSource(nullValues = "-", value = {
        // Sanz 2000 score: high risk WBC > 10; ELN 2019 (Sanz 2019, rec. 1.6): fibrinogen above 1.0-1.5 g/L and
        // platelets above 30-50 x 10^9/L, the upper ends used
        "60,    0.8, 12, true,  true",
        "10,    2.0, 80, false, false",
        "10.01, 2.0, 80, true,  false",
        "5,     1.5, 50, false, false",
        "5,     1.49, 80, false, true",
        "5,     2.0, 49.9, false, true"})
    void aplEmergency(double wbc, Double fibrinogen, Double platelets, boolean highRisk, boolean coagulopathy) {
        TestCases t = TestCases.a().leukemia(Leukemia.APL, false).lab(Analyte.WBC, wbc, "10*9/L")
                .lab(Analyte.FIBRINOGEN, fibrinogen, "g/L").lab(Analyte.PLATELETS, platelets, "10*9/L");
        assertTrue(t.fires("apl.start-atra"));
        assertEquals(highRisk, t.fires("apl.high-risk"));
        assertEquals(coagulopathy, t.fires("apl.coagulopathy"));
        assertFalse(t.fires("apl.measure-coagulation"));
        assertFalse(t.fires("apl.differentiation-watch"));
        assertTrue(t.therapyStarted("2026-06-10").fires("apl.differentiation-watch"));
    }

    @Test
    @DisplayName("apl.measure-coagulation when fibrinogen or platelets are missing; no APL rule outside APL")
    void aplCoagulationUnmeasured() {
        assertTrue(TestCases.a().leukemia(Leukemia.APL, false).fires("apl.measure-coagulation"));
        assertFalse(aml(150).fires("apl.start-atra"));
        assertFalse(aml(150).fires("apl.measure-coagulation"));
    }

    @Test
    @DisplayName("hyperviscosity.treat-on-picture is act-now for signs with a possible verdict (Gertz 2018)")
    void treatOnPicture() {
        TestCases low = TestCases.a().findings(TestCases.noSigns()).paraprotein(Paraprotein.IGA)
                .signs(Observation.YES, Observation.YES, Retinopathy.HAEMORRHAGES, Observation.NO)
                .lab(Analyte.SERUM_VISCOSITY, 2.8, "cP");
        assertTrue(low.fires("hyperviscosity.treat-on-picture"));
        assertFalse(symptomaticIgm().fires("hyperviscosity.treat-on-picture"), "likely has its own act-now flag");
        assertFalse(TestCases.a().findings(TestCases.noSigns()).paraprotein(Paraprotein.IGA)
                .lab(Analyte.SERUM_VISCOSITY, 2.8, "cP").fires("hyperviscosity.treat-on-picture"));
    }

    @ParameterizedTest(name = "cryoglobulin {0}, read at {1} °C -> {2}")
    @CsvSource(nullValues = "-", value = {
        // common practice (laboratory handbooks): a cryoglobulin sample must stay at 37 °C
        "present, 22,   not-trusted",
        "present, 36.9, not-trusted",
        "present, 37,   trusted",
        "present, -,    not-trusted",
        "unknown, 22,   not-trusted",
        "unknown, -,    warmth-unconfirmed",
        "absent,  22,   trusted",
        "absent,  -,    trusted"})
    void viscosityTrust(String cryo, Double celsius, String expected) {
        TestCases t = TestCases.a().findings(TestCases.noSigns()).paraprotein(Paraprotein.IGM)
                .cryoglobulin(org.stasissheet.intake.Enums.parse(Cryoglobulin.class, cryo).orElseThrow())
                .viscosityAt(2.0, celsius);
        assertEquals(expected, t.assess().hyperviscosity().viscosity().code());
        assertEquals(expected.equals("not-trusted"), t.fires("hyperviscosity.viscosity-not-trusted"));
        assertEquals(expected.equals("warmth-unconfirmed"), t.fires("hyperviscosity.confirm-warm-sample"));
    }

    @Test
    @DisplayName("hyperviscosity.examine-first and signs-other-cause (Mehta & Singhal 2003; Gertz 2018)")
    void examineFirstAndOtherCause() {
        TestCases unexamined = TestCases.a().paraprotein(Paraprotein.IGM).lab(Analyte.SERUM_VISCOSITY, 3.5, "cP");
        assertTrue(unexamined.fires("hyperviscosity.examine-first"));
        assertTrue(unexamined.plan(false, true).fires("hyperviscosity.transfusion-planned"));
        assertFalse(TestCases.a().findings(TestCases.noSigns()).paraprotein(Paraprotein.IGM)
                .lab(Analyte.SERUM_VISCOSITY, 3.5, "cP").fires("hyperviscosity.examine-first"));
        TestCases normal = TestCases.a().findings(TestCases.noSigns()).paraprotein(Paraprotein.IGM)
                .signs(Observation.YES, Observation.NO, Retinopathy.NONE, Observation.NO)
                .lab(Analyte.SERUM_VISCOSITY, 1.6, "cP");
        assertTrue(normal.fires("hyperviscosity.signs-other-cause"));
        assertFalse(normal.fires("hyperviscosity.treat-on-picture"));
    }

    @Test
    @DisplayName("leukostasis gating flags: needs-diagnosis, below-type-level, exclude-apl, acute-untyped, possible")
    void leukostasisGating() {
        TestCases none60 = TestCases.a().findings(TestCases.noSigns()).grades(3, 0, 0).lab(Analyte.WBC, 60, "10*9/L");
        assertTrue(none60.fires("leukostasis.needs-diagnosis"));
        assertFalse(none60.fires("leukostasis.probable"));
        assertFalse(TestCases.a().lab(Analyte.WBC, 49.9, "10*9/L").fires("leukostasis.needs-diagnosis"));
        TestCases cll120 = TestCases.a().findings(TestCases.noSigns()).leukemia(Leukemia.CLL, false).grades(2, 0, 0)
                .lab(Analyte.WBC, 120, "10*9/L");
        assertTrue(cll120.fires("leukostasis.below-type-level"));
        assertFalse(cll120.grades(0, 0, 0).fires("leukostasis.below-type-level"));
        TestCases untyped = TestCases.a().findings(TestCases.noSigns()).leukemia(Leukemia.ACUTE_UNTYPED, false)
                .lab(Analyte.WBC, 100.01, "10*9/L");
        assertTrue(untyped.fires("leukostasis.exclude-apl"));
        assertTrue(untyped.fires("hyperleukocytosis.acute-untyped"));
        assertTrue(untyped.fires("leukostasis.dic-screen"));
        assertFalse(untyped.lab(Analyte.WBC, 100, "10*9/L").fires("hyperleukocytosis.acute-untyped"));
        assertTrue(aml(150).grades(1, 0, 0).fires("leukostasis.possible"));
        assertFalse(aml(150).grades(2, 0, 0).fires("leukostasis.possible"));
        assertTrue(aml(150).grades(0, null, 0).fires("leukostasis.examine-first"));
        assertFalse(aml(150).fires("leukostasis.examine-first"));
    }

    @Test
    @DisplayName("hyperleukocytosis.* by type are tested with their limits in LeukostasisVerdictTest")
    void hyperleukocytosisRulesExist() {
        Set<String> ids = TestCases.SHIPPED.rules().stream().map(Rule::id).collect(Collectors.toSet());
        assertTrue(ids.containsAll(Set.of("hyperleukocytosis.AML", "hyperleukocytosis.AMLMonocytic",
                "hyperleukocytosis.APL", "hyperleukocytosis.ALL", "hyperleukocytosis.CML", "hyperleukocytosis.CLL")));
        assertTrue(ids.containsAll(Set.of("tumorLysis.clinical", "tumorLysis.laboratory",
                "tumorLysis.window-not-confirmed")), "tested in TumorLysisVerdictTest");
    }

    @Test
    @DisplayName("every flag carries a source and a basis")
    void everyFlagSourced() {
        symptomaticIgm().plan(true, true).assess().flags().forEach(f -> {
            assertFalse(f.source().isBlank(), f.id());
            assertNotNull(f.basis());
        });
    }

    private static Set<String> ids(TestCases t) {
        return t.assess().flags().stream().map(Flag::id).collect(Collectors.toSet());
    }
}
