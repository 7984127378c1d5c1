package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.Threshold.Comparison;

/**
 * The four comparisons of the rule vocabulary, exactly at a limit and at the documented tolerance of one part in
 * 10⁹ (Threshold's contract: a conversion's rounding never moves a value across a limit).
 */
class ThresholdComparisonTest {

    // expected truth values: the meaning of ≥ > ≤ < themselves
    @ParameterizedTest(name = "{0}: at the limit {1}, just inside the tolerance {2}, clearly past it {3}")
    @CsvSource({
        "AT_LEAST, true,  true,  false",
        "ABOVE,    false, false, false",
        "AT_MOST,  true,  true,  true",
        "BELOW,    false, false, true"
    })
    void comparison_atAndAroundTheLimit(Comparison op, boolean atLimit, boolean withinTolerance, boolean belowBy2e9) {
        double limit = 4.0;
        double slack = Threshold.RELATIVE_TOLERANCE * limit;
        assertEquals(atLimit, op.test(limit, limit), "at the limit");
        // exactly one tolerance below: still counts as at the limit
        assertEquals(withinTolerance, op.test(limit - slack, limit), "one tolerance below");
        assertEquals(belowBy2e9, op.test(limit - 2 * slack, limit), "two tolerances below");
    }

    @Test
    @DisplayName("above and at-most flip only past the tolerance above the limit")
    void aboveTheLimit() {
        double limit = 4.0;
        double slack = Threshold.RELATIVE_TOLERANCE * limit;
        assertEquals(false, Comparison.ABOVE.test(limit + slack, limit));
        assertEquals(true, Comparison.AT_MOST.test(limit + slack, limit));
        assertEquals(true, Comparison.ABOVE.test(limit + 2 * slack, limit));
        assertEquals(false, Comparison.AT_MOST.test(limit + 2 * slack, limit));
    }

    @Test
    @DisplayName("every comparison is found by its rule-file key, and shows its mathematical symbol")
    void keysAndSymbols() {
        assertEquals(Optional.of(Comparison.AT_LEAST), Comparison.byKey("atLeast"));
        assertEquals(Optional.of(Comparison.ABOVE), Comparison.byKey("above"));
        assertEquals(Optional.of(Comparison.AT_MOST), Comparison.byKey("atMost"));
        assertEquals(Optional.of(Comparison.BELOW), Comparison.byKey("below"));
        assertEquals(Optional.empty(), Comparison.byKey("greaterThan"));
        assertEquals(Optional.empty(), Comparison.byKey("AtLeast"));
        assertEquals(List.of("≥", ">", "≤", "<"), List.of(Comparison.values()).stream().map(Comparison::symbol).toList());
        for (Comparison c : Comparison.values()) {
            assertEquals(Optional.of(c), Comparison.byKey(c.key()));
        }
    }

    @Test
    @DisplayName("25 % above a baseline: the figure scales, the other-unit figures are dropped")
    void times_scalesAndDropsEquivalents() {
        Threshold t = new Threshold(new Quantity(4.0, "mmol/L"), List.of(new Quantity(15.6, "mg/dL")), Optional.of("x"));
        Threshold scaled = t.times(1.25);
        // 4.0 × 1.25 = 5.0 (arithmetic)
        assertEquals(5.0, scaled.value().value(), 1e-12);
        assertEquals("mmol/L", scaled.value().unit());
        assertTrue(scaled.equivalents().isEmpty());
        assertEquals(Optional.empty(), scaled.parameterId());
    }

    @Test
    @DisplayName("a threshold describes itself with its unit symbol, never its parameter id, and without the unit 1")
    void describe() {
        assertEquals("4 cP",
                new Threshold(new Quantity(4, "cP"), List.of(), Optional.of("hyperviscosity.sv")).describe());
        assertEquals("0.45", Threshold.literal(new Quantity(0.45, "1")).describe());
        assertEquals("100 ×10⁹/L", Threshold.literal(new Quantity(100, "10*9/L")).describe());
    }
}
