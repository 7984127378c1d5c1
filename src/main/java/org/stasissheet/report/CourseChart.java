package org.stasissheet.report;

import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;
import java.awt.Color;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.stasissheet.course.AnalyteCheck;
import org.stasissheet.course.CourseEntry;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.Procedure;
import org.stasissheet.course.ProcedureReview;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.UnitSymbols;

/**
 * One time chart of a course for the PDF: measured values as filled dots joined by a line, projected values as
 * hollow marks at the time of the next measurement (a square for the value right after the procedure or the largest
 * usual fall, a hollow circle for the value after redistribution or the smallest usual fall), procedures as dashed
 * vertical lines numbered as in the table. Shapes and words, never colour alone, tell them apart.
 */
final class CourseChart {
    static final float HEIGHT = 150;
    private static final float LEFT = 46;
    private static final float BOTTOM = 30;
    private static final float TOP = 14;
    private static final float RIGHT = 12;
    private static final Color GREY = new Color(0x66, 0x66, 0x66);

    private CourseChart() {
    }

    /** Whether the course measured this analyte at least once (a chart is drawn only then). */
    static boolean measured(CourseReport report, Analyte a) {
        return report.course().assessments().stream().anyMatch(x -> x.moment().labs().has(a));
    }

    static PdfTemplate draw(PdfContentByte cb, CourseReport report, Analyte a, float width) {
        PdfTemplate t = cb.createTemplate(width, HEIGHT);
        List<double[]> measured = new ArrayList<>();
        for (CourseEntry.Assessment x : report.course().assessments()) {
            x.moment().labs().canonical(a).ifPresent(v -> measured.add(new double[] {seconds(x.at().toInstant()), v}));
        }
        List<double[]> projected = new ArrayList<>();
        for (ProcedureReview r : report.procedures()) {
            for (AnalyteCheck c : r.checks()) {
                if (c.analyte() != a) {
                    continue;
                }
                c.projected().known().ifPresent(p -> {
                    double at = c.next().map(m -> seconds(m.at().toInstant()))
                            .orElse(seconds(r.procedure().at().toInstant()));
                    projected.add(new double[] {at, p.low(), p.high()});
                });
            }
        }
        double t0 = Double.MAX_VALUE;
        double t1 = -Double.MAX_VALUE;
        for (CourseEntry e : report.course().entries()) {
            t0 = Math.min(t0, seconds(e.at().toInstant()));
            t1 = Math.max(t1, seconds(e.at().toInstant()));
        }
        if (t1 - t0 < 3600) {
            t1 = t0 + 3600;
        }
        double yMax = 0;
        for (double[] m : measured) {
            yMax = Math.max(yMax, m[1]);
        }
        for (double[] p : projected) {
            yMax = Math.max(yMax, p[2]);
        }
        yMax = yMax <= 0 ? 1 : yMax * 1.1;
        float plotW = width - LEFT - RIGHT;
        float plotH = HEIGHT - BOTTOM - TOP;
        double fromT = t0;
        double spanT = t1 - t0;
        double top = yMax;
        java.util.function.DoubleUnaryOperator x = s -> LEFT + plotW * (s - fromT) / spanT;
        java.util.function.DoubleUnaryOperator y = v -> BOTTOM + plotH * v / top;

        // axes and y ticks
        t.setLineWidth(0.6f);
        t.setColorStroke(Color.BLACK);
        t.moveTo(LEFT, BOTTOM);
        t.lineTo(LEFT, BOTTOM + plotH);
        t.moveTo(LEFT, BOTTOM);
        t.lineTo(LEFT + plotW, BOTTOM);
        t.stroke();
        text(t, a.label() + " (" + UnitSymbols.of(a.canonicalUnit()) + ")", LEFT, HEIGHT - 9, Element.ALIGN_LEFT, 8,
                true);
        for (int i = 0; i <= 4; i++) {
            double v = top * i / 4;
            float yy = (float) y.applyAsDouble(v);
            text(t, Numbers.rounded(v, 2), LEFT - 3, yy - 2.5f, Element.ALIGN_RIGHT, 6.5f, false);
            t.setColorStroke(new Color(0xdd, 0xdd, 0xdd));
            t.setLineWidth(0.3f);
            t.moveTo(LEFT, yy);
            t.lineTo(LEFT + plotW, yy);
            t.stroke();
        }
        // procedures: dashed lines, numbered as in the table of entries; labels stay inside the plot
        LabelRows rows = new LabelRows(LEFT, LEFT + plotW);
        int n = 0;
        for (CourseEntry e : report.course().entries()) {
            n++;
            if (!(e instanceof Procedure p)) {
                continue;
            }
            float xx = (float) x.applyAsDouble(seconds(p.at().toInstant()));
            t.setColorStroke(GREY);
            t.setLineWidth(0.7f);
            t.setLineDash(3, 2, 0);
            t.moveTo(xx, BOTTOM);
            t.lineTo(xx, BOTTOM + plotH);
            t.stroke();
            t.setLineDash(0);
            String label = "#" + n + " " + shortKind(p);
            float[] at = rows.place(xx, PdfFonts.regular().getWidthPoint(PdfFonts.printable(label), 6));
            text(t, label, at[0], BOTTOM + plotH - 7 - 7 * at[1], Element.ALIGN_LEFT, 6, false);
        }
        // time labels at the first and last entry
        text(t, ReportTime.FORMAT.format(report.course().entries().get(0).at()), LEFT, BOTTOM - 10,
                Element.ALIGN_LEFT, 6.5f, false);
        List<CourseEntry> all = report.course().entries();
        text(t, ReportTime.FORMAT.format(all.get(all.size() - 1).at()), LEFT + plotW, BOTTOM - 10,
                Element.ALIGN_RIGHT, 6.5f, false);
        // measured: filled dots joined by a line
        t.setColorStroke(Color.BLACK);
        t.setColorFill(Color.BLACK);
        t.setLineWidth(1f);
        for (int i = 0; i < measured.size(); i++) {
            float xx = (float) x.applyAsDouble(measured.get(i)[0]);
            float yy = (float) y.applyAsDouble(measured.get(i)[1]);
            if (i == 0) {
                t.moveTo(xx, yy);
            } else {
                t.lineTo(xx, yy);
            }
        }
        if (measured.size() > 1) {
            t.stroke();
        } else {
            t.newPath();
        }
        for (double[] m : measured) {
            t.circle((float) x.applyAsDouble(m[0]), (float) y.applyAsDouble(m[1]), 2.4f);
            t.fill();
        }
        // projected: hollow square (low) and hollow triangle (high), a little left of the measured time
        t.setLineWidth(0.8f);
        for (double[] p : projected) {
            float xx = (float) x.applyAsDouble(p[0]) - 6;
            float low = (float) y.applyAsDouble(p[1]);
            float high = (float) y.applyAsDouble(p[2]);
            t.rectangle(xx - 2.4f, low - 2.4f, 4.8f, 4.8f);
            t.stroke();
            t.circle(xx, high, 2.6f);
            t.stroke();
        }
        legend(t, width);
        return t;
    }

    private static void legend(PdfTemplate t, float width) {
        text(t, "● measured   □ projected right after (leukapheresis: largest usual fall)   ○ projected after "
                + "redistribution (leukapheresis: smallest usual fall)   dashed line: procedure", LEFT, 4, Element.ALIGN_LEFT,
                6, false);
    }

    /**
     * Places the procedure labels of one chart: right of their line, or left of it where the text would pass the
     * plot's right edge (a procedure near the last entry), never left of the plot; a label that would overlap the
     * one before it goes one row lower (three rows, then it overlaps rather than leaving the chart).
     */
    static final class LabelRows {
        static final int ROWS = 3;
        private final float left;
        private final float right;
        private final float[] ends = new float[ROWS];

        LabelRows(float left, float right) {
            this.left = left;
            this.right = right;
            java.util.Arrays.fill(ends, -Float.MAX_VALUE);
        }

        /** The label's left x and its row (0 = top) for a line at {@code x} and a text {@code width} wide. */
        float[] place(float x, float width) {
            float at = x + 1.5f;
            if (at + width > right) {
                at = x - 1.5f - width;
            }
            at = Math.max(left + 1, Math.min(at, right - width));
            int row = 0;
            while (row < ROWS - 1 && at < ends[row] + 2) {
                row++;
            }
            ends[row] = Math.max(ends[row], at + width);
            return new float[] {at, row};
        }
    }

    static String shortKind(Procedure p) {
        if (p instanceof Procedure.PlasmaExchange) {
            return "exchange";
        }
        if (p instanceof Procedure.Leukapheresis) {
            return "leukapheresis";
        }
        if (p instanceof Procedure.Transfusion) {
            return "transfusion";
        }
        if (p instanceof Procedure.Cytoreduction) {
            return "cytoreduction";
        }
        return "rituximab";
    }

    private static void text(PdfTemplate t, String s, float x, float y, int align, float size, boolean bold) {
        t.beginText();
        t.setFontAndSize(bold ? PdfFonts.bold() : PdfFonts.regular(), size);
        t.setColorFill(Color.BLACK);
        t.showTextAligned(align, PdfFonts.printable(s), x, y, 0);
        t.endText();
    }

    private static double seconds(Instant i) {
        return i.getEpochSecond();
    }
}
