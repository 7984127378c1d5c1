package org.stasissheet.measure;

import static org.junit.jupiter.api.Assertions.*;

import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Quantity writes its equality out (for start-up speed); it must agree with the equality Java generates for a record
 * of the same components (reference: the Java language's record semantics, Double.compare for a double).
 */
class QuantityEqualityTest {
    private record Reference(double value, String unit) {
    }

    @Test
    @DisplayName("equal exactly when a generated record of the same components is equal; equal ones hash alike")
    void agreesWithGeneratedRecordEquality() {
        double[] values = {0.0, -0.0, 1.0, 1.0000000000000002, 5.6, 150_000, -3, Double.MIN_VALUE, Double.MAX_VALUE};
        String[] units = {"cP", "10*9/L", "/uL", "{rel}", "mmol/L"};
        Random random = new Random(1204L);
        for (int i = 0; i < 5_000; i++) {
            double a = values[random.nextInt(values.length)];
            double b = random.nextInt(3) == 0 ? a : values[random.nextInt(values.length)];
            String u = units[random.nextInt(units.length)];
            String v = random.nextInt(3) == 0 ? new String(u) : units[random.nextInt(units.length)];
            Quantity x = new Quantity(a, u);
            Quantity y = new Quantity(b, v);
            boolean expected = new Reference(a, u).equals(new Reference(b, v));
            assertEquals(expected, x.equals(y), x + " vs " + y);
            assertEquals(expected, y.equals(x), y + " vs " + x);
            if (expected) {
                assertEquals(x.hashCode(), y.hashCode());
            }
        }
        Quantity q = new Quantity(5.6, "cP");
        assertNotEquals(q, null);
        assertNotEquals(q, "5.6 cP");
        assertEquals(q, q);
    }
}
