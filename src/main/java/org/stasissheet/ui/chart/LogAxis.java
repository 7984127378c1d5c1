package org.stasissheet.ui.chart;

import java.util.ArrayList;
import java.util.List;
import javafx.scene.chart.ValueAxis;
import org.stasissheet.measure.Numbers;

/**
 * A base-10 logarithmic axis with fixed bounds, for vessel diameters from a few micrometres to a millimetre.
 * Major ticks at 1, 2 and 5 of each decade, minor ticks at the other whole multiples.
 */
public final class LogAxis extends ValueAxis<Number> {
    public LogAxis(String label, double lower, double upper) {
        super(lower, upper);
        if (!(lower > 0) || !(upper > lower)) {
            throw new IllegalArgumentException("a log axis needs 0 < lower < upper: " + lower + ", " + upper);
        }
        setLabel(label);
        setAutoRanging(false);
        setMinorTickCount(0);
    }

    private double fraction(double value) {
        double lo = Math.log10(getLowerBound());
        double hi = Math.log10(getUpperBound());
        return (Math.log10(Math.max(value, Double.MIN_NORMAL)) - lo) / (hi - lo);
    }

    private double length() {
        return getSide() != null && getSide().isVertical() ? getHeight() : getWidth();
    }

    @Override
    public double getDisplayPosition(Number value) {
        double f = fraction(value.doubleValue());
        return getSide() != null && getSide().isVertical() ? (1 - f) * length() : f * length();
    }

    @Override
    public Number getValueForDisplay(double displayPosition) {
        double f = displayPosition / length();
        if (getSide() != null && getSide().isVertical()) {
            f = 1 - f;
        }
        double lo = Math.log10(getLowerBound());
        double hi = Math.log10(getUpperBound());
        return Math.pow(10, lo + f * (hi - lo));
    }

    @Override
    public boolean isValueOnAxis(Number value) {
        double v = value.doubleValue();
        return v >= getLowerBound() && v <= getUpperBound();
    }

    @Override
    protected List<Number> calculateMinorTickMarks() {
        List<Number> ticks = new ArrayList<>();
        for (double decade = decadeBelow(getLowerBound()); decade <= getUpperBound(); decade *= 10) {
            for (int m : new int[] {3, 4, 6, 7, 8, 9}) {
                double v = m * decade;
                if (v >= getLowerBound() && v <= getUpperBound()) {
                    ticks.add(v);
                }
            }
        }
        return ticks;
    }

    @Override
    protected void setRange(Object range, boolean animate) {
        double[] r = (double[]) range;
        setLowerBound(r[0]);
        setUpperBound(r[1]);
    }

    @Override
    protected Object getRange() {
        return new double[] {getLowerBound(), getUpperBound()};
    }

    @Override
    protected List<Number> calculateTickValues(double length, Object range) {
        double[] r = (double[]) range;
        List<Number> ticks = new ArrayList<>();
        for (double decade = decadeBelow(r[0]); decade <= r[1]; decade *= 10) {
            for (int m : new int[] {1, 2, 5}) {
                double v = m * decade;
                if (v >= r[0] * 0.999 && v <= r[1] * 1.001) {
                    ticks.add(v);
                }
            }
        }
        return ticks;
    }

    @Override
    protected String getTickMarkLabel(Number value) {
        return Numbers.rounded(value.doubleValue(), 3);
    }

    private static double decadeBelow(double v) {
        return Math.pow(10, Math.floor(Math.log10(v)));
    }
}
