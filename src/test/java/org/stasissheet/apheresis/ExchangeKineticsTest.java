package org.stasissheet.apheresis;

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
    @DisplayName("IgM left after one plasma volume: 1 − 0.76 × 0.632 = 0.520")
    void igmLeft() {
        // by hand: f = 0.76 (IgM, Reverberi 2007 range 76–78 %), 1 − e^−1 = 0.632121; 1 − 0.76 × 0.632121 = 0.519588
        assertEquals(0.519588, ExchangeKinetics.paraproteinRemaining(0.76, 1.0), 1e-6);
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
     * How far the log-linear projection is from two published falls. Reported (printed) and bounded; the bounds
     * record what the projection does, they do not make it right.
     */
    @Nested
    @DisplayName("projection against published falls")
    class AgainstPublished {
        private static final double REFERENCE_SV = 1.6; // Mehta & Singhal 2003, middle of 1.4–1.8

        @Test
        @DisplayName("Gertz 2018 IgA case, 13.6 → 3.6 cP after one exchange: the projection under-predicts the fall")
        void gertzCase() {
            // assumptions: IgA, f = 0.42 (Reverberi 2007); the patient's plasma volume is not given, so V = 1.0
            // (3479 mL removed); reference SV 1.6 on the same scale as the case's 13.6
            double observed = 3.6; // Gertz MA, Blood 2018;132:1379, after the first exchange
            double atOne = ExchangeKinetics.projectedSerumViscosity(13.6, REFERENCE_SV,
                    ExchangeKinetics.paraproteinRemaining(0.42, 1.0));
            double atInfinity = ExchangeKinetics.projectedSerumViscosity(13.6, REFERENCE_SV,
                    ExchangeKinetics.paraproteinRemaining(0.42, 50));
            double rNeeded = Math.log(observed / REFERENCE_SV) / Math.log(13.6 / REFERENCE_SV);
            System.out.printf(java.util.Locale.ROOT,
                    "Gertz 2018: observed 3.6 cP; projected %.2f cP at V = 1.0, %.2f cP even at V → ∞;"
                            + " r needed %.3f, i.e. f·(1 − e^−V) = %.3f, more than f = 0.42 allows%n",
                    atOne, atInfinity, rNeeded, 1 - rNeeded);
            // safe side (DOMAIN.md §4 prefers under-predicting the fall): projected stays above the observed value
            assertTrue(atOne > observed, "projection " + atOne + " should not fall below the observed 3.6");
            // size of the miss at V = 1.0: about 7.7 cP against 3.6 (by hand: 1.6 × 8.5^0.7345 = 7.705); tolerance 0.01
            assertEquals(7.705, atOne, 0.01);
            // no V brings it to 3.6 with f = 0.42: the floor is 1.6 × 8.5^0.58 = 5.536 (by hand), above 3.6
            assertEquals(5.536, atInfinity, 0.01);
        }

        @Test
        @DisplayName("Menke 2009 follow-up, IgM −46.5 %, SV −44.7 %: the projection's SV fall over plausible starts")
        void menkeFollowUp() {
            // IgM fall by the kinetics with f = 0.76, V = 1.0 (assumed one plasma volume): 48.0 % vs 46.5 % observed
            double modelIgmFall = 1 - ExchangeKinetics.paraproteinRemaining(0.76, 1.0);
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
