package org.stasissheet.report;

/**
 * The published methods behind the flow and apheresis numbers, cited in the PDF's source list. Citations as in
 * the team's domain reference (DOMAIN.md §4–5), with its basis tags.
 */
final class EstimateSources {
    private EstimateSources() {
    }

    static final String POISEUILLE = "Poiseuille's law: at fixed pressure and geometry flow varies as "
            + "reference viscosity ÷ patient viscosity [published]";
    static final String PRIES_1992 = "Pries AR, Neuhaus D, Gaehtgens P, Am J Physiol 1992;263:H1770–H1778 "
            + "(in vitro blood viscosity law) [published]";
    static final String PRIES_1994 = "Pries AR et al., Circ Res 1994;75:904–915 (in vivo viscosity law with the "
            + "endothelial surface layer) [published]";
    static final String LICHTMAN_ROWE = "Lichtman MA, Rowe JM, Blood 1982;60(2):279–283 (leukocrit); mean cell "
            + "volumes from memory [from memory]";
    static final String NADLER = "Nadler SB, Hidalgo JU, Bloch T, Surgery 1962;51:224–232 (total blood volume) "
            + "[published]";
    static final String KAPLAN = "Kaplan AA, ASAIO Trans 1990;36:M597–599 (estimated plasma volume) "
            + "[published, secondary]";
    static final String ONE_COMPARTMENT = "One-compartment exchange kinetics, fraction left e^−V (standard "
            + "apheresis kinetics, e.g. Kaplan) [published]; intravascular fractions: Reverberi R, Reverberi L, "
            + "Blood Transfus 2007;5(3):164–174 (IgM 76 % from memory)";
    static final String SV_PROJECTION = "Serum viscosity after exchange: log-linear projection, an approximation "
            + "[from memory: exponential rise of protein-solution viscosity with concentration]";
    static final String LEUKAPHERESIS = "Leukapheresis lowers the white count by about 20–50 % per procedure "
            + "[common practice]";
}
