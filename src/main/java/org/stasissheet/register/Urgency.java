package org.stasissheet.register;

import java.util.Comparator;
import java.util.Optional;
import org.stasissheet.rules.Level;

/**
 * The register's order: most urgent first (act now, review, note, nothing flagged), then the earliest received,
 * then the lowest id so the order is stable. The same rank is stored with each referral so both databases sort
 * it the same way.
 */
public final class Urgency {
    public static final Comparator<Referral> MOST_URGENT_FIRST = Comparator
            .comparingInt((Referral r) -> rank(r.snapshot().highestLevel()))
            .thenComparing(Referral::receivedAt)
            .thenComparingLong(Referral::id);

    private Urgency() {
    }

    /** 0 act now, 1 review, 2 note, 3 nothing flagged. */
    public static int rank(Optional<Level> highest) {
        return highest.map(Level::ordinal).orElse(Level.values().length);
    }

    /** The stored word: the level's code, or {@code none}. */
    public static String code(Optional<Level> highest) {
        return highest.map(Level::code).orElse("none");
    }

    /** For people: the level's badge (symbol and word), or "nothing flagged". */
    public static String badge(Optional<Level> highest) {
        return highest.map(Level::badge).orElse("nothing flagged");
    }
}
