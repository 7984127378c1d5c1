package org.stasissheet.interop;

import java.math.BigDecimal;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.UUID;
import java.util.stream.Collectors;
import org.hl7.fhir.r4.model.Attachment;
import org.hl7.fhir.r4.model.Bundle;
import org.hl7.fhir.r4.model.CodeableConcept;
import org.hl7.fhir.r4.model.Coding;
import org.hl7.fhir.r4.model.DateTimeType;
import org.hl7.fhir.r4.model.Device;
import org.hl7.fhir.r4.model.DiagnosticReport;
import org.hl7.fhir.r4.model.Identifier;
import org.hl7.fhir.r4.model.Observation;
import org.hl7.fhir.r4.model.Provenance;
import org.hl7.fhir.r4.model.Quantity;
import org.hl7.fhir.r4.model.Reference;
import org.hl7.fhir.r4.model.Resource;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.LoincCode;
import org.stasissheet.report.VerdictWords;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.Worksheet;

/**
 * The assessment as a FHIR R4 Bundle (type collection) for the patient record: a DiagnosticReport (status final,
 * the worksheet PDF as {@code presentedForm}, the conclusion in plain words), one Observation per verdict, one per
 * input value it used (LOINC-coded, UCUM units), the tool as a Device, and a Provenance naming the rule set and its
 * SHA-256. Built with HAPI's model classes and written by HAPI's JSON parser.
 */
public final class FhirWorksheetExport {
    private FhirWorksheetExport() {
    }

    static final String UCUM = "http://unitsofmeasure.org";
    /** Where a rule-set hash is an identifier: RFC 3986 says a URN names the value itself. */
    static final String URI_SYSTEM = "urn:ietf:rfc:3986";

    /**
     * @param subject a FHIR reference to the patient in the receiving system ("Patient/123"), when known; the
     *                case's own label is never written
     */
    public static String bundle(Worksheet sheet, byte[] pdf, OffsetDateTime now, Optional<String> subject,
                                String toolVersion) {
        Objects.requireNonNull(sheet, "sheet");
        Objects.requireNonNull(pdf, "pdf");
        Date issued = Date.from(now.toInstant());
        Optional<Reference> patient = subject.map(Reference::new);

        Bundle bundle = new Bundle();
        bundle.setType(Bundle.BundleType.COLLECTION);
        bundle.setTimestamp(issued);

        Device device = new Device();
        device.addDeviceName().setName("Stasis Sheet").setType(Device.DeviceNameType.USERFRIENDLYNAME);
        device.addVersion().setValue(toolVersion);
        String deviceUrl = add(bundle, device);

        List<String> inputUrls = new ArrayList<>();
        sheet.source().patient().height().ifPresent(m -> inputUrls.add(add(bundle, input(m, "", patient, sheet))));
        sheet.source().patient().weight().ifPresent(m -> inputUrls.add(add(bundle, input(m, "", patient, sheet))));
        sheet.source().labs().values().values().forEach(m -> inputUrls.add(add(bundle, input(m, "", patient, sheet))));
        sheet.source().baseline().values().values().forEach(m -> inputUrls.add(add(bundle,
                input(m, "baseline, before therapy: ", patient, sheet))));

        List<String> verdictUrls = List.of(
                add(bundle, verdict("Hyperviscosity syndrome (Stasis Sheet verdict)",
                        VerdictWords.hyperviscosity(sheet.hyperviscosity()), patient, inputUrls, sheet, issued)),
                add(bundle, verdict("Leukostasis (Stasis Sheet verdict, Novotny grading)",
                        VerdictWords.leukostasis(sheet.leukostasis()), patient, inputUrls, sheet, issued)),
                add(bundle, verdict("Tumor lysis, Cairo-Bishop (Stasis Sheet verdict)",
                        VerdictWords.tumorLysis(sheet.tumorLysis()), patient, inputUrls, sheet, issued)));

        DiagnosticReport report = new DiagnosticReport();
        report.setStatus(DiagnosticReport.DiagnosticReportStatus.FINAL);
        report.setCode(new CodeableConcept().setText("Hyperviscosity and leukostasis worksheet (decision support)"));
        patient.ifPresent(report::setSubject);
        sheet.source().assessedAt().ifPresent(t -> report.setEffective(dateTime(t)));
        report.setIssued(issued);
        verdictUrls.forEach(url -> report.addResult(new Reference(url)));
        report.setConclusion(conclusion(sheet));
        report.addPresentedForm(new Attachment().setContentType("application/pdf").setData(pdf)
                .setTitle("Stasis Sheet worksheet").setCreationElement(dateTime(now)));
        String reportUrl = add(bundle, report);

        Provenance provenance = new Provenance();
        provenance.addTarget(new Reference(reportUrl));
        verdictUrls.forEach(url -> provenance.addTarget(new Reference(url)));
        provenance.setRecorded(issued);
        provenance.addAgent().setWho(new Reference(deviceUrl).setDisplay("Stasis Sheet " + toolVersion));
        var rules = sheet.ruleSet();
        provenance.addEntity().setRole(Provenance.ProvenanceEntityRole.SOURCE)
                .setWhat(new Reference().setIdentifier(new Identifier().setSystem(URI_SYSTEM)
                                .setValue("urn:sha256:" + rules.sha256()))
                        .setDisplay("rule set " + rules.name() + " " + rules.version() + " (SHA-256 " + rules.sha256()
                                + (rules.local() ? ", a local protocol" : ", as shipped") + ")"));
        add(bundle, provenance);
        return Fhir.json().setPrettyPrint(true).encodeResourceToString(bundle) + "\n";
    }

    /** Verdicts, the urgent flags, the rule set and the standing caution, in words; never reassurance alone. */
    static String conclusion(Worksheet sheet) {
        StringBuilder b = new StringBuilder("Decision support: ")
                .append(VerdictWords.hyperviscosity(sheet.hyperviscosity())).append("; ")
                .append(VerdictWords.leukostasis(sheet.leukostasis())).append("; ")
                .append(VerdictWords.tumorLysis(sheet.tumorLysis())).append('.');
        for (Level level : List.of(Level.ACT_NOW, Level.REVIEW)) {
            List<String> titles = sheet.flags().stream().filter(f -> f.level() == level).map(Flag::title).toList();
            if (!titles.isEmpty()) {
                b.append(' ').append(level.word()).append(": ").append(String.join("; ", titles)).append('.');
            }
        }
        b.append(" Rule set ").append(sheet.ruleSet().name()).append(' ').append(sheet.ruleSet().version())
                .append(sheet.ruleSet().local() ? " (local protocol)." : ".");
        b.append(' ').append(Cautions.STANDING.stream().collect(Collectors.joining(" ")));
        return b.toString();
    }

    private static Observation input(Measurement m, String prefix, Optional<Reference> patient, Worksheet sheet) {
        Observation o = new Observation();
        o.setStatus(Observation.ObservationStatus.FINAL);
        CodeableConcept code = new CodeableConcept().setText(prefix + m.analyte().label());
        if (prefix.isEmpty()) {
            m.analyte().loincCodes().stream().findFirst().ifPresent(l ->
                    code.addCoding(new Coding(LoincCode.FHIR_SYSTEM, l.code(), l.name())));
        }
        o.setCode(code);
        patient.ifPresent(o::setSubject);
        sheet.source().assessedAt().filter(t -> prefix.isEmpty()).ifPresent(t -> o.setEffective(dateTime(t)));
        o.setValue(new Quantity().setValue(new BigDecimal(org.stasissheet.measure.Numbers.plain(m.entered().value())))
                .setUnit(m.unitOption().display()).setSystem(UCUM).setCode(m.entered().unit()));
        if (m.analyte() == Analyte.SERUM_VISCOSITY) {
            o.addNote().setText("Compared on the scale the laboratory reported (cP or relative to water)."
                    + m.temperature().map(t -> " Measured at " + org.stasissheet.measure.Numbers.plain(t.value())
                    + " °C.").orElse(" Measuring temperature not recorded."));
        }
        return o;
    }

    private static Observation verdict(String what, String words, Optional<Reference> patient, List<String> inputs,
                                       Worksheet sheet, Date issued) {
        Observation o = new Observation();
        o.setStatus(Observation.ObservationStatus.FINAL);
        o.setCode(new CodeableConcept().setText(what));
        patient.ifPresent(o::setSubject);
        sheet.source().assessedAt().ifPresent(t -> o.setEffective(dateTime(t)));
        o.setIssued(issued);
        o.setValue(new org.hl7.fhir.r4.model.StringType(words));
        inputs.forEach(url -> o.addDerivedFrom(new Reference(url)));
        o.addNote().setText(Cautions.SHORT);
        return o;
    }

    /** Seconds always written: FHIR dateTime has no minute precision ("23:15+01:00" is refused). */
    static final java.time.format.DateTimeFormatter SECONDS =
            java.time.format.DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ssXXX");

    private static DateTimeType dateTime(OffsetDateTime t) {
        return new DateTimeType(SECONDS.format(t));
    }

    private static String add(Bundle bundle, Resource resource) {
        String url = "urn:uuid:" + UUID.randomUUID();
        bundle.addEntry().setFullUrl(url).setResource(resource);
        return url;
    }
}
