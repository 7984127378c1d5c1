package org.stasissheet.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

@DisplayName("Estimate: a value or the reason there is none")
class EstimateTest {
    @Test
    @DisplayName("map and flatMap keep the first reason")
    void keepsReason() {
        Estimate<Integer> missing = Estimate.unknown("weight not given");
        assertEquals(Optional.of("weight not given"), missing.map(x -> x + 1).whyUnknown());
        assertEquals(Optional.of(3), Estimate.known(2).map(x -> x + 1).known());
        assertEquals(Optional.of("too big"),
                Estimate.known(2).flatMap(x -> Estimate.<Integer>unknown("too big")).whyUnknown());
    }

    @Test
    @DisplayName("a blank reason or a null value is refused")
    void refusesEmpty() {
        assertThrows(IllegalArgumentException.class, () -> Estimate.unknown(" "));
        assertThrows(NullPointerException.class, () -> Estimate.known(null));
    }
}
