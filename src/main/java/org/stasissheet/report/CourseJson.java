package org.stasissheet.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.stasissheet.intake.JsonText;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.List;
import org.stasissheet.course.AnalyteCheck;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.Procedure;
import org.stasissheet.course.ProcedureReview;
import org.stasissheet.course.Projected;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;
import org.stasissheet.worksheet.Worksheet;

/**
 * Renders a course report as the {@code stasis-course-report/1} JSON object of COURSE-FORMAT.md. Each assessment
 * carries the worksheet's own verdict objects (written by {@link WorksheetJson}, one mapping); each exchange or
 * leukapheresis its projections, the next measured value and the comparison.
 */
public final class CourseJson {
    /** Nodes only: the text is written by {@link JsonText}, without an object mapper (a cold start saves its start-up). */
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private CourseJson() {
    }

    public static String render(CourseReport report) {
        return JsonText.pretty(tree(report)) + System.lineSeparator();
    }

    public static ObjectNode tree(CourseReport report) {
        ObjectNode root = NODES.objectNode();
        root.put("format", CourseReport.FORMAT);
        root.set("ruleSet", WorksheetJson.ruleSet(report.latest().ruleSet()));
        ArrayNode assessments = root.putArray("assessments");
        report.worksheets().forEach(w -> assessments.add(assessment(w)));
        ArrayNode procedures = root.putArray("procedures");
        report.procedures().forEach(p -> procedures.add(procedure(p)));
        ObjectNode cutOff = root.putObject("reviewCutOff");
        cutOff.put("fractionOfProjectedFall", AnalyteCheck.REVIEW_FRACTION_OF_PROJECTED_FALL);
        cutOff.put("basis", "common-practice");
        cutOff.put("meaning", CourseText.REVIEW_RULE);
        ArrayNode cautions = root.putArray("cautions");
        CourseText.cautions(report).forEach(cautions::add);
        return root;
    }

    private static ObjectNode assessment(Worksheet sheet) {
        ObjectNode n = NODES.objectNode();
        n.put("at", time(sheet.source().assessedAt().orElseThrow()));
        n.set("hyperviscosity", WorksheetJson.hyperviscosity(sheet.hyperviscosity()));
        n.set("leukostasis", WorksheetJson.leukostasis(sheet.leukostasis()));
        n.set("tumorLysis", WorksheetJson.tumorLysis(sheet.tumorLysis()));
        n.set("flags", WorksheetJson.flags(sheet.flags()));
        ObjectNode labs = n.putObject("labs");
        for (Measurement m : sheet.source().labs().values().values()) {
            labs.set(m.analyte().key(), WorksheetJson.quantity(m.entered()));
        }
        return n;
    }

    private static ObjectNode procedure(ProcedureReview review) {
        Procedure p = review.procedure();
        ObjectNode n = NODES.objectNode();
        n.put("at", time(p.at()));
        n.put("kind", p.kind());
        if (p instanceof Procedure.PlasmaExchange x) {
            review.plasmaVolumes().ifPresent(v -> n.put("plasmaVolumes", v));
            n.put("plasmaVolumesGiven", x.plasmaVolumes().isPresent());
            x.volume().ifPresent(q -> n.set("volume", WorksheetJson.quantity(q)));
            n.put("replacement", x.replacement().code());
        } else if (p instanceof Procedure.Leukapheresis l) {
            n.put("bloodVolumesProcessed", l.bloodVolumesProcessed());
        } else if (p instanceof Procedure.Transfusion t) {
            n.put("redCellUnits", t.redCellUnits());
        } else if (p instanceof Procedure.Cytoreduction c) {
            n.put("agent", c.agent());
        }
        List<AnalyteCheck> checks = review.checks();
        if (!checks.isEmpty()) {
            ObjectNode before = n.putObject("measuredBefore");
            ObjectNode projected = n.putObject("projected");
            ObjectNode unknown = NODES.objectNode();
            ObjectNode next = NODES.objectNode();
            ObjectNode comparison = NODES.objectNode();
            for (AnalyteCheck c : checks) {
                String key = c.analyte().key();
                ObjectNode b = before.putObject(key);
                b.put("value", c.before().value());
                b.put("unit", c.before().unit());
                b.put("at", time(c.beforeAt()));
                c.projected().known().ifPresent(pr -> projected.set(key, projection(pr, c.analyte())));
                c.projected().whyUnknown().ifPresent(why -> unknown.put(key, why));
                c.next().ifPresent(m -> {
                    ObjectNode v = next.putObject(key);
                    v.put("value", m.measured().value());
                    v.put("unit", m.measured().unit());
                    v.put("at", time(m.at()));
                    if (c.projected().known().isEmpty()) {
                        return;
                    }
                    ObjectNode d = comparison.putObject(key);
                    String[] names = lowHighNames(c.projected().known().get());
                    m.differenceFromLowPercent().ifPresent(x -> d.put(names[0] + "DifferencePercent", x));
                    m.differenceFromHighPercent().ifPresent(x -> d.put(names[1] + "DifferencePercent", x));
                    d.put("review", m.review());
                });
            }
            if (!unknown.isEmpty()) {
                n.set("notProjected", unknown);
            }
            if (!next.isEmpty()) {
                n.set("measuredNext", next);
            }
            if (!comparison.isEmpty()) {
                n.set("comparison", comparison);
            }
            n.put("review", review.needsReview());
        }
        ArrayNode notes = n.putArray("notes");
        review.notes().forEach(notes::add);
        return n;
    }

    private static ObjectNode projection(Projected p, Analyte a) {
        ObjectNode n = NODES.objectNode();
        String[] names = lowHighNames(p);
        n.put(names[0], p.low());
        n.put(names[1], p.high());
        n.put("unit", a.canonicalUnit());
        return n;
    }

    /** Exchange: the two moments of COURSE-FORMAT.md; leukapheresis: the ends of the fall per procedure. */
    private static String[] lowHighNames(Projected p) {
        return p.kind() == Projected.Kind.EXCHANGE ? new String[] {"immediate", "afterRedistribution"}
                : new String[] {"atLargestFall", "atSmallestFall"};
    }

    private static String time(OffsetDateTime t) {
        return DateTimeFormatter.ISO_OFFSET_DATE_TIME.format(t);
    }
}
