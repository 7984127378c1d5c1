package org.stasissheet.apheresis;

/** A closed range of estimates, low ≤ high, both finite; the unit is stated by the field that holds it. */
public record ValueRange(double low, double high) {
    public ValueRange {
        if (!Double.isFinite(low) || !Double.isFinite(high) || low > high) {
            throw new IllegalArgumentException("range needs finite low ≤ high, was " + low + "–" + high);
        }
    }
}
