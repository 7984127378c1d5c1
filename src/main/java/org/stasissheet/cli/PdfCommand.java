package org.stasissheet.cli;

import org.stasissheet.load.InvalidInputException;
import org.stasissheet.load.Inputs;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.stasissheet.load.Ahead;
import org.stasissheet.load.WallClock;
import org.stasissheet.report.Paper;
import org.stasissheet.report.PdfOptions;
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

/** {@code pdf CASE -o OUT.pdf}: writes the worksheet of one case as a PDF with the case embedded. */
@Command(name = "pdf",
        description = "Write the worksheet of one case as a PDF (the case file is embedded in it).")
final class PdfCommand implements Callable<Integer> {
    @Parameters(paramLabel = "CASE", description = "the case file (stasis-case/1 JSON) or a worksheet PDF")
    Path caseFile;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "OUT.pdf", description = "the PDF to write")
    Path output;

    @Mixin
    PdfLayoutOptions layout;

    @Mixin
    RulesOption rules;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        return write(caseFile, output, layout.options(), rules.dir(), spec.commandLine().getOut(),
                spec.commandLine().getErr());
    }

    /** The command's work, shared with {@link QuickPath}: read, assess, render, write atomically. */
    static int write(Path caseFile, Path output, PdfOptions options, Optional<Path> rulesDir, PrintWriter out,
                     PrintWriter err) {
        refuseOverwritingInput(caseFile, output);
        // the rule set loads and the fonts are parsed while the case is read and assessed
        Ahead<RuleSet> rules = Ahead.start("rule-set", () -> Inputs.ruleSet(rulesDir));
        Ahead<Boolean> fonts = Ahead.start("fonts", WorksheetPdf::prepareFonts);
        Inputs.LoadedCase loaded = Inputs.loadCase(caseFile, err);
        Worksheet sheet = Assessor.assess(loaded.value(), rules.get());
        fonts.get();
        byte[] pdf = WorksheetPdf.render(sheet, options, WallClock.now(), loaded.json());
        OutputFiles.write(output, pdf);
        out.println("wrote " + output);
        out.flush();
        return ExitCode.DONE;
    }

    /** Writing over the case being read would destroy the only copy of it (and, without identifiers, its label). */
    private static void refuseOverwritingInput(Path caseFile, Path output) {
        if (OutputFiles.sameFile(caseFile, output)) {
            throw new InvalidInputException(output + ": this is the input file; choose another output path (the"
                    + " case file is never overwritten)");
        }
    }

    /** Accepts {@code a4} or {@code letter}; anything else is a usage error (exit 2). */
    static final class PaperConverter implements picocli.CommandLine.ITypeConverter<Paper> {
        @Override
        public Paper convert(String value) {
            return Paper.parse(value);
        }
    }
}
