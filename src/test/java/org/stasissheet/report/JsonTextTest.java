package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.*;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.InputStream;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.course.CourseReader;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.JsonText;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;

/**
 * The JSON outputs are written by the streaming writer alone (start-up speed). Reference: Jackson's object mapper,
 * which wrote them before, must give exactly the same text for the same trees: worksheets of the demo cases and of
 * 150 generated ones, a course report, and generated trees of every node kind.
 */
class JsonTextTest {
    private static final ObjectMapper INDENTED = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private static final ObjectMapper COMPACT = new ObjectMapper();
    private static final RuleSet RULES = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();

    @Test
    @DisplayName("worksheet JSON of the demo and 150 generated cases: the same text as the object mapper writes")
    void worksheets() throws Exception {
        for (Case c : PlainWordsTest.cases()) {
            var sheet = Assessor.assess(c, RULES);
            ObjectNode tree = WorksheetJson.tree(sheet);
            assertEquals(INDENTED.writeValueAsString(tree) + System.lineSeparator(), WorksheetJson.render(sheet));
            assertEquals(COMPACT.writeValueAsString(tree), JsonText.compact(tree));
        }
    }

    @Test
    @DisplayName("course report JSON (Gertz 2018 course): the same text as the object mapper writes")
    void course() throws Exception {
        byte[] bytes;
        try (InputStream in = getClass().getResourceAsStream("/courses/gertz-2018-iga.json")) {
            bytes = in.readAllBytes();
        }
        var report = CourseAssessor.assess(((CourseReader.Accepted) CourseReader.read(bytes)).course(), RULES);
        assertEquals(INDENTED.writeValueAsString(CourseJson.tree(report)) + System.lineSeparator(),
                CourseJson.render(report));
    }

    @Test
    @DisplayName("generated trees of every node kind (fixed seed): the same text, compact and indented")
    void everyNodeKind() throws Exception {
        Random random = new Random(412L);
        JsonNodeFactory f = JsonNodeFactory.instance;
        for (int i = 0; i < 500; i++) {
            ObjectNode root = f.objectNode();
            fill(root, random, 0);
            assertEquals(COMPACT.writeValueAsString(root), JsonText.compact(root));
            assertEquals(INDENTED.writeValueAsString(root), JsonText.pretty(root));
        }
        assertEquals("{}", JsonText.compact(f.objectNode()));
        assertEquals(INDENTED.writeValueAsString(f.arrayNode()), JsonText.pretty(f.arrayNode()));
    }

    private static void fill(ObjectNode n, Random r, int depth) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        int keys = r.nextInt(5);
        for (int k = 0; k < keys; k++) {
            String key = "k" + k + (r.nextBoolean() ? "\u00b5\"\\" : "");
            switch (r.nextInt(11)) {
                case 0 -> n.put(key, r.nextInt());
                case 1 -> n.put(key, r.nextLong());
                case 2 -> n.put(key, r.nextDouble() * 1e6);
                case 3 -> n.put(key, (float) r.nextGaussian());
                case 4 -> n.put(key, new BigDecimal(r.nextInt(100_000)).movePointLeft(r.nextInt(6)));
                case 5 -> n.put(key, new BigInteger(80, r));
                case 6 -> n.put(key, r.nextBoolean());
                case 7 -> n.putNull(key);
                case 8 -> n.put(key, "text ×10⁹/L\n\t\u0001 " + r.nextInt());
                case 9 -> {
                    var a = n.putArray(key);
                    a.add(r.nextInt()).add("x").addNull().add(r.nextDouble());
                    if (depth < 3) {
                        fill(a.addObject(), r, depth + 1);
                    }
                }
                default -> {
                    if (depth < 3) {
                        fill(n.putObject(key), r, depth + 1);
                    }
                }
            }
        }
    }

    @Test
    @DisplayName("a node kind with no JSON text is refused, not written as something else")
    void refusesNonJson() {
        JsonNode pojo = JsonNodeFactory.instance.pojoNode(new Object());
        assertThrows(IllegalArgumentException.class, () -> JsonText.compact(pojo));
    }
}
