package org.stasissheet.load;

import java.time.Clock;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.TimeZone;

/**
 * The machine's clock with its present UTC offset, for stamping a worksheet or starting a new case.
 *
 * <p>Why not {@link Clock#systemDefaultZone()}: the first region zone that java.time resolves starts its zone-rules
 * provider, which searches every jar on the class path for other providers (some 35 ms of a cold {@code pdf} here,
 * src/bench/RESULTS.md). The offset read through {@link TimeZone} comes from the same time-zone database without
 * that search. The offset is read afresh at every call, so a clock kept across a daylight-saving change stays right.
 */
public final class WallClock extends Clock {
    private static final WallClock INSTANCE = new WallClock();

    private WallClock() {
    }

    /** The clock; its zone is the offset in force now. */
    public static Clock clock() {
        return INSTANCE;
    }

    /** The current time with the offset in force now. */
    public static OffsetDateTime now() {
        return OffsetDateTime.now(INSTANCE);
    }

    /** The machine's UTC offset at this instant, daylight saving included. */
    static ZoneOffset offsetAt(Instant instant) {
        return ZoneOffset.ofTotalSeconds(TimeZone.getDefault().getOffset(instant.toEpochMilli()) / 1000);
    }

    @Override
    public ZoneId getZone() {
        return offsetAt(Instant.now());
    }

    @Override
    public Clock withZone(ZoneId zone) {
        return Clock.system(zone);
    }

    @Override
    public Instant instant() {
        return Instant.now();
    }

    @Override
    public long millis() {
        return System.currentTimeMillis();
    }
}
