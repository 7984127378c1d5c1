package org.stasissheet.report;

import com.lowagie.text.pdf.BaseFont;
import java.io.IOException;
import java.io.UncheckedIOException;

/**
 * The embedded fonts of every PDF: Liberation Sans (SIL Open Font License) from the openpdf-fonts-extra jar,
 * never a system font, written as Identity-H so Latin, Greek and Cyrillic text is embedded and extractable.
 *
 * <p>Parsing a TrueType file is the most expensive step of a render, so each face is loaded once per process,
 * lazily, and shared: a {@link BaseFont} holds no document data, each writer subsets it on its own.
 */
final class PdfFonts {
    private PdfFonts() {
    }

    /**
     * The text with subscript and superscript digits written as plain digits where Liberation Sans has no glyph
     * for them (it lacks U+2080–U+2089), so "O₂" prints as "O2" instead of losing the digit.
     */
    static String printable(String text) {
        StringBuilder sb = null;
        boolean inExponent = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            char plain = plainDigit(c);
            if (plain != c && !regular().charExists(c)) {
                if (sb == null) {
                    sb = new StringBuilder(text.substring(0, i));
                }
                // a superscript without a glyph keeps its meaning as "^": "×10⁹/L" must never print as "×109/L"
                boolean superscript = c < '\u2080' || c > '\u2089';
                if (superscript && !inExponent) {
                    sb.append('^');
                }
                inExponent = superscript;
                sb.append(plain);
            } else {
                inExponent = false;
                if (sb != null) {
                    sb.append(c);
                }
            }
        }
        return sb == null ? text : sb.toString();
    }

    private static char plainDigit(char c) {
        if (c >= '\u2080' && c <= '\u2089') {
            return (char) ('0' + (c - '\u2080'));
        }
        return switch (c) {
            case '\u2070' -> '0';
            case '\u00b9' -> '1';
            case '\u00b2' -> '2';
            case '\u00b3' -> '3';
            default -> (c >= '\u2074' && c <= '\u2079') ? (char) ('0' + (c - '\u2070')) : c;
        };
    }

    static BaseFont regular() {
        return Holder.REGULAR;
    }

    static BaseFont bold() {
        return Holder.BOLD;
    }

    static BaseFont italic() {
        return Holder.ITALIC;
    }

    /** Initialised on first use only (the JVM's class-holder idiom makes this thread-safe). */
    private static final class Holder {
        static final BaseFont REGULAR = load("liberation/LiberationSans-Regular.ttf");
        static final BaseFont BOLD = load("liberation/LiberationSans-Bold.ttf");
        static final BaseFont ITALIC = load("liberation/LiberationSans-Italic.ttf");

        private static BaseFont load(String resource) {
            try {
                // Resource path inside openpdf-fonts-extra (the same files its Liberation enum names).
                return BaseFont.createFont(resource, BaseFont.IDENTITY_H, BaseFont.EMBEDDED);
            } catch (IOException e) {
                throw new UncheckedIOException("embedded font " + resource + " could not be read", e);
            } catch (com.lowagie.text.DocumentException e) {
                throw new IllegalStateException("embedded font " + resource + " could not be read", e);
            }
        }
    }
}
