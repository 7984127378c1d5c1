package org.stasissheet.files;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class WorksheetPdfsTest {

    @Test
    @DisplayName("a PDF made by another program (here PDFBox) is refused with a plain message")
    void foreignPdf_isRefusedClearly() throws IOException {
        byte[] pdf;
        try (PDDocument doc = new PDDocument()) {
            doc.addPage(new PDPage());
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            pdf = out.toByteArray();
        }
        IOException e = assertThrows(IOException.class, () -> WorksheetPdfs.extractCase(pdf));
        assertTrue(e.getMessage().contains("no embedded case file"), e.getMessage());
        assertFalse(e.getMessage().contains("\n"), "one line");
    }

    @Test
    @DisplayName("bytes that only claim to be a PDF are refused as unreadable")
    void brokenPdf_isRefused() {
        byte[] junk = "%PDF-1.7 this is not really a PDF".getBytes(StandardCharsets.US_ASCII);
        IOException e = assertThrows(IOException.class, () -> WorksheetPdfs.extractCase(junk));
        assertTrue(e.getMessage().startsWith("not a readable worksheet PDF"), e.getMessage());
    }

    @Test
    @DisplayName("a PDF is recognised by its .pdf name or by its %PDF start")
    void recognition() {
        byte[] json = "{}".getBytes(StandardCharsets.US_ASCII);
        byte[] magic = "%PDF-1.5".getBytes(StandardCharsets.US_ASCII);
        assertTrue(WorksheetPdfs.looksLikePdf(Path.of("sheet.PDF"), json));
        assertTrue(WorksheetPdfs.looksLikePdf(Path.of("sheet.json"), magic));
        assertFalse(WorksheetPdfs.looksLikePdf(Path.of("case.json"), json));
    }
}
