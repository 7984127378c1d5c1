package org.stasissheet.cli;

import org.stasissheet.load.ToolVersion;
import org.stasissheet.load.InvalidInputException;
import org.stasissheet.load.Inputs;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.stasissheet.interop.FhirWorksheetExport;
import org.stasissheet.load.WallClock;
import org.stasissheet.report.WorksheetPdf;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code export fhir CASE -o OUT.json}: the assessment as a FHIR R4 Bundle for the patient record. */
@Command(name = "export",
        description = "Write the assessment in a standard form for the patient record.",
        subcommands = ExportCommand.Fhir.class)
final class ExportCommand extends CommandGroup {

    @Command(name = "fhir",
            description = {"Write a FHIR R4 Bundle (collection): a DiagnosticReport (final, the worksheet PDF as "
                    + "presentedForm, the conclusion in words), an Observation per verdict and per input value, and a "
                    + "Provenance naming the rule set and its SHA-256.",
                "Decision support only: it supports, and never replaces, clinical judgement, local protocols and "
                    + "licensed practice."})
    static final class Fhir implements Callable<Integer> {
        @Parameters(paramLabel = "CASE", description = "the case file (stasis-case/1 JSON) or a worksheet PDF")
        Path caseFile;

        @Option(names = {"-o", "--output"}, required = true, paramLabel = "OUT.json",
                description = "the bundle to write (atomically)")
        Path output;

        @Option(names = "--subject", paramLabel = "REFERENCE",
                description = "the patient in the receiving system, e.g. Patient/123; without it the resources "
                        + "name no subject (the case's label is never written into the bundle)")
        String subject;

        @Mixin
        PdfLayoutOptions layout;

        @Mixin
        RulesOption rules;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            if (subject != null && !subject.matches("[A-Za-z]+/[A-Za-z0-9\\-.]{1,64}")) {
                throw new InvalidInputException("--subject: '" + subject + "' is not a FHIR reference such as "
                        + "Patient/123");
            }
            Inputs.LoadedCase loaded = Inputs.loadCase(caseFile, spec.commandLine().getErr());
            Worksheet sheet = Assessor.assess(loaded.value(), Inputs.ruleSet(rules.dir()));
            OffsetDateTime now = WallClock.now();
            byte[] pdf = WorksheetPdf.render(sheet, layout.options(), now, loaded.json());
            String bundle = FhirWorksheetExport.bundle(sheet, pdf, now, Optional.ofNullable(subject),
                    ToolVersion.get());
            OutputFiles.write(output, bundle.getBytes(StandardCharsets.UTF_8));
            spec.commandLine().getOut().println("wrote " + output);
            spec.commandLine().getOut().flush();
            return ExitCode.DONE;
        }
    }
}
