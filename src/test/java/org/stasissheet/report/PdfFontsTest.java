package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class PdfFontsTest {
    @Test
    @DisplayName("a subscript digit the font lacks prints as a plain digit; Greek and Cyrillic stay as they are")
    void printable() {
        // U+2082 SUBSCRIPT TWO has no glyph in the Liberation Sans shipped with openpdf-fonts-extra 2.0.3
        assertFalse(PdfFonts.regular().charExists('\u2082'), "if the font gains the glyph, keep it");
        assertEquals("arterial O2 tension", PdfFonts.printable("arterial O₂ tension"));
        assertEquals("Ελένη · Анна", PdfFonts.printable("Ελένη · Анна"));
        assertEquals("µm ÷ ≥ –", PdfFonts.printable("µm ÷ ≥ –"));
        // U+2079 SUPERSCRIPT NINE has no glyph either: an exponent keeps its caret, never reading as 109
        assertFalse(PdfFonts.regular().charExists('\u2079'), "if the font gains the glyph, keep it");
        assertEquals("WBC 6.1 ×10^9/L", PdfFonts.printable("WBC 6.1 ×10⁹/L"));
        assertEquals("×10³/µL", PdfFonts.printable("×10³/µL"), "Latin-1 superscripts have glyphs");
        // the level marks are our own dots, and the font has them
        assertTrue(PdfFonts.regular().charExists('\u25CF') && PdfFonts.regular().charExists('\u25CB'));
        assertTrue(PdfFonts.bold().charExists('\u25CF') && PdfFonts.bold().charExists('\u25CB'));
    }

    @Test
    @DisplayName("the fonts are loaded once and shared between renders")
    void loadedOnce() {
        assertTrue(PdfFonts.regular() == PdfFonts.regular());
        assertTrue(PdfFonts.bold() != PdfFonts.regular());
    }
}
