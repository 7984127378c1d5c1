package org.stasissheet.measure;

import java.math.BigDecimal;

/** Locale-free number formatting shared by every renderer, so "5.6" never turns into "5,6". */
public final class Numbers {
    private Numbers() {
    }

    /** The shortest plain decimal that reads back as the same double: 150000 not 1.5E5, 5.6 not 5.6000. */
    public static String plain(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        return new BigDecimal(Double.toString(value)).stripTrailingZeros().toPlainString();
    }

    /** Rounded to at most {@code significant} significant digits, then written plainly. */
    public static String rounded(double value, int significant) {
        if (value == 0 || !Double.isFinite(value)) {
            return plain(value);
        }
        BigDecimal rounded = new BigDecimal(value).round(new java.math.MathContext(significant));
        return plain(rounded.doubleValue());
    }
}
