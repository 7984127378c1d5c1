package org.stasissheet.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import org.stasissheet.cli.StasisCommand;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.Case;
import org.stasissheet.report.Paper;
import org.stasissheet.report.PdfOptions;
import org.stasissheet.report.WorksheetPdf;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;
import picocli.CommandLine;

/**
 * Where a cold {@code pdf} spends its time: the steps of the command, in its order, each timed once in a fresh
 * JVM, then the render timed a second time in the same JVM. The first render minus the second is start-up
 * work (class loading, first interpretation, font parsing) rather than per-case work. Run by
 * {@code src/bench/cold-phases.sh}, which starts this many times and prints the medians; one line of
 * tab-separated milliseconds per run, in the order of {@link #STEPS}.
 *
 * <p>Usage: {@code ColdStartPhases CASE.json}. Nothing is written to disk.
 */
public final class ColdStartPhases {
    /** The step names, in the order they are printed. */
    static final String[] STEPS = {"command-line", "case", "rule-set", "assess", "pdf-first", "pdf-again"};

    private ColdStartPhases() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length != 1) {
            System.err.println("usage: ColdStartPhases CASE.json");
            System.exit(2);
        }
        Path caseFile = Path.of(args[0]);
        long[] ms = new long[STEPS.length];
        long start = System.nanoTime();

        // the command model and the parse, as `stasis-sheet pdf CASE -o OUT` builds them (nothing runs)
        new CommandLine(new StasisCommand()).parseArgs("pdf", caseFile.toString(), "-o", "unused.pdf");
        start = lap(ms, 0, start);

        byte[] json = Files.readAllBytes(caseFile);
        Case patientCase = AssessmentBench.Samples.read(json);
        start = lap(ms, 1, start);

        LoadResult loaded = RuleSources.shipped();
        if (!(loaded instanceof LoadResult.Loaded ok)) {
            throw new IllegalStateException("the shipped rule set did not load: " + loaded);
        }
        RuleSet rules = ok.ruleSet();
        start = lap(ms, 2, start);

        Worksheet sheet = Assessor.assess(patientCase, rules);
        start = lap(ms, 3, start);

        PdfOptions options = new PdfOptions(Paper.A4, true, "bench");
        // a fixed generation time: the figure must not depend on the clock
        OffsetDateTime at = OffsetDateTime.of(2026, 3, 5, 2, 40, 0, 0, ZoneOffset.ofHours(1));
        int size = WorksheetPdf.render(sheet, options, at, json).length;
        start = lap(ms, 4, start);

        size += WorksheetPdf.render(sheet, options, at, json).length;
        lap(ms, 5, start);

        StringBuilder line = new StringBuilder();
        for (long m : ms) {
            line.append(line.length() == 0 ? "" : "\t").append(m);
        }
        System.out.println(line);
        if (size == 0) {
            throw new IllegalStateException("empty PDF"); // also keeps the renders from being dropped
        }
    }

    private static long lap(long[] ms, int step, long since) {
        long now = System.nanoTime();
        ms[step] = Math.round((now - since) / 1e6);
        return now;
    }
}
