package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.fuzz.TinyPdf;

/** The form's Open reads worksheet PDFs through the same checked read-back as the command line. */
class CaseOpeningTest {
    @TempDir
    Path tmp;

    @Test
    @DisplayName("a worksheet PDF without the digest of its case opens, with the warning for the status line")
    void missingDigestWarns() throws IOException {
        byte[] json = Files.readAllBytes(Path.of("samples", "igm-symptomatic.json"));
        Path pdf = Files.write(tmp.resolve("old.pdf"), TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME, json, ""));
        Actions.Opened opened = Actions.CaseOpening.read(pdf, true);
        assertTrue(opened.problems().isEmpty(), opened.problems().toString());
        assertArrayEquals(json, opened.caseJson());
        assertEquals(1, opened.warnings().size());
        assertTrue(opened.warnings().get(0).contains("records no SHA-256"), opened.warnings().toString());
    }

    @Test
    @DisplayName("a worksheet PDF whose case does not match its digest is not opened")
    void mismatchRefused() throws IOException {
        byte[] json = Files.readAllBytes(Path.of("samples", "igm-symptomatic.json"));
        Path pdf = Files.write(tmp.resolve("edited.pdf"), TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME, json,
                "/" + WorksheetPdfs.CASE_DIGEST_KEY + "(" + "0".repeat(64) + ")"));
        Actions.Opened opened = Actions.CaseOpening.read(pdf, true);
        assertEquals(1, opened.problems().size());
        assertTrue(opened.problems().get(0).contains("does not match the SHA-256"), opened.problems().toString());
    }
}
