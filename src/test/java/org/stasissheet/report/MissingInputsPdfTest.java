package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Patient;
import org.stasissheet.worksheet.Worksheet;

/**
 * The PDF says once what the apheresis numbers lack and where to enter it, read back with PDFBox. Nadler's blood
 * volume needs sex, height and weight (Nadler SB et al., Surgery 1962); the invented IgM patient of {@link Fixtures}
 * without height and weight.
 */
class MissingInputsPdfTest {
    private static final String SENTENCE = "Enter height and weight (Patient) to estimate the blood volume, the plasma"
            + " volume and the exchange volumes.";

    private static String squash(String s) {
        return s.replaceAll("\\s+", " ");
    }

    @Test
    @DisplayName("no height or weight: one sentence with the fields to fill, never 'not estimated: … not estimated'")
    void saidOnce() throws IOException {
        Case full = Fixtures.igmCase("Invented patient, bed 3");
        Patient p = full.patient();
        Case c = new Case(new Patient(p.label(), p.sex(), p.ageYears(), Optional.empty(), Optional.empty()),
                full.condition(), full.labs(), full.baseline(), full.findings(), full.plan(), full.assessedAt(),
                full.assessor(), full.extraJson());
        Worksheet ws = Fixtures.sheet(c, Fixtures.SHIPPED);
        assertEquals(Optional.of(SENTENCE), ws.apheresis().missing().sentence());
        byte[] bytes = WorksheetPdf.render(ws, PdfOptions.defaults("t"), Fixtures.GENERATED, Fixtures.caseJson("x"));
        String text;
        try (PdfProbe pdf = new PdfProbe(bytes)) {
            text = squash(pdf.allText());
        }
        assertEquals(1, text.split(java.util.regex.Pattern.quote(SENTENCE), -1).length - 1, "said exactly once");
        int start = text.lastIndexOf("Apheresis planning", text.indexOf(SENTENCE));
        int end = text.indexOf("Sources cited", start);
        assertTrue(start >= 0 && end > start, "the apheresis section is found");
        String section = text.substring(start, end);
        assertTrue(section.contains(SENTENCE), section);
        assertFalse(section.contains("blood volume not estimated"), "the sentence replaces the per-cell reasons");
        assertFalse(section.contains("Kaplan's formula needs weight"), "the plasma volume reason is covered too");
        String plain = WorksheetText.render(ws);
        assertTrue(plain.contains(SENTENCE), "the text worksheet says it too");
        assertFalse(plain.contains("not estimated: blood volume not estimated"));
    }
}
