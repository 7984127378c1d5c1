package org.stasissheet.intake;

/**
 * Leukemia type, deciding the count thresholds. {@link #ACUTE_UNTYPED} is a real state at first presentation (blasts
 * seen, lineage not yet known) and is graded as an acute leukemia; {@link #NONE} means no leukemia is recorded.
 */
public enum Leukemia implements Enums.Coded {
    NONE("none"),
    ACUTE_UNTYPED("acute-untyped"),
    AML("AML"),
    APL("APL"),
    ALL("ALL"),
    CML("CML"),
    CLL("CLL");

    private final String code;

    Leukemia(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }
}
