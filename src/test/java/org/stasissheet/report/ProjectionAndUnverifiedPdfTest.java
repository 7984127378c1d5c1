package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.Worksheet;

/**
 * Issue 12 in the PDF: both exchange projections, each labelled, and the "unverified" mark on the leukostasis
 * organ grades. The invented St. Alder Infirmary IgM patient of {@link Fixtures}.
 */
@DisplayName("PDF: exchange projections and unverified grade descriptors")
class ProjectionAndUnverifiedPdfTest {
    private static final String LABEL = "Invented patient, bed 12";

    private static String squash(String s) {
        return s.replaceAll("\\s+", " ");
    }

    private static String pdfText(Worksheet sheet) throws IOException {
        byte[] bytes = WorksheetPdf.render(sheet, PdfOptions.defaults("t"), Fixtures.GENERATED,
                Fixtures.caseJson(LABEL));
        try (PdfProbe pdf = new PdfProbe(bytes)) {
            return squash(pdf.allText());
        }
    }

    @Test
    @DisplayName("the exchange table shows both moments with the numbers worked by hand")
    void bothProjections() throws IOException {
        String text = pdfText(Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED));
        // by hand, IgM 59 g/L, f = 0.78 (Reverberi 2007 as quoted), V = 1: right after 59 × e^−1 = 21.7 g/L,
        // after redistribution 59 × (1 − 0.78 × 0.632121) = 29.9 g/L; SV 1.6 × 3.5^0.367879 = 2.54,
        // 1.6 × 3.5^0.506946 = 3.02
        assertTrue(text.contains(ExchangeProjection.IMMEDIATE_SHORT + " 21.7 g/L"), text);
        assertTrue(text.contains(ExchangeProjection.AFTER_REDISTRIBUTION_SHORT + " 29.9 g/L"), text);
        assertTrue(text.contains(ExchangeProjection.IMMEDIATE_SHORT + " 2.54"), text);
        assertTrue(text.contains(ExchangeProjection.AFTER_REDISTRIBUTION_SHORT + " 3.02"), text);
        assertTrue(text.contains(squash(ExchangeProjection.AFTER_REDISTRIBUTION_MEANING)), text);
    }

    @Test
    @DisplayName("the leukostasis grades carry 'unverified — check the source' where they show")
    void gradesMarkedUnverified() throws IOException {
        String text = pdfText(Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED));
        // the text is searched for in pieces: a long sentence may break across lines in the extraction
        assertTrue(text.contains("unverified — check the source"), text);
        assertTrue(text.contains("Novotny JR et al., Eur J Haematol"), text);
        assertTrue(Cautions.GRADING_UNVERIFIED.contains("unverified — check the source"));
    }
}
