package org.stasissheet.cli;

import org.stasissheet.intake.Case;
import org.stasissheet.load.Ahead;
import org.stasissheet.load.CourseInputs;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.load.Inputs;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.stasissheet.report.WorksheetJson;
import org.stasissheet.report.WorksheetText;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code assess CASE [--json]}: reads one case and prints its worksheet. */
@Command(name = "assess",
        description = "Read one case (a case JSON file or a worksheet PDF) and print its worksheet.")
final class AssessCommand implements Callable<Integer> {
    @Parameters(paramLabel = "CASE", description = "the case file (stasis-case/1 JSON), a course file (stasis-course/1) or a "
            + "worksheet or course PDF")
    Path caseFile;

    @Option(names = "--json", description = "print the stasis-worksheet/1 JSON object instead of text")
    boolean json;

    @Option(names = "--at", paramLabel = "ISO-TIME", description = "for a course: the assessment at or before this "
            + "time, ISO-8601 with offset (default: the latest)")
    OffsetDateTime at;

    @Mixin
    RulesOption rules;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        return print(caseFile, json, Optional.ofNullable(at), rules.dir(), spec.commandLine().getOut(),
                spec.commandLine().getErr());
    }

    /** The command's work, shared with {@link QuickPath}: read, assess, print. */
    static int print(Path caseFile, boolean json, Optional<OffsetDateTime> at, Optional<Path> rulesDir,
                     PrintWriter out, PrintWriter err) {
        Ahead<RuleSet> rules = Ahead.start("rule-set", () -> Inputs.ruleSet(rulesDir)); // loads while the case is read
        Case c = CourseInputs.caseOf(caseFile, at, err);
        Worksheet sheet = Assessor.assess(c, rules.get());
        out.print(json ? WorksheetJson.render(sheet) : WorksheetText.render(sheet));
        out.flush();
        return ExitCode.DONE;
    }
}
