package org.stasissheet.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.stasissheet.report.HandoffNote;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code note CASE}: prints a short SBAR handoff, without the patient label unless asked. */
@Command(name = "note",
        description = "Print a 3-20 line handoff note (situation, background, assessment, recommendation).")
final class NoteCommand implements Callable<Integer> {
    @Parameters(paramLabel = "CASE", description = "the case file (stasis-case/1 JSON) or a worksheet PDF")
    Path caseFile;

    @Option(names = "--with-identifiers", description = "include the patient label (left out by default)")
    boolean withIdentifiers;

    @Mixin
    RulesOption rules;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Worksheet sheet = Assessor.assess(Inputs.readCase(caseFile, spec.commandLine().getErr()), Inputs.ruleSet(rules.dir()));
        PrintWriter out = spec.commandLine().getOut();
        out.print(HandoffNote.render(sheet, withIdentifiers));
        out.flush();
        return ExitCode.DONE;
    }
}
