package org.stasissheet.report;

import org.stasissheet.flow.FlowSources;
import org.stasissheet.apheresis.ApheresisSources;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import org.stasissheet.apheresis.ApheresisPlan;
import org.stasissheet.apheresis.ExchangeRow;
import org.stasissheet.apheresis.MissingInputs;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.apheresis.ValueRange;
import org.stasissheet.flow.FlowEstimates;
import org.stasissheet.flow.FlowPoint;
import org.stasissheet.flow.Leukocrit;
import org.stasissheet.flow.WhatIf;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;

/** The worksheet PDF's sections that present the flow estimate (as a vector chart) and the apheresis numbers. */
final class PdfEstimateSections {
    /** Diameters of the flow table, µm: the ones CASE-FORMAT requires in {@code flow.byDiameter}. */
    static final double[] TABLE_DIAMETERS_UM = {5, 10, 20, 50, 100};
    private static final float PLOT_HEIGHT = 190;

    private PdfEstimateSections() {
    }

    // ---- flow -----------------------------------------------------------------------------------------------

    static void flow(WorksheetPdf pdf, Document doc, PdfWriter writer) throws DocumentException {
        FlowEstimates flow = pdf.sheet().flow();
        if (flow.byDiameter().isKnown()) {
            // heading, intro and chart stay together: start a page rather than strand the heading
            float needed = FlowChart.height(PLOT_HEIGHT, seriesCount(flow)) + 80;
            if (writer.getVerticalPosition(true) - doc.bottom() < needed) {
                doc.newPage();
            }
        }
        doc.add(pdf.heading("Microvascular flow estimate"));
        if (flow.byDiameter().whyUnknown().isPresent()) {
            doc.add(pdf.loose(pdf.text("No flow chart. " + sentence(flow.byDiameter().whyUnknown().get()),
                    pdf.bodyBold())));
            caveats(pdf, doc, flow.caveats());
            return;
        }
        int poiseuille = pdf.sources().cite(FlowSources.POISEUILLE);
        int vitro = pdf.sources().cite(FlowSources.PRIES_1992);
        int vivo = pdf.sources().cite(FlowSources.PRIES_1994);
        doc.add(pdf.loose(pdf.text(flow.meaning() + flow.aboveReference().map(n -> " " + n).orElse("")
                + " [" + poiseuille + "]; "
                + "apparent viscosity = plasma ratio × blood viscosity law [" + vitro + "], [" + vivo + "]. "
                + "Hematocrit used " + flow.hematocrit().known().map(h -> Numbers.rounded(h, 3)).orElse("—")
                + ", plasma ratio " + Numbers.rounded(flow.plasmaRatio(), 3) + " (" + flow.plasmaRatioBasis()
                + "). Reference: hematocrit " + Numbers.plain(flow.referenceHematocrit()) + ", serum viscosity "
                + Numbers.plain(flow.referenceSerumViscosity()) + ".", pdf.small())));
        List<NamedSeries> series = series(pdf, flow);
        List<FlowChart.Series> chart = series.stream().map(NamedSeries::chart).toList();
        float width = pdf.contentWidth();
        PdfTemplate t = FlowChart.draw(writer.getDirectContent(), width, PLOT_HEIGHT, chart);
        WorksheetPdf.addTemplate(doc, t);
        valuesTable(pdf, doc, series);
        caveats(pdf, doc, flow.caveats());
        whatIfNotes(pdf, doc, flow);
    }

    /** A chart series with its values by diameter, for the table under the chart. */
    private record NamedSeries(FlowChart.Series chart, List<FlowPoint> points) {
    }

    private static List<NamedSeries> series(WorksheetPdf pdf, FlowEstimates flow) {
        List<NamedSeries> list = new ArrayList<>();
        flow.byDiameter().known().ifPresent(p -> list.add(named("patient, in vitro law (Pries 1992)", p)));
        flow.inVivo().known().ifPresent(p -> list.add(named("patient, in vivo law (Pries 1994)", p)));
        Optional<Leukocrit> lk = flow.leukocrit().known();
        if (lk.isPresent()) {
            pdf.sources().cite(FlowSources.LICHTMAN_ROWE);
            Leukocrit l = lk.get();
            list.add(named("patient with leukocrit " + Numbers.rounded(l.leukocritLow(), 2) + "–"
                    + Numbers.rounded(l.leukocritHigh(), 2) + " (" + l.cellType() + " " + Numbers.plain(l.volumeLowFl())
                    + "–" + Numbers.plain(l.volumeHighFl()) + " fL; drawn at the high end)", l.byDiameter()));
        }
        for (WhatIf w : flow.whatIf()) {
            String suffix = w.changes() == WhatIf.Changes.LEUKOCRIT_ONLY ? " (with leukocrit)" : "";
            w.movedSeries().known().ifPresent(p -> list.add(named("what-if: " + w.name() + suffix, p)));
        }
        return list;
    }

    private static int seriesCount(FlowEstimates flow) {
        int n = (flow.byDiameter().isKnown() ? 1 : 0) + (flow.inVivo().isKnown() ? 1 : 0)
                + (flow.leukocrit().isKnown() ? 1 : 0);
        return n + (int) flow.whatIf().stream().filter(w -> w.movedSeries().isKnown()).count();
    }

    private static NamedSeries named(String label, List<FlowPoint> points) {
        List<FlowChart.Point> chart = points.stream()
                .map(p -> new FlowChart.Point(p.diameterUm(), p.relativeFlow())).toList();
        return new NamedSeries(new FlowChart.Series(label, chart), points);
    }

    private static void valuesTable(WorksheetPdf pdf, Document doc, List<NamedSeries> series)
            throws DocumentException {
        float[] widths = new float[TABLE_DIAMETERS_UM.length + 1];
        widths[0] = 4.2f;
        for (int i = 1; i < widths.length; i++) {
            widths[i] = 1;
        }
        PdfPTable t = pdf.table(widths);
        t.addCell(headerCell(pdf, "relative flow at diameter"));
        for (double d : TABLE_DIAMETERS_UM) {
            t.addCell(headerCell(pdf, Numbers.plain(d) + " µm"));
        }
        for (NamedSeries s : series) {
            t.addCell(pdf.cell(s.chart().label(), pdf.small()));
            for (double d : TABLE_DIAMETERS_UM) {
                String v = s.points().stream().filter(p -> p.diameterUm() == d).findFirst()
                        .map(p -> Numbers.rounded(p.relativeFlow(), 3)).orElse("—");
                t.addCell(pdf.cell(v, pdf.small()));
            }
        }
        doc.add(t);
    }

    private static PdfPCell headerCell(WorksheetPdf pdf, String text) {
        PdfPCell c = pdf.cell(text, WorksheetPdf.font(PdfFonts.bold(), 7.5f));
        c.setBackgroundColor(new Color(0xee, 0xee, 0xee));
        return c;
    }

    private static void caveats(WorksheetPdf pdf, Document doc, List<String> caveats) throws DocumentException {
        Paragraph head = pdf.subheading("What this estimate leaves out", pdf.bodyBold(), 3);
        doc.add(head);
        for (String c : caveats) {
            doc.add(pdf.text("• " + c, pdf.small()));
        }
    }

    private static void whatIfNotes(WorksheetPdf pdf, Document doc, FlowEstimates flow) throws DocumentException {
        if (flow.whatIf().isEmpty()) {
            return;
        }
        Paragraph head = pdf.subheading("What-if assumptions", pdf.bodyBold(), 3);
        doc.add(head);
        for (WhatIf w : flow.whatIf()) {
            String text = w.byDiameter().whyUnknown().map(r -> "not drawn. " + sentence(r))
                    .orElse(String.join(" ", w.assumptions()));
            doc.add(pdf.text("• " + w.name() + ": " + text, pdf.small()));
        }
    }

    // ---- apheresis ------------------------------------------------------------------------------------------

    static void apheresis(WorksheetPdf pdf, Document doc) throws DocumentException {
        ApheresisPlan plan = pdf.sheet().apheresis();
        doc.add(pdf.heading("Apheresis planning"));
        MissingInputs missing = plan.missing();
        if (missing.sentence().isPresent()) {
            doc.add(pdf.loose(pdf.text(missing.sentence().get(), pdf.bodyBold())));
        }
        int nadler = pdf.sources().cite(ApheresisSources.NADLER);
        int kaplan = pdf.sources().cite(ApheresisSources.KAPLAN);
        PdfPTable v = pdf.table(3.2f, 4f);
        v.setHeaderRows(0);
        row(pdf, v, "Total blood volume (Nadler) [" + nadler + "]", litres(plan.bloodVolumeL(), missing));
        row(pdf, v, "Plasma volume (Kaplan) [" + kaplan + "]", litres(plan.plasmaVolumeL(), missing));
        row(pdf, v, "Plasma volume (blood volume × (1 − Hct))",
                litres(plan.plasmaVolumeFromBloodVolumeL(), missing));
        row(pdf, v, "Paraprotein", known(plan.paraproteinGPerL(), x -> Numbers.rounded(x, 3) + " g/L"));
        row(pdf, v, "Intravascular fraction of the isotype", known(plan.intravascularFraction(),
                x -> Numbers.rounded(x * 100, 3) + " %"));
        doc.add(v);

        int kinetics = pdf.sources().cite(ApheresisSources.ONE_COMPARTMENT);
        int projection = pdf.sources().cite(ApheresisSources.SV_PROJECTION);
        Paragraph head = pdf.subheading("Plasma exchange [" + kinetics + "]", pdf.bodyBold(), 4);
        doc.add(head);
        PdfPTable t = pdf.table(1.3f, 1.4f, 2f, 2f, 2.4f);
        pdf.headerCells(t, "plasma volumes", "volume", "intravascular left", "paraprotein",
                "serum viscosity [" + projection + "] (approximation)");
        Set<String> reasons = new LinkedHashSet<>();
        for (ExchangeRow r : plan.exchanges()) {
            t.addCell(pdf.cell(Numbers.rounded(r.plasmaVolumes(), 3), pdf.body()));
            t.addCell(pdf.cell(orDash(r.volumeL(), x -> Numbers.rounded(x, 3) + " L", reasons, missing),
                    pdf.body()));
            t.addCell(pdf.cell(Numbers.rounded(r.intravascularRemaining() * 100, 3) + " %", pdf.body()));
            t.addCell(pdf.cell(orDash(r.paraproteinGPerL(), x -> bothMoments(x, " g/L"), reasons, missing),
                    pdf.body()));
            t.addCell(pdf.cell(orDash(r.serumViscosity(), x -> bothMoments(x, ""), reasons, missing), pdf.body()));
        }
        doc.add(t);
        for (String reason : reasons) {
            doc.add(pdf.text("— " + sentence(reason), pdf.small()));
        }

        int leuka = pdf.sources().cite(ApheresisSources.LEUKAPHERESIS);
        PdfPTable l = pdf.table(3.2f, 4f);
        l.setHeaderRows(0);
        row(pdf, l, "Leukapheresis: blood volume to process [" + leuka + "]",
                missing.covers(plan.leukapheresis().processVolumeL()) ? "—"
                        : known(plan.leukapheresis().processVolumeL(), r -> range(r) + " L"));
        row(pdf, l, "Leukapheresis: white count after one procedure [" + leuka + "]",
                known(plan.leukapheresis().wbcAfter(), r -> range(r) + " ×10⁹/L"));
        doc.add(l);
        for (String note : plan.notes()) {
            doc.add(pdf.text("• " + note, pdf.small()));
        }
    }

    private static void row(WorksheetPdf pdf, PdfPTable t, String label, String value) {
        t.addCell(pdf.cell(label, pdf.bodyBold()));
        t.addCell(pdf.cell(value, pdf.body()));
    }

    private static String bothMoments(ExchangeProjection p, String unit) {
        return ExchangeProjection.IMMEDIATE_SHORT + " " + Numbers.rounded(p.immediate(), 3) + unit + "\n"
                + ExchangeProjection.AFTER_REDISTRIBUTION_SHORT + " " + Numbers.rounded(p.afterRedistribution(), 3)
                + unit;
    }

    /** Litres, or a dash where the one "enter …" sentence above already says why. */
    private static String litres(Estimate<Double> e, MissingInputs missing) {
        return missing.covers(e) ? "—" : known(e, x -> Numbers.rounded(x, 3) + " L");
    }

    private static String range(ValueRange r) {
        return Numbers.rounded(r.low(), 3) + "–" + Numbers.rounded(r.high(), 3);
    }

    /** The value, or the core's reason in its own words (it already says what was not estimated). */
    private static <T> String known(Estimate<T> e, Function<T, String> format) {
        return e.known().map(format).orElseGet(() -> sentence(e.whyUnknown().orElseThrow()));
    }

    /** The value, or a dash whose reason is collected to be printed once under the table. */
    private static <T> String orDash(Estimate<T> e, Function<T, String> format,
                                     Set<String> reasons, MissingInputs missing) {
        if (e.isKnown()) {
            return e.known().map(format).orElseThrow();
        }
        if (!missing.covers(e)) {
            reasons.add(e.whyUnknown().orElseThrow());
        }
        return "—";
    }

    /** Capitalised, ending with a full stop. */
    static String sentence(String s) {
        String t = s.strip();
        if (t.isEmpty()) {
            return t;
        }
        t = Character.toUpperCase(t.charAt(0)) + t.substring(1);
        return t.endsWith(".") ? t : t + ".";
    }

}
