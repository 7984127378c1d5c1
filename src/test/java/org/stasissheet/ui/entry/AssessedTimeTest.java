package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The date and 24-hour time of an assessment, written as ISO 8601 with the offset, and refused when wrong. */
class AssessedTimeTest {
    private static final ZoneId BERLIN = ZoneId.of("Europe/Berlin");
    private static final LocalDate MARCH_5 = LocalDate.of(2026, 3, 5);

    @ParameterizedTest(name = "{0} → {1}")
    @DisplayName("24-hour times are recorded as ISO 8601 date-times with the zone's offset (ISO 8601-1:2019, 5.4)")
    @CsvSource({
        "02:40, 2026-03-05T02:40+01:00",
        "2:40, 2026-03-05T02:40+01:00",
        "0240, 2026-03-05T02:40+01:00",
        "14:05, 2026-03-05T14:05+01:00",
        "23:59:30, 2026-03-05T23:59:30+01:00",
        "00:00, 2026-03-05T00:00+01:00"})
    void written(String typed, String iso) {
        AssessedTime.Written w = AssessedTime.write(Optional.of(MARCH_5), typed, BERLIN);
        assertFalse(w.refused(), w.problem());
        assertEquals(iso, w.iso());
    }

    @ParameterizedTest(name = "''{0}''")
    @DisplayName("a time that is no 24-hour time of day is refused, naming the field and the value")
    @CsvSource({"25:61", "24:00", "2:4", "2.40 pm", "12:60", "noon"})
    void refused(String typed) {
        AssessedTime.Written w = AssessedTime.write(Optional.of(MARCH_5), typed, BERLIN);
        assertTrue(w.refused());
        assertTrue(w.problem().startsWith("Assessed at (time): '" + typed + "'"), w.problem());
        assertTrue(w.iso().contains(typed), "recorded as typed, so the case reader refuses it too: " + w.iso());
    }

    @Test
    @DisplayName("a time skipped when the clocks go forward is refused, not moved (EU summer time: last Sunday of "
            + "March, 01:00 UTC; Directive 2000/84/EC, art. 2)")
    void springGap() {
        AssessedTime.Written w = AssessedTime.write(Optional.of(LocalDate.of(2026, 3, 29)), "02:30", BERLIN);
        assertTrue(w.refused());
        assertTrue(w.problem().contains("did not happen"), w.problem());
    }

    @Test
    @DisplayName("a time that happens twice when the clocks go back is recorded once, with a note to check "
            + "(EU: last Sunday of October, 01:00 UTC; Directive 2000/84/EC, art. 3)")
    void autumnTwice() {
        AssessedTime.Written w = AssessedTime.write(Optional.of(LocalDate.of(2026, 10, 25)), "02:30", BERLIN);
        assertFalse(w.refused());
        assertEquals("2026-10-25T02:30+02:00", w.iso(), "the first 02:30, still summer time");
        assertTrue(AssessedTime.twiceNote(w.iso(), BERLIN).contains("happened twice"));
        assertEquals("", AssessedTime.twiceNote("2026-03-05T02:40+01:00", BERLIN));
    }

    @Test
    @DisplayName("a date without a time, or a time without a date, is refused; both empty records nothing")
    void halves() {
        assertTrue(AssessedTime.write(Optional.of(MARCH_5), "", BERLIN).refused());
        assertTrue(AssessedTime.write(Optional.empty(), "02:40", BERLIN).problem().contains("has no date"));
        assertEquals(new AssessedTime.Written("", ""), AssessedTime.write(Optional.empty(), " ", BERLIN));
    }

    @Test
    @DisplayName("a recorded value is shown in its own offset; text that is no date-time stays whole")
    void shown() {
        assertEquals(new AssessedTime.Shown(Optional.of(MARCH_5), "02:40"), AssessedTime.show("2026-03-05T02:40+01:00"));
        assertEquals(new AssessedTime.Shown(Optional.of(MARCH_5), "02:40:30"),
                AssessedTime.show("2026-03-05T02:40:30Z"));
        assertEquals(new AssessedTime.Shown(Optional.of(MARCH_5), "25:61"), AssessedTime.show("2026-03-05T25:61"));
        assertEquals(new AssessedTime.Shown(Optional.empty(), "last night"), AssessedTime.show("last night"));
        assertEquals("2026-03-05T01:40Z", AssessedTime.now(java.time.Clock.fixed(
                java.time.Instant.parse("2026-03-05T01:40:59Z"), ZoneOffset.UTC)), "to the minute");
    }
}
