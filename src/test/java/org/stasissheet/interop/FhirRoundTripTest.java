package org.stasissheet.interop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import ca.uhn.fhir.context.FhirContext;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.hl7.fhir.r4.model.Bundle;
import org.hl7.fhir.r4.model.DateTimeType;
import org.hl7.fhir.r4.model.Observation;
import org.hl7.fhir.r4.model.Quantity;
import org.hl7.fhir.r4.model.Reference;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.Labs;
import org.stasissheet.intake.Measurement;
import org.stasissheet.intake.Patient;
import org.stasissheet.labs.LabImport;
import org.stasissheet.labs.LabLine;
import org.stasissheet.measure.Numbers;

/**
 * Bundles built with HAPI's own FHIR R4 model classes and serialised by HAPI (not by this project's writer) read
 * back to the same lab values. The LOINC codes here are this test's own table, written apart from the catalogue,
 * so a code moved to the wrong analyte in either place fails the test.
 */
class FhirRoundTripTest {
    private static final FhirContext CTX = FhirContext.forR4();

    /** LOINC code per case key (see README, LOINC table; the serum or blood code with mass units first). */
    private static final Map<String, String> LOINC = Map.ofEntries(
            Map.entry("serumViscosity", "3128-6"), Map.entry("igm", "2472-9"), Map.entry("igg", "2465-3"),
            Map.entry("iga", "2458-8"), Map.entry("totalProtein", "2885-2"), Map.entry("wbc", "6690-2"),
            Map.entry("blasts", "26446-5"), Map.entry("hematocrit", "4544-3"), Map.entry("hemoglobin", "718-7"),
            Map.entry("platelets", "777-3"), Map.entry("potassium", "2823-3"), Map.entry("sodium", "2951-2"),
            Map.entry("uricAcid", "3084-1"), Map.entry("phosphate", "2777-1"), Map.entry("calcium", "17861-6"),
            Map.entry("creatinine", "2160-0"), Map.entry("fibrinogen", "3255-7"), Map.entry("pao2", "2703-7"),
            Map.entry("spo2", "59408-5"));

    static Case sample(String name) throws Exception {
        return ((CaseReader.Accepted) CaseReader.read(Files.readAllBytes(Path.of("samples", name)))).c();
    }

    static Observation observation(String loinc, Measurement m, String subject, String time) {
        Observation o = new Observation();
        o.setStatus(Observation.ObservationStatus.FINAL);
        o.getCode().addCoding().setSystem("http://loinc.org").setCode(loinc);
        o.setSubject(new Reference(subject));
        o.setEffective(new DateTimeType(time));
        o.setValue(new Quantity().setValue(new BigDecimal(Numbers.plain(m.entered().value())))
                .setSystem("http://unitsofmeasure.org").setCode(m.entered().unit()));
        return o;
    }

    /** Every lab of the case except the lab's upper limit of normal, which LOINC has no code for. */
    static String bundleOf(Case c, Bundle.BundleType type) {
        Bundle b = new Bundle().setType(type);
        c.labs().values().values().stream().filter(m -> LOINC.containsKey(m.analyte().key())).forEach(m ->
                b.addEntry().setResource(observation(LOINC.get(m.analyte().key()), m, "Patient/demo",
                        "2026-03-05T02:00:00+01:00")));
        return CTX.newJsonParser().encodeResourceToString(b);
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"igm-symptomatic.json", "iga-borderline.json", "aml-breathless.json", "cll-extreme.json"})
    @DisplayName("a HAPI-built bundle of a demo case's labs reads back to the same labs")
    void hapiBuiltBundle_readsBackToTheSameCase(String name) throws Exception {
        Case original = sample(name);
        for (Bundle.BundleType type : new Bundle.BundleType[] {Bundle.BundleType.COLLECTION,
            Bundle.BundleType.SEARCHSET, Bundle.BundleType.TRANSACTION}) {
            LabImport read = LabReports.read(bundleOf(original, type).getBytes(StandardCharsets.UTF_8));
            assertFalse(read.needsAttention(), read.problems()::toString);
            Case emptied = new Case(original.patient(), original.condition(), Labs.NONE, original.baseline(),
                    original.findings(), original.plan(), original.assessedAt(), original.assessor(), "{}");
            Case back = read.applyTo(emptied);
            assertEquals(withoutTemperatureOrLimit(original.labs()), back.labs(), type.toCode());
            // a plain valueQuantity has no measuring temperature: the import says so instead of losing it silently
            read.taken().stream().filter(t -> t.analyte() == org.stasissheet.measure.Analyte.SERUM_VISCOSITY)
                    .forEach(t -> assertTrue(t.note().contains("temperature"), t.note()));
        }
    }

    /** The bundle as HAPI writes it, read by the import. */
    private static LabImport read(Bundle b) {
        return LabReports.read(CTX.newJsonParser().encodeResourceToString(b).getBytes(StandardCharsets.UTF_8));
    }

    private static Labs withoutTemperatureOrLimit(Labs labs) {
        Labs out = labs.without(org.stasissheet.measure.Analyte.CREATININE_UPPER_LIMIT);
        for (Measurement m : out.values().values()) {
            out = out.with(new Measurement(m.analyte(), m.entered(), Optional.empty()));
        }
        return out;
    }

    @Test
    @DisplayName("the latest value per analyte is taken; the earlier one is listed")
    void latestValuePerAnalyte() {
        Measurement older = Measurement.of(org.stasissheet.measure.Analyte.WBC, 150, "10*9/L");
        Measurement newer = Measurement.of(org.stasissheet.measure.Analyte.WBC, 182.4, "10*9/L");
        Bundle b = new Bundle().setType(Bundle.BundleType.SEARCHSET);
        b.addEntry().setResource(observation("6690-2", newer, "Patient/demo", "2026-03-05T23:10:00+01:00"));
        b.addEntry().setResource(observation("26464-8", older, "Patient/demo", "2026-03-05T08:00:00+01:00"));
        LabImport read = read(b);
        assertEquals(1, read.taken().size());
        assertEquals(newer, read.taken().get(0).value());
        assertEquals(Optional.of("2026-03-05T23:10:00+01:00"), read.taken().get(0).time());
        assertTrue(read.left().get(0).reason().contains("earlier"));
    }

    @Test
    @DisplayName("two values at the same latest time are asked, not picked")
    void sameTimeTwoValues_asked() {
        Bundle b = new Bundle().setType(Bundle.BundleType.COLLECTION);
        b.addEntry().setResource(observation("2823-3",
                Measurement.of(org.stasissheet.measure.Analyte.POTASSIUM, 6.8, "mmol/L"), "Patient/demo",
                "2026-03-05T23:10:00+01:00"));
        b.addEntry().setResource(observation("6298-4",
                Measurement.of(org.stasissheet.measure.Analyte.POTASSIUM, 3.9, "mmol/L"), "Patient/demo",
                "2026-03-05T23:10:00+01:00"));
        LabImport read = read(b);
        assertEquals(1, read.questions().size());
        assertEquals(2, read.questions().get(0).options().size());
    }

    @Test
    @DisplayName("a bundle that mixes two patients is refused whole")
    void mixedSubjects_refused() {
        Bundle b = new Bundle().setType(Bundle.BundleType.COLLECTION);
        b.addEntry().setResource(observation("6690-2",
                Measurement.of(org.stasissheet.measure.Analyte.WBC, 182.4, "10*9/L"), "Patient/demo-1",
                "2026-03-05T23:10:00+01:00"));
        b.addEntry().setResource(observation("718-7",
                Measurement.of(org.stasissheet.measure.Analyte.HEMOGLOBIN, 7.4, "g/dL"), "Patient/demo-2",
                "2026-03-05T23:10:00+01:00"));
        ReportRefused refused = assertThrows(ReportRefused.class, () -> read(b));
        assertTrue(refused.problems().get(0).contains("more than one subject"), refused.problems()::toString);
    }

    @Test
    @DisplayName("a value given as a limit (comparator <) is not taken as a measurement")
    void comparator_notTaken() {
        Bundle b = new Bundle().setType(Bundle.BundleType.COLLECTION);
        Observation o = observation("2472-9", Measurement.of(org.stasissheet.measure.Analyte.IGM, 0.2, "g/L"),
                "Patient/demo", "2026-03-05T23:10:00+01:00");
        ((Quantity) o.getValue()).setComparator(Quantity.QuantityComparator.LESS_THAN);
        b.addEntry().setResource(o);
        LabImport read = read(b);
        assertTrue(read.taken().isEmpty());
        LabLine.Left left = read.left().get(0);
        assertEquals(Optional.of(org.stasissheet.measure.Analyte.IGM), left.named());
    }

    @Test
    @DisplayName("patient height and weight coded with LOINC land on the patient, not in labs")
    void bodyMeasures_landOnThePatient() {
        Bundle b = new Bundle().setType(Bundle.BundleType.COLLECTION);
        b.addEntry().setResource(observation("8302-2",
                Measurement.of(org.stasissheet.measure.Analyte.HEIGHT, 181, "cm"), "Patient/demo",
                "2026-03-05T23:10:00+01:00"));
        LabImport read = read(b);
        Patient p = read.applyTo(Case.EMPTY).patient();
        assertEquals(Optional.of(Measurement.of(org.stasissheet.measure.Analyte.HEIGHT, 181, "cm")), p.height());
    }
}
