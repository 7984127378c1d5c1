package org.stasissheet.course;

import java.util.Objects;

/**
 * What a procedure was expected to leave of one analyte, as two values {@code low ≤ high} in the analyte's canonical
 * unit.
 *
 * <ul>
 *   <li>{@link Kind#EXCHANGE}: low = right after the exchange (start × e^−V), high = after redistribution
 *       (start × (1 − f(1 − e^−V))), from {@code derived.ExchangeKinetics}; for serum viscosity the log-linear rule.</li>
 *   <li>{@link Kind#LEUKAPHERESIS}: the white count after one leukapheresis at the rule set's high and low
 *       fall per procedure (common practice, 20–50 % in the shipped rules).</li>
 * </ul>
 */
public record Projected(Kind kind, double low, double high) {
    public enum Kind { EXCHANGE, LEUKAPHERESIS }

    public Projected {
        Objects.requireNonNull(kind, "kind");
        if (!Double.isFinite(low) || !Double.isFinite(high) || low < 0 || high < low) {
            throw new IllegalArgumentException("projection needs finite 0 ≤ low ≤ high, was " + low + ", " + high);
        }
    }
}
