package org.stasissheet.load;

import static org.junit.jupiter.api.Assertions.*;

import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.util.TimeZone;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The wall clock reads the UTC offset through TimeZone (start-up speed); reference: java.time's own zone rules for
 * the same zone must give the same offset at every instant, across daylight-saving changes both ways.
 */
class WallClockTest {
    private static final String[] ZONES = {"Europe/Berlin", "America/New_York", "Australia/Lord_Howe",
        "Asia/Kolkata", "America/St_Johns", "Pacific/Chatham", "Etc/UTC", "Africa/Casablanca"};

    @Test
    @DisplayName("the offset agrees with java.time's zone rules every 6 hours over 2025-2027 in eight zones")
    void offsetAgreesWithZoneRules() {
        TimeZone saved = TimeZone.getDefault();
        try {
            for (String id : ZONES) {
                TimeZone.setDefault(TimeZone.getTimeZone(id));
                var rules = ZoneId.of(id).getRules();
                for (Instant t = Instant.parse("2025-01-01T00:00:00Z"); t.isBefore(Instant.parse("2027-12-31T00:00:00Z"));
                        t = t.plus(Duration.ofHours(6))) {
                    assertEquals(rules.getOffset(t), WallClock.offsetAt(t), id + " at " + t);
                }
            }
        } finally {
            TimeZone.setDefault(saved);
        }
    }

    @Test
    @DisplayName("now() is the current instant with the zone's present offset")
    void nowIsNow() {
        TimeZone saved = TimeZone.getDefault();
        try {
            TimeZone.setDefault(TimeZone.getTimeZone("Asia/Kolkata"));
            Instant before = Instant.now();
            OffsetDateTime now = WallClock.now();
            Instant after = Instant.now();
            assertEquals(ZoneId.of("Asia/Kolkata").getRules().getOffset(now.toInstant()), now.getOffset());
            assertFalse(now.toInstant().isBefore(before.minusMillis(1)));
            assertFalse(now.toInstant().isAfter(after));
            assertEquals(now.getOffset(), WallClock.clock().getZone());
        } finally {
            TimeZone.setDefault(saved);
        }
    }
}
