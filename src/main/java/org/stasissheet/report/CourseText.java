package org.stasissheet.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.stasissheet.course.AnalyteCheck;
import org.stasissheet.course.Course;
import org.stasissheet.course.CourseEntry;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.Procedure;
import org.stasissheet.course.ProcedureReview;
import org.stasissheet.course.Projected;
import org.stasissheet.derived.CaseQuantities;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.UnitSymbols;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.Worksheet;

/**
 * The course report as plain text, and the words every course output shares (procedure names, the review rule,
 * the trend line, the course caution): latest verdicts and act-now items first, then each procedure with its
 * projections beside what was measured, then every assessment's worksheet in time order.
 */
public final class CourseText {
    private static final String NL = System.lineSeparator();

    /** The review rule in words, one place for text, JSON and PDF. */
    public static final String REVIEW_RULE = "a measured fall smaller than half the smallest projected fall is "
            + "marked for review (common practice, no published cut-off): check the volume actually processed, "
            + "rebound from outside the vessels and new production";

    /** The course's own caution, beside the standing ones. */
    public static final String COURSE_CAUTION = "Projected values are model estimates, not measurements: act on "
            + "measured values and the patient, and measure again after each procedure.";

    private CourseText() {
    }

    public static List<String> cautions(CourseReport report) {
        List<String> all = new ArrayList<>(report.latest().cautions());
        all.add(COURSE_CAUTION);
        return List.copyOf(all);
    }

    public static String render(CourseReport report) {
        StringBuilder sb = new StringBuilder();
        sb.append("STASIS SHEET COURSE OF TREATMENT").append(NL);
        cautions(report).forEach(c -> sb.append("  * ").append(c).append(NL));
        sb.append(NL);
        WorksheetText.ruleSet(sb, report.latest().ruleSet());
        Worksheet latest = report.latest();
        sb.append("LATEST ASSESSMENT, ").append(ReportTime.FORMAT.format(latest.source().assessedAt().orElseThrow()))
                .append(NL);
        trendLine(report).ifPresent(t -> sb.append("  Trend: ").append(t).append(NL));
        WorksheetText.verdicts(sb, latest);
        actNow(sb, latest);
        sb.append("TIMELINE").append(NL);
        int sheet = 0;
        int procedure = 0;
        for (CourseEntry e : report.course().entries()) {
            if (e instanceof CourseEntry.Assessment) {
                Worksheet w = report.worksheets().get(sheet++);
                sb.append("  ").append(ReportTime.FORMAT.format(e.at())).append("  assessment: ")
                        .append(VerdictWords.hyperviscosity(w.hyperviscosity())).append("; ")
                        .append(VerdictWords.leukostasis(w.leukostasis())).append(NL);
                String values = keyValues(w);
                if (!values.isEmpty()) {
                    sb.append("      ").append(values).append(NL);
                }
            } else {
                procedure(sb, report.procedures().get(procedure++));
            }
        }
        sb.append("  Review rule: ").append(REVIEW_RULE).append('.').append(NL).append(NL);
        sheet = 0;
        for (Worksheet w : report.worksheets()) {
            sb.append("WORKSHEET ").append(++sheet).append(" OF ").append(report.worksheets().size()).append(", ")
                    .append(ReportTime.FORMAT.format(w.source().assessedAt().orElseThrow())).append(NL);
            WorksheetText.verdicts(sb, w);
            WorksheetText.flags(sb, w);
            WorksheetText.inputs(sb, w);
        }
        sb.append(Cautions.SHORT).append(NL);
        return sb.toString();
    }

    private static void actNow(StringBuilder sb, Worksheet w) {
        List<Flag> actNow = w.flags().stream().filter(f -> f.level() == Level.ACT_NOW).toList();
        sb.append("ACT NOW (latest assessment)").append(NL);
        if (actNow.isEmpty()) {
            sb.append("  (nothing flagged to act on now; this rules nothing out)").append(NL);
        }
        actNow.forEach(f -> sb.append("  ").append(f.level().symbol()).append(' ').append(f.title()).append(NL));
        sb.append(NL);
    }

    /** The values a course follows, as measured at this assessment. */
    static String keyValues(Worksheet w) {
        List<String> parts = new ArrayList<>();
        for (Analyte a : followed(w.source().condition().paraprotein())) {
            w.source().labs().get(a).ifPresent(m -> parts.add(a.label() + " " + m.entered()));
        }
        return String.join(", ", parts);
    }

    /** The analytes a course follows, in the order charts and tables show them. */
    public static List<Analyte> followed(org.stasissheet.intake.Paraprotein isotype) {
        List<Analyte> list = new ArrayList<>();
        list.add(Analyte.SERUM_VISCOSITY);
        CaseQuantities.paraproteinLab(isotype).ifPresent(list::add);
        list.add(Analyte.WBC);
        list.add(Analyte.POTASSIUM);
        return list;
    }

    private static void procedure(StringBuilder sb, ProcedureReview r) {
        sb.append("  ").append(ReportTime.FORMAT.format(r.procedure().at())).append("  ").append(describe(r))
                .append(NL);
        for (AnalyteCheck c : r.checks()) {
            sb.append("      ").append(c.analyte().label()).append(" before ").append(amount(c.before().value(),
                    c.analyte())).append(NL);
            c.projected().whyUnknown().ifPresent(why -> sb.append("        not projected: ").append(why).append(NL));
            c.projected().known().ifPresent(p -> {
                String[] names = names(p);
                sb.append("        projected ").append(names[0]).append(' ').append(amount(p.low(), c.analyte()))
                        .append(", ").append(names[1]).append(' ').append(amount(p.high(), c.analyte())).append(NL);
            });
            if (c.next().isEmpty()) {
                sb.append("        measured next: none yet").append(NL);
            }
            c.next().ifPresent(m -> {
                String[] names = c.projected().known().map(CourseText::names).orElse(new String[] {"", ""});
                sb.append("        measured next ").append(amount(m.measured().value(), c.analyte())).append(" at ")
                        .append(ReportTime.FORMAT.format(m.at()));
                m.differenceFromLowPercent().ifPresent(d -> sb.append("; ").append(percent(d)).append(" against ")
                        .append(names[0]));
                m.differenceFromHighPercent().ifPresent(d -> sb.append(", ").append(percent(d)).append(" against ")
                        .append(names[1]));
                sb.append(NL);
                if (m.review()) {
                    sb.append("        ").append(Level.REVIEW.symbol()).append(" REVIEW: the fall is much smaller "
                            + "than projected; check the volume processed, rebound and new production").append(NL);
                }
            });
        }
        r.notes().forEach(n -> sb.append("      ").append(n).append(NL));
    }

    /** The procedure in words: kind and amount. */
    public static String describe(ProcedureReview r) {
        Procedure p = r.procedure();
        if (p instanceof Procedure.PlasmaExchange x) {
            String amount = x.plasmaVolumes().map(v -> Numbers.plain(v) + (v == 1 ? " plasma volume" : " plasma volumes"))
                    .orElseGet(() -> x.volume().orElseThrow() + " removed" + r.plasmaVolumes()
                            .map(v -> " (about " + Numbers.rounded(v, 2)
                            + (Numbers.rounded(v, 2).equals("1") ? " plasma volume)" : " plasma volumes)")).orElse(""));
            return "plasma exchange, " + amount + ", replaced with " + x.replacement().words();
        }
        if (p instanceof Procedure.Leukapheresis l) {
            return "leukapheresis, " + Numbers.plain(l.bloodVolumesProcessed()) + " blood volumes processed";
        }
        if (p instanceof Procedure.Transfusion t) {
            return "red cell transfusion, " + t.redCellUnits() + " unit" + (t.redCellUnits() == 1 ? "" : "s");
        }
        if (p instanceof Procedure.Cytoreduction c) {
            return "cytoreduction started: " + c.agent();
        }
        return "rituximab started";
    }

    /** The names of a projection's two values ("right after", "after redistribution", or the usual falls). */
    public static String[] names(Projected p) {
        return p.kind() == Projected.Kind.EXCHANGE
                ? new String[] {ExchangeProjection.IMMEDIATE_SHORT, ExchangeProjection.AFTER_REDISTRIBUTION_SHORT}
                : new String[] {"at the largest usual fall", "at the smallest usual fall"};
    }

    /** A value of a followed analyte with its unit symbol, for the reader. */
    public static String amount(double value, Analyte a) {
        return UnitSymbols.format(Numbers.rounded(value, 3), a.canonicalUnit());
    }

    /** A signed difference in per cent. */
    public static String percent(double d) {
        return (d > 0 ? "+" : "") + Numbers.rounded(d, 2) + " %";
    }

    /**
     * One line of trend for a handoff: the first followed value measured at two or more assessments, with the
     * procedures that lower it counted between its first and last measurement
     * ("serum viscosity 13.6 → 3.6 → 1.8 cP after 2 exchanges").
     */
    public static Optional<String> trendLine(CourseReport report) {
        Course course = report.course();
        for (Analyte a : followed(course.condition().paraprotein())) {
            List<CourseEntry.Assessment> measured = course.assessments().stream()
                    .filter(x -> x.moment().labs().has(a)).toList();
            if (measured.size() < 2) {
                continue;
            }
            List<String> values = measured.stream()
                    .map(x -> Numbers.rounded(x.moment().labs().canonical(a).orElseThrow(), 3)).toList();
            var from = measured.get(0).at().toInstant();
            var to = measured.get(measured.size() - 1).at().toInstant();
            long exchanges = count(course, Procedure.PlasmaExchange.class, from, to);
            long leukaphereses = count(course, Procedure.Leukapheresis.class, from, to);
            List<String> after = new ArrayList<>();
            if (exchanges > 0) {
                after.add(exchanges + (exchanges == 1 ? " exchange" : " exchanges"));
            }
            if (leukaphereses > 0) {
                after.add(leukaphereses + (leukaphereses == 1 ? " leukapheresis" : " leukaphereses"));
            }
            return Optional.of(a.label() + " " + UnitSymbols.format(String.join(" → ", values), a.canonicalUnit())
                    + (after.isEmpty() ? "" : " after " + String.join(" and ", after)));
        }
        return Optional.empty();
    }

    private static long count(Course course, Class<? extends Procedure> kind, java.time.Instant from,
                              java.time.Instant to) {
        return course.procedures().stream().filter(kind::isInstance)
                .filter(p -> !p.at().toInstant().isBefore(from) && !p.at().toInstant().isAfter(to)).count();
    }

    /** The handoff note of the latest assessment with the trend line after its background. */
    public static String note(CourseReport report, boolean withIdentifiers) {
        String note = HandoffNote.render(report.latest(), withIdentifiers);
        Optional<String> trend = trendLine(report);
        if (trend.isEmpty()) {
            return note;
        }
        List<String> lines = new ArrayList<>(List.of(note.split("\n")));
        lines.add(2, "Trend: " + trend.get() + ".");
        return String.join("\n", lines) + "\n";
    }
}
