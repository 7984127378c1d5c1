package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.rules.Level;

class TriageSummaryTest {

    private static TriageRow ok(String file, Level level, Integer score, int hvRank) {
        return new TriageRow(file, "", TriageRow.Status.OK, Optional.ofNullable(level), "hv", "lk", "tl", "top",
                score == null ? OptionalInt.empty() : OptionalInt.of(score), hvRank, file + ".pdf", "");
    }

    // Expected encodings from RFC 4180 §2 (fields with comma, quote or line break are quoted; quotes doubled)
    // and the OWASP "CSV injection" guidance (a leading = + - @ tab or CR is neutralised with an apostrophe).
    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(delimiter = '|', quoteCharacter = '~', value = {
        "plain|plain",
        "a,b|~\"a,b\"~",
        "say \"hi\"|~\"say \"\"hi\"\"\"~",
        "=HYPERLINK(1)|'=HYPERLINK(1)",
        "+1|'+1",
        "-2|'-2",
        "@SUM(A1)|'@SUM(A1)",
        "=1,2|~\"'=1,2\"~",
        "Ελένη|Ελένη",
    })
    @DisplayName("cells are RFC 4180 quoted and never start a spreadsheet formula")
    void cellEncoding(String raw, String encoded) {
        assertEquals(encoded, Csv.cell(raw));
    }

    @Test
    @DisplayName("a line break inside a cell is kept inside quotes (RFC 4180 §2.6)")
    void lineBreakIsQuoted() {
        assertEquals("\"line one\nline two\"", Csv.cell("line one\nline two"));
    }

    @Test
    @DisplayName("rows rank by level, then unread files, then leukostasis score, then hyperviscosity, then name")
    void ranking() {
        List<TriageRow> rows = List.of(
                ok("f-note.json", Level.NOTE, 3, 0),
                ok("e-review-hv-possible.json", Level.REVIEW, 1, 1),
                ok("d-review-hv-likely.json", Level.REVIEW, 1, 0),
                ok("c-review-score2.json", Level.REVIEW, 2, 3),
                ok("g-nothing.json", null, null, 3),
                TriageRow.failed("b-bad.json", TriageRow.Status.ERROR, "labs.wbc: not a number"),
                ok("a2-act.json", Level.ACT_NOW, null, 0),
                ok("a1-act.json", Level.ACT_NOW, 3, 2));
        List<String> order = TriageSummary.ranked(rows).stream().map(TriageRow::file).toList();
        assertEquals(List.of("a1-act.json", "a2-act.json", "b-bad.json", "c-review-score2.json",
                "d-review-hv-likely.json", "e-review-hv-possible.json", "f-note.json", "g-nothing.json"), order);
    }

    @Test
    @DisplayName("the CSV has the header, CRLF line ends and one row per file with its status and message")
    void csvShape() {
        String csv = TriageSummary.csv(List.of(ok("a.json", Level.ACT_NOW, 3, 0),
                TriageRow.failed("b.json", TriageRow.Status.ERROR, "labs.wbc: \"abc\" is not a number")));
        String[] lines = csv.split("\r\n", -1);
        assertEquals(4, lines.length, csv); // header, two rows, and the empty string after the last CRLF
        assertEquals(String.join(",", TriageSummary.COLUMNS), lines[0]);
        assertTrue(lines[1].startsWith("a.json,,ok,ACT NOW,"), lines[1]);
        assertEquals("b.json,,error,unknown,,,,,,\"labs.wbc: \"\"abc\"\" is not a number\"", lines[2]);
        assertEquals("", lines[3]);
    }

    @Test
    @DisplayName("an internal error keeps its own status word, and a failed row must say why")
    void internalError() {
        String csv = TriageSummary.csv(List.of(TriageRow.failed("c.json", TriageRow.Status.INTERNAL_ERROR,
                "internal error (IllegalStateException): boom")));
        assertEquals("c.json,,internal-error,unknown,,,,,,internal error (IllegalStateException): boom",
                csv.split("\r\n")[1]);
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> TriageRow.failed("d.json", TriageRow.Status.ERROR, " "));
    }
}
