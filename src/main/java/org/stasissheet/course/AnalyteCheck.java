package org.stasissheet.course;

import java.time.OffsetDateTime;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Quantity;

/**
 * One analyte around one exchange or leukapheresis: the value measured before it, what was projected, and the first
 * value measured after it, in the analyte's canonical unit.
 *
 * @param before    the last value measured before the procedure, with no other exchange or leukapheresis between
 * @param projected the projection, or why there is none
 * @param next      the first value measured after the procedure, before any further exchange or leukapheresis
 */
public record AnalyteCheck(Analyte analyte, Quantity before, OffsetDateTime beforeAt, Estimate<Projected> projected,
                           Optional<Comparison> next) {
    /**
     * The review cut-off: a measured fall smaller than half the smallest projected fall asks for a review.
     * Common practice (no published cut-off): a fall that small is beyond the spread of the volume estimates and
     * points at the volume processed, rebound from the extravascular pool or new synthesis (for the white count:
     * the marrow's output).
     */
    public static final double REVIEW_FRACTION_OF_PROJECTED_FALL = 0.5;

    public AnalyteCheck {
        Objects.requireNonNull(analyte, "analyte");
        Objects.requireNonNull(before, "before");
        Objects.requireNonNull(beforeAt, "beforeAt");
        Objects.requireNonNull(projected, "projected");
        Objects.requireNonNull(next, "next");
    }

    /**
     * The next measured value beside the projection.
     *
     * @param differenceFromLowPercent  (measured − projected low) ÷ projected low × 100; empty without a projection
     *                                  or when it is 0
     * @param differenceFromHighPercent the same against the projected high
     * @param review                    whether the measured fall is much smaller than projected (see
     *                                  {@link #REVIEW_FRACTION_OF_PROJECTED_FALL})
     */
    public record Comparison(Quantity measured, OffsetDateTime at, Optional<Double> differenceFromLowPercent,
                             Optional<Double> differenceFromHighPercent, boolean review) {
        public Comparison {
            Objects.requireNonNull(measured, "measured");
            Objects.requireNonNull(at, "at");
            Objects.requireNonNull(differenceFromLowPercent, "differenceFromLowPercent");
            Objects.requireNonNull(differenceFromHighPercent, "differenceFromHighPercent");
        }
    }

    /**
     * Compares a measured value with a projection from {@code start}; pure arithmetic, one place. Without a
     * projection the measured value still stands, with no difference and no review mark.
     */
    static Comparison compare(double start, Optional<Projected> projected, Quantity measured, OffsetDateTime at) {
        if (projected.isEmpty()) {
            return new Comparison(measured, at, Optional.empty(), Optional.empty(), false);
        }
        Projected p = projected.get();
        double value = measured.value();
        double smallestProjectedFall = start - p.high();
        boolean review = smallestProjectedFall > 0
                && start - value < REVIEW_FRACTION_OF_PROJECTED_FALL * smallestProjectedFall;
        return new Comparison(measured, at, percent(value, p.low()), percent(value, p.high()), review);
    }

    private static Optional<Double> percent(double measured, double projected) {
        return projected > 0 ? Optional.of(100 * (measured - projected) / projected) : Optional.empty();
    }
}
