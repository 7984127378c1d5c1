package org.stasissheet.course;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.CaseReader.Problem;
import org.stasissheet.measure.Analyte;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;

/** The {@code stasis-course/1} reader and writer against the contract in COURSE-FORMAT.md. Invented data. */
class CourseReaderTest {
    private static final RuleSet RULES = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();
    private static final String HEAD = """
            {"format": "stasis-course/1",
             "patient": {"label": "Invented patient", "sex": "female", "ageYears": 66,
                         "height": {"value": 165, "unit": "cm"}, "weight": {"value": 62, "unit": "kg"}},
             "condition": {"paraprotein": "IgM", "leukemia": "none", "monocytic": false, "cryoglobulin": "absent"},
             "entries": [
            """;

    static String course(String... entries) {
        return HEAD + String.join(",\n", entries) + "\n], \"extra\": {\"ward\": \"invented\"}}";
    }

    static String assessment(String at, double sv) {
        return "{\"assessment\": {\"assessedAt\": \"" + at + "\", \"labs\": {\"serumViscosity\": {\"value\": " + sv
                + ", \"unit\": \"cP\"}, \"hematocrit\": {\"value\": 30, \"unit\": \"%\"}}}}";
    }

    static String exchange(String at, String amount) {
        return "{\"procedure\": {\"at\": \"" + at + "\", \"kind\": \"plasma-exchange\", " + amount
                + (amount.isEmpty() ? "" : ", ") + "\"replacement\": \"albumin\"}}";
    }

    static CourseReader.Result read(String json) {
        return CourseReader.read(json.getBytes(StandardCharsets.UTF_8));
    }

    static Course accepted(String json) {
        CourseReader.Result r = read(json);
        if (r instanceof CourseReader.Rejected rejected) {
            throw new AssertionError("refused: " + rejected.problems());
        }
        return ((CourseReader.Accepted) r).course();
    }

    static List<Problem> refused(String json) {
        return assertInstanceOf(CourseReader.Rejected.class, read(json)).problems();
    }

    @Nested
    class Order {
        @Test
        @DisplayName("entries written out of order are read in time order, by instant across offsets")
        void timeOrder() {
            Course c = accepted(course(
                    assessment("2026-06-11T12:00:00+02:00", 3.0),
                    exchange("2026-06-11T09:00:00+02:00", "\"plasmaVolumes\": 1.0"),
                    // 06:00 UTC is 08:00 at +02:00: before the exchange at 09:00 +02:00
                    assessment("2026-06-11T06:00:00Z", 6.0)));
            assertEquals(List.of(6.0, 3.0), c.assessments().stream()
                    .map(a -> a.moment().labs().canonical(Analyte.SERUM_VISCOSITY).orElseThrow()).toList());
            assertInstanceOf(Procedure.PlasmaExchange.class, c.entries().get(1));
        }

        @Test
        @DisplayName("two entries at the same instant keep their written order")
        void sameInstant() {
            Course c = accepted(course(
                    assessment("2026-06-11T08:00:00+02:00", 6.0),
                    exchange("2026-06-11T08:00:00+02:00", "\"plasmaVolumes\": 1.0"),
                    assessment("2026-06-11T06:00:00Z", 5.5)));
            assertInstanceOf(CourseEntry.Assessment.class, c.entries().get(0));
            assertInstanceOf(Procedure.PlasmaExchange.class, c.entries().get(1));
            assertInstanceOf(CourseEntry.Assessment.class, c.entries().get(2));
            // so the exchange is projected from 6.0 and compared with 5.5, written after it
            AnalyteCheck sv = CourseAssessor.assess(c, RULES).procedures().get(0).checks().get(0);
            assertEquals(6.0, sv.before().value(), 1e-12);
            assertEquals(5.5, sv.next().orElseThrow().measured().value(), 1e-12);
        }
    }

    @Test
    @DisplayName("a course of one assessment has one worksheet and no procedures")
    void oneAssessment() {
        CourseReport r = CourseAssessor.assess(accepted(course(assessment("2026-06-11T08:00:00+02:00", 6.0))), RULES);
        assertEquals(1, r.worksheets().size());
        assertTrue(r.procedures().isEmpty());
    }

    @Test
    @DisplayName("a procedure before any assessment is kept, with nothing projected and the reason said")
    void procedureFirst() {
        Course c = accepted(course(exchange("2026-06-11T07:00:00+02:00", "\"plasmaVolumes\": 1.0"),
                assessment("2026-06-11T12:00:00+02:00", 3.0)));
        ProcedureReview review = CourseAssessor.assess(c, RULES).procedures().get(0);
        assertTrue(review.checks().isEmpty());
        assertEquals(List.of("No assessment before this procedure, so nothing was projected."), review.notes());
    }

    @Nested
    class Refused {
        @Test
        @DisplayName("a plasma exchange with neither plasmaVolumes nor volume is refused, located by path")
        void noAmount() {
            List<Problem> problems = refused(course(assessment("2026-06-11T08:00:00+02:00", 6.0),
                    exchange("2026-06-11T09:00:00+02:00", "")));
            assertEquals("entries[1].procedure", problems.get(0).path());
            assertTrue(problems.get(0).message().contains("neither"), problems.toString());
        }

        @Test
        @DisplayName("both plasmaVolumes and volume are refused too")
        void bothAmounts() {
            List<Problem> problems = refused(course(assessment("2026-06-11T08:00:00+02:00", 6.0),
                    exchange("2026-06-11T09:00:00+02:00",
                            "\"plasmaVolumes\": 1.0, \"volume\": {\"value\": 3, \"unit\": \"L\"}")));
            assertEquals("entries[1].procedure", problems.get(0).path());
        }

        @Test
        @DisplayName("plasma volumes outside 0.5–2.0 (COURSE-FORMAT.md) are refused with the value")
        void volumesOutOfRange() {
            List<Problem> problems = refused(course(assessment("2026-06-11T08:00:00+02:00", 6.0),
                    exchange("2026-06-11T09:00:00+02:00", "\"plasmaVolumes\": 2.5")));
            assertEquals("entries[1].procedure.plasmaVolumes", problems.get(0).path());
            assertTrue(problems.get(0).message().startsWith("2.5 plasma volumes"), problems.toString());
        }

        @Test
        @DisplayName("a case problem inside an assessment carries the entry's path, as the case reader words it")
        void caseProblemLocated() {
            String bad = "{\"assessment\": {\"assessedAt\": \"2026-06-11T08:00:00+02:00\", "
                    + "\"labs\": {\"wbc\": {\"value\": 150000, \"unit\": \"10*9/L\"}}}}";
            List<Problem> problems = refused(course(assessment("2026-06-11T07:00:00+02:00", 6.0), bad));
            assertEquals("entries[1].assessment.labs.wbc", problems.get(0).path());
            assertTrue(problems.get(0).message().contains("150000"), problems.toString());
        }

        @Test
        @DisplayName("unknown keys are refused at their path: top level, assessment, procedure")
        void unknownKeys() {
            String json = course(
                    "{\"assessment\": {\"assessedAt\": \"2026-06-11T07:00:00+02:00\", \"patient\": {}}}",
                    "{\"procedure\": {\"at\": \"2026-06-11T09:00:00+02:00\", \"kind\": \"rituximab\", \"dose\": 1}}")
                    .replace("\"extra\":", "\"extras\": {}, \"extra\":");
            List<String> paths = refused(json).stream().map(Problem::path).toList();
            assertEquals(List.of("extras", "entries[0].assessment.patient", "entries[1].procedure.dose"), paths);
        }

        @Test
        @DisplayName("an assessment without its time and a course without assessments are refused")
        void missingTimeAndAssessments() {
            assertEquals("entries[0].assessment.assessedAt", refused(course("{\"assessment\": {\"labs\": {}}}"))
                    .get(0).path());
            assertEquals("entries", refused(course(exchange("2026-06-11T09:00:00+02:00",
                    "\"plasmaVolumes\": 1.0"))).get(0).path());
        }

        @Test
        @DisplayName("a patient problem shared by every assessment is reported once, at its own path")
        void sharedProblemOnce() {
            String json = course(assessment("2026-06-11T07:00:00+02:00", 6.0),
                    assessment("2026-06-11T08:00:00+02:00", 5.0)).replace("\"female\"", "\"woman\"");
            List<Problem> problems = refused(json);
            assertEquals(1, problems.stream().filter(p -> p.path().equals("patient.sex")).count(), problems.toString());
        }
    }

    @Test
    @DisplayName("write then read gives an equal course (extra kept, volume units kept, procedures of every kind)")
    void roundTrip() {
        Course c = accepted(course(
                assessment("2026-06-11T08:00:00+02:00", 6.2),
                exchange("2026-06-11T09:00:00+02:00", "\"volume\": {\"value\": 2850, \"unit\": \"mL\"}"),
                "{\"procedure\": {\"at\": \"2026-06-11T10:00:00+02:00\", \"kind\": \"transfusion\", \"redCellUnits\": 1}}",
                "{\"procedure\": {\"at\": \"2026-06-11T11:00:00+02:00\", \"kind\": \"rituximab\"}}",
                "{\"procedure\": {\"at\": \"2026-06-11T11:30:00+02:00\", \"kind\": \"cytoreduction\", \"agent\": \"bendamustine\"}}",
                "{\"procedure\": {\"at\": \"2026-06-11T12:00:00+02:00\", \"kind\": \"leukapheresis\", \"bloodVolumesProcessed\": 2}}",
                "{\"assessment\": {\"assessedAt\": \"2026-06-11T13:00:00+02:00\", \"assessor\": \"Invented fellow\", "
                        + "\"labs\": {\"igm\": {\"value\": 4.1, \"unit\": \"g/dL\"}}, \"extra\": {\"k\": [1, 2]}}}"));
        String written = CourseWriter.write(c);
        Course again = accepted(written);
        assertEquals(c, again);
        assertEquals("{\"ward\":\"invented\"}", again.extraJson());
        assertEquals(written, CourseWriter.write(again));
    }

    @Test
    @DisplayName("tumor-lysis baseline: an entry without one takes the first assessment's labs (COURSE-FORMAT.md)")
    void baselineFromFirstAssessment() {
        Course c = accepted(course(assessment("2026-06-11T08:00:00+02:00", 6.0),
                assessment("2026-06-12T08:00:00+02:00", 4.0)));
        assertTrue(c.caseAt(0).baseline().values().isEmpty(), "the first assessment is not its own baseline");
        assertEquals(6.0, c.caseAt(1).baseline().canonical(Analyte.SERUM_VISCOSITY).orElseThrow(), 1e-12);
    }
}
