package org.stasissheet.intake;

/** A sign that was seen, looked for and absent, or not looked for. */
public enum Observation implements Enums.Coded {
    YES("yes"),
    NO("no"),
    NOT_ASSESSED("not-assessed");

    private final String code;

    Observation(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }
}
