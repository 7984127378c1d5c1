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

    /**
     * The record's own equality, written out: the generated one is linked through method handles on its first
     * call, which cost a cold command-line run about 15 ms (src/bench/RESULTS.md). Values compare as
     * {@link Double#compare} does, as a record's do.
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof Quantity q && Double.compare(value, q.value) == 0 && unit.equals(q.unit);
    }

    @Override
    public int hashCode() {
        return 31 * Double.hashCode(value) + unit.hashCode();
    }

    /** For people: the number with the unit's symbol ({@link UnitSymbols}); files and JSON use the fields. */
    @Override
    public String toString() {
        return UnitSymbols.format(Numbers.plain(value), unit);
    }
}
