package org.stasissheet.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Edges of the value types: inclusive plausible bounds as documented, and locale-free number text. */
class BoundsAndFormatsTest {

    @Test
    @DisplayName("plausible bounds are inclusive at both ends, as Analyte documents")
    void plausibleBounds_areInclusive() {
        for (Analyte a : Analyte.values()) {
            assertTrue(a.isPlausible(a.plausibleMin()), a + " at its minimum");
            assertTrue(a.isPlausible(a.plausibleMax()), a + " at its maximum");
            assertFalse(a.isPlausible(Math.nextDown(a.plausibleMin())), a + " just below");
            assertFalse(a.isPlausible(Math.nextUp(a.plausibleMax())), a + " just above");
        }
    }

    // expected strings: Java's own Double.toString / BigDecimal.toPlainString contract (shortest round-trip form)
    @ParameterizedTest(name = "{0} is written {1}")
    @CsvSource({
        "150000, 150000",
        "5.6, 5.6",
        "-3, -3",
        "0.001, 0.001",
        "1e15, 1000000000000000",
        "1e16, 10000000000000000",
        "999999999999999, 999999999999999",
        "-999999999999999.5, -999999999999999.5",
        "1.5e-7, 0.00000015"
    })
    void plain_writesTheShortestDecimal(double value, String expected) {
        assertEquals(expected, Numbers.plain(value));
    }

    @Test
    @DisplayName("a quantity prints for people: its plain number and the unit's symbol, never a raw UCUM code")
    void quantity_toString() {
        assertEquals("5.6 cP", new Quantity(5.6, "cP").toString());
        assertEquals("150000 /µL", new Quantity(150_000, "/uL").toString());
        assertEquals("182 ×10⁹/L", new Quantity(182, "10*9/L").toString());
        assertEquals("37 °C", new Quantity(37, "Cel").toString());
        assertEquals("3.4 relative to water", new Quantity(3.4, "{rel}").toString());
        assertEquals("0.76", new Quantity(0.76, "1").toString());
    }
}
