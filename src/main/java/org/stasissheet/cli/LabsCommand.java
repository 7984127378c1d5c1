package org.stasissheet.cli;

import org.stasissheet.load.InvalidInputException;
import org.stasissheet.load.Inputs;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.stasissheet.interop.LabReports;
import org.stasissheet.interop.ReportRefused;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.labs.LabImport;
import org.stasissheet.labs.LabLine;
import org.stasissheet.measure.Numbers;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code labs import FILE -o CASE.json [--into CASE.json]}: lab results from a report into a case file. */
@Command(name = "labs",
        description = "Lab results from a laboratory report into a case.",
        subcommands = LabsCommand.Import.class)
final class LabsCommand extends CommandGroup {

    @Command(name = "import",
            description = {"Read lab results and write them into a case file. FILE is report text as copied from a "
                    + "result screen, a FHIR R4 Bundle (JSON) or an HL7 v2 ORU^R01 message; the kind is told from "
                    + "the content.",
                "A line that reads two ways, or names a value that cannot be read, stops the import (exit 2) and "
                    + "nothing is written; lines naming nothing the worksheet uses are listed and passed over.",
                "Decision support only: check every imported value against the report."})
    static final class Import implements Callable<Integer> {
        @Parameters(paramLabel = "FILE", description = "the lab report: text, FHIR R4 Bundle JSON or HL7 v2")
        Path report;

        @Option(names = {"-o", "--output"}, required = true, paramLabel = "CASE.json",
                description = "the case file to write (atomically)")
        Path output;

        @Option(names = "--into", paramLabel = "CASE.json",
                description = "start from this case (its values of the same analytes are replaced); "
                        + "without it, a new case holding only the lab values")
        Path into;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            Case base = into == null ? Case.EMPTY : Inputs.readCase(into, spec.commandLine().getErr());
            LabImport read;
            try {
                read = LabReports.read(Inputs.readLimited(report, LabReports.MAX_BYTES));
            } catch (ReportRefused e) {
                List<String> lines = new ArrayList<>();
                lines.add(report + ": the lab report was not read; nothing was written.");
                e.problems().forEach(p -> lines.add("  " + p));
                throw new InvalidInputException(lines);
            }
            if (read.needsAttention()) {
                List<String> lines = new ArrayList<>();
                lines.add(report + " (" + read.source().label() + "): " + read.problems().size()
                        + " line(s) need a decision; nothing was written.");
                read.problems().forEach(p -> lines.add("  " + p));
                throw new InvalidInputException(lines);
            }
            Case merged = read.applyTo(base);
            byte[] json = CaseWriter.write(merged).getBytes(StandardCharsets.UTF_8);
            // the reader has the last word: a case it would refuse is never written
            Inputs.parseCase(output, json);
            OutputFiles.write(output, json);
            summary(read, base);
            return ExitCode.DONE;
        }

        private void summary(LabImport read, Case base) {
            PrintWriter out = spec.commandLine().getOut();
            out.println("read " + report + " as " + read.source().label() + ": " + read.taken().size()
                    + " value(s) taken, " + read.left().size() + " line(s) not imported");
            for (LabLine.Taken t : read.taken()) {
                out.println("  " + t.where() + ": " + t.analyte().key() + " = "
                        + Numbers.plain(t.value().entered().value()) + " " + t.value().entered().unit()
                        + (t.flag().isEmpty() ? "" : "  [" + t.flag() + "]")
                        + (t.note().isEmpty() ? "" : "  (" + t.note() + ")"));
            }
            for (LabLine.Left l : read.left()) {
                out.println("  not imported, " + l.where() + ": " + l.reason());
            }
            read.replacements(base).forEach(r -> out.println("  " + r));
            out.println("wrote " + output + " (check every value against the report; decision support only)");
            out.flush();
        }
    }
}
