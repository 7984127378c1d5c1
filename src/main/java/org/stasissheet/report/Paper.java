package org.stasissheet.report;

import com.lowagie.text.PageSize;
import com.lowagie.text.Rectangle;

/** The paper sizes a worksheet PDF can be printed on. */
public enum Paper {
    /** ISO 216 A4, 210 × 297 mm. */
    A4("a4", PageSize.A4),
    /** US Letter, 8.5 × 11 in. */
    LETTER("letter", PageSize.LETTER);

    private final String code;
    private final Rectangle size;

    Paper(String code, Rectangle size) {
        this.code = code;
        this.size = size;
    }

    /** The word used on the command line, e.g. {@code a4}. */
    public String code() {
        return code;
    }

    Rectangle size() {
        return new Rectangle(size);
    }

    /** Parses {@code a4} or {@code letter} (any case). */
    public static Paper parse(String code) {
        for (Paper p : values()) {
            if (p.code.equalsIgnoreCase(code.trim())) {
                return p;
            }
        }
        throw new IllegalArgumentException("paper must be a4 or letter, was '" + code + "'");
    }
}
