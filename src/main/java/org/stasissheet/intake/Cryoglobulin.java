package org.stasissheet.intake;

/** Whether a cryoglobulin is known to be present. */
public enum Cryoglobulin implements Enums.Coded {
    PRESENT("present"),
    ABSENT("absent"),
    UNKNOWN("unknown");

    private final String code;

    Cryoglobulin(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }
}
