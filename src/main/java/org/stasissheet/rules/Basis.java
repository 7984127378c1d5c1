package org.stasissheet.rules;

import org.stasissheet.intake.Enums;

/** How far a number or a rule has been checked against its source (see DOMAIN.md's basis tags). */
public enum Basis implements Enums.Coded {
    /** Seen in the named source, or a reliable abstract of it. */
    PUBLISHED("published"),
    /** The named source's numbers as quoted by a later review or handbook. */
    PUBLISHED_SECONDARY("published-secondary"),
    /** A fact of the trade with no single source. */
    COMMON_PRACTICE("common-practice"),
    /** Recalled, not verified in a source text; every output that uses it says so. */
    FROM_MEMORY("from-memory");

    private final String code;

    Basis(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }

    /** The basis in words for people; the rule files keep the code ({@code from-memory}). */
    public String words() {
        return switch (this) {
            case PUBLISHED -> "published";
            case PUBLISHED_SECONDARY -> "published, quoted by a later source";
            case COMMON_PRACTICE -> "common practice (no single source)";
            case FROM_MEMORY -> "unverified \u2014 check the source";
        };
    }
}
