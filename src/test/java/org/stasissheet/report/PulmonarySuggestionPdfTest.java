package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.CaseFiles;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * The suggested pulmonary grade in the worksheet text and PDF, marked as a suggestion with its basis. The invented
 * sample {@code aml-breathless.json}: PaO2 6.9 kPa at WBC 182 ×10⁹/L, pulmonary grade 2 set. Cut-off: hypoxaemic
 * respiratory failure below 8 kPa (from memory); the artefact at high counts: Van de Louw A et al., Respir Care
 * 2016 [published].
 */
class PulmonarySuggestionPdfTest {
    private static Worksheet sample(String name) {
        return Assessor.assess(((CaseReader.Accepted) CaseFiles.read(Path.of("samples", name))).c(),
                Fixtures.shipped());
    }

    private static String squash(String s) {
        return s.replaceAll("\\s+", " ");
    }

    @Test
    @DisplayName("text and PDF show the suggestion as not applied, the oxygen need, the cautions and the basis")
    void suggestionInTextAndPdf() throws IOException {
        Worksheet ws = sample("aml-breathless.json");
        String text = squash(WorksheetText.render(ws));
        byte[] bytes = WorksheetPdf.render(ws, PdfOptions.defaults("t"), Fixtures.GENERATED, Fixtures.caseJson("x"));
        String pdf;
        try (PdfProbe probe = new PdfProbe(bytes)) {
            pdf = squash(probe.allText());
        }
        for (String shown : new String[] {text, pdf}) {
            assertTrue(shown.contains("SUGGESTION, NOT APPLIED: Suggested pulmonary grade 3"), shown);
            assertTrue(shown.contains("The pulmonary grade set is 2"), shown);
            assertTrue(shown.contains("PaO2 6.9 kPa is below 8 kPa"), shown);
            assertTrue(shown.contains("may be spurious"), shown);
            assertTrue(shown.contains("Basis: Suggestion rule"), shown);
            assertTrue(shown.contains("unverified — check the source"), shown);
        }
    }

    @Test
    @DisplayName("the handoff note says the oxygen need and the grade suggested but not applied, within 20 lines")
    void suggestionInTheNote() {
        String note = HandoffNote.render(sample("aml-breathless.json"), false);
        assertTrue(note.contains("Oxygen needed: PaO2 6.9 kPa is below 8 kPa"), note);
        assertTrue(note.contains("The values suggest pulmonary grade 3 (not applied; grade set: 2): check it against "
                + "the patient; at this white count the value may be spurious"), note);
        assertTrue(note.lines().count() <= HandoffNote.MAX_LINES, note);
        String quiet = HandoffNote.render(sample("igm-symptomatic.json"), false);
        assertFalse(quiet.contains("suggest pulmonary grade"), quiet);
    }

    @Test
    @DisplayName("a paraprotein case without oxygen values gets no oxygen lines")
    void noClutterWithoutValues() {
        String text = WorksheetText.render(sample("igm-symptomatic.json"));
        assertFalse(text.contains("Suggestion rule"), text);
    }
}
