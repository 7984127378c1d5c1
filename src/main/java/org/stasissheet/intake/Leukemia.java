package org.stasissheet.intake;

/**
 * Leukemia type, deciding the count thresholds. {@link #ACUTE_UNTYPED} is a real state at first presentation (blasts
 * seen, lineage not yet known) and is graded as an acute leukemia; {@link #NONE} means no leukemia is recorded.
 */
public enum Leukemia implements Enums.Coded {
    NONE("none", "no leukemia recorded"),
    ACUTE_UNTYPED("acute-untyped", "acute leukemia, not yet typed"),
    AML("AML", "AML"),
    APL("APL", "APL"),
    ALL("ALL", "ALL"),
    CML("CML", "CML"),
    CLL("CLL", "CLL");

    private final String code;
    private final String words;

    Leukemia(String code, String words) {
        this.code = code;
        this.words = words;
    }

    /** The type in clinical words, for people. */
    public String words() {
        return words;
    }

    @Override
    public String code() {
        return code;
    }
}
