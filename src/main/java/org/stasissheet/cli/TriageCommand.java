package org.stasissheet.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
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
 * {@code summary.csv}, most urgent first. One bad file never stops the batch; it gets a row saying what is wrong.
 * The rule set and the fonts are loaded once for the whole batch; nothing of one case is kept for the next.
 */
@Command(name = "triage",
        description = "Assess every case (*.json, *.pdf) in DIR: a PDF each in OUTDIR and OUTDIR/summary.csv, "
                + "most urgent first.")
final class TriageCommand implements Callable<Integer> {
    static final String SUMMARY = "summary.csv";

    @Parameters(paramLabel = "DIR", description = "the referral folder")
    Path dir;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "OUTDIR",
            description = "the folder for the PDFs and summary.csv (created when missing)")
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
        List<Path> cases = caseFiles(dir);
        RuleSet ruleSet = Inputs.ruleSet(rules.dir());
        // a register that cannot be opened stops the run before anything is written
        ReferralSink sink = register ? RegisterRuns.sink(db.value(), RegisterRuns.actor(Optional.empty())) : null;
        createOutDir();
        PrintWriter err = spec.commandLine().getErr();
        PdfOptions options = layout.options();
        List<TriageRow> rows = new ArrayList<>();
        Set<String> taken = new HashSet<>();
        int n = 0;
        for (Path file : cases) {
            n++;
            StringBuilder registered = new StringBuilder();
            TriageRow row = triage(file, ruleSet, options, outputName(file, taken), sink, registered);
            rows.add(row);
            err.println("[" + n + "/" + cases.size() + "] " + file.getFileName() + " " + row.status().code()
                    + registered);
            err.flush();
        }
        OutputFiles.write(outDir.resolve(SUMMARY), TriageSummary.csv(rows).getBytes(StandardCharsets.UTF_8));
        PrintWriter out = spec.commandLine().getOut();
        long failed = rows.stream().filter(r -> r.status() != TriageRow.Status.OK).count();
        out.println("triaged " + rows.size() + " file" + (rows.size() == 1 ? "" : "s") + " (" + failed
                + " could not be assessed); summary in " + outDir.resolve(SUMMARY));
        out.flush();
        return ExitCode.DONE;
    }

    private TriageRow triage(Path file, RuleSet ruleSet, PdfOptions options, String pdfName, ReferralSink sink,
                             StringBuilder registered) {
        String name = file.getFileName().toString();
        try {
            Inputs.LoadedCase loaded = Inputs.loadCase(file);
            Worksheet sheet = Assessor.assess(loaded.value(), ruleSet);
            byte[] pdf = WorksheetPdf.render(sheet, options, OffsetDateTime.now(), loaded.json());
            OutputFiles.write(outDir.resolve(pdfName), pdf);
            if (sink != null) {
                registered.append(" (register: referral ").append(addToRegister(sink, loaded, sheet, pdfName))
                        .append(')');
            }
            return TriageRow.assessed(name, sheet, pdfName, options.includeIdentifiers());
        } catch (InvalidInputException e) {
            return TriageRow.failed(name, TriageRow.Status.ERROR, withoutFilePrefix(file, e.lines()));
        } catch (RuntimeException e) {
            return TriageRow.failed(name, TriageRow.Status.INTERNAL_ERROR,
                    "internal error (" + e.getClass().getSimpleName() + "): " + e.getMessage());
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

    /** *.json and *.pdf files, not hidden, by name. */
    static List<Path> caseFiles(Path dir) {
        try (Stream<Path> list = Files.list(dir)) {
            return list.filter(Files::isRegularFile)
                    .filter(p -> !p.getFileName().toString().startsWith("."))
                    .filter(p -> {
                        String n = p.getFileName().toString().toLowerCase(Locale.ROOT);
                        return n.endsWith(".json") || n.endsWith(".pdf");
                    })
                    .sorted()
                    .toList();
        } catch (IOException e) {
            throw new InvalidInputException(dir + ": cannot list the folder (" + e.getClass().getSimpleName() + ")");
        }
    }

    /** {@code a.json} → {@code a.pdf}; a second file with the same stem keeps its full name ({@code a.pdf.pdf}). */
    private String outputName(Path file, Set<String> taken) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String candidate = (dot > 0 ? name.substring(0, dot) : name) + ".pdf";
        Path target = outDir.resolve(candidate).toAbsolutePath().normalize();
        if (taken.contains(candidate) || target.equals(file.toAbsolutePath().normalize())) {
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
