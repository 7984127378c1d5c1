package org.stasissheet.cli;

import org.stasissheet.load.Inputs;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.stasissheet.course.Course;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.report.CourseText;
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
    @Parameters(paramLabel = "CASE", description = "the case file, a course file (adds one line of trend) or a worksheet or "
            + "course PDF")
    Path caseFile;

    @Option(names = "--with-identifiers", description = "include the patient label (left out by default)")
    boolean withIdentifiers;

    @Mixin
    RulesOption rules;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        byte[] json = Inputs.caseBytes(caseFile, spec.commandLine().getErr());
        PrintWriter out = spec.commandLine().getOut();
        if (Inputs.isCourse(json)) {
            Course course = Inputs.parseCourse(caseFile, json);
            out.print(CourseText.note(CourseAssessor.assess(course, Inputs.ruleSet(rules.dir())), withIdentifiers));
            out.flush();
            return ExitCode.DONE;
        }
        Worksheet sheet = Assessor.assess(Inputs.parseCase(caseFile, json), Inputs.ruleSet(rules.dir()));
        out.print(HandoffNote.render(sheet, withIdentifiers));
        out.flush();
        return ExitCode.DONE;
    }
}
