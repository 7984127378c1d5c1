package org.stasissheet.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Quantity;

class CaseWriterTest {

    private static Case read(String json) {
        return assertInstanceOf(CaseReader.Accepted.class,
                CaseReader.read(json.getBytes(StandardCharsets.UTF_8))).c();
    }

    @Test
    @DisplayName("writes the contract's key order, numbers and units as entered, and omits absent values")
    void goldenOutput() {
        String input = """
                {"extra": {"b": 1, "a": [1.50, "x"]}, "assessor": "Invented night resident",
                 "assessedAt": "2026-03-05T02:40:00+01:00",
                 "plan": {"transfusionPlanned": false},
                 "findings": {"seizure": false, "retinopathy": "venous-dilation", "neurologicalGrade": 1},
                 "labs": {"wbc": {"value": 7.2, "unit": "10*9/L"}, "hematocrit": {"value": 29, "unit": "%"},
                          "serumViscosity": {"unit": "cP", "value": 5.6, "temperature": {"value": 37.0, "unit": "Cel"}}},
                 "condition": {"paraprotein": "IgM"},
                 "patient": {"weight": {"value": 58, "unit": "kg"}, "sex": "female", "label": "Demo \\"T\\""},
                 "format": "stasis-case/1"}
                """;
        String expected = """
                {
                  "format": "stasis-case/1",
                  "patient": {
                    "label": "Demo \\"T\\"",
                    "sex": "female",
                    "weight": {"value": 58, "unit": "kg"}
                  },
                  "condition": {
                    "paraprotein": "IgM",
                    "leukemia": "none",
                    "monocytic": false,
                    "cryoglobulin": "unknown"
                  },
                  "labs": {
                    "serumViscosity": {"value": 5.6, "unit": "cP", "temperature": {"value": 37, "unit": "Cel"}},
                    "wbc": {"value": 7.2, "unit": "10*9/L"},
                    "hematocrit": {"value": 29, "unit": "%"}
                  },
                  "baseline": {},
                  "findings": {
                    "neurologicalGrade": 1,
                    "retinopathy": "venous-dilation",
                    "seizure": false
                  },
                  "plan": {
                    "rituximabPlanned": false,
                    "transfusionPlanned": false
                  },
                  "assessedAt": "2026-03-05T02:40:00+01:00",
                  "assessor": "Invented night resident",
                  "extra": {"b":1,"a":[1.50,"x"]}
                }
                """;
        assertEquals(expected, CaseWriter.write(read(input)));
    }

    @Test
    @DisplayName("a value is written as its exact double, with no float artefacts and no exponent")
    void numbersAsEntered() {
        Labs labs = Labs.NONE
                .with(Measurement.of(Analyte.SERUM_VISCOSITY, 5.6, "cP"))
                .with(Measurement.of(Analyte.WBC, 150000, "/uL"))
                .with(Measurement.of(Analyte.FIBRINOGEN, 0.1 + 0.2, "g/L"))
                .with(new Measurement(Analyte.IGM, new Quantity(0.0000015, "g/L"), Optional.empty()));
        Case c = new Case(Patient.UNKNOWN, Condition.UNKNOWN, labs, Labs.NONE, Findings.NOT_ASSESSED, Plan.NOTHING,
                Optional.empty(), "", "{}");
        String out = CaseWriter.write(c);
        assertTrue(out.contains("\"serumViscosity\": {\"value\": 5.6, \"unit\": \"cP\"}"), out);
        assertTrue(out.contains("\"wbc\": {\"value\": 150000, \"unit\": \"/uL\"}"), out);
        // 0.1 + 0.2 is 0.30000000000000004 in IEEE 754 doubles: written exactly, so it reads back equal
        assertTrue(out.contains("\"value\": 0.30000000000000004,"), out);
        assertTrue(out.contains("\"value\": 0.0000015,"), out);
        assertEquals(c, read(out));
    }

    @Test
    @DisplayName("texts with quotes, backslashes, control characters and non-ASCII survive a round trip")
    void escaping() {
        Patient p = new Patient("Demo \"A\" \\ ward 7\n\t\u0001 Ærø µ 🙂", Optional.empty(), Optional.empty(),
                Optional.empty(), Optional.empty());
        Case c = new Case(p, Condition.UNKNOWN, Labs.NONE, Labs.NONE, Findings.NOT_ASSESSED, Plan.NOTHING,
                Optional.empty(), "Invented night resident", "{}");
        assertEquals(c, read(CaseWriter.write(c)));
    }
}
