package org.stasissheet.interop;

import ca.uhn.fhir.parser.DataFormatException;
import java.math.BigDecimal;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.hl7.fhir.r4.model.Bundle;
import org.hl7.fhir.r4.model.CodeableConcept;
import org.hl7.fhir.r4.model.Coding;
import org.hl7.fhir.r4.model.DateTimeType;
import org.hl7.fhir.r4.model.Observation;
import org.hl7.fhir.r4.model.Quantity;
import org.hl7.fhir.r4.model.Reference;
import org.hl7.fhir.r4.model.Resource;
import org.stasissheet.labs.CodedResult;
import org.stasissheet.labs.CodedResults;
import org.stasissheet.labs.LabImport;
import org.stasissheet.measure.LoincCode;

/**
 * A FHIR R4 Bundle (collection, searchset or transaction) of Observations to an import: one patient only, the
 * latest value per analyte, units from {@code valueQuantity}. Resources other than Observations are passed over.
 */
final class FhirLabBundle {
    private FhirLabBundle() {
    }

    private static final Set<Bundle.BundleType> READ = Set.of(Bundle.BundleType.COLLECTION,
            Bundle.BundleType.SEARCHSET, Bundle.BundleType.TRANSACTION);
    private static final Set<Observation.ObservationStatus> USABLE = Set.of(Observation.ObservationStatus.FINAL,
            Observation.ObservationStatus.AMENDED, Observation.ObservationStatus.CORRECTED,
            Observation.ObservationStatus.PRELIMINARY);

    static LabImport read(String json) {
        Bundle bundle;
        try {
            bundle = Fhir.json().parseResource(Bundle.class, json);
        } catch (DataFormatException | ClassCastException e) {
            throw new ReportRefused("$: not a readable FHIR R4 Bundle: " + e.getMessage());
        }
        if (!READ.contains(bundle.getType())) {
            throw new ReportRefused("Bundle.type: '" + (bundle.getType() == null ? "(none)" : bundle.getType().toCode())
                    + "' is not read; a collection, searchset or transaction of Observations is");
        }
        List<Observation> observations = new ArrayList<>();
        for (Bundle.BundleEntryComponent entry : bundle.getEntry()) {
            Resource r = entry.getResource();
            if (r instanceof Observation o) {
                observations.add(o);
            }
        }
        if (observations.isEmpty()) {
            throw new ReportRefused("Bundle.entry: the bundle holds no Observation");
        }
        Set<String> subjects = new LinkedHashSet<>();
        for (Observation o : observations) {
            subjects.add(subjectOf(o.getSubject()));
        }
        if (subjects.size() > 1) {
            throw new ReportRefused("Bundle.entry: the Observations are about more than one subject ("
                    + subjects.size() + " different subject references); import one patient's results at a time");
        }
        List<CodedResult> results = new ArrayList<>();
        for (int i = 0; i < observations.size(); i++) {
            results.add(result(observations.get(i), i));
        }
        return CodedResults.read(LabImport.Source.FHIR_R4, results);
    }

    private static String subjectOf(Reference subject) {
        if (subject == null || subject.isEmpty()) {
            return "(none)";
        }
        if (subject.hasReference()) {
            return subject.getReference();
        }
        if (subject.hasIdentifier()) {
            return subject.getIdentifier().getSystem() + "|" + subject.getIdentifier().getValue();
        }
        return "(display only) " + subject.getDisplay();
    }

    private static CodedResult result(Observation o, int index) {
        String id = o.hasIdElement() ? o.getIdElement().getValue() : null;
        String where = id == null || id.isBlank() ? "Observation #" + (index + 1)
                : id.startsWith("urn:") ? id : "Observation/" + o.getIdElement().getIdPart();
        CodeableConcept code = o.getCode();
        Optional<String> loinc = code.getCoding().stream()
                .filter(c -> LoincCode.FHIR_SYSTEM.equals(c.getSystem()) && c.hasCode())
                .map(Coding::getCode).findFirst();
        String label = code.hasText() ? code.getText()
                : code.getCoding().stream().filter(Coding::hasDisplay).map(Coding::getDisplay).findFirst().orElse("");
        String refused = o.getStatus() == null || !USABLE.contains(o.getStatus())
                ? "status '" + (o.getStatus() == null ? "(none)" : o.getStatus().toCode()) + "' is not a result to use"
                : "";
        Optional<BigDecimal> value = Optional.empty();
        String comparator = "";
        String unitCode = "";
        String unitText = "";
        if (o.hasValueQuantity()) {
            Quantity q = o.getValueQuantity();
            value = Optional.ofNullable(q.getValue());
            comparator = q.hasComparator() ? q.getComparator().toCode() : "";
            unitCode = q.hasCode() && "http://unitsofmeasure.org".equals(q.getSystem()) ? q.getCode() : "";
            unitText = q.hasUnit() ? q.getUnit() : (q.hasCode() ? q.getCode() : "");
        } else if (o.hasValue()) {
            refused = refused.isEmpty() ? "the value is a " + o.getValue().fhirType() + ", not a quantity" : refused;
        }
        String flag = o.getInterpretation().stream().flatMap(c -> c.getCoding().stream()).map(Coding::getCode)
                .filter(c -> c != null && !c.isBlank()).findFirst().orElse("");
        String range = o.getReferenceRange().stream().findFirst().map(FhirLabBundle::range).orElse("");
        DateTimeType when = o.hasEffectiveDateTimeType() ? o.getEffectiveDateTimeType()
                : o.hasEffectivePeriod() && o.getEffectivePeriod().hasStart() ? o.getEffectivePeriod().getStartElement()
                : null;
        Optional<Instant> at = when == null || when.getValue() == null ? Optional.empty()
                : Optional.of(when.getValue().toInstant());
        Optional<String> time = when == null ? Optional.empty() : Optional.ofNullable(when.getValueAsString());
        String text = (label.isEmpty() ? loinc.orElse("?") : label) + " "
                + value.map(BigDecimal::toPlainString).orElse("(no value)") + " " + unitText;
        return new CodedResult(where, text.strip(), loinc, label, value, comparator, unitCode, unitText, flag, range,
                refused, at, time);
    }

    private static String range(Observation.ObservationReferenceRangeComponent r) {
        String low = r.hasLow() && r.getLow().hasValue() ? r.getLow().getValue().toPlainString() : "";
        String high = r.hasHigh() && r.getHigh().hasValue() ? r.getHigh().getValue().toPlainString() : "";
        if (low.isEmpty() && high.isEmpty()) {
            return r.hasText() ? r.getText() : "";
        }
        return low.isEmpty() ? "< " + high : high.isEmpty() ? "> " + low : low + "-" + high;
    }
}
