package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.worksheet.Cautions;

/** The {@code course} command and the course forms of {@code assess} and {@code note}, on the invented samples. */
class CourseCommandTest {
    private static final String IGM = "samples/courses/igm-exchange-series.json";
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = StasisCommand.run(args, new PrintWriter(o, true), new PrintWriter(e, true));
        return new Run(code, o.toString(), e.toString());
    }

    private static String ok(String... args) {
        Run r = run(args);
        assertEquals(ExitCode.DONE, r.code(), r.err());
        return r.out();
    }

    @ParameterizedTest
    @ValueSource(strings = {IGM, "samples/courses/aml-leukapheresis-hydroxyurea.json"})
    @DisplayName("text, JSON and PDF work on both samples; the PDF reads back to the same JSON report and shows "
            + "the caution on every page")
    void threeOutputs(String sample) throws IOException {
        String text = ok("course", sample);
        assertTrue(text.contains(Cautions.SHORT), text);
        JsonNode report = JSON.readTree(ok("course", sample, "--json"));
        assertEquals("stasis-course-report/1", report.get("format").asText());
        assertEquals(3, report.get("assessments").size());
        Path pdf = dir.resolve("course.pdf");
        ok("course", sample, "-o", pdf.toString());
        assertEquals(ok("course", sample, "--json"), ok("course", pdf.toString(), "--json"));
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(pdf))) {
            assertTrue(doc.getNumberOfPages() >= 3);
            for (int page = 1; page <= doc.getNumberOfPages(); page++) {
                PDFTextStripper stripper = new PDFTextStripper();
                stripper.setStartPage(page);
                stripper.setEndPage(page);
                String words = stripper.getText(doc).replaceAll("\\s+", " ");
                assertTrue(words.contains(Cautions.SHORT), "page " + page + ": " + words);
            }
        }
    }

    @Test
    @DisplayName("each assessment of the course report carries the same verdict objects as assess --at that time")
    void assessmentsMatchAssessAt() throws IOException {
        JsonNode report = JSON.readTree(ok("course", IGM, "--json"));
        for (JsonNode a : report.get("assessments")) {
            JsonNode sheet = JSON.readTree(ok("assess", IGM, "--at", a.get("at").asText(), "--json"));
            for (String key : List.of("hyperviscosity", "leukostasis", "tumorLysis", "flags")) {
                assertEquals(sheet.get(key), a.get(key), key + " at " + a.get("at"));
            }
        }
    }

    @Test
    @DisplayName("assess --at picks the assessment at or before the time; before the first one it refuses")
    void assessAt() throws IOException {
        // 14:00 falls after the 13:30 assessment (3.9 cP) and before the next day's
        JsonNode sheet = JSON.readTree(ok("assess", IGM, "--at", "2026-06-11T14:00:00+02:00", "--json"));
        assertTrue(sheet.get("hyperviscosity").get("reason").asText().contains("3.9 cP"), sheet.toString());
        Run early = run("assess", IGM, "--at", "2026-06-10T14:00:00+02:00");
        assertEquals(ExitCode.INVALID_INPUT, early.code());
        assertTrue(early.err().contains("first assessment is later"), early.err());
        Run onCase = run("assess", "samples/igm-symptomatic.json", "--at", "2026-06-10T14:00:00+02:00");
        assertEquals(ExitCode.INVALID_INPUT, onCase.code());
        assertTrue(onCase.err().contains("not a course"), onCase.err());
    }

    @Test
    @DisplayName("note on a course adds exactly one trend line to the handoff of the latest assessment")
    void noteTrend() {
        String note = ok("note", IGM);
        List<String> trend = note.lines().filter(l -> l.startsWith("Trend:")).toList();
        assertEquals(List.of("Trend: serum viscosity 6.8 → 3.9 → 3.7 cP after 2 exchanges."), trend);
        assertTrue(note.lines().count() <= 20, note);
    }

    @Test
    @DisplayName("a refused course names every problem by path and assesses nothing")
    void refusedCourse() throws IOException {
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, Files.readString(Path.of(IGM))
                .replace("\"plasmaVolumes\": 1.0, ", ""));
        Run r = run("course", bad.toString());
        assertEquals(ExitCode.INVALID_INPUT, r.code());
        assertTrue(r.err().contains("entries[1].procedure: a plasma exchange needs plasmaVolumes"), r.err());
        assertEquals("", r.out());
    }
}
