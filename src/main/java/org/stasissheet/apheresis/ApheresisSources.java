package org.stasissheet.apheresis;

/**
 * The published methods and common-practice figures behind the apheresis planning numbers. Citations as in the team's domain reference (DOMAIN.md §4–5), with its basis tags; every renderer
 * cites these, none writes its own.
 */
public final class ApheresisSources {
    private ApheresisSources() {
    }

    public static final String NADLER = "Nadler SB, Hidalgo JU, Bloch T, Surgery 1962;51:224–232 (total blood volume) "
            + "[published]";

    public static final String KAPLAN = "Kaplan AA, ASAIO Trans 1990;36:M597–599 (estimated plasma volume) "
            + "[published, secondary]";

    public static final String ONE_COMPARTMENT = "One-compartment exchange kinetics, fraction left e^−V (standard "
            + "apheresis kinetics, e.g. Kaplan) [published]; intravascular fractions: Reverberi R, Reverberi L, "
            + "Blood Transfus 2007;5(3):164–174 (IgM 76 % from memory)";

    public static final String SV_PROJECTION = "Serum viscosity after exchange: log-linear projection, an approximation "
            + "[from memory: exponential rise of protein-solution viscosity with concentration]";

    public static final String LEUKAPHERESIS = "Leukapheresis lowers the white count by about 20–50 % per procedure "
            + "[common practice]";
}
