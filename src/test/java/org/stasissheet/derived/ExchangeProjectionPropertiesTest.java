package org.stasissheet.derived;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Properties of the two exchange projections over a fixed-seed generator (plain JUnit). The expected orderings
 * follow from the formulas themselves (DOMAIN.md §4 and §6): e^−V ≤ 1 − f(1 − e^−V) ≤ 1 for 0 ≤ f ≤ 1, V ≥ 0.
 */
@DisplayName("exchange projections: properties")
class ExchangeProjectionPropertiesTest {
    private static final int DRAWS = 2_000;

    @ParameterizedTest(name = "seed {0}")
    @DisplayName("0 ≤ right after ≤ after redistribution ≤ before, for levels and viscosities")
    @ValueSource(longs = {3, 12, 2026})
    void ordered(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < DRAWS; i++) {
            double start = random.nextDouble(0, 120);
            double f = random.nextDouble(0, 1);
            double v = random.nextDouble(0, 3);
            ExchangeProjection p = ExchangeKinetics.project(start, f, v);
            String where = "start " + start + ", f " + f + ", V " + v;
            assertTrue(0 <= p.immediate() && p.immediate() <= p.afterRedistribution(), where);
            assertTrue(p.afterRedistribution() <= start * (1 + 1e-12), where);

            double sv = random.nextDouble(0.5, 20);
            ExchangeProjection s = ExchangeKinetics.projectSerumViscosity(sv, 1.6, f, v);
            assertTrue(s.immediate() <= s.afterRedistribution() && s.afterRedistribution() <= sv * (1 + 1e-12),
                    "SV " + sv + ", " + where);
            // the log-linear rule never projects below the reference, nor below a value already under it
            assertTrue(s.immediate() >= Math.min(sv, 1.6) * (1 - 1e-12), "SV " + sv + ", " + where);
        }
    }

    @Test
    @DisplayName("zero plasma volumes change nothing; f = 1 makes both moments equal")
    void edges() {
        ExchangeProjection none = ExchangeKinetics.project(30, 0.42, 0);
        assertEquals(30, none.immediate(), 0);
        assertEquals(30, none.afterRedistribution(), 0);
        // e^−1 × 30 = 11.036 (mathematical constant) at both moments when everything is intravascular
        ExchangeProjection all = ExchangeKinetics.project(30, 1.0, 1.0);
        assertEquals(30 * Math.exp(-1), all.immediate(), 1e-12);
        assertEquals(all.immediate(), all.afterRedistribution(), 1e-12);
    }

    @Test
    @DisplayName("bad arguments are refused with the value in the message")
    void refuses() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ExchangeKinetics.project(-1, 0.5, 1));
        assertTrue(e.getMessage().contains("-1.0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.project(Double.NaN, 0.5, 1));
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.project(10, 1.5, 1));
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.project(10, 0.5, -0.1));
        assertThrows(IllegalArgumentException.class, () -> new ExchangeProjection(3, 2));
    }
}
