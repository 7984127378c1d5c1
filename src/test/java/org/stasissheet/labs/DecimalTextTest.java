package org.stasissheet.labs;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class DecimalTextTest {
    @Test
    @DisplayName("regression (found by the 100,000-input fuzz run): mixed grouping marks are not a number, never an exception")
    void mixedGroupingMarks_areNotANumber() {
        assertEquals(List.of(), DecimalText.readings("1.234,567.89"));
        assertEquals(List.of(), DecimalText.readings("1,234.567,8"));
        // one consistent grouping mark with a different decimal mark still reads (written by hand: 1234567.89)
        assertEquals(List.of(new BigDecimal("1234567.89")), DecimalText.readings("1.234.567,89"));
    }
}
