package org.stasissheet.derived;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

@DisplayName("plasma exchange kinetics")
class ExchangeKineticsTest {

    @ParameterizedTest(name = "{0} plasma volumes remove {1} %")
    @DisplayName("one-compartment removal e^−V (standard apheresis kinetics, DOMAIN.md §4)")
    // expected: 63.2 / 77.7 / 86.5 % removed, DOMAIN.md §4 (one-compartment model, e.g. Kaplan)
    @CsvSource({"1.0, 63.2", "1.5, 77.7", "2.0, 86.5"})
    void removal(double plasmaVolumes, double removedPercent) {
        assertEquals(removedPercent / 100, 1 - ExchangeKinetics.intravascularRemaining(plasmaVolumes), 1e-3);
    }

    @Test
    @DisplayName("IgM left after one plasma volume, after redistribution: 1 − 0.78 × 0.632 = 0.507")
    void igmLeft() {
        // by hand: f = 0.78 (IgM, Reverberi 2007 as quoted, DOMAIN.md §6), 1 − e^−1 = 0.632121;
        // 1 − 0.78 × 0.632121 = 0.506946
        assertEquals(0.506946, ExchangeKinetics.paraproteinRemaining(0.78, 1.0), 1e-6);
    }

    @Test
    @DisplayName("the issue's IgA case at 1.0 plasma volume: 25.0 g/L right after, 49.95 g/L after redistribution")
    void issueIgaExample() {
        // the numbers quoted in the issue for an IgA paraprotein at 1.0 plasma volume: one-compartment 25.0 g/L,
        // after redistribution 49.95 g/L; both fit a start of 68 g/L (by hand: 68 × 0.367879 = 25.016;
        // 68 × (1 − 0.42 × 0.632121) = 68 × 0.734509 = 49.947)
        ExchangeProjection p = ExchangeKinetics.project(68, 0.42, 1.0);
        assertEquals(25.0, p.immediate(), 0.05);
        assertEquals(49.95, p.afterRedistribution(), 0.005);
    }

    @ParameterizedTest(name = "f = {0}")
    @DisplayName("both moments agree when the whole paraprotein is intravascular (f = 1) and split as f falls")
    @CsvSource({"1.0", "0.78", "0.45", "0.42", "0.0"})
    void momentsOrdered(double f) {
        ExchangeProjection p = ExchangeKinetics.project(40, f, 1.5);
        // by the formulas: immediate 40 × e^−1.5 = 8.9252 for every f; after redistribution 40 × (1 − f(1 − e^−1.5))
        assertEquals(40 * Math.exp(-1.5), p.immediate(), 1e-9);
        assertEquals(40 * (1 - f * (1 - Math.exp(-1.5))), p.afterRedistribution(), 1e-9);
        assertTrue(p.afterRedistribution() >= p.immediate());
    }

    @Test
    @DisplayName("viscosity at both moments: 1.6 × 3.5^e^−1 = 2.537 and 1.6 × 3.5^0.507 = 3.019 (worked by hand)")
    void viscosityBothMoments() {
        // by hand: ln 3.5 = 1.252763; × 0.367879 = 0.460865, e^ = 1.585420, × 1.6 = 2.53667;
        // × 0.506946 = 0.635083, e^ = 1.887121, × 1.6 = 3.01939
        ExchangeProjection p = ExchangeKinetics.projectSerumViscosity(5.6, 1.6, 0.78, 1.0);
        assertEquals(2.53667, p.immediate(), 1e-4);
        assertEquals(3.01939, p.afterRedistribution(), 1e-4);
    }

    @Test
    @DisplayName("log-linear projection: 1.6 × (6.4/1.6)^0.5 = 3.2 (worked by hand)")
    void projectionWorkedExample() {
        // by hand: (6.4 / 1.6)^0.5 = 4^0.5 = 2; × 1.6 = 3.2 (DOMAIN.md §4 projection)
        assertEquals(3.2, ExchangeKinetics.projectedSerumViscosity(6.4, 1.6, 0.5), 1e-12);
    }

    @Test
    @DisplayName("at or below the reference the measured value is kept (nothing to remove)")
    void noExcessKept() {
        // expected: the measured 1.5 itself (no projection applies below the reference)
        assertEquals(1.5, ExchangeKinetics.projectedSerumViscosity(1.5, 1.6, 0.3), 0);
    }

    @Test
    @DisplayName("out-of-range arguments are rejected")
    void rejects() {
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.intravascularRemaining(-1));
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.paraproteinRemaining(1.2, 1));
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.projectedSerumViscosity(0, 1.6, 0.5));
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.projectedSerumViscosity(4, 1.6, 1.5));
    }

    /**
     * The projections against published falls. Reported (printed) and bounded; the bounds record what the
     * projections do, they do not make them right.
     */
    @Nested
    @DisplayName("projections against published falls")
    class AgainstPublished {
        private static final double REFERENCE_SV = 1.6; // Mehta & Singhal 2003, middle of 1.4–1.8
        private static final double IGA_FRACTION = 0.42; // Reverberi & Reverberi 2007
        // Gertz MA, "Acute hyperviscosity: syndromes and management", Blood 2018;132(13):1379–1385, patient summary:
        // IgA myeloma, hemoglobin 7.9 g/dL, SV 13.6 cP before, 3479 mL plasma removed, SV 3.6 cP after; the next
        // day 3535 mL removed, SV 1.8 cP.
        private static final double GERTZ_HEMOGLOBIN_G_PER_DL = 7.9;
        private static final double GERTZ_SV_BEFORE = 13.6;
        private static final double GERTZ_SV_AFTER_FIRST = 3.6;
        private static final double GERTZ_SV_AFTER_SECOND = 1.8;
        private static final double GERTZ_FIRST_REMOVED_L = 3.479;
        private static final double GERTZ_SECOND_REMOVED_L = 3.535;

        /**
         * The paper gives no weight or plasma volume, so V is stated under an assumption: Kaplan's plasma volume
         * 0.065 × W × (1 − Hct) (Kaplan 1990), hematocrit ≈ 3 × hemoglobin in g/dL (common practice: 7.9 → 0.237),
         * and a body weight of 60, 70 or 80 kg (an adult man's range; 70 kg is common practice for a standard
         * adult). 70 kg gives 3.47 L, so the first exchange was about 1.0 plasma volume.
         */
        private double plasmaVolumes(double removedL, double weightKg) {
            double hematocrit = 3 * GERTZ_HEMOGLOBIN_G_PER_DL / 100;
            return removedL / BloodVolume.kaplanPlasmaLitres(weightKg, hematocrit);
        }

        @Test
        @DisplayName("assumed plasma volume: Gertz's first exchange of 3479 mL is 1.00 plasma volume at 70 kg")
        void gertzAssumedVolume() {
            // by hand: 0.065 × 70 × (1 − 0.237) = 3.47165 L; 3.479 / 3.47165 = 1.0021
            assertEquals(1.0021, plasmaVolumes(GERTZ_FIRST_REMOVED_L, 70), 1e-3);
        }

        @Test
        @DisplayName("Gertz 2018 IgA case, 13.6 → 3.6 cP after one exchange: inside the 'right after' band, far "
                + "below the 'after redistribution' band")
        void gertzFirstExchange() {
            double immediateLow = Double.MAX_VALUE;
            double immediateHigh = 0;
            double afterLow = Double.MAX_VALUE;
            for (double weight : new double[] {60, 70, 80}) {
                ExchangeProjection p = ExchangeKinetics.projectSerumViscosity(GERTZ_SV_BEFORE, REFERENCE_SV,
                        IGA_FRACTION, plasmaVolumes(GERTZ_FIRST_REMOVED_L, weight));
                immediateLow = Math.min(immediateLow, p.immediate());
                immediateHigh = Math.max(immediateHigh, p.immediate());
                afterLow = Math.min(afterLow, p.afterRedistribution());
                System.out.printf(java.util.Locale.ROOT,
                        "Gertz 2018, exchange 1, %.0f kg: right after %.2f cP, after redistribution %.2f cP;"
                                + " measured 3.6 cP%n", weight, p.immediate(), p.afterRedistribution());
            }
            // tolerance: the spread of the projection over the assumed weights 60–80 kg (by hand 3.11–3.90 cP);
            // the weight is the largest unknown, and the measured value must fall inside that band
            assertTrue(immediateLow <= GERTZ_SV_AFTER_FIRST && GERTZ_SV_AFTER_FIRST <= immediateHigh,
                    "measured 3.6 outside the right-after band " + immediateLow + "–" + immediateHigh);
            // at 70 kg (by hand): V = 1.0021, 1.6 × 8.5^e^−1.0021 = 3.51 cP, within 0.1 cP of the measured 3.6
            ExchangeProjection at70 = ExchangeKinetics.projectSerumViscosity(GERTZ_SV_BEFORE, REFERENCE_SV,
                    IGA_FRACTION, plasmaVolumes(GERTZ_FIRST_REMOVED_L, 70));
            assertEquals(3.51, at70.immediate(), 0.01);
            assertEquals(GERTZ_SV_AFTER_FIRST, at70.immediate(), 0.1);
            // after redistribution (by hand at 70 kg: 1.6 × 8.5^0.7335 = 7.70 cP): more than twice the measured
            // value at every assumed weight, so this case does not support it as the level after one exchange
            assertEquals(7.70, at70.afterRedistribution(), 0.01);
            assertTrue(afterLow > 2 * GERTZ_SV_AFTER_FIRST, "after-redistribution floor " + afterLow);
        }

        @Test
        @DisplayName("Gertz 2018, second exchange 3.6 → 1.8 cP: both projections stay above the measured value "
                + "(the safe side); the 'right after' one is nearer")
        void gertzSecondExchange() {
            for (double weight : new double[] {60, 70, 80}) {
                ExchangeProjection p = ExchangeKinetics.projectSerumViscosity(GERTZ_SV_AFTER_FIRST, REFERENCE_SV,
                        IGA_FRACTION, plasmaVolumes(GERTZ_SECOND_REMOVED_L, weight));
                System.out.printf(java.util.Locale.ROOT,
                        "Gertz 2018, exchange 2, %.0f kg: right after %.2f cP, after redistribution %.2f cP;"
                                + " measured 1.8 cP%n", weight, p.immediate(), p.afterRedistribution());
                // by hand: right after 2.05–2.23 cP, after redistribution 2.84–2.95 cP over 60–80 kg
                assertTrue(p.immediate() > GERTZ_SV_AFTER_SECOND, "right after " + p.immediate());
                assertTrue(p.immediate() - GERTZ_SV_AFTER_SECOND < p.afterRedistribution() - GERTZ_SV_AFTER_SECOND);
                // tolerance 0.5 cP: the measured 1.8 is at the normal range's top (1.4–1.8, Mehta & Singhal 2003),
                // where the log-linear rule flattens towards the reference 1.6 and cannot go lower
                assertEquals(GERTZ_SV_AFTER_SECOND, p.immediate(), 0.5);
            }
        }

        @Test
        @DisplayName("Menke 2009 follow-up, IgM −46.5 %, SV −44.7 %: the kinetics and the viscosity rule")
        void menkeFollowUp() {
            // IgM fall after redistribution with f = 0.78, V = 1.0 (assumed one plasma volume): 49.3 % vs 46.5 %
            double modelIgmFall = 1 - ExchangeKinetics.paraproteinRemaining(0.78, 1.0);
            System.out.printf(java.util.Locale.ROOT, "Menke 2009: IgM fall model %.1f %% vs observed 46.5 %%%n",
                    100 * modelIgmFall);
            // expected: Menke follow-up 2009 −46.5 % IgM (DOMAIN.md §4); within 3 percentage points
            assertEquals(0.465, modelIgmFall, 0.03);

            // the starting SV is not in our reference: assume 4–6 cP, where symptoms usually appear (Crawford 1985),
            // and use the observed IgM left (r = 0.535) so only the viscosity projection is under test
            for (double start : new double[] {4, 5, 6}) {
                double after = ExchangeKinetics.projectedSerumViscosity(start, REFERENCE_SV, 1 - 0.465);
                double fall = 1 - after / start;
                System.out.printf(java.util.Locale.ROOT,
                        "Menke 2009: start %.0f cP → %.2f cP, SV fall %.1f %% vs observed 44.7 %%%n",
                        start, after, 100 * fall);
                // expected: Menke follow-up 2009 −44.7 % SV (DOMAIN.md §4); the projection gives 35–46 % here,
                // bound ±12 percentage points
                assertEquals(0.447, fall, 0.12);
            }
        }
    }
}
