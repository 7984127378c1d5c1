package org.stasissheet.report;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Image;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfFileSpecification;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfString;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Case;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.intake.Enums;
import org.stasissheet.intake.Findings;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Patient;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.Provenance;
import org.stasissheet.worksheet.InputLine;
import org.stasissheet.worksheet.Worksheet;

/**
 * Renders a worksheet as a PDF: a pure function of the worksheet, the options, the generation time and the case
 * file's bytes (embedded as an attachment, so the PDF is itself the record and can be assessed again).
 *
 * <p>Every page carries the standing cautions at the top and "Page X of Y" at the foot. Text is real text in
 * embedded Liberation Sans, so it can be selected and searched. The document metadata carries no patient data.
 */
public final class WorksheetPdf {
    /** The document title in the PDF metadata: never patient data. */
    public static final String TITLE = "Stasis Sheet worksheet";
    /** The name of the embedded case file, which {@code files.WorksheetPdfs} looks for when reading a PDF back. */
    public static final String ATTACHMENT_NAME = "stasis-case.json";
    /** The document-information key holding the embedded case's SHA-256, which read-back checks. */
    public static final String CASE_DIGEST_KEY = WorksheetPdfs.CASE_DIGEST_KEY;

    static final DateTimeFormatter TIME = ReportTime.FORMAT;
    private static final float MARGIN = 40;
    private static final float CAUTION_SIZE = 7.5f;
    private static final float CAUTION_LEADING = 8.6f;
    private static final float FOOTER_BAND = 34;
    private static final Color RULE_GREY = new Color(0x88, 0x88, 0x88);
    private static final Color HEAD_FILL = new Color(0xee, 0xee, 0xee);

    private final Worksheet sheet;
    private final PdfOptions options;
    private final OffsetDateTime generatedAt;
    private final byte[] embedded;
    private final String embeddedSha256;
    private final SourceList sources = new SourceList();
    private final Font body = font(PdfFonts.regular(), 9);
    private final Font bodyBold = font(PdfFonts.bold(), 9);
    private final Font small = font(PdfFonts.regular(), 7.5f);
    private final Font smallItalic = font(PdfFonts.italic(), 7.5f);
    private final Font heading = font(PdfFonts.bold(), 12);
    private final Font title = font(PdfFonts.bold(), 16);

    private WorksheetPdf(Worksheet sheet, PdfOptions options, OffsetDateTime generatedAt, byte[] caseJson) {
        this.sheet = Objects.requireNonNull(sheet, "sheet");
        this.options = Objects.requireNonNull(options, "options");
        this.generatedAt = Objects.requireNonNull(generatedAt, "generatedAt");
        this.embedded = embeddedCase(sheet.source(), Objects.requireNonNull(caseJson, "caseJson"),
                options.includeIdentifiers());
        this.embeddedSha256 = WorksheetPdfs.sha256(embedded);
    }

    /**
     * Parses the embedded faces now (each is parsed once per process), so a caller can have it done on another
     * thread while it reads and assesses the case; a render does it anyway when nobody did. True when all are there.
     */
    public static boolean prepareFonts() {
        return PdfFonts.regular() != null && PdfFonts.bold() != null && PdfFonts.italic() != null;
    }

    /**
     * The PDF bytes.
     *
     * @param caseJson the case file exactly as read (stasis-case/1 JSON); without identifiers the case is
     *                 embedded without label, assessor and {@code extra} instead
     */
    public static byte[] render(Worksheet sheet, PdfOptions options, OffsetDateTime generatedAt, byte[] caseJson) {
        return new WorksheetPdf(sheet, options, generatedAt, caseJson).render();
    }

    private byte[] render() {
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        Rectangle page = options.paper().size();
        Document doc = document(page, sheet.cautions());
        try {
            PdfWriter writer = open(doc, out, new PageFrame(), options, generatedAt, TITLE);
            attach(writer, embedded, "The case file this worksheet was made from (stasis-case/1)");
            header(doc);
            PdfVerdictSections.verdicts(this, doc);
            inputs(doc);
            caseDetails(doc);
            PdfEstimateSections.flow(this, doc, writer);
            PdfEstimateSections.apheresis(this, doc);
            sourceList(doc);
            provenance(doc);
            doc.close();
        } catch (DocumentException e) {
            throw new IllegalStateException("worksheet PDF could not be laid out: " + e.getMessage(), e);
        }
        return out.toByteArray();
    }

    // ---- shared by the sections ----------------------------------------------------------------------------

    Worksheet sheet() {
        return sheet;
    }

    /** The width between the margins, points. */
    float contentWidth() {
        return options.paper().size().getWidth() - 2 * MARGIN;
    }

    SourceList sources() {
        return sources;
    }

    Font body() {
        return body;
    }

    Font bodyBold() {
        return bodyBold;
    }

    Font small() {
        return small;
    }

    Font smallItalic() {
        return smallItalic;
    }

    static Font font(BaseFont base, float size) {
        return new Font(base, size);
    }

    /**
     * A section heading. Space above comes from the leading, not from paragraph spacing: OpenPDF writes spacing
     * as a blank text line, which some extractors merge into the heading ("I nputs").
     */
    Paragraph heading(String text) {
        return subheading(text, heading, 12);
    }

    /** A one-line heading with {@code above} points of extra space above it. */
    Paragraph subheading(String text, Font f, float above) {
        Paragraph p = new Paragraph(PdfFonts.printable(text), f);
        p.setLeading(f.getSize() * 1.3f + above);
        return p;
    }

    Paragraph text(String text, Font f) {
        Paragraph p = new Paragraph(PdfFonts.printable(text), f);
        p.setLeading(f.getSize() * 1.3f);
        return p;
    }

    /** The paragraph with 3 points more leading: the first text under a heading, so the two do not touch. */
    Paragraph loose(Paragraph p) {
        p.setLeading(p.getLeading() + 3);
        return p;
    }

    PdfPTable table(float... widths) {
        PdfPTable t = new PdfPTable(widths);
        t.setWidthPercentage(100);
        t.setHeaderRows(1);
        // table spacing moves the cursor without writing text, unlike paragraph spacing
        t.setSpacingBefore(4);
        t.setSpacingAfter(4);
        return t;
    }

    void headerCells(PdfPTable t, String... labels) {
        for (String label : labels) {
            PdfPCell c = cell(label, bodyBold);
            c.setBackgroundColor(HEAD_FILL);
            t.addCell(c);
        }
    }

    PdfPCell cell(String text, Font f) {
        PdfPCell c = new PdfPCell(new Phrase(PdfFonts.printable(text), f));
        c.setPadding(3);
        c.setBorderColor(RULE_GREY);
        c.setBorderWidth(0.5f);
        return c;
    }

    PdfPCell cell(Phrase phrase) {
        PdfPCell c = new PdfPCell(phrase);
        c.setPadding(3);
        c.setBorderColor(RULE_GREY);
        c.setBorderWidth(0.5f);
        return c;
    }

    static String quantity(Quantity q) {
        return WorksheetText.format(q);
    }

    // ---- sections -----------------------------------------------------------------------------------------

    private void header(Document doc) throws DocumentException {
        doc.add(new Paragraph(TITLE, title));
        Case c = sheet.source();
        Patient p = c.patient();
        PdfPTable t = new PdfPTable(new float[] {1.2f, 3f, 1.2f, 3f});
        t.setWidthPercentage(100);
        t.setSpacingBefore(6);
        pair(t, "Patient", options.includeIdentifiers() ? orDash(p.label()) : "(left out of this copy)");
        pair(t, "Sex / age", p.sex().map(Enums.Coded::code).orElse("not given") + " / "
                + p.ageYears().map(a -> a + " years").orElse("age not given"));
        pair(t, "Assessor", options.includeIdentifiers() ? orDash(c.assessor()) : "(left out of this copy)");
        pair(t, "Assessed at", c.assessedAt().map(TIME::format).orElse("not given"));
        pair(t, "Generated at", TIME.format(generatedAt));
        pair(t, "Rule set", sheet.ruleSet().name() + " " + sheet.ruleSet().version()
                + (sheet.ruleSet().local() ? " (LOCAL PROTOCOL)" : ""));
        doc.add(t);
    }

    private void pair(PdfPTable t, String label, String value) {
        PdfPCell l = cell(label, bodyBold);
        l.setBorder(Rectangle.NO_BORDER);
        PdfPCell v = cell(value, body);
        v.setBorder(Rectangle.NO_BORDER);
        t.addCell(l);
        t.addCell(v);
    }

    private void inputs(Document doc) throws DocumentException {
        doc.add(heading("Inputs"));
        if (sheet.inputs().isEmpty()) {
            doc.add(text("No measured values were entered.", body));
            return;
        }
        PdfPTable t = table(2.6f, 1.8f, 1.8f);
        headerCells(t, "Value", "as entered", "in standard units");
        for (InputLine line : sheet.inputs()) {
            t.addCell(cell(WorksheetText.label(line), body));
            t.addCell(cell(quantity(line.entered()), body));
            t.addCell(cell(line.entered().equals(line.canonical()) ? "(same)" : quantity(line.canonical()), body));
        }
        doc.add(t);
    }

    private void caseDetails(Document doc) throws DocumentException {
        Case c = sheet.source();
        Findings f = c.findings();
        PdfPTable t = table(2.2f, 5f);
        headerCells(t, "Condition, findings and plan", "as entered");
        row(t, "Paraprotein", c.condition().paraprotein().code());
        row(t, "Leukemia", c.condition().leukemia().words()
                + (c.condition().monocytic() ? " (monocytic differentiation)" : ""));
        row(t, "Cryoglobulin", c.condition().cryoglobulin().code());
        row(t, "Therapy started", c.condition().therapyStarted().map(Object::toString).orElse("not started / not given"));
        row(t, "Organ grades (0–3)", "pulmonary " + grade(f.pulmonaryGrade()) + ", neurological "
                + grade(f.neurologicalGrade()) + ", other organs " + grade(f.otherOrganGrade()));
        row(t, "Signs", "mucosal bleeding " + seen(f.mucosalBleeding()) + "; visual disturbance "
                + seen(f.visualDisturbance()) + "; heart failure " + seen(f.heartFailure()) + "; arrhythmia "
                + seen(f.arrhythmia()) + "; seizure " + seen(f.seizure()));
        row(t, "Fundoscopy", f.retinopathy().words());
        row(t, "Plan", "rituximab " + (c.plan().rituximabPlanned() ? "planned" : "not planned")
                + "; red-cell transfusion " + (c.plan().transfusionPlanned() ? "planned" : "not planned"));
        doc.add(t);
    }

    private void row(PdfPTable t, String label, String value) {
        t.addCell(cell(label, bodyBold));
        t.addCell(cell(value, body));
    }

    private static String grade(Optional<Integer> g) {
        return g.map(String::valueOf).orElse("not assessed");
    }

    private static String seen(Observation o) {
        return switch (o) {
            case YES -> "yes";
            case NO -> "no";
            case NOT_ASSESSED -> "not assessed";
        };
    }

    private void sourceList(Document doc) throws DocumentException {
        doc.add(heading("Sources cited"));
        if (sources.isEmpty()) {
            doc.add(text("No source was cited on this worksheet.", body));
            return;
        }
        List<String> entries = sources.entries();
        PdfPTable t = new PdfPTable(new float[] {0.35f, 7f});
        t.setWidthPercentage(100);
        for (int i = 0; i < entries.size(); i++) {
            PdfPCell n = cell("[" + (i + 1) + "]", small);
            n.setBorder(Rectangle.NO_BORDER);
            PdfPCell s = cell(entries.get(i), small);
            s.setBorder(Rectangle.NO_BORDER);
            t.addCell(n);
            t.addCell(s);
        }
        doc.add(t);
    }

    private void provenance(Document doc) throws DocumentException {
        Provenance p = sheet.ruleSet();
        doc.add(heading("Provenance"));
        PdfPTable t = table(1.6f, 5.6f);
        t.setHeaderRows(0);
        row(t, "Tool", "Stasis Sheet " + options.toolVersion());
        row(t, "Rule set", p.name() + ", version " + p.version());
        PdfPCell hashLabel = cell("Rule set SHA-256", bodyBold);
        PdfPCell hash = cell(p.sha256(), font(PdfFonts.regular(), 8));
        t.addCell(hashLabel);
        t.addCell(hash);
        row(t, "Embedded record", "the case file is attached to this PDF as " + ATTACHMENT_NAME
                + (options.includeIdentifiers() ? "" : " (patient label, assessor and extra removed)")
                + "; assessing this PDF reads it back and checks it against the SHA-256 below.");
        t.addCell(cell("Embedded case SHA-256", bodyBold));
        t.addCell(cell(embeddedSha256, font(PdfFonts.regular(), 8)));
        doc.add(t);
        if (p.local()) {
            Paragraph local = text("LOCAL PROTOCOL: this rule set differs from the one shipped with the tool. "
                    + "Its thresholds are the local team's responsibility; check them against the local protocol.",
                    bodyBold);
            doc.add(local);
        }
    }

    /** A page with room for the caution band above and the footer below; shared by every PDF the tool writes. */
    static Document document(Rectangle page, List<String> cautions) {
        float band = cautionBandHeight(page.getWidth(), cautions);
        return new Document(page, MARGIN, MARGIN, MARGIN + band - 8, MARGIN + FOOTER_BAND - 10);
    }

    /** Opens the document with its page frame, title, creator and generation time (handed in: no clock here). */
    static PdfWriter open(Document doc, ByteArrayOutputStream out, PdfPageEventHelper frame, PdfOptions options,
                          OffsetDateTime generatedAt, String title) throws DocumentException {
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        writer.setPageEvent(frame);
        writer.setFullCompression();
        // keep a chart where it belongs, between its heading and its table, even when it moves to a new page
        writer.setStrictImageSequence(true);
        doc.addTitle(title);
        doc.addCreator("Stasis Sheet " + options.toolVersion());
        PdfDate generated = new PdfDate(GregorianCalendar.from(generatedAt.toZonedDateTime()));
        doc.open();
        writer.getInfo().put(PdfName.CREATIONDATE, generated);
        writer.getInfo().put(PdfName.MODDATE, generated);
        return writer;
    }

    /**
     * Embeds a JSON record as {@link #ATTACHMENT_NAME} and records its SHA-256 in the document information as
     * {@value #CASE_DIGEST_KEY}, apart from the attachment: an edit of the embedded record alone no longer matches,
     * and read-back refuses it. Shared by every PDF the tool writes.
     */
    static void attach(PdfWriter writer, byte[] bytes, String description) {
        try {
            PdfFileSpecification spec = PdfFileSpecification.fileEmbedded(writer, null, ATTACHMENT_NAME, bytes,
                    true, "application/json", null);
            writer.addFileAttachment(description, spec);
            writer.getInfo().put(new PdfName(CASE_DIGEST_KEY), new PdfString(WorksheetPdfs.sha256(bytes)));
        } catch (IOException e) {
            throw new UncheckedIOException("the record could not be attached", e);
        }
    }

    /**
     * The case file to embed: as read, or, for a copy without identifiers, rewritten from the case without the
     * label, the assessor and {@code extra} (by the case writer, so it always reads back).
     */
    static byte[] embeddedCase(Case c, byte[] caseJson, boolean includeIdentifiers) {
        return includeIdentifiers ? caseJson.clone()
                : CaseWriter.write(c.withoutIdentifiers()).getBytes(StandardCharsets.UTF_8);
    }

    private static String orDash(String s) {
        return s.isBlank() ? "—" : s;
    }

    /**
     * The height of the caution band: one line per caution, more where a caution wraps (measured in the font),
     * so a longer caution makes the band taller instead of being cut short.
     */
    private static float cautionBandHeight(float pageWidth, List<String> cautions) {
        float width = pageWidth - 2 * MARGIN - 10;
        int lines = 0;
        boolean first = true;
        for (String caution : cautions) {
            String text = first ? "CAUTION  " + caution : caution;
            BaseFont f = first ? PdfFonts.bold() : PdfFonts.regular();
            lines += (int) Math.ceil(f.getWidthPoint(PdfFonts.printable(text), CAUTION_SIZE) * 1.05 / width);
            first = false;
        }
        return Math.max(1, lines) * CAUTION_LEADING + 16;
    }

    /** The cautions, boxed at the top of a page: every page of every PDF the tool writes carries them. */
    static void cautionBand(PdfContentByte cb, Rectangle page, List<String> cautions) {
        float left = MARGIN;
        float right = page.getWidth() - MARGIN;
        float top = page.getHeight() - MARGIN + 14;
        float bottom = top - cautionBandHeight(page.getWidth(), cautions) + 6;
        cb.saveState();
        cb.setLineWidth(1.2f);
        cb.setColorStroke(Color.BLACK);
        cb.rectangle(left, bottom, right - left, top - bottom);
        cb.stroke();
        cb.restoreState();
        ColumnText ct = new ColumnText(cb);
        ct.setSimpleColumn(left + 5, bottom + 2, right - 5, top - 3);
        Paragraph p = new Paragraph();
        p.setLeading(CAUTION_LEADING);
        p.add(new Chunk("CAUTION  ", font(PdfFonts.bold(), CAUTION_SIZE)));
        boolean first = true;
        for (String caution : cautions) {
            if (!first) {
                p.add(Chunk.NEWLINE);
            }
            p.add(new Chunk(PdfFonts.printable(caution),
                    font(first ? PdfFonts.bold() : PdfFonts.regular(), CAUTION_SIZE)));
            first = false;
        }
        ct.addElement(p);
        try {
            if (ColumnText.hasMoreText(ct.go())) {
                // a caution cut short is worse than no PDF: fail loudly so the band gets made taller
                throw new IllegalStateException("the standing cautions do not fit the caution band");
            }
        } catch (DocumentException e) {
            throw new IllegalStateException("caution band could not be laid out", e);
        }
    }

    /** The cautions at the top of every page and "Page X of Y" with a short running footer at the foot. */
    private final class PageFrame extends PdfPageEventHelper {
        private PdfTemplate total;
        private static final float FOOT_SIZE = 7.5f;

        @Override
        public void onOpenDocument(PdfWriter writer, Document document) {
            total = writer.getDirectContent().createTemplate(30, 12);
        }

        @Override
        public void onEndPage(PdfWriter writer, Document document) {
            PdfContentByte cb = writer.getDirectContent();
            Rectangle page = document.getPageSize();
            cautionBand(cb, page, sheet.cautions());
            footer(cb, page, writer.getPageNumber());
        }

        private void footer(PdfContentByte cb, Rectangle page, int number) {
            float y = MARGIN - 14;
            float left = MARGIN;
            float right = page.getWidth() - MARGIN;
            cb.saveState();
            cb.setLineWidth(0.5f);
            cb.setColorStroke(RULE_GREY);
            cb.moveTo(left, y + 11);
            cb.lineTo(right, y + 11);
            cb.stroke();
            cb.restoreState();
            String running = TITLE
                    + (options.includeIdentifiers() && !sheet.source().patient().label().isBlank()
                            ? " · " + sheet.source().patient().label() : "")
                    + " · generated " + TIME.format(generatedAt)
                    + " · rule set " + sheet.ruleSet().name() + " " + sheet.ruleSet().version()
                    + (sheet.ruleSet().local() ? " (LOCAL PROTOCOL)" : "");
            String pageText = "Page " + number + " of ";
            float pageWidth = PdfFonts.regular().getWidthPoint(pageText + "999", FOOT_SIZE);
            cb.beginText();
            cb.setFontAndSize(PdfFonts.regular(), FOOT_SIZE);
            cb.setColorFill(Color.BLACK);
            cb.showTextAligned(Element.ALIGN_LEFT, fit(PdfFonts.printable(running), right - left - pageWidth - 12), left, y, 0);
            cb.showTextAligned(Element.ALIGN_LEFT, pageText, right - pageWidth, y, 0);
            cb.endText();
            cb.addTemplate(total, right - pageWidth + PdfFonts.regular().getWidthPoint(pageText, FOOT_SIZE), y);
        }

        private String fit(String text, float width) {
            String s = text;
            while (s.length() > 8 && PdfFonts.regular().getWidthPoint(s, FOOT_SIZE) > width) {
                s = s.substring(0, s.length() - 2);
            }
            return s.equals(text) ? s : s + "…";
        }

        @Override
        public void onCloseDocument(PdfWriter writer, Document document) {
            total.beginText();
            total.setFontAndSize(PdfFonts.regular(), FOOT_SIZE);
            total.setColorFill(Color.BLACK);
            total.showTextAligned(Element.ALIGN_LEFT, String.valueOf(writer.getPageNumber() - 1), 0, 0, 0);
            total.endText();
        }
    }

    /** Adds a chart template to the flow of the document as a scalable vector image. */
    static void addTemplate(Document doc, PdfTemplate t) throws DocumentException {
        Image img = Image.getInstance(t);
        img.setAlignment(Element.ALIGN_CENTER);
        doc.add(img);
    }
}
