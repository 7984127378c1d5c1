package org.stasissheet;

import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.stasissheet.cli.ExitCode;
import org.stasissheet.cli.StasisCommand;
import org.stasissheet.files.DataFolder;

/**
 * The training run behind {@code stasis-sheet --make-archive}: one JVM that goes through the common paths once, so
 * that the class-data archive written at its exit holds their classes. Hidden on purpose (a system property, not a
 * command): it is for the launcher scripts, not for users.
 *
 * <p>Paths: {@code assess} (text), {@code assess --json}, {@code note} and {@code pdf} of the given case,
 * in-process; then, where a display is present, the form started exactly as a user starts it, on its demo case,
 * until the first worksheet is laid out, and closed the normal way. Without a display, or with one that cannot be
 * opened, the command-line paths are still trained and the run still succeeds (it says so on standard error).
 * Everything it writes goes to a scratch folder of its own, removed at the end: the user's data folder
 * (preferences, drafts) is never touched.
 *
 * <p>The property's value picks a {@link Part}, so that each way of starting gets an archive of its own: the JVM
 * patches every pointer of an archive at start (this runtime maps archives at a random address), so an archive
 * that also holds the form's 34 MB of classes cost a cold {@code assess} some 60 ms (src/bench/RESULTS.md).
 */
final class ArchiveTraining {
    /** {@code -Dstasis.archiveTraining=PART} with one argument, a case file, asks for the training run. */
    static final String PROPERTY = "stasis.archiveTraining";

    /** What one training run goes through; the launchers keep one archive per part. */
    enum Part {
        /**
         * {@code assess} and {@code assess --json}, the commands a cold start is timed on; {@code note} and the rest
         * go through the whole command-line library, whose classes would double this archive (and its start-up cost)
         */
        COMMANDS,
        /** {@code pdf} */
        PDF,
        /** the form's start, where a display is present */
        FORM,
        /** all of them in one run ({@code true}): one archive for every way of starting */
        ALL;

        /** The part named by the property's value, or empty for a value that names none. */
        static java.util.Optional<Part> named(String value) {
            if ("true".equals(value)) {
                return java.util.Optional.of(ALL);
            }
            for (Part p : values()) {
                if (p.name().toLowerCase(Locale.ROOT).equals(value)) {
                    return java.util.Optional.of(p);
                }
            }
            return java.util.Optional.empty();
        }

        boolean commands() {
            return this == COMMANDS || this == ALL;
        }

        boolean pdf() {
            return this == PDF || this == ALL;
        }

        boolean form() {
            return this == FORM || this == ALL;
        }
    }
    /**
     * Exit code of a run that had nothing to train: the form's part without a display (or without the form). The
     * launchers then keep no form archive, and the form starts on the command line's.
     */
    static final int NOTHING_TRAINED = 4;
    /** The form's part gives up after this long (a display that never answers); the command-line part stands. */
    static final long FORM_TIMEOUT_SECONDS = 90;

    private ArchiveTraining() {
    }

    static boolean requested() {
        return System.getProperty(PROPERTY) != null;
    }

    /** The run for the part the property names; an unknown part is refused, naming the ones there are. */
    static int run(String[] args, Map<String, String> environment, PrintStream report) {
        String value = System.getProperty(PROPERTY, "");
        java.util.Optional<Part> part = Part.named(value);
        if (part.isEmpty()) {
            report.println("archive training: " + PROPERTY + "=" + value + " names no part; use commands, pdf, form "
                    + "or true (all)");
            return ExitCode.INVALID_INPUT;
        }
        return run(part.get(), args, environment, report);
    }

    /**
     * Runs the training; returns the exit code (0 when every path it tried ran) and reports on {@code report} which
     * paths it trained. {@code environment} decides whether a display is present.
     */
    static int run(Part part, String[] args, Map<String, String> environment, PrintStream report) {
        if (args.length != 1 || !Files.isRegularFile(Path.of(args[0]))) {
            report.println("archive training: give one case file to train on");
            return ExitCode.INVALID_INPUT;
        }
        String demo = args[0];
        Path scratch;
        try {
            scratch = Files.createTempDirectory("stasis-training");
        } catch (IOException e) {
            report.println("archive training: no scratch folder: " + e.getMessage());
            return ExitCode.INTERNAL_ERROR;
        }
        // the form's preferences and drafts go to the scratch folder, never to the user's
        System.setProperty(DataFolder.PROPERTY, scratch.resolve("data").toString());
        List<String> trained = new ArrayList<>();
        try {
            List<List<String>> commands = new ArrayList<>();
            if (part.commands()) {
                commands.addAll(List.of(List.of("assess", demo), List.of("assess", "--json", demo)));
            }
            if (part == Part.ALL) {
                commands.add(List.of("note", demo));
            }
            if (part.pdf()) {
                commands.add(List.of("pdf", demo, "-o", scratch.resolve("training.pdf").toString()));
            }
            for (List<String> command : commands) {
                StringWriter errors = new StringWriter();
                int code = StasisCommand.run(command.toArray(String[]::new), new PrintWriter(new StringWriter()),
                        new PrintWriter(errors));
                if (code != ExitCode.DONE) {
                    report.println("archive training: '" + String.join(" ", command) + "' exited " + code + ": "
                            + errors.toString().strip());
                    return ExitCode.INTERNAL_ERROR;
                }
                trained.add(command.get(0) + (command.contains("--json") ? " --json" : ""));
            }
            if (!part.form()) {
                report.println("archive training: " + (trained.isEmpty() ? "nothing" : String.join(", ", trained)));
                return ExitCode.DONE;
            }
            if (!FormLauncher.available()) {
                report.println("archive training: " + (trained.isEmpty() ? "nothing" : String.join(", ", trained)) + " (this build has no form)");
                return trained.isEmpty() ? NOTHING_TRAINED : ExitCode.DONE;
            }
            if (!displayPresent(environment, System.getProperty("os.name", ""),
                    System.getProperty("glass.platform", ""))) {
                report.println("archive training: " + (trained.isEmpty() ? "nothing" : String.join(", ", trained))
                        + " (no display: the form was not trained)");
                return trained.isEmpty() ? NOTHING_TRAINED : ExitCode.DONE;
            }
            String form = FormLauncher.train(FORM_TIMEOUT_SECONDS);
            if (form.startsWith(FormLauncher.NO_WINDOW)) {
                // DISPLAY set but no usable display (a closed X session, no GTK): as without a display
                report.println("archive training: " + (trained.isEmpty() ? "nothing" : String.join(", ", trained))
                        + " (the form could not open a window, so it was not trained: "
                        + form.substring(FormLauncher.NO_WINDOW.length()) + ")");
                return trained.isEmpty() ? NOTHING_TRAINED : ExitCode.DONE;
            }
            if (!form.isEmpty()) {
                report.println("archive training: " + (trained.isEmpty() ? "nothing" : String.join(", ", trained)) + "; the form did not train: "
                        + form);
                return ExitCode.INTERNAL_ERROR;
            }
            trained.add("form (first worksheet)");
            report.println("archive training: " + (trained.isEmpty() ? "nothing" : String.join(", ", trained)));
            return ExitCode.DONE;
        } finally {
            removeQuietly(scratch);
        }
    }

    /**
     * Whether the form can open a window here: on Linux and the other X11 systems only with {@code DISPLAY} set
     * (JavaFX's GTK glass needs it, on Wayland through XWayland); always on Windows and macOS; and under Monocle
     * (headless JavaFX, chosen by {@code -Dglass.platform=Monocle}), which needs no display.
     */
    static boolean displayPresent(Map<String, String> environment, String osName, String glassPlatform) {
        if ("Monocle".equals(glassPlatform)) {
            return true;
        }
        String os = osName.toLowerCase(Locale.ROOT);
        if (os.startsWith("windows") || os.startsWith("mac")) {
            return true;
        }
        String display = environment.get("DISPLAY");
        return display != null && !display.isBlank();
    }

    private static void removeQuietly(Path folder) {
        try {
            Files.walkFileTree(folder, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                    Files.deleteIfExists(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path dir, IOException e) throws IOException {
                    Files.deleteIfExists(dir);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            // a scratch folder left in the temporary directory harms nothing
        }
    }
}
