package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class FormJsonTest {
    private static final ObjectMapper JSON = com.fasterxml.jackson.databind.json.JsonMapper.builder()
            .enable(com.fasterxml.jackson.databind.DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .nodeFactory(com.fasterxml.jackson.databind.node.JsonNodeFactory.withExactBigDecimals(true)).build();

    private static JsonNode tree(FormState s) throws Exception {
        return JSON.readTree(FormJson.write(s));
    }

    @Test
    @DisplayName("a number is written exactly as typed, with the unit code picked")
    void numberAsTyped() throws Exception {
        FormState s = FormJson.blank(UnitSystem.SI).with("labs.serumViscosity.value", "5.60")
                .with("labs.serumViscosity.unit", "cP");
        JsonNode q = tree(s).path("labs").path("serumViscosity");
        assertTrue(q.path("value").isNumber());
        assertEquals("5.60", q.path("value").decimalValue().toPlainString());
        assertEquals("cP", q.path("unit").asText());
    }

    @Test
    @DisplayName("text that is not a number is written as typed, so the case reader names it")
    void notANumberKept() throws Exception {
        FormState s = FormJson.blank(UnitSystem.SI).with("labs.wbc.value", "5,6");
        JsonNode v = tree(s).path("labs").path("wbc").path("value");
        assertTrue(v.isTextual());
        assertEquals("5,6", v.asText());
    }

    @Test
    @DisplayName("empty fields are left out; switches are always written; an empty therapy date is null")
    void emptyFields() throws Exception {
        JsonNode root = tree(FormJson.blank(UnitSystem.SI));
        assertEquals("stasis-case/1", root.path("format").asText());
        assertTrue(root.path("labs").isEmpty());
        assertFalse(root.path("patient").has("sex"));
        assertFalse(root.path("findings").has("mucosalBleeding"));
        assertFalse(root.path("plan").path("rituximabPlanned").asBoolean(true));
        assertTrue(root.path("condition").path("therapyStarted").isNull());
    }

    @Test
    @DisplayName("reading a case and writing it again keeps every value, extra and unknown keys included")
    void roundTrip() throws Exception {
        String file = """
                {"format":"stasis-case/1",
                 "patient":{"label":"Invented patient, bed 4","sex":"female","ageYears":71,
                            "height":{"value":162,"unit":"cm"},"weight":{"value":58,"unit":"kg"}},
                 "condition":{"paraprotein":"IgM","leukemia":"none","monocytic":false,"cryoglobulin":"unknown",
                              "therapyStarted":null},
                 "labs":{"serumViscosity":{"value":5.6,"unit":"cP","temperature":{"value":37,"unit":"Cel"}},
                         "wbc":{"value":150000,"unit":"10*9/L"},"wbcc":{"value":1,"unit":"%"}},
                 "baseline":{},
                 "findings":{"neurologicalGrade":1,"mucosalBleeding":true,"retinopathy":"venous-dilation"},
                 "plan":{"rituximabPlanned":true,"transfusionPlanned":false},
                 "assessedAt":"2026-03-05T02:40:00+01:00","assessor":"Invented night resident",
                 "extra":{"ward":"St. Alder Infirmary, ward 3"}}
                """;
        FormState s = FormJson.read(file.getBytes(StandardCharsets.UTF_8), UnitSystem.CONVENTIONAL).orElseThrow();
        assertEquals("5.6", s.get("labs.serumViscosity.value"));
        assertEquals("37", s.get("labs.serumViscosity.temperature.value"));
        assertEquals("150000", s.get("labs.wbc.value"));
        assertEquals("true", s.get("findings.mucosalBleeding"));
        assertEquals("1", s.get("findings.neurologicalGrade"));
        assertEquals("", s.get("findings.seizure"));
        JsonNode again = tree(s);
        assertEquals(JSON.readTree(file).path("labs").path("serumViscosity"),
                again.path("labs").path("serumViscosity"));
        assertEquals(1, again.path("labs").path("wbcc").path("value").asInt(), "unknown key kept for the reader");
        assertEquals("St. Alder Infirmary, ward 3", again.path("extra").path("ward").asText());
        assertEquals("Invented night resident", again.path("assessor").asText());
        assertEquals(s, FormJson.read(FormJson.write(s), UnitSystem.CONVENTIONAL).orElseThrow(), "stable on a second pass");
    }

    @Test
    @DisplayName("bytes that are not a JSON object give no form state")
    void notAnObject() {
        assertTrue(FormJson.read("[1,2]".getBytes(StandardCharsets.UTF_8), UnitSystem.SI).isEmpty());
        assertTrue(FormJson.read("{".getBytes(StandardCharsets.UTF_8), UnitSystem.SI).isEmpty());
    }

    @Test
    @DisplayName("a quantity missing from the file starts in the preferred unit system")
    void startingUnits() {
        FormState s = FormJson.read("{}".getBytes(StandardCharsets.UTF_8), UnitSystem.CONVENTIONAL).orElseThrow();
        assertEquals("10*3/uL", s.get("labs.wbc.unit"));
        assertEquals("mg/dL", s.get("labs.creatinine.unit"));
        FormState si = FormJson.blank(UnitSystem.SI);
        assertEquals("10*9/L", si.get("labs.wbc.unit"));
        assertEquals("umol/L", si.get("labs.creatinine.unit"));
    }
}
