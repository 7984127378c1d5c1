package org.stasissheet.report;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.stasissheet.intake.Findings;
import org.stasissheet.rules.Basis;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.HyperviscosityVerdict;
import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.TumorLysisVerdict;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.Worksheet;

/** The worksheet PDF's sections that present the rules: the three verdicts and the flags by level. */
final class PdfVerdictSections {
    private PdfVerdictSections() {
    }

    // ---- verdicts and flags -------------------------------------------------------------------------------

    static void verdicts(WorksheetPdf pdf, Document doc) throws DocumentException {
        Worksheet sheet = pdf.sheet();
        doc.add(pdf.heading("Verdicts"));
        PdfPTable t = pdf.table(1.5f, 2.4f, 4.6f);
        pdf.headerCells(t, "Question", "Verdict", "Why");
        t.addCell(pdf.cell("Hyperviscosity syndrome", pdf.bodyBold()));
        t.addCell(pdf.cell(VerdictWords.hyperviscosity(sheet.hyperviscosity()), pdf.bodyBold()));
        t.addCell(pdf.cell(sheet.hyperviscosity().reason(), pdf.small()));
        t.addCell(pdf.cell("Leukostasis (Novotny grading)", pdf.bodyBold()));
        t.addCell(pdf.cell(VerdictWords.leukostasis(sheet.leukostasis()), pdf.bodyBold()));
        t.addCell(pdf.cell(sheet.leukostasis().reason() + "\n" + organGrades(sheet.source().findings())
                + VerdictWords.pulmonarySuggestion(sheet).stream().map(l -> "\n" + l).reduce("", String::concat),
                pdf.small()));
        TumorLysisVerdict tl = sheet.tumorLysis();
        t.addCell(pdf.cell("Tumor lysis (Cairo-Bishop)", pdf.bodyBold()));
        if (tl.applies()) {
            t.addCell(pdf.cell("laboratory " + VerdictWords.laboratory(tl) + "\nclinical "
                    + VerdictWords.clinical(tl), pdf.bodyBold()));
            t.addCell(pdf.cell(tl.reason() + "\n" + criteria(tl) + tl.window(), pdf.small()));
        } else {
            t.addCell(pdf.cell("not checked", pdf.body()));
            t.addCell(pdf.cell(TumorLysisVerdict.NOT_CHECKED + ".", pdf.small()));
        }
        doc.add(t);
        flags(pdf, doc, sheet.flags());
    }


    private static String organGrades(Findings f) {
        List<String> parts = new ArrayList<>();
        grade(parts, LeukostasisVerdict.Organ.PULMONARY, f.pulmonaryGrade());
        grade(parts, LeukostasisVerdict.Organ.NEUROLOGICAL, f.neurologicalGrade());
        grade(parts, LeukostasisVerdict.Organ.OTHER, f.otherOrganGrade());
        return "Grades: " + String.join("; ", parts) + ".\n" + Cautions.GRADING_UNVERIFIED;
    }

    private static void grade(List<String> parts, LeukostasisVerdict.Organ organ, Optional<Integer> g) {
        parts.add(organ.label() + " " + g.map(v -> v + " (" + LeukostasisVerdict.descriptor(organ, v) + ")")
                .orElse("not assessed"));
    }

    private static String criteria(TumorLysisVerdict tl) {
        StringBuilder sb = new StringBuilder();
        for (TumorLysisVerdict.Criterion c : tl.criteria()) {
            sb.append(VerdictWords.criterion(c)).append(": ").append(c.analyte().label())
                    .append(c.value().map(q -> " " + WorksheetPdf.quantity(q) + " (" + c.how() + ")").orElse(""))
                    .append('\n');
        }
        return sb.toString();
    }

    /** Flags grouped by level, most urgent first; each group and each flag shows the level's word and symbol. */
    static void flags(WorksheetPdf pdf, Document doc, List<Flag> flags) throws DocumentException {
        doc.add(pdf.heading("Flags"));
        if (flags.isEmpty()) {
            doc.add(pdf.text("No rule fired. This does not rule anything out: act on the clinical picture.",
                    pdf.body()));
            return;
        }
        for (Level level : Level.values()) {
            List<Flag> group = flags.stream().filter(f -> f.level() == level).toList();
            if (group.isEmpty()) {
                continue;
            }
            Paragraph head = pdf.subheading(level.badge() + " (" + group.size() + ")",
                    WorksheetPdf.font(PdfFonts.bold(), level == Level.ACT_NOW ? 11 : 10), 4);
            doc.add(head);
            PdfPTable t = new PdfPTable(new float[] {0.9f, 7f});
            t.setWidthPercentage(100);
            t.setSpacingBefore(3);
            t.setSpacingAfter(3);
            for (Flag f : group) {
                PdfPCell badge = pdf.cell(level.symbol() + "\n" + level.word(), pdf.bodyBold());
                PdfPCell body = pdf.cell(new Phrase());
                if (level == Level.ACT_NOW) {
                    // a heavier frame as well as the word and symbol, so the urgent rows stand out in grey print
                    badge.setBorderWidth(1.6f);
                }
                t.addCell(badge);
                Phrase p = new Phrase();
                p.add(new Chunk(PdfFonts.printable(f.title()) + "\n", pdf.bodyBold()));
                p.add(new Chunk(PdfFonts.printable(f.explanation()) + "\n", pdf.body()));
                int n = pdf.sources().cite(f.source());
                p.add(new Chunk("Source [" + n + "] · basis: " + f.basis().words() + " · rule " + f.id(),
                        f.basis() == Basis.FROM_MEMORY ? pdf.smallItalic() : pdf.small()));
                body = pdf.cell(p);
                if (level == Level.ACT_NOW) {
                    body.setBorderWidth(1.6f);
                }
                t.addCell(body);
            }
            doc.add(t);
        }
    }

}
