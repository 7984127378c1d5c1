package org.stasissheet.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The case reader's bounds on numbers and messages, at the limit and one step beyond (README, Limits). */
class CaseReaderBoundsTest {
    private static CaseReader.Result read(String json) {
        return CaseReader.read(json.getBytes(StandardCharsets.UTF_8));
    }

    private static String withExtra(String extra) {
        return "{\"format\": \"stasis-case/1\", \"extra\": " + extra + "}";
    }

    private static List<CaseReader.Problem> problems(String json) {
        return assertInstanceOf(CaseReader.Rejected.class, read(json)).problems();
    }

    @Test
    @DisplayName("number length: 40 characters are read, 41 are refused before conversion")
    void numberLength() {
        assertInstanceOf(CaseReader.Accepted.class, read(withExtra("{\"n\": " + "9".repeat(40) + "}")));
        List<CaseReader.Problem> p = problems(withExtra("{\"n\": " + "9".repeat(41) + "}"));
        assertEquals("extra.n", p.get(0).path());
        assertTrue(p.get(0).message().contains("41 characters"), p.get(0).message());
    }

    @Test
    @DisplayName("number size: 1e15 and 1e-15 are read, 1e16 and 1e-16 are refused as written; 0e999 is zero")
    void numberSize() {
        assertInstanceOf(CaseReader.Accepted.class, read(withExtra("{\"a\": 1e15, \"b\": 1e-15, \"c\": 0e999}")));
        assertTrue(problems(withExtra("{\"a\": 1e16}")).get(0).message().startsWith("1e16 is too large"));
        assertTrue(problems(withExtra("{\"a\": 1e-16}")).get(0).message().startsWith("1e-16 is too small"));
    }

    private static String duplicates(int n) {
        StringBuilder sb = new StringBuilder("{\"k\": 1");
        for (int i = 0; i < n; i++) {
            sb.append(", \"k\": 1");
        }
        return withExtra(sb.append('}').toString());
    }

    @Test
    @DisplayName("problem count: 100 problems are listed as they are; the 101st becomes '… and 1 more problems'")
    void problemCount() {
        List<CaseReader.Problem> atLimit = problems(duplicates(CaseReader.MAX_PROBLEMS));
        assertEquals(CaseReader.MAX_PROBLEMS, atLimit.size());
        assertTrue(atLimit.stream().noneMatch(p -> p.message().contains("more problems")));
        List<CaseReader.Problem> beyond = problems(duplicates(CaseReader.MAX_PROBLEMS + 1));
        assertEquals(CaseReader.MAX_PROBLEMS + 1, beyond.size());
        assertEquals("… and 1 more problems", beyond.get(CaseReader.MAX_PROBLEMS).message());
    }

    @Test
    @DisplayName("message length: a message is cut at 500 characters with '…'")
    void messageLength() {
        String key = "x".repeat(2_000);
        CaseReader.Problem p = problems(withExtra("{\"" + key + "\": 1, \"" + key + "\": 1}")).get(0);
        assertEquals(CaseReader.MAX_MESSAGE_CHARS + 1, p.message().length());
        assertTrue(p.message().endsWith("…"));
    }
}
