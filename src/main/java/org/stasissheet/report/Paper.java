package org.stasissheet.report;

import com.lowagie.text.Rectangle;

/**
 * The paper sizes a worksheet PDF can be printed on, in PDF points (1/72 in), the values of OpenPDF's
 * {@code PageSize}. Held as plain numbers so that naming a paper (the command line parses {@code --paper} for
 * every command it knows) loads no PDF class; only {@link #size()} does, when a PDF is drawn.
 */
public enum Paper {
    /** ISO 216 A4, 210 × 297 mm: 595 × 842 pt. */
    A4("a4", 595, 842),
    /** US Letter, 8.5 × 11 in: 612 × 792 pt. */
    LETTER("letter", 612, 792);

    private final String code;
    private final float widthPt;
    private final float heightPt;

    Paper(String code, float widthPt, float heightPt) {
        this.code = code;
        this.widthPt = widthPt;
        this.heightPt = heightPt;
    }

    /** The word used on the command line, e.g. {@code a4}. */
    public String code() {
        return code;
    }

    Rectangle size() {
        return new Rectangle(widthPt, heightPt);
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
