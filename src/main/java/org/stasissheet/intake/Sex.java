package org.stasissheet.intake;

/** Used by the blood-volume formula. */
public enum Sex implements Enums.Coded {
    FEMALE("female"),
    MALE("male");

    private final String code;

    Sex(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }
}
