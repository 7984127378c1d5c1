package org.stasissheet.ui.course;

import java.time.Duration;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.stasissheet.course.AnalyteCheck;
import org.stasissheet.course.CourseEntry;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.Procedure;
import org.stasissheet.course.ProcedureReview;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.UnitSymbols;
import org.stasissheet.report.CourseText;
import org.stasissheet.report.ReportTime;

/**
 * The course report laid out for the panel: the rows of the projected-versus-measured table and the points of the
 * trend charts. Only presentation: every number comes from the {@link CourseReport}, the words from
 * {@link CourseText}, as in the text report and the PDF. No JavaFX, so it is tested without a screen.
 */
public final class CourseRows {
    private CourseRows() {
    }

    /**
     * One line of the table: one analyte around one procedure (or, for a procedure with nothing projected, the
     * procedure and why), every cell in words with its unit.
     *
     * @param projectedLow  right after the exchange, or after a leukapheresis at the largest usual fall
     * @param projectedHigh after redistribution, or at the smallest usual fall
     * @param review        "REVIEW" with what to check, "no" or "not yet measured"
     */
    public record ReviewRow(String procedure, String analyte, String before, String projectedLow,
                            String projectedHigh, String measuredNext, String difference, String review) {
        public ReviewRow {
            Objects.requireNonNull(procedure, "procedure");
        }

        public boolean flagged() {
            return review.startsWith("REVIEW");
        }
    }

    /** A point of a chart: hours since the course's first entry, the value in the analyte's unit, a label. */
    public record Point(double hours, double value, String label) {
    }

    /**
     * One chart: the measured values, the projections drawn at the time of the next measurement (so each sits
     * beside what was measured; at the procedure when nothing was measured after it), the procedures on the time
     * axis (value 0).
     */
    public record Trend(Analyte analyte, String title, List<Point> measured, List<Point> projectedLow,
                        List<Point> projectedHigh, List<Point> procedures) {
        public Trend {
            measured = List.copyOf(measured);
            projectedLow = List.copyOf(projectedLow);
            projectedHigh = List.copyOf(projectedHigh);
            procedures = List.copyOf(procedures);
        }
    }

    public static List<ReviewRow> rows(CourseReport report) {
        List<ReviewRow> rows = new ArrayList<>();
        int n = 0;
        int reviewIndex = 0;
        for (CourseEntry e : report.course().entries()) {
            n++;
            if (!(e instanceof Procedure)) {
                continue;
            }
            ProcedureReview r = report.procedures().get(reviewIndex++);
            // short: the entries list above the table describes each procedure in full
            String procedure = "#" + n + " " + r.procedure().kind().replace('-', ' ') + ", "
                    + ReportTime.FORMAT.format(r.procedure().at());
            if (r.checks().isEmpty()) {
                String why = r.notes().isEmpty() ? "nothing projected for this procedure" : r.notes().get(0);
                rows.add(new ReviewRow(procedure, "—", "—", "—", "—", "—", why, "no"));
                continue;
            }
            for (AnalyteCheck c : r.checks()) {
                Analyte a = c.analyte();
                String low = c.projected().known().map(p -> CourseText.amount(p.low(), a))
                        .orElse("not projected: " + c.projected().whyUnknown().orElse(""));
                String high = c.projected().known().map(p -> CourseText.amount(p.high(), a)).orElse("—");
                String next = c.next().map(m -> CourseText.amount(m.measured().value(), a) + " at "
                        + ReportTime.FORMAT.format(m.at())).orElse("none yet");
                String difference = c.next().map(m -> {
                    List<String> parts = new ArrayList<>();
                    m.differenceFromLowPercent().ifPresent(d -> parts.add(CourseText.percent(d) + " against low"));
                    m.differenceFromHighPercent().ifPresent(d -> parts.add(CourseText.percent(d) + " against high"));
                    return parts.isEmpty() ? "—" : String.join(", ", parts);
                }).orElse("—");
                String review = c.next().map(m -> m.review()
                        ? "REVIEW: the fall is much smaller than projected; check the volume processed, rebound "
                        + "and new production" : "no").orElse("not yet measured");
                rows.add(new ReviewRow(procedure, a.label(), CourseText.amount(c.before().value(), a), low, high,
                        next, difference, review));
            }
        }
        return rows;
    }

    /** One chart per followed analyte measured at least once, in the order the PDF draws them. */
    public static List<Trend> trends(CourseReport report) {
        List<CourseEntry> entries = report.course().entries();
        OffsetDateTime start = entries.get(0).at();
        List<Trend> trends = new ArrayList<>();
        for (Analyte a : CourseText.followed(report.course().condition().paraprotein())) {
            List<Point> measured = new ArrayList<>();
            for (CourseEntry.Assessment x : report.course().assessments()) {
                x.moment().labs().canonical(a).ifPresent(v -> measured.add(new Point(hours(start, x.at()), v,
                        "measured " + ReportTime.FORMAT.format(x.at()))));
            }
            if (measured.isEmpty()) {
                continue;
            }
            List<Point> low = new ArrayList<>();
            List<Point> high = new ArrayList<>();
            for (ProcedureReview r : report.procedures()) {
                for (AnalyteCheck c : r.checks()) {
                    if (c.analyte() != a || c.projected().known().isEmpty()) {
                        continue;
                    }
                    var p = c.projected().known().get();
                    OffsetDateTime at = c.next().map(AnalyteCheck.Comparison::at).orElse(r.procedure().at());
                    String[] names = CourseText.names(p);
                    low.add(new Point(hours(start, at), p.low(), "projected " + names[0]));
                    high.add(new Point(hours(start, at), p.high(), "projected " + names[1]));
                }
            }
            List<Point> procedures = new ArrayList<>();
            int n = 0;
            for (CourseEntry e : entries) {
                n++;
                if (e instanceof Procedure p) {
                    procedures.add(new Point(hours(start, p.at()), 0, "#" + n + " " + p.kind().replace('-', ' ')));
                }
            }
            trends.add(new Trend(a, a.label() + " (" + UnitSymbols.of(a.canonicalUnit()) + ")", measured, low, high,
                    procedures));
        }
        return trends;
    }

    private static double hours(OffsetDateTime from, OffsetDateTime to) {
        return Duration.between(from.toInstant(), to.toInstant()).toSeconds() / 3600.0;
    }
}
