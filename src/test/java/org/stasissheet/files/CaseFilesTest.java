package org.stasissheet.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseReader.Problem;
import org.stasissheet.intake.CaseWriter;

class CaseFilesTest {
    @TempDir
    Path folder;

    private static Problem onlyProblem(CaseReader.Result r) {
        List<Problem> ps = assertInstanceOf(CaseReader.Rejected.class, r).problems();
        assertEquals(1, ps.size(), ps::toString);
        return ps.get(0);
    }

    static Stream<Path> samples() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("samples"))) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    @DisplayName("every sample file is read from disk and accepted")
    void samplesAreAccepted(Path sample) {
        CaseReader.Result r = CaseFiles.read(sample);
        assertInstanceOf(CaseReader.Accepted.class, r, () -> r.toString());
    }

    @Test
    @DisplayName("at least the four demo samples exist")
    void fourSamples() throws IOException {
        List<String> names = samples().map(p -> p.getFileName().toString()).toList();
        assertTrue(names.containsAll(List.of("igm-symptomatic.json", "iga-borderline.json", "aml-breathless.json",
                "cll-extreme.json")), names::toString);
    }

    @Test
    @DisplayName("a missing file is a problem naming the file, not an exception")
    void missingFile() {
        Path file = folder.resolve("absent.json");
        Problem p = onlyProblem(CaseFiles.read(file));
        assertEquals("$", p.path());
        assertEquals("cannot read " + file + ": file does not exist", p.message());
    }

    @Test
    @DisplayName("a folder is refused as a case file")
    void folderIsRefused() {
        assertTrue(onlyProblem(CaseFiles.read(folder)).message().contains("it is a folder"));
    }

    @Test
    @DisplayName("a file over 1 MiB is refused by its size before it is read")
    void tooLargeBySize() throws IOException {
        Path file = folder.resolve("huge.json");
        try (RandomAccessFile raf = new RandomAccessFile(file.toFile(), "rw")) {
            raf.setLength(CaseReader.MAX_BYTES + 1L); // sparse: costs no disk
        }
        Problem p = onlyProblem(CaseFiles.read(file));
        assertEquals(file + " is 1048577 bytes; a case file may be at most 1048576 bytes (1 MiB)", p.message());
    }

    @Test
    @DisplayName("whole-file problems name the file; field problems keep their path")
    void namesTheFile() throws IOException {
        Path broken = Files.writeString(folder.resolve("broken.json"), "{\"format\": ");
        Problem syntax = onlyProblem(CaseFiles.read(broken));
        assertTrue(syntax.message().startsWith(broken + ": not valid JSON at line 1"), syntax.message());

        Path wrong = Files.writeString(folder.resolve("wrong.json"), "{\"format\": \"stasis-case/1\", \"labs\":"
                + " {\"wbc\": {\"value\": 150000, \"unit\": \"10*9/L\"}}}");
        Problem field = onlyProblem(CaseFiles.read(wrong));
        assertEquals("labs.wbc", field.path());
        assertEquals("150000 10*9/L is not plausible; did you mean /uL (= 150 10*9/L)?", field.message());
    }

    @Test
    @DisplayName("a case written with AtomicFiles reads back equal")
    void writeThenRead() throws IOException {
        CaseReader.Accepted sample = assertInstanceOf(CaseReader.Accepted.class,
                CaseFiles.read(Path.of("samples", "aml-breathless.json")));
        Path copy = folder.resolve("copy.json");
        AtomicFiles.write(copy, CaseWriter.write(sample.c()).getBytes(java.nio.charset.StandardCharsets.UTF_8),
                AtomicFiles.Access.OWNER_ONLY);
        assertEquals(sample.c(), assertInstanceOf(CaseReader.Accepted.class, CaseFiles.read(copy)).c());
    }
}
