package org.stasissheet.interop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import ca.uhn.fhir.context.FhirContext;
import ca.uhn.fhir.context.support.DefaultProfileValidationSupport;
import ca.uhn.fhir.validation.FhirValidator;
import ca.uhn.fhir.validation.ResultSeverityEnum;
import ca.uhn.fhir.validation.SingleValidationMessage;
import ca.uhn.fhir.validation.ValidationResult;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Optional;
import org.hl7.fhir.common.hapi.validation.support.CommonCodeSystemsTerminologyService;
import org.hl7.fhir.common.hapi.validation.support.InMemoryTerminologyServerValidationSupport;
import org.hl7.fhir.common.hapi.validation.support.SnapshotGeneratingValidationSupport;
import org.hl7.fhir.common.hapi.validation.support.ValidationSupportChain;
import org.hl7.fhir.common.hapi.validation.validator.FhirInstanceValidator;
import org.hl7.fhir.r4.model.Bundle;
import org.hl7.fhir.r4.model.DiagnosticReport;
import org.hl7.fhir.r4.model.Provenance;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.load.Inputs;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.report.PdfOptions;
import org.stasissheet.report.Paper;
import org.stasissheet.report.WorksheetPdf;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * The exported bundle checked by an outside judge: the HAPI FHIR instance validator with the FHIR R4 core
 * definitions (hapi-fhir-validation-resources-r4 8.6.5) and HAPI's UCUM and common code-system services. Zero
 * errors for every demo case.
 */
class FhirExportValidationTest {
    private static FhirValidator validator;

    @BeforeAll
    static void validator() {
        FhirContext ctx = FhirContext.forR4();
        ValidationSupportChain chain = new ValidationSupportChain(new DefaultProfileValidationSupport(ctx),
                new CommonCodeSystemsTerminologyService(ctx), new InMemoryTerminologyServerValidationSupport(ctx),
                new SnapshotGeneratingValidationSupport(ctx));
        validator = ctx.newValidator();
        validator.registerValidatorModule(new FhirInstanceValidator(chain));
    }

    static String export(String sample) throws Exception {
        byte[] json = Files.readAllBytes(Path.of("samples", sample));
        Case c = ((CaseReader.Accepted) CaseReader.read(json)).c();
        Worksheet sheet = Assessor.assess(c, Inputs.ruleSet(Optional.empty()));
        OffsetDateTime now = OffsetDateTime.parse("2026-03-06T00:10:00+01:00");
        byte[] pdf = WorksheetPdf.render(sheet, new PdfOptions(Paper.A4, true, "test"), now, json);
        return FhirWorksheetExport.bundle(sheet, pdf, now, Optional.of("Patient/demo-1"), "test");
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"igm-symptomatic.json", "iga-borderline.json", "aml-breathless.json", "cll-extreme.json"})
    @DisplayName("the FHIR R4 validator finds no error in the exported bundle")
    void exportedBundle_validates(String sample) throws Exception {
        String json = export(sample);
        ValidationResult result = validator.validateWithResult(json);
        List<SingleValidationMessage> errors = result.getMessages().stream()
                .filter(m -> m.getSeverity() == ResultSeverityEnum.ERROR || m.getSeverity() == ResultSeverityEnum.FATAL)
                .toList();
        assertEquals(List.of(), errors.stream().map(m -> m.getLocationString() + ": " + m.getMessage()).toList());
    }

    @org.junit.jupiter.api.Test
    @DisplayName("sanity: the same validator does report errors (a report without status, a unit not in UCUM)")
    void validator_reportsErrors() throws Exception {
        String json = export("igm-symptomatic.json")
                .replaceFirst("\"resourceType\": \"DiagnosticReport\",\\s*\"status\": \"final\",",
                        "\"resourceType\": \"DiagnosticReport\",")
                .replace("\"code\": \"g/dL\"", "\"code\": \"grams per decilitre\"");
        ValidationResult result = validator.validateWithResult(json);
        List<String> errors = result.getMessages().stream()
                .filter(m -> m.getSeverity() == ResultSeverityEnum.ERROR).map(SingleValidationMessage::getMessage)
                .toList();
        assertTrue(errors.size() >= 2, errors::toString);
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"igm-symptomatic.json", "aml-breathless.json"})
    @DisplayName("the bundle holds the final report with the PDF, and a provenance naming the rule set hash")
    void exportedBundle_holdsReportPdfAndProvenance(String sample) throws Exception {
        Bundle bundle = FhirContext.forR4().newJsonParser().parseResource(Bundle.class, export(sample));
        DiagnosticReport report = bundle.getEntry().stream().map(Bundle.BundleEntryComponent::getResource)
                .filter(DiagnosticReport.class::isInstance).map(DiagnosticReport.class::cast).findFirst().orElseThrow();
        assertEquals(DiagnosticReport.DiagnosticReportStatus.FINAL, report.getStatus());
        byte[] pdf = report.getPresentedFormFirstRep().getData();
        assertEquals("%PDF", new String(pdf, 0, 4, StandardCharsets.US_ASCII));
        assertTrue(report.getConclusion().contains("never replaces, clinical judgement"), report.getConclusion());
        Provenance provenance = bundle.getEntry().stream().map(Bundle.BundleEntryComponent::getResource)
                .filter(Provenance.class::isInstance).map(Provenance.class::cast).findFirst().orElseThrow();
        String sha = Assessor.assess(Case.EMPTY, Inputs.ruleSet(Optional.empty())).ruleSet().sha256();
        assertEquals("urn:sha256:" + sha, provenance.getEntityFirstRep().getWhat().getIdentifier().getValue());
    }
}
