package org.stasissheet.report;

import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;
import java.io.ByteArrayOutputStream;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Objects;
import org.stasissheet.course.AnalyteCheck;
import org.stasissheet.course.CourseEntry;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.ProcedureReview;
import org.stasissheet.measure.Analyte;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.worksheet.Worksheet;

/**
 * The course PDF: the latest verdicts and act-now items first, then a time chart per followed value where measured
 * (procedures marked, projections beside measurements), then a table of every assessment and procedure. The
 * cautions head every page; the course file is embedded under the worksheet PDF's attachment name, so every command
 * that reads a worksheet PDF reads this one back as the course.
 */
public final class CoursePdf {
    public static final String TITLE = "Stasis Sheet course of treatment";
    private static final float MARGIN = 40;
    private static final Color HEAD_FILL = new Color(0xee, 0xee, 0xee);

    private final CourseReport report;
    private final PdfOptions options;
    private final OffsetDateTime generatedAt;
    private final byte[] courseJson;
    private final Font body = WorksheetPdf.font(PdfFonts.regular(), 8.5f);
    private final Font bold = WorksheetPdf.font(PdfFonts.bold(), 8.5f);
    private final Font heading = WorksheetPdf.font(PdfFonts.bold(), 12);

    private CoursePdf(CourseReport report, PdfOptions options, OffsetDateTime generatedAt, byte[] courseJson) {
        this.report = Objects.requireNonNull(report, "report");
        this.options = Objects.requireNonNull(options, "options");
        this.generatedAt = Objects.requireNonNull(generatedAt, "generatedAt");
        this.courseJson = Objects.requireNonNull(courseJson, "courseJson").clone();
    }

    /** The PDF bytes; {@code courseJson} is the course file as read (its patient label removed without identifiers). */
    public static byte[] render(CourseReport report, PdfOptions options, OffsetDateTime generatedAt,
                                byte[] courseJson) {
        return new CoursePdf(report, options, generatedAt, courseJson).render();
    }

    private byte[] render() {
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        Document doc = WorksheetPdf.document(options.paper().size(), CourseText.cautions(report));
        try {
            PdfWriter writer = WorksheetPdf.open(doc, out, new Frame(), options, generatedAt, TITLE);
            WorksheetPdf.attach(writer, options.includeIdentifiers() ? courseJson : withoutIdentifiers(courseJson),
                    "The course file this report was made from (stasis-course/1)");
            latest(doc);
            charts(doc, writer);
            entries(doc);
            doc.close();
        } catch (DocumentException e) {
            throw new IllegalStateException("course PDF could not be laid out: " + e.getMessage(), e);
        }
        return out.toByteArray();
    }

    private Paragraph para(String text, Font f) {
        Paragraph p = new Paragraph(PdfFonts.printable(text), f);
        p.setLeading(f.getSize() * 1.35f);
        return p;
    }

    private void latest(Document doc) throws DocumentException {
        Worksheet w = report.latest();
        doc.add(para(TITLE, WorksheetPdf.font(PdfFonts.bold(), 16)));
        if (options.includeIdentifiers() && !report.course().patient().label().isBlank()) {
            doc.add(para(report.course().patient().label(), bold));
        }
        doc.add(para("Latest assessment, " + ReportTime.FORMAT.format(w.source().assessedAt().orElseThrow()),
                heading));
        doc.add(para(VerdictWords.upperFirst(VerdictWords.hyperviscosity(w.hyperviscosity())), bold));
        doc.add(para(w.hyperviscosity().reason(), body));
        doc.add(para(VerdictWords.upperFirst(VerdictWords.leukostasis(w.leukostasis())), bold));
        doc.add(para(w.leukostasis().reason(), body));
        doc.add(para(VerdictWords.upperFirst(VerdictWords.tumorLysis(w.tumorLysis())), bold));
        CourseText.trendLine(report).ifPresent(t -> {
            doc.add(para("Trend: " + t, bold));
        });
        List<Flag> actNow = w.flags().stream().filter(f -> f.level() == Level.ACT_NOW).toList();
        doc.add(para("Act now", heading));
        if (actNow.isEmpty()) {
            doc.add(para("Nothing flagged to act on now; this rules nothing out.", body));
        }
        for (Flag f : actNow) {
            doc.add(para(f.level().symbol() + " " + f.title(), bold));
            doc.add(para(f.explanation() + " (" + f.source() + "; " + f.basis().words() + ")", body));
        }
        long reviews = report.procedures().stream().filter(ProcedureReview::needsReview).count();
        if (reviews > 0) {
            doc.add(para(Level.REVIEW.symbol() + " " + reviews + " procedure" + (reviews == 1 ? "" : "s")
                    + " fell much less than projected: " + CourseText.REVIEW_RULE + ".", bold));
        }
    }

    private void charts(Document doc, PdfWriter writer) throws DocumentException {
        doc.newPage();
        doc.add(para("Values over time", heading));
        doc.add(para("Projections are model estimates (one-compartment exchange kinetics; the rule set's fall per "
                + "leukapheresis), drawn at the time of the next measurement so each sits beside what was measured.",
                body));
        float width = options.paper().size().getWidth() - 2 * MARGIN;
        boolean any = false;
        for (Analyte a : CourseText.followed(report.course().condition().paraprotein())) {
            if (CourseChart.measured(report, a)) {
                WorksheetPdf.addTemplate(doc, CourseChart.draw(writer.getDirectContent(), report, a, width));
                any = true;
            }
        }
        if (!any) {
            doc.add(para("None of serum viscosity, paraprotein, white cell count or potassium was measured.", body));
        }
    }

    private void entries(Document doc) throws DocumentException {
        doc.newPage();
        doc.add(para("Every assessment and procedure", heading));
        PdfPTable t = new PdfPTable(new float[] {0.4f, 1.5f, 1.4f, 4.7f});
        t.setWidthPercentage(100);
        t.setHeaderRows(1);
        t.setSpacingBefore(4);
        for (String h : new String[] {"#", "time", "entry", "what it showed"}) {
            PdfPCell c = cell(h, bold);
            c.setBackgroundColor(HEAD_FILL);
            t.addCell(c);
        }
        int n = 0;
        int sheet = 0;
        int procedure = 0;
        for (CourseEntry e : report.course().entries()) {
            n++;
            t.addCell(cell("#" + n, body));
            t.addCell(cell(ReportTime.FORMAT.format(e.at()), body));
            if (e instanceof CourseEntry.Assessment) {
                Worksheet w = report.worksheets().get(sheet++);
                t.addCell(cell("assessment", bold));
                long actNow = w.flags().stream().filter(f -> f.level() == Level.ACT_NOW).count();
                t.addCell(cell(VerdictWords.upperFirst(VerdictWords.hyperviscosity(w.hyperviscosity())) + "; "
                        + VerdictWords.leukostasis(w.leukostasis()) + "; " + VerdictWords.tumorLysis(w.tumorLysis())
                        + (actNow > 0 ? "; " + actNow + " act-now item" + (actNow == 1 ? "" : "s") : "")
                        + (CourseText.keyValues(w).isEmpty() ? "" : ". " + CourseText.keyValues(w)), body));
            } else {
                ProcedureReview r = report.procedures().get(procedure++);
                t.addCell(cell(CourseChart.shortKind(r.procedure()), bold));
                StringBuilder sb = new StringBuilder(CourseText.describe(r));
                for (AnalyteCheck c : r.checks()) {
                    sb.append(". ").append(VerdictWords.upperFirst(c.analyte().label())).append(" before ")
                            .append(CourseText.amount(c.before().value(), c.analyte()));
                    c.projected().known().ifPresent(p -> {
                        String[] names = CourseText.names(p);
                        sb.append("; projected ").append(names[0]).append(' ')
                                .append(CourseText.amount(p.low(), c.analyte())).append(", ").append(names[1])
                                .append(' ').append(CourseText.amount(p.high(), c.analyte()));
                    });
                    c.projected().whyUnknown().ifPresent(why -> sb.append("; not projected: ").append(why));
                    sb.append(c.next().map(m -> "; measured next " + CourseText.amount(m.measured().value(),
                            c.analyte()) + (m.review() ? " — REVIEW: fell much less than projected" : ""))
                            .orElse("; not measured since"));
                }
                r.notes().forEach(note -> sb.append(". ").append(note));
                t.addCell(cell(sb.toString(), body));
            }
        }
        doc.add(t);
        doc.add(para("Review rule: " + CourseText.REVIEW_RULE + ".", body));
        doc.add(para("Embedded record: the course file is attached to this PDF as " + WorksheetPdf.ATTACHMENT_NAME
                + (options.includeIdentifiers() ? "" : " (patient label removed)")
                + "; reading this PDF with the course command reads it back. Rule set "
                + report.latest().ruleSet().name() + " " + report.latest().ruleSet().version() + ", SHA-256 "
                + report.latest().ruleSet().sha256() + ".", body));
    }

    private PdfPCell cell(String text, Font f) {
        PdfPCell c = new PdfPCell(new com.lowagie.text.Phrase(PdfFonts.printable(text), f));
        c.setPadding(3);
        c.setBorderWidth(0.5f);
        return c;
    }

    /** The cautions at the top of every page and the page number with a running footer at the foot. */
    private final class Frame extends PdfPageEventHelper {
        @Override
        public void onEndPage(PdfWriter writer, Document document) {
            PdfContentByte cb = writer.getDirectContent();
            com.lowagie.text.Rectangle page = document.getPageSize();
            WorksheetPdf.cautionBand(cb, page, CourseText.cautions(report));
            cb.beginText();
            cb.setFontAndSize(PdfFonts.regular(), 7.5f);
            cb.showTextAligned(Element.ALIGN_LEFT, PdfFonts.printable(TITLE + " · generated "
                    + ReportTime.FORMAT.format(generatedAt) + " · Page " + writer.getPageNumber()), MARGIN,
                    MARGIN - 14, 0);
            cb.endText();
        }
    }

    /** A teaching copy: the patient label, every assessor and every {@code extra} left out, as for a case. */
    static byte[] withoutIdentifiers(byte[] courseJson) {
        com.fasterxml.jackson.databind.ObjectMapper json = new com.fasterxml.jackson.databind.ObjectMapper();
        try {
            com.fasterxml.jackson.databind.JsonNode root = json.readTree(courseJson);
            if (root instanceof com.fasterxml.jackson.databind.node.ObjectNode top) {
                top.remove("extra");
                if (top.get("patient") instanceof com.fasterxml.jackson.databind.node.ObjectNode patient) {
                    patient.remove("label");
                }
                for (com.fasterxml.jackson.databind.JsonNode entry : top.path("entries")) {
                    if (entry.get("assessment") instanceof com.fasterxml.jackson.databind.node.ObjectNode a) {
                        a.remove("assessor");
                        a.remove("extra");
                    }
                }
            }
            return json.writeValueAsBytes(root);
        } catch (java.io.IOException e) {
            throw new IllegalArgumentException("the course file to embed is not JSON: " + e.getMessage(), e);
        }
    }
}
