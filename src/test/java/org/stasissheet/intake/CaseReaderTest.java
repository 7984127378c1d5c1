package org.stasissheet.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.intake.CaseReader.Accepted;
import org.stasissheet.intake.CaseReader.Problem;
import org.stasissheet.intake.CaseReader.Rejected;
import org.stasissheet.measure.Analyte;

/** Every kind of bad input named in the case contract, each with its exact path and the key parts of the message. */
class CaseReaderTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    /** A small valid case; tests change one thing in it. */
    private static final String VALID = """
            {
              "format": "stasis-case/1",
              "patient": {"label": "Demo patient T", "sex": "female", "ageYears": 71,
                          "height": {"value": 162, "unit": "cm"}, "weight": {"value": 58, "unit": "kg"}},
              "condition": {"paraprotein": "IgM", "leukemia": "none", "monocytic": false,
                            "cryoglobulin": "unknown", "therapyStarted": null},
              "labs": {"serumViscosity": {"value": 5.6, "unit": "cP"}, "igm": {"value": 5.9, "unit": "g/dL"},
                       "hematocrit": {"value": 29, "unit": "%"}, "wbc": {"value": 7.2, "unit": "10*9/L"}},
              "baseline": {},
              "findings": {"pulmonaryGrade": 0, "neurologicalGrade": 1, "otherOrganGrade": 0,
                           "mucosalBleeding": true, "visualDisturbance": true, "retinopathy": "venous-dilation",
                           "heartFailure": false, "arrhythmia": false, "seizure": false},
              "plan": {"rituximabPlanned": true, "transfusionPlanned": false},
              "assessedAt": "2026-03-05T02:40:00+01:00",
              "assessor": "Invented night resident",
              "extra": {}
            }
            """;

    static CaseReader.Result read(String json) {
        return CaseReader.read(json.getBytes(StandardCharsets.UTF_8));
    }

    static Case accepted(String json) {
        CaseReader.Result r = read(json);
        if (r instanceof Rejected rejected) {
            fail("expected the case to be accepted, got " + rejected.problems());
        }
        return ((Accepted) r).c();
    }

    static List<Problem> problems(String json) {
        return assertInstanceOf(Rejected.class, read(json), "expected a rejection").problems();
    }

    /** The single problem the input has; fails if there are more or none. */
    static Problem only(String json) {
        List<Problem> problems = problems(json);
        assertEquals(1, problems.size(), () -> "expected one problem, got " + problems);
        return problems.get(0);
    }

    /** {@link #VALID} with the value at a dotted path replaced by raw JSON (created if absent). */
    static String with(String dottedPath, String rawJson) {
        try {
            ObjectNode root = (ObjectNode) JSON.readTree(VALID);
            String[] keys = dottedPath.split("\\.");
            ObjectNode node = root;
            for (int i = 0; i < keys.length - 1; i++) {
                node = (ObjectNode) node.get(keys[i]);
            }
            node.set(keys[keys.length - 1], JSON.readTree(rawJson));
            return JSON.writeValueAsString(root);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    static String without(String dottedPath) {
        try {
            ObjectNode root = (ObjectNode) JSON.readTree(VALID);
            String[] keys = dottedPath.split("\\.");
            ObjectNode node = root;
            for (int i = 0; i < keys.length - 1; i++) {
                node = (ObjectNode) node.get(keys[i]);
            }
            node.remove(keys[keys.length - 1]);
            return JSON.writeValueAsString(root);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    static void assertContains(String message, String... parts) {
        for (String part : parts) {
            assertTrue(message.contains(part), () -> "expected \"" + part + "\" in: " + message);
        }
    }

    @Test
    @DisplayName("the contract's example case is accepted with every field as written")
    void validCaseIsAccepted() {
        Case c = accepted(VALID);
        assertEquals("Demo patient T", c.patient().label());
        assertEquals(Optional.of(Sex.FEMALE), c.patient().sex());
        assertEquals(Optional.of(71), c.patient().ageYears());
        assertEquals(162, c.patient().height().orElseThrow().entered().value(), 0.0, "as written in the file");
        assertEquals(Paraprotein.IGM, c.condition().paraprotein());
        assertEquals(Optional.empty(), c.condition().therapyStarted());
        assertEquals(5.6, c.labs().get(Analyte.SERUM_VISCOSITY).orElseThrow().entered().value(), 0.0, "as written");
        assertEquals(0.29, c.labs().canonical(Analyte.HEMATOCRIT).orElseThrow(), 1e-12, "29 % = 0.29 by definition");
        assertEquals(Optional.of(1), c.findings().neurologicalGrade());
        assertEquals(Observation.YES, c.findings().mucosalBleeding());
        assertEquals(Retinopathy.VENOUS_DILATION, c.findings().retinopathy());
        assertTrue(c.plan().rituximabPlanned());
        assertEquals(Optional.of(OffsetDateTime.parse("2026-03-05T02:40:00+01:00")), c.assessedAt());
        assertEquals("Invented night resident", c.assessor());
        assertEquals("{}", c.extraJson());
    }

    @Nested
    @DisplayName("file-level limits")
    class FileLevel {
        @Test
        @DisplayName("malformed JSON names line and column")
        void malformedJson() {
            Problem p = only("{\n  \"format\": \"stasis-case/1\",\n  \"labs\": {\"wbc\": }\n}");
            assertEquals("$", p.path());
            assertContains(p.message(), "not valid JSON", "line 3", "column 19", "labs.wbc");
        }

        @Test
        @DisplayName("an empty file is refused as such")
        void emptyFile() {
            assertContains(only("  \n").message(), "empty");
        }

        @Test
        @DisplayName("a top level that is not an object is refused")
        void notAnObject() {
            Problem p = only("[1, 2]");
            assertEquals("$", p.path());
            assertContains(p.message(), "one JSON object", "array");
        }

        @Test
        @DisplayName("content after the case object is refused with its position")
        void trailingContent() {
            Problem p = only(VALID + "{}");
            assertEquals("$", p.path());
            assertContains(p.message(), "after the end", "line 18");
        }

        @Test
        @DisplayName("a file over 1 MiB is refused by its byte length before parsing")
        void tooLarge() {
            byte[] big = new byte[CaseReader.MAX_BYTES + 1];
            // not even JSON: the size check must come first
            java.util.Arrays.fill(big, (byte) '[');
            List<Problem> ps = ((Rejected) CaseReader.read(big)).problems();
            assertEquals(1, ps.size());
            assertEquals("$", ps.get(0).path());
            assertContains(ps.get(0).message(), "1048577 bytes", "1048576", "1 MiB");
        }

        @Test
        @DisplayName("non-UTF-8 bytes are refused with the offset of the first bad byte")
        void notUtf8() {
            byte[] good = VALID.getBytes(StandardCharsets.UTF_8);
            int offset = VALID.indexOf("Demo patient T") + 5;
            byte[] bad = good.clone();
            bad[offset] = (byte) 0xE9; // "é" in ISO-8859-1, not valid UTF-8 here
            List<Problem> ps = ((Rejected) CaseReader.read(bad)).problems();
            assertEquals(1, ps.size());
            assertEquals("$", ps.get(0).path());
            assertContains(ps.get(0).message(), "not valid UTF-8", "0xE9", "byte offset " + offset);
        }

        @Test
        @DisplayName("a UTF-8 byte order mark is tolerated")
        void byteOrderMark() {
            byte[] text = VALID.getBytes(StandardCharsets.UTF_8);
            byte[] withBom = new byte[text.length + 3];
            withBom[0] = (byte) 0xEF;
            withBom[1] = (byte) 0xBB;
            withBom[2] = (byte) 0xBF;
            System.arraycopy(text, 0, withBom, 3, text.length);
            assertInstanceOf(Accepted.class, CaseReader.read(withBom));
        }

        @Test
        @DisplayName("nesting deeper than 64 levels is refused early; exactly 64 is accepted")
        void tooDeep() {
            // root object = level 1, extra = level 2, so 62 more arrays reach 64 and 63 more reach 65
            String ok = with("extra", "{\"deep\": " + "[".repeat(62) + "]".repeat(62) + "}");
            accepted(ok);
            String deep = "{\"format\": \"stasis-case/1\", \"extra\": {\"deep\": " + "[".repeat(63)
                    + "]".repeat(63) + "}}";
            Problem p = only(deep);
            assertEquals("$", p.path());
            assertContains(p.message(), "nested deeper than 64 levels", "line 1", "extra.deep");
            // a hostile depth is refused by the limit, not by running out of stack
            Problem hostile = only("{\"extra\": " + "[".repeat(100_000));
            assertContains(hostile.message(), "nested deeper than 64 levels");
        }

        @Test
        @DisplayName("strings longer than 10,000 characters are refused; exactly 10,000 is accepted")
        void tooLongString() {
            accepted(with("assessor", "\"" + "a".repeat(10_000) + "\""));
            Problem p = only(with("assessor", "\"" + "a".repeat(10_001) + "\""));
            assertEquals("$", p.path());
            assertContains(p.message(), "longer than 10000 characters");
            Problem key = only("{\"format\": \"stasis-case/1\", \"extra\": {\"" + "k".repeat(10_001) + "\": 1}}");
            assertContains(key.message(), "longer than 10000 characters");
        }

        @Test
        @DisplayName("duplicate keys are reported with their path, every one")
        void duplicateKeys() {
            String json = VALID.replace("\"assessor\": \"Invented night resident\",",
                    "\"assessor\": \"Invented night resident\",\n  \"assessor\": \"someone else\",")
                    .replace("\"wbc\": {\"value\": 7.2, \"unit\": \"10*9/L\"}",
                            "\"wbc\": {\"value\": 7.2, \"value\": 72, \"unit\": \"10*9/L\"}");
            List<Problem> ps = problems(json);
            assertEquals(2, ps.size(), ps::toString);
            assertEquals("labs.wbc.value", ps.get(0).path());
            assertContains(ps.get(0).message(), "\"value\" appears more than once", "in labs.wbc");
            assertEquals("assessor", ps.get(1).path());
            assertContains(ps.get(1).message(), "appears more than once", "line 16");
        }
    }

    @Nested
    @DisplayName("keys and JSON types")
    class KeysAndTypes {
        @Test
        @DisplayName("an unknown key anywhere is refused with its path and the nearest known key")
        void unknownKeys() {
            Problem top = only(with("asessor", "\"x\""));
            assertEquals("asessor", top.path());
            assertContains(top.message(), "unknown key \"asessor\"", "did you mean \"assessor\"?", "extra");

            Problem lab = only(with("labs.wbcc", "{\"value\": 7, \"unit\": \"10*9/L\"}"));
            assertEquals("labs.wbcc", lab.path());
            assertContains(lab.message(), "did you mean \"wbc\"?");

            Problem inQuantity = only(with("labs.wbc", "{\"value\": 7, \"unit\": \"10*9/L\", \"units\": 1}"));
            assertEquals("labs.wbc.units", inQuantity.path());

            Problem temperatureElsewhere =
                    only(with("labs.igm", "{\"value\": 5, \"unit\": \"g/dL\", \"temperature\": 37}"));
            assertEquals("labs.igm.temperature", temperatureElsewhere.path());

            Problem bodyInLabs = only(with("labs.weight", "{\"value\": 58, \"unit\": \"kg\"}"));
            assertEquals("labs.weight", bodyInLabs.path());
            assertContains(bodyInLabs.message(), "belongs under patient");
        }

        @Test
        @DisplayName("anything goes under extra, kept verbatim as compact JSON with numbers as written")
        void extraIsVerbatim() {
            Case c = accepted(VALID.replace("\"extra\": {}", "\"extra\": {\"whatever\": {\"n\": 1.10,"
                    + " \"big\": 12345678901234567890, \"list\": [true, null, \"é\"]}, \"unknownKeysHere\": 1e3}"));
            assertEquals("{\"whatever\":{\"n\":1.10,\"big\":12345678901234567890,\"list\":[true,null,\"é\"]},"
                    + "\"unknownKeysHere\":1E+3}", c.extraJson());
        }

        @Test
        @DisplayName("wrong JSON types are refused with the path, the expected type and the value found")
        void wrongTypes() {
            Problem value = only(with("labs.wbc", "{\"value\": \"7.2\", \"unit\": \"10*9/L\"}"));
            assertEquals("labs.wbc.value", value.path());
            assertContains(value.message(), "expected a number", "the text \"7.2\"");

            Problem bare = only(with("labs.wbc", "7.2"));
            assertEquals("labs.wbc", bare.path());
            assertContains(bare.message(), "{\"value\": number, \"unit\": \"UCUM code\"}", "the number 7.2");

            Problem bool = only(with("findings.seizure", "\"no\""));
            assertEquals("findings.seizure", bool.path());
            assertContains(bool.message(), "true or false", "\"no\"");

            Problem section = only(with("patient", "[]"));
            assertEquals("patient", section.path());
            assertContains(section.message(), "an object", "an array");

            Problem extra = only(with("extra", "\"notes\""));
            assertEquals("extra", extra.path());
        }

        @Test
        @DisplayName("absent fields take the documented defaults")
        void defaults() {
            Case c = accepted("{\"format\": \"stasis-case/1\"}");
            assertEquals(Patient.UNKNOWN, c.patient());
            assertEquals(new Condition(Paraprotein.NONE, Leukemia.NONE, false, Cryoglobulin.UNKNOWN,
                    Optional.empty()), c.condition());
            assertEquals(Findings.NOT_ASSESSED, c.findings());
            assertEquals(Plan.NOTHING, c.plan());
            assertEquals(Labs.NONE, c.labs());
            assertEquals("{}", c.extraJson());

            Case partial = accepted(with("findings", "{\"pulmonaryGrade\": 2}"));
            assertEquals(Observation.NOT_ASSESSED, partial.findings().seizure());
            assertEquals(Retinopathy.NOT_EXAMINED, partial.findings().retinopathy());
            assertEquals(Optional.empty(), partial.findings().neurologicalGrade());
            assertEquals(Plan.NOTHING, accepted(with("plan", "{}")).plan());
        }

        @Test
        @DisplayName("a missing format is refused, and so is a different one")
        void format() {
            Problem missing = only(without("format"));
            assertEquals("format", missing.path());
            assertContains(missing.message(), "missing", "stasis-case/1");

            Problem other = only(with("format", "\"stasis-case/2\""));
            assertEquals("format", other.path());
            assertContains(other.message(), "\"stasis-case/2\"", "expected \"stasis-case/1\"");
        }

        @Test
        @DisplayName("all problems are reported together, in file order")
        void allProblemsTogether() {
            String json = """
                    {"format": "stasis-case/1",
                     "patient": {"sex": "f", "height": {"value": 162, "unit": "ft"}},
                     "labs": {"wbc": {"value": 150000, "unit": "10*9/L"}, "potassium": {"value": -1, "unit": "mmol/L"}},
                     "findings": {"pulmonaryGrade": 4, "retinopathy": "bad"},
                     "assessedAt": "yesterday", "surprise": 1}
                    """;
            List<String> paths = problems(json).stream().map(Problem::path).toList();
            assertEquals(List.of("surprise", "patient.sex", "patient.height.unit", "labs.wbc", "labs.potassium",
                    "findings.pulmonaryGrade", "findings.retinopathy", "assessedAt"), paths);
        }
    }

    @Nested
    @DisplayName("values and units")
    class ValuesAndUnits {
        @Test
        @DisplayName("an implausible count suggests the unit that makes it plausible, exactly as the contract shows")
        void implausibleWithSuggestion() {
            Problem p = only(with("labs.wbc", "{\"value\": 150000, \"unit\": \"10*9/L\"}"));
            assertEquals("labs.wbc", p.path());
            // message text fixed by CASE-FORMAT.md
            assertEquals("150000 10*9/L is not plausible; did you mean /uL (= 150 10*9/L)?", p.message());
        }

        @Test
        @DisplayName("a hematocrit of 29 as a fraction suggests %")
        void hematocritAsFraction() {
            Problem p = only(with("labs.hematocrit", "{\"value\": 29, \"unit\": \"1\"}"));
            assertEquals("labs.hematocrit", p.path());
            assertEquals("29 1 is not plausible; did you mean % (= 0.29 1)?", p.message());
        }

        @Test
        @DisplayName("a height in metres typed as cm suggests m")
        void heightInWrongUnit() {
            Problem p = only(with("patient.height", "{\"value\": 1.62, \"unit\": \"cm\"}"));
            assertEquals("patient.height", p.path());
            assertContains(p.message(), "1.62 cm is not plausible", "did you mean m (= 162 cm)?");
        }

        @Test
        @DisplayName("when no unit fits, the plausible range is given with its unit")
        void implausibleWithoutSuggestion() {
            Problem p = only(with("labs.sodium", "{\"value\": 14, \"unit\": \"mmol/L\"}"));
            assertEquals("labs.sodium", p.path());
            assertEquals("14 mmol/L is not plausible; the plausible range for sodium is 90 to 200 mmol/L",
                    p.message());
            Problem inOtherUnit = only(with("labs.fibrinogen", "{\"value\": 90000, \"unit\": \"mg/dL\"}"));
            assertContains(inOtherUnit.message(), "90000 mg/dL is not plausible", "0 to 1500 mg/dL",
                    "(0 to 15 g/L)");
        }

        @Test
        @DisplayName("an unknown unit is refused at .unit with the accepted units listed")
        void unknownUnit() {
            Problem lab = only(with("labs.wbc", "{\"value\": 7.2, \"unit\": \"x10^9/L\"}"));
            assertEquals("labs.wbc.unit", lab.path());
            assertEquals("\"x10^9/L\" (value 7.2) is not an accepted unit for white cell count; accepted (UCUM codes):"
                    + " 10*9/L, 10*3/uL, /uL, /mm3", lab.message());

            Problem body = only(with("patient.height", "{\"value\": 5.3, \"unit\": \"ft\"}"));
            assertEquals("patient.height.unit", body.path());
            assertContains(body.message(), "\"ft\"", "cm, m, [in_i]");

            Problem missing = only(with("patient.weight", "{\"value\": 58}"));
            assertEquals("patient.weight.unit", missing.path());
            assertContains(missing.message(), "missing", "kg, g, [lb_av]");

            Problem noValue = only(with("labs.igm", "{\"unit\": \"g/dL\"}"));
            assertEquals("labs.igm.value", noValue.path());
            assertContains(noValue.message(), "missing");
        }

        @Test
        @DisplayName("body measures accept cm, m, [in_i] and kg, g, [lb_av]")
        void bodyMeasureUnits() {
            Case c = accepted(with("patient.height", "{\"value\": 64, \"unit\": \"[in_i]\"}"));
            // definition of the international inch: 2.54 cm
            assertEquals(162.56, c.patient().height().orElseThrow().canonical(), 1e-9);
            Case w = accepted(with("patient.weight", "{\"value\": 128, \"unit\": \"[lb_av]\"}"));
            // definition of the avoirdupois pound: 0.45359237 kg
            assertEquals(58.05982336, w.patient().weight().orElseThrow().canonical(), 1e-9);
        }

        @ParameterizedTest(name = "{0}")
        @ValueSource(strings = {"NaN", "Infinity", "-Infinity", "+Infinity"})
        @DisplayName("NaN and Infinity tokens are refused clearly at their path")
        void nonFiniteTokens(String token) {
            String json = VALID.replace("\"value\": 7.2, \"unit\": \"10*9/L\"", "\"value\": " + token
                    + ", \"unit\": \"10*9/L\"");
            Problem p = only(json);
            assertEquals("labs.wbc.value", p.path());
            assertContains(p.message(), token, "not a number JSON allows", "finite");
        }

        @Test
        @DisplayName("a number too large for a double is refused as written, not turned into Infinity")
        void hugeNumber() {
            Problem p = only(VALID.replace("\"value\": 7.2,", "\"value\": 1e400,"));
            assertEquals("labs.wbc.value", p.path());
            assertContains(p.message(), "1e400", "too large");
        }

        @Test
        @DisplayName("negative values are refused with value, unit and analyte")
        void negative() {
            Problem p = only(with("labs.potassium", "{\"value\": -4.1, \"unit\": \"mmol/L\"}"));
            assertEquals("labs.potassium", p.path());
            assertEquals("-4.1 mmol/L is negative; potassium cannot be below 0", p.message());
            Problem baseline = only(with("baseline", "{\"calcium\": {\"value\": -2, \"unit\": \"mg/dL\"}}"));
            assertEquals("baseline.calcium", baseline.path());
        }

        @Test
        @DisplayName("a serum viscosity temperature must be in Cel and within 0–45")
        void temperature() {
            accepted(with("labs.serumViscosity",
                    "{\"value\": 5.6, \"unit\": \"cP\", \"temperature\": {\"value\": 37, \"unit\": \"Cel\"}}"));
            Problem unit = only(with("labs.serumViscosity",
                    "{\"value\": 5.6, \"unit\": \"cP\", \"temperature\": {\"value\": 98.6, \"unit\": \"[degF]\"}}"));
            assertEquals("labs.serumViscosity.temperature.unit", unit.path());
            assertContains(unit.message(), "\"[degF]\"", "Cel");
            Problem range = only(with("labs.serumViscosity",
                    "{\"value\": 5.6, \"unit\": \"cP\", \"temperature\": {\"value\": 310, \"unit\": \"Cel\"}}"));
            assertEquals("labs.serumViscosity.temperature", range.path());
            assertContains(range.message(), "310 Cel is not plausible", "0 to 45 Cel");
        }
    }

    @Nested
    @DisplayName("grades, words and dates")
    class GradesWordsDates {
        @Test
        @DisplayName("a non-integer grade is refused")
        void nonIntegerGrade() {
            Problem p = only(with("findings.pulmonaryGrade", "1.5"));
            assertEquals("findings.pulmonaryGrade", p.path());
            assertContains(p.message(), "1.5 is not a whole number", "0–3");
            // 2.0 is a whole number written with a decimal point
            assertEquals(Optional.of(2), accepted(with("findings.pulmonaryGrade", "2.0")).findings().pulmonaryGrade());
        }

        @Test
        @DisplayName("a grade outside 0–3 is refused")
        void gradeOutOfRange() {
            Problem high = only(with("findings.neurologicalGrade", "4"));
            assertEquals("findings.neurologicalGrade", high.path());
            assertContains(high.message(), "4 is outside 0–3");
            Problem low = only(with("findings.otherOrganGrade", "-1"));
            assertEquals("findings.otherOrganGrade", low.path());
            assertContains(low.message(), "-1 is outside 0–3");
        }

        @Test
        @DisplayName("an age that is not a whole number of years in 0–130 is refused")
        void age() {
            assertEquals("patient.ageYears", only(with("patient.ageYears", "71.5")).path());
            assertContains(only(with("patient.ageYears", "140")).message(), "140 is outside 0–130 years");
        }

        @Test
        @DisplayName("a word outside a vocabulary is refused with the allowed words")
        void badWords() {
            Problem sex = only(with("patient.sex", "\"Female\""));
            assertEquals("patient.sex", sex.path());
            assertContains(sex.message(), "\"Female\" is not allowed", "female | male", "case-sensitive");

            Problem leukemia = only(with("condition.leukemia", "\"AMML\""));
            assertEquals("condition.leukemia", leukemia.path());
            assertContains(leukemia.message(), "none | acute-untyped | AML | APL | ALL | CML | CLL");

            Problem retinopathy = only(with("findings.retinopathy", "\"dilated\""));
            assertEquals("findings.retinopathy", retinopathy.path());
            assertContains(retinopathy.message(), "not-examined | none | venous-dilation | haemorrhages | papilloedema");

            assertEquals("condition.paraprotein", only(with("condition.paraprotein", "\"IgD\"")).path());
            assertEquals("condition.cryoglobulin", only(with("condition.cryoglobulin", "\"maybe\"")).path());
        }

        @Test
        @DisplayName("dates and timestamps must be ISO; a timestamp needs its UTC offset")
        void badDates() {
            Problem date = only(with("condition.therapyStarted", "\"04/03/2026\""));
            assertEquals("condition.therapyStarted", date.path());
            assertContains(date.message(), "\"04/03/2026\" is not an ISO date", "2026-03-04");
            assertContains(only(with("condition.therapyStarted", "\"2026-02-30\"")).message(), "2026-02-30");
            assertEquals(Optional.of(LocalDate.of(2026, 3, 4)),
                    accepted(with("condition.therapyStarted", "\"2026-03-04\"")).condition().therapyStarted());

            Problem noOffset = only(with("assessedAt", "\"2026-03-05T02:40:00\""));
            assertEquals("assessedAt", noOffset.path());
            assertContains(noOffset.message(), "has no UTC offset", "2026-03-05T02:40:00+01:00");
            Problem garbage = only(with("assessedAt", "\"5 March, night\""));
            assertContains(garbage.message(), "not an ISO date and time");
        }
    }
}
