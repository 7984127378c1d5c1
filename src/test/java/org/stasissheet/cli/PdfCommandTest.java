package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.files.WorksheetPdfs;

class PdfCommandTest {
    private static final Path SAMPLE = Path.of("samples", "igm-symptomatic.json");

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    private String runOut(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = StasisCommand.run(args, new PrintWriter(o, true), new PrintWriter(e, true));
        assertEquals(ExitCode.DONE, code, e.toString());
        return o.toString();
    }

    @Test
    @DisplayName("pdf writes the worksheet with the case file embedded byte for byte")
    void writesPdfWithTheCase() throws IOException {
        Path pdf = dir.resolve("sheet.pdf");
        assertEquals(ExitCode.DONE, run("pdf", SAMPLE.toString(), "-o", pdf.toString()), err.toString());
        byte[] bytes = Files.readAllBytes(pdf);
        assertArrayEquals(Files.readAllBytes(SAMPLE), WorksheetPdfs.extractCase(bytes));
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            assertTrue(doc.getNumberOfPages() >= 2);
        }
    }

    @Test
    @DisplayName("assess WORKSHEET.pdf gives exactly the JSON worksheet of the case it was made from")
    void assessPdf_equalsAssessCase() {
        Path pdf = dir.resolve("sheet.pdf");
        runOut("pdf", SAMPLE.toString(), "-o", pdf.toString());
        assertEquals(runOut("assess", SAMPLE.toString(), "--json"), runOut("assess", pdf.toString(), "--json"));
    }

    @Test
    @DisplayName("a teaching copy (--no-identifiers) still reads back to the same assessment, without the label")
    void teachingCopy_assessesTheSame() throws IOException {
        Path pdf = dir.resolve("teach.pdf");
        runOut("pdf", SAMPLE.toString(), "-o", pdf.toString(), "--no-identifiers");
        assertEquals(runOut("assess", SAMPLE.toString(), "--json"), runOut("assess", pdf.toString(), "--json"));
        String embedded = new String(WorksheetPdfs.extractCase(Files.readAllBytes(pdf)), StandardCharsets.UTF_8);
        assertFalse(embedded.contains("Demo patient A"), embedded);
    }

    @Test
    @DisplayName("a worksheet PDF works as the input of pdf and note too, also without the .pdf name")
    void pdfAsInput_recognisedByContent() throws IOException {
        Path pdf = dir.resolve("sheet.pdf");
        runOut("pdf", SAMPLE.toString(), "-o", pdf.toString());
        Path renamed = Files.copy(pdf, dir.resolve("sheet-without-extension"));
        assertEquals(runOut("note", SAMPLE.toString()), runOut("note", renamed.toString()));
        Path again = dir.resolve("again.pdf");
        runOut("pdf", renamed.toString(), "-o", again.toString());
        assertArrayEquals(Files.readAllBytes(SAMPLE), WorksheetPdfs.extractCase(Files.readAllBytes(again)));
    }

    @Test
    @DisplayName("a PDF without our attachment is invalid input with a clear one-line message")
    void foreignPdf_isInvalidInput() throws IOException {
        Path foreign = dir.resolve("foreign.pdf");
        try (PDDocument doc = new PDDocument()) {
            doc.addPage(new org.apache.pdfbox.pdmodel.PDPage());
            doc.save(foreign.toFile());
        }
        assertEquals(ExitCode.INVALID_INPUT, run("assess", foreign.toString()));
        assertTrue(err.toString().contains("no embedded case file"), err.toString());
        assertFalse(err.toString().contains("\tat "), "no stack trace");
    }

    @Test
    @DisplayName("a failed export leaves the existing file untouched (bad case, then a folder in the way)")
    void failedExport_leavesExistingFile() throws IOException {
        Path pdf = dir.resolve("sheet.pdf");
        byte[] before = "an earlier worksheet".getBytes(StandardCharsets.UTF_8);
        Files.write(pdf, before);
        Path bad = Files.writeString(dir.resolve("bad.json"), "{\"format\": \"stasis-case/1\", \"labs\": [}");
        assertEquals(ExitCode.INVALID_INPUT, run("pdf", bad.toString(), "-o", pdf.toString()));
        assertArrayEquals(before, Files.readAllBytes(pdf));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(2, files.count(), "no temporary file left behind");
        }
    }

    @Test
    @DisplayName("an unwritable output path is one line on stderr, exit 2, never a stack trace")
    void unwritablePath_isOneLine() {
        Path missing = dir.resolve("no-such-folder").resolve("sheet.pdf");
        assertEquals(ExitCode.INVALID_INPUT, run("pdf", SAMPLE.toString(), "-o", missing.toString()));
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertTrue(err.toString().contains("cannot write"), err.toString());
        assertFalse(Files.exists(missing));
    }

    @Test
    @DisplayName("writing over a folder fails cleanly and the folder is unchanged")
    void folderAsTarget_isRefused() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("taken.pdf"));
        Files.writeString(folder.resolve("keep.txt"), "keep");
        assertEquals(ExitCode.INVALID_INPUT, run("pdf", SAMPLE.toString(), "-o", folder.toString()));
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertEquals("keep", Files.readString(folder.resolve("keep.txt")));
    }

    @Test
    @DisplayName("--paper letter and --no-identifiers are honoured; a bad paper name is a usage error")
    void options() throws IOException {
        Path pdf = dir.resolve("teach.pdf");
        runOut("pdf", SAMPLE.toString(), "-o", pdf.toString(), "--paper", "letter", "--no-identifiers");
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertEquals(612, doc.getPage(0).getMediaBox().getWidth(), 0.5); // US Letter 8.5 in × 72 pt
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
            assertFalse(text.contains("Demo patient A"), "label must be left out");
        }
        assertEquals(ExitCode.INVALID_INPUT, run("pdf", SAMPLE.toString(), "-o", pdf.toString(), "--paper", "a5"));
    }
}
