package org.stasissheet.course;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.derived.ExchangeKinetics;
import org.stasissheet.files.RuleSources;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;

/** Projections beside measurements and the review mark, on invented IgM courses. */
class CourseAssessorTest {
    private static final RuleSet RULES = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();

    private static CourseReport report(String... entries) {
        return CourseAssessor.assess(CourseReaderTest.accepted(CourseReaderTest.course(entries)), RULES);
    }

    /** Serum viscosity after 1 plasma volume from 6.0 cP: the derived kinetics, with f = 0.78 for IgM. */
    private static double projectedHigh() {
        // f = 0.78 (Reverberi & Reverberi 2007 via DOMAIN.md §6), reference 1.6 cP (Mehta & Singhal 2003)
        return ExchangeKinetics.projectSerumViscosity(6.0, 1.6, 0.78, 1.0).afterRedistribution();
    }

    @Test
    @DisplayName("review mark: a fall just under half the smallest projected fall is marked, just over is not "
            + "(cut-off 0.5, common practice)")
    void reviewCutOff() {
        double smallestFall = 6.0 - projectedHigh();
        for (double share : new double[] {0.49, 0.51}) {
            double measured = 6.0 - share * smallestFall;
            AnalyteCheck sv = report(
                    CourseReaderTest.assessment("2026-06-11T08:00:00+02:00", 6.0),
                    CourseReaderTest.exchange("2026-06-11T09:00:00+02:00", "\"plasmaVolumes\": 1.0"),
                    CourseReaderTest.assessment("2026-06-11T13:00:00+02:00", measured))
                    .procedures().get(0).checks().get(0);
            assertEquals(projectedHigh(), sv.projected().known().orElseThrow().high(), 1e-12);
            assertEquals(share < 0.5, sv.next().orElseThrow().review(), "share " + share);
        }
    }

    @Test
    @DisplayName("a value that rose after the exchange is always marked for review")
    void roseAfterExchange() {
        AnalyteCheck sv = report(
                CourseReaderTest.assessment("2026-06-11T08:00:00+02:00", 6.0),
                CourseReaderTest.exchange("2026-06-11T09:00:00+02:00", "\"plasmaVolumes\": 1.0"),
                CourseReaderTest.assessment("2026-06-11T13:00:00+02:00", 6.3))
                .procedures().get(0).checks().get(0);
        assertTrue(sv.next().orElseThrow().review());
    }

    @Test
    @DisplayName("two exchanges without a measurement between: the second is not projected from the stale value, "
            + "and the first is not compared with a value measured after the second")
    void noStaleProjection() {
        CourseReport r = report(
                CourseReaderTest.assessment("2026-06-11T08:00:00+02:00", 6.0),
                CourseReaderTest.exchange("2026-06-11T09:00:00+02:00", "\"plasmaVolumes\": 1.0"),
                CourseReaderTest.exchange("2026-06-12T09:00:00+02:00", "\"plasmaVolumes\": 1.0"),
                CourseReaderTest.assessment("2026-06-12T13:00:00+02:00", 2.5));
        ProcedureReview first = r.procedures().get(0);
        assertFalse(first.checks().isEmpty());
        assertTrue(first.checks().get(0).next().isEmpty());
        assertEquals(List.of(), r.procedures().get(1).checks());
    }

    @Test
    @DisplayName("an exchange written as a volume needs weight and hematocrit; without a hematocrit it says why")
    void volumeWithoutHematocrit() {
        String noHematocrit = "{\"assessment\": {\"assessedAt\": \"2026-06-11T08:00:00+02:00\", "
                + "\"labs\": {\"serumViscosity\": {\"value\": 6.0, \"unit\": \"cP\"}}}}";
        ProcedureReview review = report(noHematocrit,
                CourseReaderTest.exchange("2026-06-11T09:00:00+02:00", "\"volume\": {\"value\": 2.8, \"unit\": \"L\"}"),
                CourseReaderTest.assessment("2026-06-11T13:00:00+02:00", 3.0)).procedures().get(0);
        assertTrue(review.plasmaVolumes().isEmpty());
        assertTrue(review.checks().get(0).projected().whyUnknown().orElseThrow().contains("hematocrit"),
                review.toString());
        // the measured value still stands beside it, with no difference and no review mark
        AnalyteCheck.Comparison next = review.checks().get(0).next().orElseThrow();
        assertEquals(3.0, next.measured().value(), 1e-12);
        assertTrue(next.differenceFromLowPercent().isEmpty());
        assertFalse(next.review());
    }
}
