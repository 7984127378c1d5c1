package org.stasissheet.register;

import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.Locale;
import java.util.Optional;

/**
 * How the register writes a time: a UTC instant to the millisecond in one fixed-width ISO 8601 form
 * ({@code 2026-03-05T01:40:00.000Z}), so text order is time order in either database; and how it shows one to
 * people, in their zone with its offset.
 */
public final class RegisterTime {
    private static final DateTimeFormatter STORED =
            DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT).withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("uuuu-MM-dd HH:mm xxx", Locale.ROOT);

    private RegisterTime() {
    }

    public static String format(Instant t) {
        return STORED.format(t.truncatedTo(ChronoUnit.MILLIS));
    }

    public static Instant parse(String stored) {
        return Instant.from(STORED.parse(stored));
    }

    public static String show(Instant t, ZoneId zone) {
        return SHOWN.format(t.atZone(zone));
    }

    /** An ISO 8601 time with an offset ({@code 2026-03-05T02:40:00+01:00}) or in UTC ({@code ...Z}). */
    public static Optional<Instant> parseIso(String text) {
        try {
            return Optional.of(java.time.OffsetDateTime.parse(text.strip()).toInstant());
        } catch (DateTimeParseException e) {
            return Optional.empty();
        }
    }
}
