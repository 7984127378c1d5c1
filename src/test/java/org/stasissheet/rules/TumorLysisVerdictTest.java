package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.intake.Observation;
import org.stasissheet.measure.Analyte;

/** Cairo MS, Bishop M, Br J Haematol 2004 (thresholds as in DOMAIN.md §3, from two secondary tables). */
class TumorLysisVerdictTest {
    /** A case with potassium already meeting its criterion, so the analyte under test decides "laboratory". */
    private static TestCases withHighPotassium() {
        return TestCases.a().lab(Analyte.POTASSIUM, 6.5, "mmol/L");
    }

    private static boolean met(TestCases t, Analyte a) {
        return t.assess().tumorLysis().criteria().stream().filter(c -> c.analyte() == a).findFirst()
                .orElseThrow().met();
    }

    @ParameterizedTest(name = "{0} {1} {2} -> met {3}")
    @CsvSource({
        // SI and conventional figures of the Cairo–Bishop table; at the limit is included (>= / <=)
        "uricAcid,  476,   umol/L, true",
        "uricAcid,  475,   umol/L, false",
        "uricAcid,  477,   umol/L, true",
        "uricAcid,  8.0,   mg/dL,  true",
        "uricAcid,  7.9,   mg/dL,  false",
        "uricAcid,  0.476, mmol/L, true",
        "potassium, 6.0,   mmol/L, true",
        "potassium, 5.99,  mmol/L, false",
        "potassium, 6.0,   meq/L,  true",
        "phosphate, 1.45,  mmol/L, true",
        "phosphate, 1.44,  mmol/L, false",
        "phosphate, 4.5,   mg/dL,  true",
        "phosphate, 4.4,   mg/dL,  false",
        "calcium,   1.75,  mmol/L, true",
        "calcium,   1.76,  mmol/L, false",
        "calcium,   1.74,  mmol/L, true",
        "calcium,   7.0,   mg/dL,  true",
        "calcium,   7.1,   mg/dL,  false"})
    void absoluteLimits_adult(String key, double value, String unit, boolean expected) {
        Analyte a = Analyte.byKey(key).orElseThrow();
        TestCases t = TestCases.a().age(40).lab(a, value, unit);
        assertEquals(expected, met(t, a));
    }

    @ParameterizedTest(name = "child phosphate {0} {1} -> met {2}")
    @CsvSource({"2.1, mmol/L, true", "2.09, mmol/L, false", "6.5, mg/dL, true", "6.4, mg/dL, false"})
    void childPhosphate(double value, String unit, boolean expected) {
        assertEquals(expected, met(TestCases.a().age(17).lab(Analyte.PHOSPHATE, value, unit), Analyte.PHOSPHATE));
    }

    @Test
    @DisplayName("age 18 takes the adult phosphate limit (child = under 18)")
    void eighteenIsAdult() {
        assertTrue(met(TestCases.a().age(18).lab(Analyte.PHOSPHATE, 1.5, "mmol/L"), Analyte.PHOSPHATE));
        assertFalse(met(TestCases.a().age(17).lab(Analyte.PHOSPHATE, 1.5, "mmol/L"), Analyte.PHOSPHATE));
    }

    @ParameterizedTest(name = "{0}: baseline {1}, now {2} {3} -> met {4}")
    @CsvSource({
        // +25 % from baseline (Cairo–Bishop), exactly 25 % included
        "uricAcid,  300, 375,  umol/L, true",
        "uricAcid,  300, 374,  umol/L, false",
        "potassium, 4.0, 5.0,  mmol/L, true",
        "potassium, 4.0, 4.99, mmol/L, false",
        "phosphate, 1.0, 1.25, mmol/L, true",
        "phosphate, 1.0, 1.24, mmol/L, false",
        // -25 % for calcium
        "calcium,   2.4, 1.8,  mmol/L, true",
        "calcium,   2.4, 1.81, mmol/L, false"})
    void changeFromBaseline(String key, double base, double now, String unit, boolean expected) {
        Analyte a = Analyte.byKey(key).orElseThrow();
        assertEquals(expected, met(TestCases.a().age(40).baseline(a, base, unit).lab(a, now, unit), a));
    }

    @Test
    @DisplayName("laboratory is null with fewer than two values, false with two and one met, true with two met")
    void laboratoryTruthTable() {
        assertEquals(Optional.empty(), withHighPotassium().assess().tumorLysis().laboratory());
        assertEquals(Optional.empty(), withHighPotassium().assess().tumorLysis().clinical());
        TestCases one = withHighPotassium().lab(Analyte.CALCIUM, 2.3, "mmol/L");
        assertEquals(Optional.of(false), one.assess().tumorLysis().laboratory());
        assertEquals(Optional.of(false), one.assess().tumorLysis().clinical());
        TestCases two = withHighPotassium().lab(Analyte.CALCIUM, 1.7, "mmol/L");
        assertEquals(Optional.of(true), two.assess().tumorLysis().laboratory());
        assertTrue(two.fires("tumorLysis.laboratory"));
    }

    @ParameterizedTest(name = "creatinine {0} x ULN, arrhythmia {1}, seizure {2} -> clinical {3}")
    @CsvSource({
        "1.5,  NO,  NO,  true",
        "1.49, NO,  NO,  false",
        "1.0,  YES, NO,  true",
        "1.0,  NO,  YES, true"})
    void clinical(double ratio, Observation arrhythmia, Observation seizure, boolean expected) {
        TestCases t = withHighPotassium().lab(Analyte.URIC_ACID, 500, "umol/L")
                .lab(Analyte.CREATININE_UPPER_LIMIT, 100, "umol/L").lab(Analyte.CREATININE, 100 * ratio, "umol/L")
                .findings(TestCases.noSigns()).arrhythmiaSeizure(arrhythmia, seizure);
        assertEquals(Optional.of(expected), t.assess().tumorLysis().clinical());
        assertEquals(expected, t.fires("tumorLysis.clinical"));
    }

    @ParameterizedTest(name = "therapy {0}, assessed {1} -> window confirmed {2}")
    @CsvSource({
        "2026-03-05, 2026-03-02T08:00:00+01:00, true",
        "2026-03-05, 2026-03-01T08:00:00+01:00, false",
        "2026-03-05, 2026-03-12T08:00:00+01:00, true",
        "2026-03-05, 2026-03-13T08:00:00+01:00, false"})
    void window(String start, String at, boolean confirmed) {
        TumorLysisVerdict v = TestCases.a().therapyStarted(start).assessedAt(at).assess().tumorLysis();
        assertEquals(confirmed, v.windowConfirmed(), v.window());
    }

    @Test
    @DisplayName("no therapy start: the window is not confirmed, and the note fires when a verdict was reached")
    void noStart() {
        TestCases t = withHighPotassium().lab(Analyte.CALCIUM, 1.7, "mmol/L");
        assertFalse(t.assess().tumorLysis().windowConfirmed());
        assertTrue(t.assess().tumorLysis().window().contains("not confirmed"));
        assertTrue(t.fires("tumorLysis.window-not-confirmed"));
    }
}
