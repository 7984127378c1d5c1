package org.stasissheet.intake;

/** Leukemia type, deciding the count thresholds. */
public enum Leukemia implements Enums.Coded {
    NONE("none"),
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
