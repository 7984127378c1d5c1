package org.stasissheet.flow;

/**
 * The published laws and figures behind the flow estimates. Citations as in the team's domain reference (DOMAIN.md §4–5), with its basis tags; every renderer
 * cites these, none writes its own.
 */
public final class FlowSources {
    private FlowSources() {
    }

    public static final String POISEUILLE = "Poiseuille's law: at fixed pressure and geometry flow varies as "
            + "reference viscosity ÷ patient viscosity [published]";

    public static final String PRIES_1992 = "Pries AR, Neuhaus D, Gaehtgens P, Am J Physiol 1992;263:H1770–H1778 "
            + "(in vitro blood viscosity law) [published]";

    public static final String PRIES_1994 = "Pries AR et al., Circ Res 1994;75:904–915 (in vivo viscosity law with the "
            + "endothelial surface layer) [published]";

    public static final String LICHTMAN_ROWE = "Lichtman MA, Rowe JM, Blood 1982;60(2):279–283 (leukocrit) "
            + "[published]; mean cell volumes as ranges: CLL 154–244 fL (Costello C et al., Br J Haematol "
            + "1980;45(2):209–214 [published, abstract]), ALL blasts from about 82 fL and monocytic AML blasts "
            + "240–730 fL [published, secondary], the ALL upper end 250 fL [from memory]";
}
