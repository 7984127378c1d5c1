package org.stasissheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A command loads only what it needs: the command line never loads JavaFX, and only the commands that write PDFs
 * load the PDF library and its fonts. Checked on a real JVM started with the test class path, from the JVM's own
 * class-loading log.
 */
class StartupLoadingTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "stasis-sheet {0}")
    @ValueSource(strings = {"--help", "--version", "assess --help", "assess samples/igm-symptomatic.json",
        "assess --json samples/cll-extreme.json", "note samples/aml-breathless.json", "rules list",
        "labs --help", "export fhir --help"})
    @DisplayName("a command-line run loads no JavaFX, no PDF class and no FHIR or HL7 class")
    void commandLine_loadsNeitherToolkitNorPdf(String args) throws Exception {
        List<String> loaded = classesLoadedBy(args.split(" "));
        // (not picocli: the plain assess runs take the quick path, which does not load it)
        assertTrue(loaded.stream().anyMatch(c -> c.startsWith("org.stasissheet.cli.")),
                "sanity: the log lists the classes");
        assertEquals(List.of(), loaded.stream().filter(c -> c.startsWith("javafx.") || c.startsWith("com.sun.javafx.")
                || c.startsWith("com.sun.glass.") || c.startsWith("com.sun.prism.")).toList());
        assertEquals(List.of(), loaded.stream().filter(StartupLoadingTest::isPdfOrFont).toList());
        assertEquals(List.of(), loaded.stream().filter(StartupLoadingTest::isDatabase).toList(),
                "only a register command loads the database classes");
        assertEquals(List.of(), loaded.stream().filter(StartupLoadingTest::isFhirOrHl7).toList());
    }

    @Test
    @DisplayName("a register command loads the database classes (so the check above can see them), and no JavaFX or PDF")
    void register_loadsDatabaseButNoToolkitOrPdf() throws Exception {
        List<String> loaded = classesLoadedBy("register", "list", "--db",
                "jdbc:sqlite:" + dir.resolve("register.sqlite"));
        assertTrue(loaded.stream().anyMatch(c -> c.startsWith("org.flywaydb.")), "Flyway was loaded");
        assertTrue(loaded.stream().anyMatch(c -> c.startsWith("org.sqlite.")), "the SQLite driver was loaded");
        assertEquals(List.of(), loaded.stream().filter(c -> c.startsWith("org.postgresql.")).toList(),
                "a SQLite register does not load the PostgreSQL driver");
        assertEquals(List.of(), loaded.stream().filter(c -> c.startsWith("javafx.")).toList());
        assertEquals(List.of(), loaded.stream().filter(StartupLoadingTest::isPdfOrFont).toList());
    }

    /** (java.sql itself is not here: picocli touches a few java.sql types for its built-in converters.) */
    static boolean isDatabase(String className) {
        return className.startsWith("org.flywaydb.") || className.startsWith("org.sqlite.")
                || className.startsWith("org.postgresql.") || className.startsWith("org.stasissheet.register.store.");
    }

    @Test
    @DisplayName("labs import loads the HL7 library only when it reads HL7, prints only its own lines, and no JavaFX")
    void labsImport_loadsHapiOnlyWhenItReadsAMessage() throws Exception {
        List<String> text = classesLoadedBy("labs", "import", "lab-reports/aml-night.txt", "-o",
                dir.resolve("a.json").toString());
        assertEquals(List.of(), text.stream().filter(StartupLoadingTest::isFhirOrHl7).toList(),
                "pasted text needs no HAPI class");
        List<String> hl7 = classesLoadedBy("labs", "import", "lab-reports/aml-night.hl7", "-o",
                dir.resolve("b.json").toString());
        assertTrue(hl7.stream().anyMatch(c -> c.startsWith("ca.uhn.hl7v2.")), "HAPI HL7 v2 was loaded");
        assertEquals(List.of(), hl7.stream().filter(c -> c.startsWith("javafx.")).toList());
        // the libraries' logging is bound to SLF4J's no-op: nothing but the command's own summary is printed
        String printed = read(dir.resolve("out.txt"));
        assertTrue(printed.lines().allMatch(l -> l.startsWith("read ") || l.startsWith("  ")
                || l.startsWith("wrote ")), printed);
    }

    static boolean isFhirOrHl7(String className) {
        return className.startsWith("ca.uhn.") || className.startsWith("org.hl7.");
    }

    @Test
    @DisplayName("pdf loads the PDF library (so the check above can see it) and still no JavaFX")
    void pdf_loadsPdfButNoToolkit() throws Exception {
        List<String> loaded = classesLoadedBy("pdf", "samples/igm-symptomatic.json", "-o", dir.resolve("w.pdf").toString());
        assertTrue(loaded.stream().anyMatch(c -> c.startsWith("com.lowagie.text.pdf.")), "OpenPDF was loaded");
        assertEquals(List.of(), loaded.stream().filter(c -> c.startsWith("javafx.")).toList());
        assertTrue(Files.size(dir.resolve("w.pdf")) > 0, "the PDF was written");
    }

    static boolean isPdfOrFont(String className) {
        return className.startsWith("com.lowagie.") || className.startsWith("org.librepdf.")
                || className.startsWith("java.awt.Font") || className.startsWith("sun.font.");
    }

    /** Runs the tool's main class in a fresh JVM and returns the names of every class it loaded. */
    List<String> classesLoadedBy(String... args) throws IOException, InterruptedException {
        Path log = dir.resolve("classes.log");
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xshare:off", "-Xlog:class+load=info:file=" + log,
                "-Djava.awt.headless=true",
                "-cp", System.getProperty("java.class.path"), Main.class.getName()));
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(dir.resolve("out.txt").toFile()).start();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "the run finished");
        assertEquals(0, p.exitValue(), () -> read(dir.resolve("out.txt")));
        try (Stream<String> lines = Files.lines(log, StandardCharsets.UTF_8)) {
            // lines look like "[0.012s][info][class,load] picocli.CommandLine source: file:/..."
            return lines.map(l -> l.substring(l.indexOf("] ", l.indexOf("[class,load]")) + 2))
                    .map(l -> l.split(" ", 2)[0]).toList();
        }
    }

    private static String read(Path p) {
        try {
            return Files.readString(p, StandardCharsets.UTF_8);
        } catch (IOException e) {
            return "(no output: " + e.getMessage() + ")";
        }
    }
}
