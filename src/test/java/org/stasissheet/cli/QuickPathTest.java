package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@code assess CASE [--json]} and {@code pdf CASE -o OUT} run without the command-line library's model ({@link QuickPath}); it must print,
 * warn and exit exactly as the full command line does. The full way is forced with {@code --}, which the library
 * reads as "only positional arguments follow" and the quick path never takes.
 */
class QuickPathTest {
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    /** Every demo case and course, and inputs that are refused in different ways. */
    static List<String> inputs(Path temp) throws IOException {
        List<String> files = new ArrayList<>();
        try (Stream<Path> s = Stream.concat(Files.list(Path.of("samples")), Files.list(Path.of("samples/courses")))) {
            s.filter(Files::isRegularFile).map(Path::toString).sorted().forEach(files::add);
        }
        Path broken = temp.resolve("broken.json");
        Files.writeString(broken, "{\"format\": \"stasis-case/1\", \"labs\": {", StandardCharsets.UTF_8);
        Path implausible = temp.resolve("implausible.json");
        Files.writeString(implausible, Files.readString(Path.of("samples/cll-extreme.json"))
                .replaceFirst("\"wbc\"\\s*:\\s*\\{\\s*\"value\"\\s*:\\s*[0-9.]+", "\"wbc\": {\"value\": 150000"));
        Path withSpace = temp.resolve("a case with spaces.json");
        Files.copy(Path.of("samples/aml-breathless.json"), withSpace);
        files.add(broken.toString());
        files.add(implausible.toString());
        files.add(withSpace.toString());
        files.add(temp.resolve("missing.json").toString());
        files.add(temp.toString());
        return files;
    }

    @Test
    @DisplayName("assess CASE and assess CASE --json: the same output, warnings and exit code as the full command line")
    void sameAsFullCommandLine(@TempDir Path temp) throws IOException {
        List<String> files = inputs(temp);
        int refused = 0;
        for (String file : files) {
            assertTrue(QuickPath.recognise(new String[] {"assess", file}).isPresent(), file);
            assertEquals(run("assess", "--", file), run("assess", file), "text: " + file);
            assertEquals(run("assess", "--json", "--", file), run("assess", file, "--json"), "json: " + file);
            assertEquals(run("assess", "--json", "--", file), run("assess", "--json", file), "json first: " + file);
            refused += run("assess", file).code() == ExitCode.INVALID_INPUT ? 1 : 0;
        }
        assertTrue(files.size() >= 9, "inputs: " + files);
        assertTrue(refused >= 3, "the refused inputs are among them: " + refused);
        Run ok = run("assess", "samples/igm-symptomatic.json");
        assertEquals(ExitCode.DONE, ok.code(), ok.err());
        assertTrue(ok.out().contains("Decision support only"), ok.out());
    }

    @Test
    @DisplayName("pdf CASE -o OUT: the same messages, exit code and file written as the full command line")
    void pdfSameAsFullCommandLine(@TempDir Path temp) throws IOException {
        Files.createDirectories(temp.resolve("in"));
        List<String> files = new ArrayList<>(inputs(temp.resolve("in")));
        files.add("samples/igm-symptomatic.json|same");
        int written = 0;
        for (String entry : files) {
            String file = entry.replace("|same", "");
            Path out = entry.endsWith("|same") ? Path.of(file) : temp.resolve("out.pdf");
            assertTrue(QuickPath.recognise(new String[] {"pdf", file, "-o", out.toString()}).isPresent(), file);
            Files.deleteIfExists(temp.resolve("out.pdf"));
            Run quick = run("pdf", file, "-o", out.toString());
            boolean quickWrote = Files.isRegularFile(temp.resolve("out.pdf"));
            Files.deleteIfExists(temp.resolve("out.pdf"));
            Run full = run("pdf", "-o", out.toString(), "--", file);
            boolean fullWrote = Files.isRegularFile(temp.resolve("out.pdf"));
            assertEquals(full, quick, file);
            assertEquals(fullWrote, quickWrote, file);
            if (quickWrote) {
                assertEquals("%PDF-", new String(Files.readAllBytes(temp.resolve("out.pdf")), 0, 5,
                        StandardCharsets.ISO_8859_1), file);
                written++;
            }
        }
        assertTrue(written >= 4, "the demo cases were written: " + written);
        assertEquals(run("pdf", "-o", temp.resolve("b.pdf").toString(), "--", "samples/cll-extreme.json"),
                run("pdf", "--output", temp.resolve("b.pdf").toString(), "samples/cll-extreme.json"));
        assertTrue(QuickPath.recognise(new String[] {"pdf", "samples/igm-symptomatic.json", "-o",
                "samples/igm-symptomatic.json"}).isPresent(), "refusing to overwrite the input is the command's own");
        assertTrue(Files.readString(Path.of("samples/igm-symptomatic.json")).startsWith("{"), "input untouched");
    }

    @ParameterizedTest
    @ValueSource(strings = {"assess", "assess|-h", "assess|--help", "assess|x.json|--rules|r", "assess|--at|2026-01-01T00:00Z|x",
            "assess|@args.txt", "assess|-", "assess|--|x.json", "assess|x.json|y.json", "assess|--json|--json|x.json",
            "assess|--JSON|x.json", "pdf|x.json", "assess|x.json|--json|extra", "--version", "assess|", "pdf|x.json|-oout.pdf",
            "pdf|x.json|--output=o.pdf", "pdf|x.json|-o|o.pdf|--paper", "pdf|x.json|--no-identifiers|o.pdf",
            "pdf|-o|o.pdf|-x", "pdf|x.json|-o|-", "pdf|x.json|-o|@o", "pdf|x.json|y.json|o.pdf", "pdf|-o|-o|x"})
    @DisplayName("anything but assess CASE [--json] goes the full way")
    void recognisesOnlyThePlainForm(String joined) {
        String[] args = joined.split("\\|", -1);
        assertTrue(QuickPath.recognise(args).isEmpty(), joined);
    }

    @Test
    @DisplayName("the plain forms are recognised, the file kept as given")
    void recognisesThePlainForm() {
        assertEquals(new QuickPath.Assess(Path.of("x.json"), false),
                QuickPath.recognise(new String[] {"assess", "x.json"}).orElseThrow());
        assertEquals(new QuickPath.Assess(Path.of("x.json"), true),
                QuickPath.recognise(new String[] {"assess", "x.json", "--json"}).orElseThrow());
        assertEquals(new QuickPath.Assess(Path.of("x.json"), true),
                QuickPath.recognise(new String[] {"assess", "--json", "x.json"}).orElseThrow());
        assertEquals(new QuickPath.Pdf(Path.of("x.json"), Path.of("o.pdf")),
                QuickPath.recognise(new String[] {"pdf", "x.json", "-o", "o.pdf"}).orElseThrow());
        assertEquals(new QuickPath.Pdf(Path.of("x.json"), Path.of("o.pdf")),
                QuickPath.recognise(new String[] {"pdf", "-o", "o.pdf", "x.json"}).orElseThrow());
        assertEquals(new QuickPath.Pdf(Path.of("x.json"), Path.of("o.pdf")),
                QuickPath.recognise(new String[] {"pdf", "x.json", "--output", "o.pdf"}).orElseThrow());
    }
}
