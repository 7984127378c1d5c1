package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.lowagie.text.PageSize;
import com.lowagie.text.Rectangle;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Paper holds its size as numbers so that naming it loads no PDF class; they must be OpenPDF's own sizes. */
class PaperSizeTest {
    // reference: OpenPDF's PageSize constants (ISO 216 A4 = 210 × 297 mm, US Letter = 8.5 × 11 in, in 1/72 in)
    @ParameterizedTest(name = "{0}")
    @CsvSource({"A4", "LETTER"})
    void paper_matchesOpenPdfPageSize(String name) throws ReflectiveOperationException {
        Rectangle reference = (Rectangle) PageSize.class.getField(name).get(null);
        Rectangle ours = Paper.valueOf(name).size();
        assertEquals(reference.getWidth(), ours.getWidth(), 0.001f);
        assertEquals(reference.getHeight(), ours.getHeight(), 0.001f);
    }
}
