package org.stasissheet.interop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import ca.uhn.hl7v2.model.v251.datatype.CE;
import ca.uhn.hl7v2.model.v251.datatype.NM;
import ca.uhn.hl7v2.model.v251.message.ORU_R01;
import ca.uhn.hl7v2.model.v251.segment.OBX;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Measurement;
import org.stasissheet.labs.LabImport;
import org.stasissheet.labs.LabLine;
import org.stasissheet.measure.Analyte;

/** HL7 v2 ORU^R01 result messages, parsed by the HAPI HL7 v2 library. */
class Hl7ResultsTest {

    @Test
    @DisplayName("the demo message: LOINC-coded OBX values taken with their UCUM units; others listed with a reason")
    void demoMessage() throws Exception {
        LabImport read = LabReports.read(Files.readAllBytes(Path.of("lab-reports", "aml-night.hl7")));
        assertEquals(LabImport.Source.HL7_V2, read.source());
        // expected values: OBX-5 and OBX-6 of the message itself
        assertEquals(List.of(Measurement.of(Analyte.WBC, 182.4, "10*9/L"), Measurement.of(Analyte.HEMOGLOBIN, 74, "g/L"),
                Measurement.of(Analyte.PLATELETS, 38, "10*9/L"), Measurement.of(Analyte.BLASTS, 78, "%"),
                Measurement.of(Analyte.POTASSIUM, 5.6, "mmol/L"), Measurement.of(Analyte.URIC_ACID, 541, "umol/L"),
                Measurement.of(Analyte.CREATININE, 1.9, "mg/dL"),
                Measurement.of(Analyte.CREATININE_UPPER_LIMIT, 1.2, "mg/dL")),
                read.taken().stream().map(LabLine.Taken::value).toList());
        assertEquals(Optional.of("2026-03-05T22:50:00+01:00"), read.taken().get(0).time());
        assertEquals("H", read.taken().get(0).flag());
        assertTrue(read.left().stream().anyMatch(l -> l.reason().contains("LOINC 1994-3")), "ionised calcium refused");
        assertTrue(read.left().stream().anyMatch(l -> l.reason().contains("not a number")), "text value refused");
    }

    @Test
    @DisplayName("a message built with HAPI's own v2.5.1 model classes reads back")
    void hapiBuiltMessage_readsBack() throws Exception {
        ORU_R01 oru = new ORU_R01();
        // the header by hand: HAPI's initQuickstart would draw a control id from a counter file in the working folder
        var msh = oru.getMSH();
        msh.getFieldSeparator().setValue("|");
        msh.getEncodingCharacters().setValue("^~\\&");
        msh.getMessageType().getMessageCode().setValue("ORU");
        msh.getMessageType().getTriggerEvent().setValue("R01");
        msh.getMessageType().getMessageStructure().setValue("ORU_R01");
        msh.getMessageControlID().setValue("DEMO-1");
        msh.getProcessingID().getProcessingID().setValue("P");
        msh.getVersionID().getVersionID().setValue("2.5.1");
        oru.getPATIENT_RESULT().getPATIENT().getPID().getPatientIdentifierList(0).getIDNumber().setValue("DEMO-1");
        OBX obx = oru.getPATIENT_RESULT().getORDER_OBSERVATION().getOBSERVATION().getOBX();
        obx.getSetIDOBX().setValue("1");
        obx.getValueType().setValue("NM");
        obx.getObservationIdentifier().getIdentifier().setValue("2472-9");
        obx.getObservationIdentifier().getNameOfCodingSystem().setValue("LN");
        NM value = new NM(oru);
        value.setValue("48");
        obx.getObservationValue(0).setData(value);
        CE units = obx.getUnits();
        units.getIdentifier().setValue("g/L");
        units.getNameOfCodingSystem().setValue("UCUM");
        obx.getObservationResultStatus().setValue("F");
        LabImport read = LabReports.read(oru.encode().getBytes(StandardCharsets.UTF_8));
        assertEquals(List.of(Measurement.of(Analyte.IGM, 48, "g/L")),
                read.taken().stream().map(LabLine.Taken::value).toList());
    }

    @Test
    @DisplayName("a message with two patients is refused whole")
    void twoPatients_refused() {
        String message = String.join("\r",
                "MSH|^~\\&|LAB|DEMO|STASIS|DEMO|202603052310||ORU^R01^ORU_R01|1|P|2.5.1",
                "PID|1||DEMO-1^^^DEMO^MR",
                "OBR|1",
                "OBX|1|NM|6690-2^WBC^LN||182.4|10*9/L^^UCUM|||||F",
                "PID|2||DEMO-2^^^DEMO^MR",
                "OBR|1",
                "OBX|1|NM|718-7^Hb^LN||7.4|g/dL^^UCUM|||||F") + "\r";
        ReportRefused refused = assertThrows(ReportRefused.class,
                () -> LabReports.read(message.getBytes(StandardCharsets.UTF_8)));
        assertTrue(refused.problems().get(0).startsWith("PID-3"), refused.problems()::toString);
    }

    @Test
    @DisplayName("another message type is refused, naming MSH-9")
    void notAResultMessage_refused() {
        String message = "MSH|^~\\&|ADT|DEMO|STASIS|DEMO|202603052310||ADT^A01^ADT_A01|1|P|2.5.1\rPID|1||DEMO-1\r";
        ReportRefused refused = assertThrows(ReportRefused.class,
                () -> LabReports.read(message.getBytes(StandardCharsets.UTF_8)));
        assertTrue(refused.problems().get(0).startsWith("MSH-9"), refused.problems()::toString);
    }

    @Test
    @DisplayName("a cancelled result (OBX-11 X) and a local code without a known name are not taken")
    void cancelledAndUnknownLocal_notTaken() {
        String message = String.join("\r",
                "MSH|^~\\&|LAB|DEMO|STASIS|DEMO|202603052310||ORU^R01^ORU_R01|1|P|2.5.1",
                "PID|1||DEMO-1^^^DEMO^MR",
                "OBR|1",
                "OBX|1|NM|6690-2^WBC^LN||182.4|10*9/L^^UCUM|||||X",
                "OBX|2|NM|FERR^Ferritin^L||820|ug/L|||||F",
                "OBX|3|NM|K^Kalium^L||6.8|mmol/L|||||F") + "\r";
        LabImport read = LabReports.read(message.getBytes(StandardCharsets.UTF_8));
        assertEquals(List.of(Measurement.of(Analyte.POTASSIUM, 6.8, "mmol/L")),
                read.taken().stream().map(LabLine.Taken::value).toList());
        assertEquals(2, read.left().size());
    }
}
