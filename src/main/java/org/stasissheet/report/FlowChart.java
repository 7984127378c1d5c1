package org.stasissheet.report;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;
import java.awt.Color;
import java.util.List;
import java.util.Objects;
import org.stasissheet.measure.Numbers;

/**
 * Draws relative microvascular flow against vessel diameter as vector graphics with real (selectable) text:
 * a log x axis from 4 to 1000 µm, a linear y axis from 0, a dashed line at 1.0 for the reference, and one line
 * per series. Series differ by line pattern, marker shape and label, and only incidentally by shade, so the
 * chart reads the same printed in black and white.
 */
final class FlowChart {
    static final double MIN_DIAMETER_UM = 4;
    static final double MAX_DIAMETER_UM = 1000;
    private static final double[] X_TICKS = {4, 10, 20, 50, 100, 200, 500, 1000};

    /** One point; the diameter in µm, the flow as a ratio to the reference (1 = the reference). */
    record Point(double diameterUm, double relativeFlow) {
        Point {
            if (!(diameterUm > 0) || !Double.isFinite(diameterUm) || !Double.isFinite(relativeFlow)) {
                throw new IllegalArgumentException("chart point needs a positive diameter and a finite flow");
            }
        }
    }

    /** One line of the chart with its legend label. */
    record Series(String label, List<Point> points) {
        Series {
            Objects.requireNonNull(label, "label");
            points = List.copyOf(points);
        }
    }

    /** Line patterns (dash arrays in points; empty = solid) and markers, used in this order. */
    private static final float[][] DASHES = {{}, {6, 3}, {1.5f, 2}, {7, 2, 1.5f, 2}, {11, 3}};
    private static final Marker[] MARKERS = Marker.values();
    private static final Color[] SHADES = {
        new Color(0x11, 0x11, 0x11), new Color(0x1f, 0x4e, 0x8c), new Color(0x8c, 0x2d, 0x1f),
        new Color(0x2e, 0x6b, 0x2e), new Color(0x5b, 0x3a, 0x80)
    };

    private enum Marker { CIRCLE, SQUARE, TRIANGLE, DIAMOND, CROSS }

    private static final float LEFT = 44;
    private static final float RIGHT = 12;
    private static final float TOP = 10;
    private static final float AXIS_BAND = 30;
    private static final float LEGEND_LINE = 11;

    private FlowChart() {
    }

    /** The total height a chart with this many series needs at this plot height. */
    static float height(float plotHeight, int seriesCount) {
        return TOP + plotHeight + AXIS_BAND + 6 + LEGEND_LINE * (seriesCount + 1);
    }

    static PdfTemplate draw(PdfContentByte canvas, float width, float plotHeight, List<Series> series) {
        float height = height(plotHeight, series.size());
        PdfTemplate t = canvas.createTemplate(width, height);
        BaseFont font = PdfFonts.regular();
        float x0 = LEFT;
        float x1 = width - RIGHT;
        float yTop = height - TOP;
        float y0 = yTop - plotHeight;
        double yMax = niceMax(series);
        double yStep = niceStep(yMax);
        Axis axis = new Axis(x0, x1, y0, yTop, yMax);

        // frame and grid
        t.setLineWidth(0.4f);
        t.setColorStroke(new Color(0xbb, 0xbb, 0xbb));
        for (double d : X_TICKS) {
            t.moveTo(axis.x(d), y0);
            t.lineTo(axis.x(d), yTop);
        }
        for (double v = yStep; v <= yMax + 1e-9; v += yStep) {
            t.moveTo(x0, axis.y(v));
            t.lineTo(x1, axis.y(v));
        }
        t.stroke();
        t.setColorStroke(Color.BLACK);
        t.setLineWidth(0.8f);
        t.rectangle(x0, y0, x1 - x0, yTop - y0);
        t.stroke();

        // tick labels and axis titles
        t.beginText();
        t.setColorFill(Color.BLACK);
        t.setFontAndSize(font, 7);
        for (double d : X_TICKS) {
            t.showTextAligned(PdfContentByte.ALIGN_CENTER, Numbers.plain(d), axis.x(d), y0 - 9, 0);
        }
        for (double v = 0; v <= yMax + 1e-9; v += yStep) {
            t.showTextAligned(PdfContentByte.ALIGN_RIGHT, Numbers.rounded(v, 3), x0 - 3, axis.y(v) - 2.5f, 0);
        }
        t.setFontAndSize(font, 7.5f);
        t.showTextAligned(PdfContentByte.ALIGN_CENTER, "vessel diameter (µm, log scale)", (x0 + x1) / 2,
                y0 - 21, 0);
        t.showTextAligned(PdfContentByte.ALIGN_CENTER, "relative flow (patient ÷ reference)", 11,
                (y0 + yTop) / 2, 90);
        t.endText();

        // the reference line at 1.0, dashed, labelled in words
        t.setLineWidth(0.9f);
        t.setLineDash(3, 3, 0);
        t.moveTo(x0, axis.y(1));
        t.lineTo(x1, axis.y(1));
        t.stroke();
        t.setLineDash(0);
        t.beginText();
        t.setFontAndSize(font, 7);
        t.showTextAligned(PdfContentByte.ALIGN_RIGHT, "1.0 = reference", x1 - 3, axis.y(1) + 2.5f, 0);
        t.endText();

        for (int i = 0; i < series.size(); i++) {
            drawSeries(t, axis, series.get(i), i);
        }
        drawLegend(t, font, series, x0, y0 - AXIS_BAND - 4);
        return t;
    }

    private static void drawSeries(PdfTemplate t, Axis axis, Series s, int index) {
        List<Point> visible = s.points().stream()
                .filter(p -> p.diameterUm() >= MIN_DIAMETER_UM && p.diameterUm() <= MAX_DIAMETER_UM)
                .toList();
        if (visible.isEmpty()) {
            return;
        }
        style(t, index);
        for (int k = 0; k < visible.size(); k++) {
            Point p = visible.get(k);
            if (k == 0) {
                t.moveTo(axis.x(p.diameterUm()), axis.y(p.relativeFlow()));
            } else {
                t.lineTo(axis.x(p.diameterUm()), axis.y(p.relativeFlow()));
            }
        }
        t.stroke();
        t.setLineDash(0);
        for (Point p : visible) {
            marker(t, MARKERS[markerIndex(index)], axis.x(p.diameterUm()), axis.y(p.relativeFlow()));
        }
    }

    /**
     * Series i gets dash pattern i mod 5 and marker (i + i div 5) mod 5: the first 25 series all differ in the
     * pair, so no two lines look alike even in grey.
     */
    static int markerIndex(int index) {
        return (index + index / DASHES.length) % MARKERS.length;
    }

    private static void style(PdfTemplate t, int index) {
        t.setColorStroke(SHADES[markerIndex(index) % SHADES.length]);
        t.setLineWidth(1.2f);
        float[] dash = DASHES[index % DASHES.length];
        if (dash.length == 0) {
            t.setLineDash(0);
        } else {
            t.setLineDash(dash, 0);
        }
    }

    private static void marker(PdfTemplate t, Marker m, float x, float y) {
        float r = 2.4f;
        t.setLineWidth(0.9f);
        switch (m) {
            case CIRCLE -> t.circle(x, y, r);
            case SQUARE -> t.rectangle(x - r, y - r, 2 * r, 2 * r);
            case TRIANGLE -> {
                t.moveTo(x, y + r * 1.2f);
                t.lineTo(x - r * 1.1f, y - r * 0.8f);
                t.lineTo(x + r * 1.1f, y - r * 0.8f);
                t.closePath();
            }
            case DIAMOND -> {
                t.moveTo(x, y + r * 1.3f);
                t.lineTo(x + r * 1.1f, y);
                t.lineTo(x, y - r * 1.3f);
                t.lineTo(x - r * 1.1f, y);
                t.closePath();
            }
            case CROSS -> {
                t.moveTo(x - r, y - r);
                t.lineTo(x + r, y + r);
                t.moveTo(x - r, y + r);
                t.lineTo(x + r, y - r);
            }
        }
        t.stroke();
    }

    private static void drawLegend(PdfTemplate t, BaseFont font, List<Series> series, float x, float yFirst) {
        float y = yFirst;
        // the reference line is a legend entry too
        t.setColorStroke(Color.BLACK);
        t.setLineWidth(0.9f);
        t.setLineDash(3, 3, 0);
        t.moveTo(x, y + 2.5f);
        t.lineTo(x + 26, y + 2.5f);
        t.stroke();
        t.setLineDash(0);
        legendText(t, font, "reference: hematocrit 0.45, serum viscosity 1.6 (flow = 1.0)", x + 32, y);
        for (int i = 0; i < series.size(); i++) {
            y -= LEGEND_LINE;
            style(t, i);
            t.moveTo(x, y + 2.5f);
            t.lineTo(x + 26, y + 2.5f);
            t.stroke();
            t.setLineDash(0);
            marker(t, MARKERS[markerIndex(i)], x + 13, y + 2.5f);
            legendText(t, font, series.get(i).label(), x + 32, y);
        }
    }

    private static void legendText(PdfTemplate t, BaseFont font, String text, float x, float y) {
        t.beginText();
        t.setColorFill(Color.BLACK);
        t.setFontAndSize(font, 7.5f);
        t.showTextAligned(PdfContentByte.ALIGN_LEFT, PdfFonts.printable(text), x, y, 0);
        t.endText();
    }

    /** The y-axis top: at least 1.2 so the reference line never sits on the frame. */
    static double niceMax(List<Series> series) {
        double max = 1.2;
        for (Series s : series) {
            for (Point p : s.points()) {
                max = Math.max(max, p.relativeFlow() * 1.08);
            }
        }
        double step = niceStep(max);
        return Math.ceil(max / step - 1e-9) * step;
    }

    static double niceStep(double max) {
        for (double step : new double[] {0.2, 0.25, 0.5, 1, 2, 2.5, 5, 10, 20, 50}) {
            if (max / step <= 7) {
                return step;
            }
        }
        return Math.pow(10, Math.ceil(Math.log10(max / 7)));
    }

    /** Maps data to template coordinates: log10 on x, linear from 0 on y. */
    private record Axis(float x0, float x1, float y0, float y1, double yMax) {
        float x(double diameterUm) {
            double lo = Math.log10(MIN_DIAMETER_UM);
            double hi = Math.log10(MAX_DIAMETER_UM);
            return (float) (x0 + (Math.log10(diameterUm) - lo) / (hi - lo) * (x1 - x0));
        }

        float y(double flow) {
            double clamped = Math.max(0, Math.min(yMax, flow));
            return (float) (y0 + clamped / yMax * (y1 - y0));
        }
    }
}
