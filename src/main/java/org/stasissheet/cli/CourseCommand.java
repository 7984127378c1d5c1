package org.stasissheet.cli;

import org.stasissheet.load.Inputs;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.course.CourseReport;
import org.stasissheet.load.WallClock;
import org.stasissheet.report.CourseJson;
import org.stasissheet.report.CoursePdf;
import org.stasissheet.report.CourseText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code course COURSE [--json | -o OUT.pdf]}: the course of treatment, as text, JSON or a PDF. */
@Command(name = "course",
        description = "Read a course of treatment (assessments and procedures over time) and print its report: "
                + "each assessment's verdicts and each exchange or leukapheresis projected beside what was "
                + "measured next.")
final class CourseCommand implements Callable<Integer> {
    @Parameters(paramLabel = "COURSE", description = "the course file (stasis-course/1 JSON) or a course PDF")
    Path courseFile;

    @Option(names = "--json", description = "print the stasis-course-report/1 JSON object instead of text")
    boolean json;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT.pdf", description = "write the course PDF (the course "
            + "file is embedded in it)")
    Path output;

    @Mixin
    PdfLayoutOptions layout;

    @Mixin
    RulesOption rules;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        // the bytes read once: assessed here and, for the PDF, embedded as the record
        byte[] courseJson = Inputs.caseBytes(courseFile, spec.commandLine().getErr());
        CourseReport report = CourseAssessor.assess(Inputs.parseCourse(courseFile, courseJson),
                Inputs.ruleSet(rules.dir()));
        PrintWriter out = spec.commandLine().getOut();
        if (output != null) {
            OutputFiles.write(output, CoursePdf.render(report, layout.options(), WallClock.now(),
                    courseJson));
            out.println("wrote " + output);
        } else {
            out.print(json ? CourseJson.render(report) : CourseText.render(report));
        }
        out.flush();
        return ExitCode.DONE;
    }
}
