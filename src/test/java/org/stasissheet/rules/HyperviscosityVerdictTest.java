package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.measure.Analyte;

class HyperviscosityVerdictTest {
    private static TestCases withSigns(boolean signs) {
        TestCases t = TestCases.a().findings(TestCases.noSigns());
        return signs ? t.signs(Observation.YES, Observation.NO, Retinopathy.NONE, Observation.NO) : t;
    }

    private static String assessment(TestCases t) {
        return t.assess().hyperviscosity().assessment().code();
    }

    @Nested
    @DisplayName("with a serum viscosity (Crawford, Cox & Cohen, Am J Med 1985: symptoms from 4, rare below 3)")
    class WithViscosity {
        @ParameterizedTest(name = "SV {0} cP, signs {1} -> {2}")
        @CsvSource({
            // 4.0 and 3.0 included (">= 4.0", "3.0 to < 4.0"); below 3 signs still make it possible, because
            // symptoms are reported at 2-3 cP (DOMAIN section 6; Gertz 2018: treat on the clinical picture); a
            // value within the normal range (up to 1.8 cP, Mehta & Singhal 2003) makes it unlikely even with signs
            "5.6,  true,  likely",
            "4.0,  true,  likely",
            "4.01, true,  likely",
            "3.99, true,  possible",
            "3.0,  true,  possible",
            "2.99, true,  possible",
            "1.81, true,  possible",
            "1.8,  true,  unlikely",
            "5.6,  false, possible",
            "4.0,  false, possible",
            "3.99, false, unlikely",
            "3.0,  false, unlikely",
            "1.6,  false, unlikely"})
        void truthTable(double sv, boolean signs, String expected) {
            assertEquals(expected, assessment(withSigns(signs).lab(Analyte.SERUM_VISCOSITY, sv, "cP")));
        }

        @Test
        @DisplayName("a relative-to-water result is compared as reported (CASE-FORMAT)")
        void relativeScale() {
            assertEquals("likely", assessment(withSigns(true).lab(Analyte.SERUM_VISCOSITY, 4.0, "{rel}")));
        }

        @Test
        @DisplayName("a trusted viscosity within the normal range decides even when the paraprotein is above its level")
        void normalViscosityWins() {
            TestCases t = withSigns(true).paraprotein(Paraprotein.IGM).lab(Analyte.IGM, 6, "g/dL")
                    .lab(Analyte.SERUM_VISCOSITY, 1.8, "cP");
            assertEquals("unlikely", assessment(t));
            assertEquals(HyperviscosityVerdict.Route.VISCOSITY, t.assess().hyperviscosity().route());
            assertTrue(t.fires("hyperviscosity.signs-other-cause"));
        }

        @Test
        @DisplayName("above the normal range the most urgent route decides: a low viscosity never overrules the level")
        void mostUrgentRouteWins() {
            TestCases t = withSigns(true).paraprotein(Paraprotein.IGM).lab(Analyte.IGM, 6, "g/dL")
                    .lab(Analyte.SERUM_VISCOSITY, 2.0, "cP");
            assertEquals("likely", assessment(t));
            assertEquals(HyperviscosityVerdict.Route.PARAPROTEIN, t.assess().hyperviscosity().route());
        }
    }

    @Nested
    @DisplayName("without a viscosity: the paraprotein level for the isotype")
    class WithParaprotein {
        @ParameterizedTest(name = "{0} {1} {2}, signs {3} -> {4}")
        @CsvSource({
            // IgM 3 g/dL (Mehta & Singhal 2003; Kwaan 2013), at the level is included; below a level, signs
            // still make it possible (Kwaan 2013: IgG3 and polymerising IgA act at lower levels; Gertz 2018)
            "IgM,  3.0,  g/dL, true,  likely",
            "IgM,  3.0,  g/dL, false, possible",
            "IgM,  2.99, g/dL, true,  possible",
            "IgM,  2.99, g/dL, false, unlikely",
            "IgM,  30,   g/L,  false, possible",
            "IgM,  29.9, g/L,  false, unlikely",
            "IgM,  3000, mg/dL, false, possible",
            // IgG about 4 g/dL (Mehta & Singhal 2003; Kwaan 2013 gives > 15 g/dL: the lower figure is used)
            "IgG,  4.0,  g/dL, false, possible",
            "IgG,  3.99, g/dL, false, unlikely",
            "IgG,  4.01, g/dL, true,  likely",
            // IgG3 4 g/dL, lower end of Kwaan's 4-5 g/dL; entered under igg
            "IgG3, 4.0,  g/dL, false, possible",
            "IgG3, 3.99, g/dL, false, unlikely",
            // IgA about 6 g/dL (Mehta & Singhal 2003; Kwaan 2013 gives > 10-11 g/dL)
            "IgA,  6.0,  g/dL, true,  likely",
            "IgA,  5.99, g/dL, true,  possible",
            "IgA,  5.99, g/dL, false, unlikely",
            "IgA,  60,   g/L,  false, possible"})
        void truthTable(String type, double value, String unit, boolean signs, String expected) {
            Paraprotein p = org.stasissheet.intake.Enums.parse(Paraprotein.class, type).orElseThrow();
            Analyte a = Verdicts.analyteOf(p).orElseThrow();
            assertEquals(expected, assessment(withSigns(signs).paraprotein(p).lab(a, value, unit)));
        }

        @Test
        @DisplayName("likely on the paraprotein alone asks for a serum viscosity now")
        void likelyAsksForViscosity() {
            TestCases t = withSigns(true).paraprotein(Paraprotein.IGM).lab(Analyte.IGM, 5.9, "g/dL");
            assertTrue(t.fires("hyperviscosity.measure-viscosity-now"));
            assertTrue(t.fires("hyperviscosity.likely"));
        }
    }

    @Nested
    @DisplayName("with neither a viscosity nor a paraprotein value")
    class WithNeither {
        @Test
        @DisplayName("a known paraprotein with signs is possible, with the act-now flag to measure both (Gertz 2018)")
        void clinicalPicture() {
            TestCases t = withSigns(true).paraprotein(Paraprotein.IGA);
            assertEquals("possible", assessment(t));
            assertEquals(Level.ACT_NOW, t.assess().flags().stream()
                    .filter(f -> f.id().equals("hyperviscosity.measure-both-now")).findFirst().orElseThrow().level());
        }

        @Test
        void knownParaproteinWithoutSigns_isNotAssessable() {
            assertEquals("not-assessable", assessment(withSigns(false).paraprotein(Paraprotein.IGM)));
        }

        @Test
        void noParaprotein_isNotAssessable() {
            assertEquals("not-assessable", assessment(withSigns(true)));
        }
    }

    @Nested
    @DisplayName("signs")
    class Signs {
        @ParameterizedTest(name = "{0}")
        @CsvSource({"venous-dilation, true", "haemorrhages, true", "papilloedema, true", "none, false"})
        @DisplayName("retinopathy of venous dilation or worse is a sign")
        void retinopathy(String code, boolean sign) {
            Retinopathy r = org.stasissheet.intake.Enums.parse(Retinopathy.class, code).orElseThrow();
            TestCases t = TestCases.a().findings(TestCases.noSigns())
                    .signs(Observation.NO, Observation.NO, r, Observation.NO).lab(Analyte.SERUM_VISCOSITY, 4.5, "cP");
            assertEquals(sign ? "likely" : "possible", assessment(t));
        }

        @Test
        @DisplayName("neurological grade 1 is a sign; 0 is not")
        void neurologicalGrade() {
            TestCases one = TestCases.a().findings(TestCases.noSigns()).grades(0, 1, 0)
                    .lab(Analyte.SERUM_VISCOSITY, 3.5, "cP");
            TestCases zero = TestCases.a().findings(TestCases.noSigns()).lab(Analyte.SERUM_VISCOSITY, 3.5, "cP");
            assertEquals("possible", assessment(one));
            assertEquals("unlikely", assessment(zero));
        }

        @Test
        @DisplayName("heart failure and visual disturbance are signs")
        void heartAndVision() {
            assertEquals("likely", assessment(TestCases.a().findings(TestCases.noSigns())
                    .signs(Observation.NO, Observation.NO, Retinopathy.NONE, Observation.YES)
                    .lab(Analyte.SERUM_VISCOSITY, 4, "cP")));
            assertEquals("likely", assessment(TestCases.a().findings(TestCases.noSigns())
                    .signs(Observation.NO, Observation.YES, Retinopathy.NONE, Observation.NO)
                    .lab(Analyte.SERUM_VISCOSITY, 4, "cP")));
        }

        @Test
        @DisplayName("unassessed signs do not lower a raised verdict, and fundoscopy is asked for (Menke 2006)")
        void unassessedDoNotLower() {
            TestCases t = TestCases.a().paraprotein(Paraprotein.IGM).lab(Analyte.SERUM_VISCOSITY, 4.5, "cP");
            Verdicts.Outcome o = t.assess();
            assertEquals("possible", o.hyperviscosity().assessment().code());
            assertTrue(o.hyperviscosity().unassessed().contains("findings.retinopathy"));
            assertTrue(t.fires("hyperviscosity.fundoscopy"));
            assertTrue(t.fires("hyperviscosity.signs-unassessed"));
        }
    }
}
