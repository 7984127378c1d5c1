package org.stasissheet.intake;

/** Fundoscopy finding, ordered from none to worst. */
public enum Retinopathy implements Enums.Coded {
    NOT_EXAMINED("not-examined"),
    NONE("none"),
    VENOUS_DILATION("venous-dilation"),
    HAEMORRHAGES("haemorrhages"),
    PAPILLOEDEMA("papilloedema");

    private final String code;

    Retinopathy(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }
}
