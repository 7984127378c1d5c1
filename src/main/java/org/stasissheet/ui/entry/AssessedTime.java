package org.stasissheet.ui.entry;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The time of an assessment as people enter it, a date and a 24-hour time of day, turned into the case file's
 * ISO 8601 date-time with the offset of the computer's time zone on that date, and back. A time that cannot be
 * recorded exactly is refused with a message naming the field and the value; nothing is rounded or moved
 * (a time skipped when the clocks go forward is refused, not shifted by an hour).
 */
public final class AssessedTime {
    /** The words the messages name the field by. */
    public static final String FIELD = "Assessed at";

    /** {@code H:mm}, {@code HH:mm}, {@code HH:mm:ss} or {@code HHmm}; 24-hour. */
    private static final Pattern TIME = Pattern.compile("(\\d{1,2}):(\\d{2})(?::(\\d{2}))?|(\\d{2})(\\d{2})");
    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("HH:mm");
    private static final DateTimeFormatter SHOWN_SECONDS = DateTimeFormatter.ofPattern("HH:mm:ss");

    private AssessedTime() {
    }

    /** What a date and a time text give: the ISO text to record, and a message when it is not a valid time. */
    public record Written(String iso, String problem) {
        public Written {
            Objects.requireNonNull(iso, "iso");
            Objects.requireNonNull(problem, "problem");
        }

        public boolean refused() {
            return !problem.isEmpty();
        }
    }

    /** The date and the time text shown for a recorded value; text that is no ISO date-time stays as typed. */
    public record Shown(Optional<LocalDate> date, String time) {
        public Shown {
            Objects.requireNonNull(date, "date");
            Objects.requireNonNull(time, "time");
        }
    }

    /** The current time, to the minute, as the case file records it. */
    public static String now(java.time.Clock clock) {
        return OffsetDateTime.now(clock).truncatedTo(ChronoUnit.MINUTES).toString();
    }

    /**
     * The value to record for a date and a typed time in {@code zone}. A refused time is still recorded, as the
     * text typed, so the case reader refuses the case too and no worksheet is printed with an old time; the
     * message says what to write instead.
     */
    public static Written write(Optional<LocalDate> date, String timeText, ZoneId zone) {
        String typed = timeText.strip();
        if (date.isEmpty() && typed.isEmpty()) {
            return new Written("", "");
        }
        if (date.isEmpty()) {
            return new Written(typed, FIELD + ": the time " + typed + " has no date; pick the date");
        }
        if (typed.isEmpty()) {
            return new Written(date.get().toString(), FIELD + " (time): empty; write the time as HH:mm, 24-hour");
        }
        Optional<LocalTime> time = time(typed);
        if (time.isEmpty()) {
            return new Written(date.get() + "T" + typed, FIELD + " (time): '" + typed
                    + "' is not a time of day; write HH:mm, 24-hour, e.g. 02:40 or 14:05");
        }
        LocalDateTime local = LocalDateTime.of(date.get(), time.get());
        List<ZoneOffset> offsets = zone.getRules().getValidOffsets(local);
        if (offsets.isEmpty()) {
            return new Written(date.get() + "T" + typed, FIELD + " (time): " + typed + " on " + date.get()
                    + " did not happen in time zone " + zone.getId() + " (the clocks went forward); check the time");
        }
        // the hour the clocks go back happens twice: the first is recorded, and twiceNote says so
        // ISO 8601 as java.time writes it: seconds only when there are some (02:40+01:00, 02:40:30+01:00)
        return new Written(OffsetDateTime.of(local, offsets.get(0)).toString(), "");
    }

    /**
     * A note when a valid time happened twice in {@code zone} (the clocks went back): which one was recorded.
     * Empty otherwise.
     */
    public static String twiceNote(String iso, ZoneId zone) {
        try {
            OffsetDateTime t = OffsetDateTime.parse(iso);
            if (zone.getRules().getValidOffsets(t.toLocalDateTime()).size() > 1) {
                return FIELD + ": " + t.toLocalTime().format(SHOWN) + " happened twice that night (the clocks went "
                        + "back); recorded as the one at UTC" + t.getOffset().getId() + ". Check which one was meant.";
            }
        } catch (DateTimeParseException e) {
            // not a recorded time: nothing to note
        }
        return "";
    }

    /** The date and time to show for a recorded value, in the value's own offset. */
    public static Shown show(String recorded) {
        String s = recorded.strip();
        if (s.isEmpty()) {
            return new Shown(Optional.empty(), "");
        }
        try {
            OffsetDateTime t = OffsetDateTime.parse(s);
            LocalTime time = t.toLocalTime();
            return new Shown(Optional.of(t.toLocalDate()),
                    (time.getSecond() == 0 && time.getNano() == 0 ? SHOWN : SHOWN_SECONDS).format(time));
        } catch (DateTimeParseException e) {
            int t = s.indexOf('T');
            if (t == 10) {
                try {
                    return new Shown(Optional.of(LocalDate.parse(s.substring(0, 10))), s.substring(11));
                } catch (DateTimeParseException notADate) {
                    // falls through: the whole text stays in the time field
                }
            }
            return new Shown(Optional.empty(), s);
        }
    }

    /** A 24-hour time of day, or empty. */
    static Optional<LocalTime> time(String typed) {
        Matcher m = TIME.matcher(typed.strip());
        if (!m.matches()) {
            return Optional.empty();
        }
        int h = Integer.parseInt(m.group(1) != null ? m.group(1) : m.group(4));
        int min = Integer.parseInt(m.group(2) != null ? m.group(2) : m.group(5));
        int sec = m.group(3) != null ? Integer.parseInt(m.group(3)) : 0;
        if (h > 23 || min > 59 || sec > 59) {
            return Optional.empty();
        }
        return Optional.of(LocalTime.of(h, min, sec));
    }
}
