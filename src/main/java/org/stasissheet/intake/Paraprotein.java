package org.stasissheet.intake;

/** The monoclonal protein's isotype; an IgG3 value is entered under igg. */
public enum Paraprotein implements Enums.Coded {
    NONE("none"),
    IGM("IgM"),
    IGG("IgG"),
    IGG3("IgG3"),
    IGA("IgA");

    private final String code;

    Paraprotein(String code) {
        this.code = code;
    }

    @Override
    public String code() {
        return code;
    }
}
