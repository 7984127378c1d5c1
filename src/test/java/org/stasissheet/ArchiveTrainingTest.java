package org.stasissheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The class-data archive's training run ({@code -Dstasis.archiveTraining=true}, what {@code --make-archive} starts):
 * in a fresh JVM that writes a real archive at its exit, then read back by the JVM itself
 * ({@code -XX:+PrintSharedArchiveAndExit} lists the archived classes and says whether the archive is valid). The
 * program's classes go into a jar first: the JVM archives classes from jars only.
 */
class ArchiveTrainingTest {
    @TempDir
    static Path shared;
    @TempDir
    Path dir;

    /** The program's classes as a jar, then every library jar of the test class path (Monocle among them). */
    static String classPath;

    @BeforeAll
    static void programAsAJar() throws IOException {
        Path classes = Path.of(Main.class.getProtectionDomain().getCodeSource().getLocation().getPath());
        Path jar = shared.resolve("program.jar");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar));
             Stream<Path> files = Files.walk(classes)) {
            for (Path f : files.filter(Files::isRegularFile).sorted().toList()) {
                out.putNextEntry(new JarEntry(classes.relativize(f).toString().replace(File.separatorChar, '/')));
                Files.copy(f, out);
                out.closeEntry();
            }
        }
        classPath = Stream.concat(Stream.of(jar.toString()),
                Stream.of(System.getProperty("java.class.path").split(File.pathSeparator))
                        .filter(e -> e.endsWith(".jar")))
                .collect(Collectors.joining(File.pathSeparator));
    }

    @Test
    @DisplayName("a display is present with DISPLAY set, on Windows and macOS, and under Monocle; not without DISPLAY")
    void displayPresent() {
        assertFalse(ArchiveTraining.displayPresent(Map.of(), "Linux", ""));
        assertFalse(ArchiveTraining.displayPresent(Map.of("DISPLAY", " "), "Linux", ""));
        assertTrue(ArchiveTraining.displayPresent(Map.of("DISPLAY", ":0"), "Linux", ""));
        assertTrue(ArchiveTraining.displayPresent(Map.of(), "Windows 11", ""));
        assertTrue(ArchiveTraining.displayPresent(Map.of(), "Mac OS X", ""));
        assertTrue(ArchiveTraining.displayPresent(Map.of(), "Linux", "Monocle"));
    }

    @Test
    @DisplayName("without a display: the command-line paths are trained, the run exits 0, the archive is valid")
    void withoutDisplay_trainsTheCommandLine() throws Exception {
        Run run = train(List.of());
        assertEquals(0, run.exit(), run.said());
        assertTrue(run.said().contains("archive training: assess, assess --json, note, pdf (no display: the form was"
                + " not trained)"), run.said());
        List<String> archived = archivedClasses(run.archive());
        assertTrue(archived.contains("org.stasissheet.cli.QuickPath"), "the assess and pdf quick path");
        assertTrue(archived.contains("org.stasissheet.cli.NoteCommand"), "the note went through the full command line");
        assertTrue(archived.stream().anyMatch(c -> c.startsWith("com.lowagie.text.pdf.")), "the pdf");
        assertFalse(archived.stream().anyMatch(c -> c.startsWith("javafx.")), "no form without a display");
        assertUntouched(run);
    }

    @Test
    @DisplayName("with a display (Monocle): the form's first worksheet is trained too, closed cleanly, exit 0")
    void withDisplay_trainsTheFormToo() throws Exception {
        Run run = train(List.of("-Dglass.platform=Monocle", "-Dmonocle.platform=Headless", "-Dprism.order=sw"));
        assertEquals(0, run.exit(), run.said());
        assertTrue(run.said().contains("archive training: assess, assess --json, note, pdf, form (first worksheet)"),
                run.said());
        assertFalse(run.said().contains("Exception"), run.said());
        List<String> archived = archivedClasses(run.archive());
        for (String c : List.of("org.stasissheet.ui.app.MainWindow", "org.stasissheet.ui.sheet.SheetView",
                "org.stasissheet.ui.course.CourseView", "javafx.scene.control.TabPane",
                "org.stasissheet.cli.NoteCommand")) {
            assertTrue(archived.contains(c), c + " is archived");
        }
        assertUntouched(run);
    }

    @Test
    @DisplayName("a display that is set but cannot be opened: the command line is trained, the run still exits 0")
    void unusableDisplay_trainsTheCommandLine() throws Exception {
        Run run = train(List.of(), ":987");
        assertEquals(0, run.exit(), run.said());
        assertTrue(run.said().contains("archive training: assess, assess --json, note, pdf (the form could not open a"
                + " window, so it was not trained: "), run.said());
        assertTrue(archivedClasses(run.archive()).contains("org.stasissheet.cli.NoteCommand"));
        assertUntouched(run);
    }

    @Test
    @DisplayName("each part trains its own paths: the text commands, the pdf, the form; none holds JavaFX but the form's")
    void partsTrainTheirOwnPaths() throws Exception {
        Run commands = train("commands", List.of(), null);
        assertEquals(0, commands.exit(), commands.said());
        assertTrue(commands.said().contains("archive training: assess, assess --json"), commands.said());
        List<String> inCommands = archivedClasses(commands.archive());
        assertTrue(inCommands.contains("org.stasissheet.report.WorksheetText"));
        assertTrue(inCommands.contains("org.stasissheet.report.WorksheetJson"));
        assertFalse(inCommands.stream().anyMatch(c -> c.startsWith("picocli.")), "the quick path needs no picocli");
        assertFalse(inCommands.contains("org.stasissheet.report.PdfFonts"), "no PDF classes in the text archive");
        assertTrue(inCommands.stream().noneMatch(c -> c.startsWith("javafx.")));
        Files.delete(commands.archive());

        Run pdf = train("pdf", List.of(), null);
        assertEquals(0, pdf.exit(), pdf.said());
        assertTrue(pdf.said().contains("archive training: pdf"), pdf.said());
        List<String> inPdf = archivedClasses(pdf.archive());
        assertTrue(inPdf.contains("org.stasissheet.report.PdfFonts"));
        assertTrue(inPdf.stream().noneMatch(c -> c.startsWith("javafx.")));
        assertUntouched(pdf);
    }

    @Test
    @DisplayName("the form's part without a display trains nothing and says so with its own exit code")
    void formPartWithoutDisplay_nothingTrained() throws Exception {
        Run run = train("form", List.of(), null);
        assertEquals(ArchiveTraining.NOTHING_TRAINED, run.exit(), run.said());
        assertTrue(run.said().contains("no display: the form was not trained"), run.said());
        assertUntouched(run);
    }

    @Test
    @DisplayName("a part that does not exist is refused, naming the parts there are")
    void unknownPart_refused() throws Exception {
        Run run = train("everything", List.of(), null);
        assertEquals(org.stasissheet.cli.ExitCode.INVALID_INPUT, run.exit(), run.said());
        assertTrue(run.said().contains("commands, pdf, form"), run.said());
    }

    @Test
    @DisplayName("the training needs a readable case file and says so otherwise")
    void withoutACase_refuses() throws Exception {
        java.io.ByteArrayOutputStream said = new java.io.ByteArrayOutputStream();
        int code = ArchiveTraining.run(ArchiveTraining.Part.ALL, new String[] {dir.resolve("none.json").toString()},
                Map.of(),
                new java.io.PrintStream(said, true, StandardCharsets.UTF_8));
        assertEquals(org.stasissheet.cli.ExitCode.INVALID_INPUT, code);
        assertTrue(said.toString(StandardCharsets.UTF_8).contains("give one case file"));
    }

    record Run(int exit, String said, Path archive, Path home) {
    }

    /** A training run in a fresh JVM with an empty home and data folder, and without DISPLAY. */
    Run train(List<String> options) throws IOException, InterruptedException {
        return train(options, null);
    }

    /** The same with DISPLAY set to {@code display} (none when null). */
    Run train(List<String> options, String display) throws IOException, InterruptedException {
        return train("true", options, display);
    }

    /** A run of one part ({@code -Dstasis.archiveTraining=PART}). */
    Run train(String part, List<String> options, String display) throws IOException, InterruptedException {
        Path archive = dir.resolve("trained.jsa");
        Path home = Files.createDirectories(dir.resolve("home"));
        List<String> command = new ArrayList<>(List.of(java(), "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC",
                "-XX:ArchiveClassesAtExit=" + archive, "-Xlog:cds=off", "-Xlog:cds+dynamic=off",
                "-Duser.home=" + home, "-Dstasis.archiveTraining=" + part));
        command.addAll(options);
        command.addAll(List.of("-cp", classPath, Main.class.getName(), "samples/aml-breathless.json"));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(dir.resolve("said.txt").toFile());
        pb.environment().remove("DISPLAY");
        pb.environment().remove("WAYLAND_DISPLAY");
        if (display != null) {
            pb.environment().put("DISPLAY", display);
        }
        pb.environment().put("HOME", home.toString());
        pb.environment().put("XDG_DATA_HOME", home.resolve("xdg").toString());
        Process p = pb.start();
        assertTrue(p.waitFor(180, TimeUnit.SECONDS), "the training finished");
        return new Run(p.exitValue(), Files.readString(dir.resolve("said.txt"), StandardCharsets.UTF_8), archive,
                home);
    }

    /** The user's data folder is never made: the training's preferences and drafts went to its scratch folder. */
    private static void assertUntouched(Run run) {
        assertFalse(Files.exists(run.home().resolve("xdg").resolve("stasis-sheet")), "no data folder made");
        assertFalse(Files.exists(run.home().resolve(".local").resolve("share").resolve("stasis-sheet")));
    }

    /** The classes the JVM finds in the archive, read by the JVM itself, which also checks the archive. */
    private static List<String> archivedClasses(Path archive) throws IOException, InterruptedException {
        assertTrue(Files.size(archive) > 0, "an archive was written");
        Process p = new ProcessBuilder(java(), "-XX:+UseSerialGC", "-XX:SharedArchiveFile=" + archive,
                "-XX:+PrintSharedArchiveAndExit", "-cp", classPath, Main.class.getName())
                .redirectErrorStream(true).start();
        String listing;
        try (var in = p.getInputStream()) {
            listing = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertTrue(listing.contains("archive is valid"), listing.lines().limit(20).collect(Collectors.joining("\n")));
        // lines look like "1158: org.stasissheet.ArchiveTraining$1 app_loader"
        return listing.lines().map(String::strip).filter(l -> l.matches("\\d+: \\S+ .*"))
                .map(l -> l.split(" ")[1]).toList();
    }

    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }
}
