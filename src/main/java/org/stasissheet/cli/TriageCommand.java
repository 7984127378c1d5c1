package org.stasissheet.cli;

import org.stasissheet.load.InvalidInputException;
import org.stasissheet.load.Inputs;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.stasissheet.files.AtomicFiles;
import org.stasissheet.files.FileWriteException;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.load.WallClock;
import org.stasissheet.report.PdfOptions;
import org.stasissheet.report.TriageRow;
import org.stasissheet.report.TriageSummary;
import org.stasissheet.report.WorksheetPdf;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code triage DIR -o OUTDIR}: every case in a referral folder gets a worksheet PDF and a row in
 * {@code summary.csv}, most urgent first. Every entry of the folder gets a row: a bad file says what is wrong, an
 * entry that is not a referral says why it was not read, and nothing one file does (not even running out of stack
 * or memory) stops the batch. The work per file is bounded by the readers' limits. The rule set and the fonts are
 * loaded once for the whole batch; nothing of one case is kept for the next.
 *
 * <p>Output safety: OUTDIR may not be DIR itself (its worksheets would be read as new referrals next time, and a
 * referral could be overwritten); a lock file keeps a second run out of the same OUTDIR; an earlier
 * {@code summary.csv} is removed before the first new PDF is written and the new one is written whole at the end,
 * so a summary never stands beside worksheets it does not describe.
 */
@Command(name = "triage",
        description = "Assess every case (*.json, *.pdf) in DIR: a PDF each in OUTDIR and OUTDIR/summary.csv, "
                + "most urgent first.")
final class TriageCommand implements Callable<Integer> {
    static final String SUMMARY = "summary.csv";
    /** Held while a run writes into OUTDIR; a second run finds it taken and stops before writing anything. */
    static final String LOCK = ".stasis-triage.lock";

    @Parameters(paramLabel = "DIR", description = "the referral folder")
    Path dir;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "OUTDIR",
            description = "the folder for the PDFs and summary.csv (created when missing; not DIR itself)")
    Path outDir;

    @Mixin
    PdfLayoutOptions layout;

    @Mixin
    RulesOption rules;

    @Option(names = "--register", description = "also add every assessed referral to the referral register")
    boolean register;

    @Mixin
    DatabaseOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (!Files.isDirectory(dir)) {
            throw new InvalidInputException(dir + ": not a folder");
        }
        RuleSet ruleSet = Inputs.ruleSet(rules.dir());
        // a register that cannot be opened stops the run before anything is written
        ReferralSink sink = register ? RegisterRuns.sink(db.value(), RegisterRuns.actor(Optional.empty())) : null;
        createOutDir();
        Path realDir = realPath(dir);
        Path realOut = realPath(outDir);
        if (realOut.equals(realDir)) {
            throw new InvalidInputException(outDir + ": this is the referral folder itself; its worksheets would be "
                    + "read as new referrals by the next run. Write them into a folder of their own, for example "
                    + dir.resolve("worksheets"));
        }
        try (FileChannel lockFile = FileChannel.open(outDir.resolve(LOCK), StandardOpenOption.CREATE,
                StandardOpenOption.WRITE)) {
            FileLock lock = tryLock(lockFile);
            try {
                return run(ruleSet, realOut, sink);
            } finally {
                if (lock != null) {
                    lock.release();
                }
            }
        } catch (IOException e) {
            throw new InvalidInputException(outDir.resolve(LOCK) + ": cannot create the lock file ("
                    + e.getClass().getSimpleName() + ")");
        }
    }

    /** The lock, or null where the file system has none (the run goes on, with a warning). */
    private FileLock tryLock(FileChannel channel) {
        FileLock lock;
        try {
            lock = channel.tryLock();
        } catch (OverlappingFileLockException e) {
            lock = null;
        } catch (IOException e) {
            spec.commandLine().getErr().println("warning: " + outDir + ": this file system cannot lock files; make sure"
                    + " no other triage writes into the same folder");
            return null;
        }
        if (lock == null) {
            throw new InvalidInputException(outDir + ": another triage is writing into this folder; wait for it to "
                    + "finish, or choose another output folder");
        }
        return lock;
    }

    private int run(RuleSet ruleSet, Path realOut, ReferralSink sink) {
        PrintWriter err = spec.commandLine().getErr();
        int cleaned = AtomicFiles.removeStaleTemps(outDir, Instant.now());
        if (cleaned > 0) {
            err.println("removed " + cleaned + " half-written file" + (cleaned == 1 ? "" : "s")
                    + " left by an interrupted run in " + outDir);
        }
        try {
            Files.deleteIfExists(outDir.resolve(SUMMARY));
        } catch (IOException e) {
            throw new InvalidInputException(outDir.resolve(SUMMARY) + ": the summary of an earlier run cannot be "
                    + "removed (" + e.getClass().getSimpleName() + "); nothing was written");
        }
        List<Path> entries = entries(dir);
        PdfOptions options = layout.options();
        List<TriageRow> rows = new ArrayList<>();
        Set<String> taken = new HashSet<>();
        Map<String, String> seenCases = new HashMap<>();
        int written = 0;
        int notWritten = 0;
        String firstWriteFailure = "";
        int n = 0;
        for (Path entry : casesFirst(entries)) {
            n++;
            String name = entry.getFileName().toString();
            TriageRow row;
            StringBuilder registered = new StringBuilder();
            Optional<NotRead> notRead = notRead(entry, realOut);
            if (notRead.isPresent()) {
                row = TriageRow.failed(name, notRead.get().status(), notRead.get().why());
            } else {
                Outcome outcome = triage(entry, ruleSet, options, seenCases, taken, sink, registered);
                row = outcome.row();
                if (outcome.writeFailure().isPresent()) {
                    notWritten++;
                    if (firstWriteFailure.isEmpty()) {
                        firstWriteFailure = outcome.writeFailure().get();
                    }
                } else if (!row.pdf().isEmpty()) {
                    written++;
                }
            }
            rows.add(row);
            err.println(Terminal.line("[" + n + "/" + entries.size() + "] " + name + " " + row.status().code()
                    + registered));
            err.flush();
        }
        int pdfs = written;
        try {
            AtomicFiles.write(outDir.resolve(SUMMARY), TriageSummary.csv(rows).getBytes(StandardCharsets.UTF_8));
        } catch (FileWriteException e) {
            throw new InvalidInputException(List.of(e.getMessage(), "The summary was not written; " + pdfs + " of "
                    + (pdfs + notWritten) + " worksheet PDFs were written before it failed. Do not rely on this "
                    + "folder: run the triage again when the problem is fixed."));
        }
        PrintWriter out = spec.commandLine().getOut();
        long failed = rows.stream().filter(r -> r.status() == TriageRow.Status.ERROR
                || r.status() == TriageRow.Status.INTERNAL_ERROR).count();
        long skipped = rows.stream().filter(r -> r.status() == TriageRow.Status.SKIPPED).count();
        out.println("triaged " + rows.size() + " entr" + (rows.size() == 1 ? "y" : "ies") + " (" + failed
                + " could not be assessed, " + skipped + " not read); summary in " + outDir.resolve(SUMMARY));
        out.flush();
        if (notWritten > 0) {
            throw new InvalidInputException(List.of(notWritten + " worksheet PDF" + (notWritten == 1 ? "" : "s")
                    + " could not be written (" + firstWriteFailure + "); " + pdfs + " of " + (pdfs + notWritten)
                    + " were written. Every verdict is in " + outDir.resolve(SUMMARY) + "."));
        }
        return ExitCode.DONE;
    }

    /**
     * An entry that is not read as a referral: an {@code error} row when its name says it is a case file (an
     * unread referral may hide an emergency), a {@code skipped} row otherwise.
     */
    private record NotRead(TriageRow.Status status, String why) {
        static NotRead of(boolean caseName, String why) {
            return new NotRead(caseName ? TriageRow.Status.ERROR : TriageRow.Status.SKIPPED, why);
        }
    }

    /**
     * Why this entry is not read as a referral, or empty when it is one. Checked on the entry itself before any
     * file is opened, so a FIFO, a device or a link loop never blocks or misleads the batch.
     */
    private static Optional<NotRead> notRead(Path entry, Path realOut) {
        String name = entry.getFileName().toString();
        boolean caseName = isCaseName(name);
        if (Files.isSymbolicLink(entry)) {
            try {
                entry.toRealPath();
            } catch (IOException e) {
                return Optional.of(NotRead.of(caseName, "a link that leads nowhere or round in a loop; not read"));
            }
        }
        if (Files.isDirectory(entry)) {
            if (realPath(entry).equals(realOut)) {
                return Optional.of(NotRead.of(false, "the output folder of this run; not read"));
            }
            return Optional.of(NotRead.of(caseName, caseName ? "a folder named like a case file; not read"
                    : "a folder; triage reads only the files directly in DIR"));
        }
        if (!Files.isRegularFile(entry)) {
            return Optional.of(NotRead.of(caseName, "not a regular file (a pipe, device or socket); not opened"));
        }
        if (name.startsWith(".")) {
            return Optional.of(NotRead.of(false, "a hidden file; not read"));
        }
        if (!caseName) {
            return Optional.of(NotRead.of(false, "not a case file (*.json or *.pdf); not read"));
        }
        return Optional.empty();
    }

    /** One case's row, and the reason its PDF could not be written, if so. */
    private record Outcome(TriageRow row, Optional<String> writeFailure) {
    }

    /**
     * Reads, assesses and writes one case. Every failure becomes the row: a bad file names its problem, and
     * anything else, even an {@link Error} the readers' bounds should prevent, is an internal-error row.
     */
    private Outcome triage(Path file, RuleSet ruleSet, PdfOptions options, Map<String, String> seenCases,
                           Set<String> taken, ReferralSink sink, StringBuilder registered) {
        String name = file.getFileName().toString();
        try {
            Inputs.LoadedCase loaded = Inputs.loadCase(file);
            String digest = WorksheetPdfs.sha256(loaded.json());
            String earlier = seenCases.putIfAbsent(digest, name);
            if (earlier != null) {
                return new Outcome(TriageRow.failed(name, TriageRow.Status.SKIPPED, "the same case as " + earlier
                        + " (identical case file); counted once"), Optional.empty());
            }
            Worksheet sheet = Assessor.assess(loaded.value(), ruleSet);
            byte[] pdf = WorksheetPdf.render(sheet, options, WallClock.now(), loaded.json());
            String pdfName = outputName(file, taken);
            TriageRow row = TriageRow.assessed(name, sheet, pdfName, options.includeIdentifiers());
            for (String w : loaded.warnings()) {
                row = row.noting("warning: " + w);
            }
            try {
                AtomicFiles.write(outDir.resolve(pdfName), pdf);
            } catch (FileWriteException e) {
                String why = e.getMessage();
                return new Outcome(row.withoutPdf(why), Optional.of(why));
            }
            if (sink != null) {
                registered.append(" (register: referral ").append(addToRegister(sink, loaded, sheet, pdfName))
                        .append(')');
            }
            return new Outcome(row, Optional.empty());
        } catch (InvalidInputException e) {
            return new Outcome(TriageRow.failed(name, TriageRow.Status.ERROR, withoutFilePrefix(file, e.lines())),
                    Optional.empty());
        } catch (RuntimeException | StackOverflowError | OutOfMemoryError | LinkageError e) {
            return new Outcome(TriageRow.failed(name, TriageRow.Status.INTERNAL_ERROR,
                    "internal error (" + e.getClass().getSimpleName() + "): " + e.getMessage()), Optional.empty());
        }
    }

    /** The worksheet is kept when the register refuses; the row then says the referral was not added. */
    private static long addToRegister(ReferralSink sink, Inputs.LoadedCase loaded, Worksheet sheet, String pdfName) {
        try {
            return sink.add(new String(loaded.json(), StandardCharsets.UTF_8), sheet);
        } catch (InvalidInputException e) {
            throw new InvalidInputException("the worksheet " + pdfName + " was written, but the referral was NOT "
                    + "added to the register: " + String.join("; ", e.lines()));
        }
    }

    /** The problems of one file without repeating its path on every line (the row already names the file). */
    static String withoutFilePrefix(Path file, List<String> lines) {
        String prefix = file + ": ";
        List<String> out = new ArrayList<>();
        for (String line : lines) {
            out.add(line.startsWith(prefix) ? line.substring(prefix.length()) : line);
        }
        return String.join("; ", out);
    }

    /** Every entry of the folder, by name; listing never follows links or opens files. */
    static List<Path> entries(Path dir) {
        try (Stream<Path> list = Files.list(dir)) {
            return list.sorted().toList();
        } catch (IOException e) {
            throw new InvalidInputException(dir + ": cannot list the folder (" + e.getClass().getSimpleName() + ")");
        }
    }

    /** JSON files before PDFs, so that a worksheet PDF of a case also present as JSON is the one counted twice. */
    private static List<Path> casesFirst(List<Path> entries) {
        List<Path> ordered = new ArrayList<>(entries);
        ordered.sort(Comparator.comparing((Path p) -> !p.getFileName().toString().toLowerCase(Locale.ROOT)
                .endsWith(".json")).thenComparing(Comparator.naturalOrder()));
        return ordered;
    }

    private static boolean isCaseName(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.endsWith(".json") || n.endsWith(".pdf");
    }

    private static Path realPath(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            return p.toAbsolutePath().normalize();
        }
    }

    /** {@code a.json} → {@code a.pdf}; a second file with the same stem keeps its full name ({@code a.pdf.pdf}). */
    private String outputName(Path file, Set<String> taken) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String candidate = (dot > 0 ? name.substring(0, dot) : name) + ".pdf";
        if (taken.contains(candidate)) {
            candidate = name + ".worksheet.pdf";
        }
        taken.add(candidate);
        return candidate;
    }

    private void createOutDir() {
        try {
            Files.createDirectories(outDir);
        } catch (IOException e) {
            throw new InvalidInputException(outDir + ": cannot create the output folder ("
                    + e.getClass().getSimpleName() + ")");
        }
    }
}
