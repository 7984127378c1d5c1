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

    public static final String ONE_COMPARTMENT = "Exchange kinetics: right after the procedure e^−V of the plasma level "
            + "is left (standard one-compartment apheresis kinetics, e.g. Kaplan) [published]; after redistribution "
            + "1 − f·(1 − e^−V) with the intravascular fractions of Reverberi R, Reverberi L, Blood Transfus "
            + "2007;5(3):164–174 (IgG 45 %, IgA 42 % [published]; IgM 78 % [published, secondary])";

    public static final String SV_PROJECTION = "Serum viscosity after exchange: log-linear projection, an approximation "
            + "[from memory: exponential rise of protein-solution viscosity with concentration]; checked against "
            + "the IgA case of Gertz MA, Blood 2018;132(13):1379–1385 (13.6 → 3.6 → 1.8 cP), which the projection "
            + "right after the procedure follows more closely";

    public static final String LEUKAPHERESIS = "Leukapheresis lowers the white count by about 20–50 % per procedure "
            + "[common practice]";
}
