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
