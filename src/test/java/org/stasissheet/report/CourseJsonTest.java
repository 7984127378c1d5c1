package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.course.CourseReader;
import org.stasissheet.files.RuleSources;
import org.stasissheet.rules.LoadResult;

/** The {@code stasis-course-report/1} keys of COURSE-FORMAT.md, filled from the Gertz 2018 course. */
class CourseJsonTest {
    @Test
    @DisplayName("Gertz 2018 course: exchange 1 projected 3.51 / 7.70 cP beside the measured 3.6 cP, keys as "
            + "COURSE-FORMAT.md fixes them")
    void gertzKeys() throws IOException {
        byte[] bytes;
        try (InputStream in = getClass().getResourceAsStream("/courses/gertz-2018-iga.json")) {
            bytes = in.readAllBytes();
        }
        var course = ((CourseReader.Accepted) CourseReader.read(bytes)).course();
        var rules = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();
        JsonNode root = new ObjectMapper().readTree(CourseJson.render(CourseAssessor.assess(course, rules)));
        assertEquals("stasis-course-report/1", root.get("format").asText());
        assertEquals("likely", root.at("/assessments/0/hyperviscosity/assessment").asText());
        JsonNode first = root.at("/procedures/0");
        assertEquals("plasma-exchange", first.get("kind").asText());
        // by hand (see GertzCourseTest): 3.51 cP right after, 7.70 cP after redistribution; Gertz 2018 measured 3.6
        assertEquals(3.51, first.at("/projected/serumViscosity/immediate").asDouble(), 0.01);
        assertEquals(7.70, first.at("/projected/serumViscosity/afterRedistribution").asDouble(), 0.01);
        assertEquals("cP", first.at("/projected/serumViscosity/unit").asText());
        assertEquals(3.6, first.at("/measuredNext/serumViscosity/value").asDouble(), 1e-9);
        assertEquals("2026-06-11T14:00:00+02:00", first.at("/measuredNext/serumViscosity/at").asText());
        assertFalse(first.get("review").asBoolean());
        assertFalse(root.get("cautions").isEmpty());
    }
}
