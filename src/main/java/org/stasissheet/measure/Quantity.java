package org.stasissheet.measure;

import java.util.Objects;

/**
 * A number with its UCUM unit code, exactly as it was entered or computed.
 *
 * <p>Guarantees: the value is finite (never NaN or infinite) and the unit code is non-blank. It makes no claim
 * that the unit suits any analyte: {@link Analyte} decides that.
 */
public record Quantity(double value, String unit) {
    public Quantity {
        Objects.requireNonNull(unit, "unit");
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be finite, was " + value);
        }
        if (unit.isBlank()) {
            throw new IllegalArgumentException("unit must not be blank");
        }
    }

    @Override
    public String toString() {
        return Numbers.plain(value) + " " + unit;
    }
}
