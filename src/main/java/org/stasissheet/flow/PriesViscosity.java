package org.stasissheet.flow;

/**
 * The Pries laws for the apparent viscosity of blood relative to its suspending plasma, exactly as DOMAIN.md §5
 * writes them. D is the vessel or tube diameter in µm, H the discharge hematocrit as a fraction.
 *
 * <ul>
 *   <li>In vitro (glass tubes): Pries AR, Neuhaus D, Gaehtgens P, Am J Physiol 1992;263:H1770–H1778.</li>
 *   <li>In vivo (with the endothelial surface layer): Pries AR et al., Circ Res 1994;75:904–915.</li>
 * </ul>
 *
 * <p>Valid for 4 ≤ D ≤ 1000 µm (inclusive) and 0 &lt; H &lt; 1 (exclusive); anything else is rejected with an
 * {@link IllegalArgumentException} naming the value, never extrapolated. Both laws describe high shear: they do
 * not capture low-shear red-cell aggregation.
 */
public final class PriesViscosity {
    private PriesViscosity() {
    }

    public static final double MIN_DIAMETER_UM = 4;
    public static final double MAX_DIAMETER_UM = 1000;

    private static final double REFERENCE_H = 0.45;

    /** In vitro relative apparent viscosity η_rel(D, H), Pries 1992. */
    public static double inVitroRelative(double diameterUm, double hematocrit) {
        check(diameterUm, hematocrit);
        return 1 + (tubeViscosityAt045(diameterUm) - 1) * hematocritShape(diameterUm, hematocrit);
    }

    /**
     * In vivo relative apparent viscosity, Pries 1994:
     * η_vivo = [1 + (η*0.45 − 1)·S(D, H)·(D/(D − 1.1))²]·(D/(D − 1.1))², S the hematocrit shape term of the
     * in vitro law. Both squared factors and the leading "1 +" are part of the law (public code often drops one).
     */
    public static double inVivoRelative(double diameterUm, double hematocrit) {
        check(diameterUm, hematocrit);
        double w = diameterUm / (diameterUm - 1.1);
        double w2 = w * w;
        return (1 + (vesselViscosityAt045(diameterUm) - 1) * hematocritShape(diameterUm, hematocrit) * w2) * w2;
    }

    /** η0.45(D) = 220·e^(−1.3·D) + 3.2 − 2.44·e^(−0.06·D^0.645), the in vitro value at H = 0.45. */
    static double tubeViscosityAt045(double d) {
        return 220 * Math.exp(-1.3 * d) + 3.2 - 2.44 * Math.exp(-0.06 * Math.pow(d, 0.645));
    }

    /** η*0.45(D) = 6·e^(−0.085·D) + 3.2 − 2.44·e^(−0.06·D^0.645), the in vivo value at H = 0.45. */
    static double vesselViscosityAt045(double d) {
        return 6 * Math.exp(-0.085 * d) + 3.2 - 2.44 * Math.exp(-0.06 * Math.pow(d, 0.645));
    }

    /** C(D) = (0.8 + e^(−0.075·D))·(−1 + 1/(1 + 10^−11·D^12)) + 1/(1 + 10^−11·D^12). */
    static double shapeExponent(double d) {
        double s = 1 / (1 + 1e-11 * Math.pow(d, 12));
        return (0.8 + Math.exp(-0.075 * d)) * (-1 + s) + s;
    }

    /**
     * S(D, H) = ((1 − H)^C − 1)/((1 − 0.45)^C − 1), computed with expm1 so it stays exact where C passes through
     * zero (near D ≈ 8 µm); at C = 0 exactly it takes its limit ln(1 − H)/ln(0.55).
     */
    static double hematocritShape(double d, double h) {
        double c = shapeExponent(d);
        double lnFree = Math.log1p(-h);
        double lnReference = Math.log1p(-REFERENCE_H);
        if (c == 0) {
            return lnFree / lnReference;
        }
        return Math.expm1(c * lnFree) / Math.expm1(c * lnReference);
    }

    static void check(double diameterUm, double hematocrit) {
        if (!(diameterUm >= MIN_DIAMETER_UM && diameterUm <= MAX_DIAMETER_UM)) {
            throw new IllegalArgumentException("diameter " + diameterUm
                    + " µm is outside the Pries laws' range 4–1000 µm; no extrapolation is made");
        }
        if (!(hematocrit > 0 && hematocrit < 1)) {
            throw new IllegalArgumentException("hematocrit " + hematocrit
                    + " (fraction) is outside the Pries laws' range 0 < H < 1");
        }
    }
}
