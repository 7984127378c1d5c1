package org.stasissheet.interop;

import ca.uhn.hl7v2.DefaultHapiContext;
import ca.uhn.hl7v2.HL7Exception;
import ca.uhn.hl7v2.HapiContext;
import ca.uhn.hl7v2.model.DataTypeException;
import ca.uhn.hl7v2.model.Message;
import ca.uhn.hl7v2.model.Type;
import ca.uhn.hl7v2.model.v251.datatype.CE;
import ca.uhn.hl7v2.model.v251.datatype.CX;
import ca.uhn.hl7v2.model.v251.datatype.IS;
import ca.uhn.hl7v2.model.v251.datatype.NM;
import ca.uhn.hl7v2.model.v251.datatype.SN;
import ca.uhn.hl7v2.model.v251.datatype.TS;
import ca.uhn.hl7v2.model.v251.group.ORU_R01_OBSERVATION;
import ca.uhn.hl7v2.model.v251.group.ORU_R01_ORDER_OBSERVATION;
import ca.uhn.hl7v2.model.v251.group.ORU_R01_PATIENT_RESULT;
import ca.uhn.hl7v2.model.v251.message.ORU_R01;
import ca.uhn.hl7v2.model.v251.segment.OBX;
import ca.uhn.hl7v2.parser.CanonicalModelClassFactory;
import ca.uhn.hl7v2.validation.impl.ValidationContextFactory;
import java.io.IOException;
import java.math.BigDecimal;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.stasissheet.labs.CodedResult;
import org.stasissheet.labs.CodedResults;
import org.stasissheet.labs.LabImport;
import org.stasissheet.measure.LoincCode;

/**
 * An HL7 v2 ORU^R01 result message to an import, parsed by the HAPI HL7 v2 library into the 2.5.1 structures
 * (older 2.x messages read into the same model). One patient only; each OBX with a LOINC code (coding system
 * {@code LN}, first or alternate identifier) or a local name becomes one result.
 */
final class Hl7Results {
    private Hl7Results() {
    }

    /** OBX-11 result statuses that are results: final, corrected, preliminary, results entered (HL7 table 0085). */
    private static final Set<String> USABLE = Set.of("F", "C", "P", "R", "A", "S");

    static LabImport read(String text) {
        String message = text.strip().replace("\r\n", "\r").replace('\n', '\r');
        Message parsed;
        try (HapiContext context = new DefaultHapiContext()) {
            context.setValidationContext(ValidationContextFactory.noValidation());
            context.setModelClassFactory(new CanonicalModelClassFactory("2.5.1"));
            parsed = context.getPipeParser().parse(message);
        } catch (HL7Exception e) {
            throw new ReportRefused("$: not a readable HL7 v2 message: " + e.getMessage());
        } catch (IOException e) {
            throw new ReportRefused("$: the HL7 v2 parser could not be closed: " + e.getMessage());
        }
        if (!(parsed instanceof ORU_R01 oru)) {
            throw new ReportRefused("MSH-9: the message is " + parsed.getName()
                    + ", not a result message (ORU^R01)");
        }
        try {
            return read(oru);
        } catch (HL7Exception e) {
            throw new ReportRefused("$: the ORU^R01 message could not be taken apart: " + e.getMessage());
        }
    }

    private static LabImport read(ORU_R01 oru) throws HL7Exception {
        Set<String> patients = new LinkedHashSet<>();
        List<CodedResult> results = new ArrayList<>();
        int obxNumber = 0;
        for (ORU_R01_PATIENT_RESULT patientResult : oru.getPATIENT_RESULTAll()) {
            CX[] ids = patientResult.getPATIENT().getPID().getPatientIdentifierList();
            patients.add(java.util.Arrays.stream(ids).map(cx -> cx.getIDNumber().getValue() + "^"
                    + cx.getAssigningAuthority().getNamespaceID().getValue()).collect(Collectors.joining("~")));
            for (ORU_R01_ORDER_OBSERVATION order : patientResult.getORDER_OBSERVATIONAll()) {
                TS orderTime = order.getOBR().getObservationDateTime();
                for (ORU_R01_OBSERVATION observation : order.getOBSERVATIONAll()) {
                    obxNumber++;
                    results.add(result(observation.getOBX(), obxNumber, orderTime));
                }
            }
        }
        if (patients.size() > 1) {
            throw new ReportRefused("PID-3: the message holds results of " + patients.size()
                    + " different patients; import one patient's results at a time");
        }
        if (results.isEmpty()) {
            throw new ReportRefused("OBX: the message holds no result segment");
        }
        return CodedResults.read(LabImport.Source.HL7_V2, results);
    }

    private static CodedResult result(OBX obx, int number, TS orderTime) throws HL7Exception {
        String where = "OBX " + number;
        CE id = obx.getObservationIdentifier();
        Optional<String> loinc = LoincCode.HL7_SYSTEM.equals(id.getNameOfCodingSystem().getValue())
                ? Optional.ofNullable(id.getIdentifier().getValue())
                : LoincCode.HL7_SYSTEM.equals(id.getNameOfAlternateCodingSystem().getValue())
                ? Optional.ofNullable(id.getAlternateIdentifier().getValue()) : Optional.empty();
        String label = firstNonBlank(id.getText().getValue(), id.getAlternateText().getValue(),
                id.getIdentifier().getValue());
        Optional<BigDecimal> value = Optional.empty();
        String comparator = "";
        String refused = "";
        String valueText = "";
        if (obx.getObservationValueReps() > 0) {
            Type data = obx.getObservationValue(0).getData();
            valueText = data.encode();
            if (data instanceof NM nm) {
                value = number(nm.getValue());
            } else if (data instanceof SN sn) {
                comparator = orEmpty(sn.getComparator().getValue());
                value = number(sn.getNum1().getValue());
            } else {
                value = number(valueText);
            }
            if (value.isEmpty() && !valueText.isBlank()) {
                refused = "the value '" + valueText + "' is not a number";
            }
        }
        String status = orEmpty(obx.getObservationResultStatus().getValue());
        if (!status.isEmpty() && !USABLE.contains(status)) {
            refused = "result status '" + status + "' (OBX-11) is not a result to use";
        }
        CE units = obx.getUnits();
        String unitSystem = orEmpty(units.getNameOfCodingSystem().getValue());
        String unitCode = unitSystem.equalsIgnoreCase("UCUM") ? orEmpty(units.getIdentifier().getValue()) : "";
        String unitText = firstNonBlank(units.getIdentifier().getValue(), units.getText().getValue());
        String flag = java.util.Arrays.stream(obx.getAbnormalFlags()).map(IS::getValue).filter(v -> v != null)
                .collect(Collectors.joining(" "));
        String range = orEmpty(obx.getReferencesRange().getValue());
        TS when = obx.getDateTimeOfTheObservation().getTime().getValue() != null
                ? obx.getDateTimeOfTheObservation() : orderTime;
        Optional<OffsetDateTime> at = time(when);
        String text = (label + " " + valueText + " " + unitText + " " + flag).strip().replaceAll("\\s+", " ");
        return new CodedResult(where, text, loinc.filter(s -> !s.isBlank()), label, value, comparator, unitCode,
                unitText, flag, range, refused, at.map(OffsetDateTime::toInstant), at.map(FhirWorksheetExport.SECONDS::format));
    }

    private static Optional<BigDecimal> number(String s) {
        if (s == null || s.isBlank()) {
            return Optional.empty();
        }
        try {
            return Optional.of(new BigDecimal(s.strip()));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    private static Optional<OffsetDateTime> time(TS ts) {
        try {
            if (ts.getTime().getValue() == null) {
                return Optional.empty();
            }
            Calendar c = ts.getTime().getValueAsCalendar();
            Instant instant = c.toInstant();
            return Optional.of(OffsetDateTime.ofInstant(instant, c.getTimeZone().toZoneId()));
        } catch (DataTypeException e) {
            return Optional.empty();
        }
    }

    private static String firstNonBlank(String... values) {
        for (String v : values) {
            if (v != null && !v.isBlank()) {
                return v;
            }
        }
        return "";
    }

    private static String orEmpty(String s) {
        return s == null ? "" : s;
    }
}
