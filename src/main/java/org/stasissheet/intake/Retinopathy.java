package org.stasissheet.intake;

/** Fundoscopy finding, ordered from none to worst. */
public enum Retinopathy implements Enums.Coded {
    NOT_EXAMINED("not-examined", "fundi not examined"),
    NONE("none", "no retinopathy"),
    VENOUS_DILATION("venous-dilation", "retinal venous dilation"),
    HAEMORRHAGES("haemorrhages", "retinal haemorrhages"),
    PAPILLOEDEMA("papilloedema", "papilloedema");

    private final String code;
    private final String words;

    Retinopathy(String code, String words) {
        this.code = code;
        this.words = words;
    }

    /** The finding in clinical words, for people. */
    public String words() {
        return words;
    }

    @Override
    public String code() {
        return code;
    }
}
