package org.stasissheet.derived;

/**
 * Plasma exchange arithmetic (one-compartment kinetics with an intravascular fraction, DOMAIN.md §4 and §6), written
 * once for the exchange rows, the flow what-ifs and, later, the course of treatment. Pure functions of numbers.
 *
 * <p>Two moments are told apart because they differ a lot for IgG and IgA, whose larger part lives outside the
 * vessels: right after the procedure the plasma level is P·e^−V (only the intravascular pool was exchanged); once
 * the extravascular pool has flowed back it is P·(1 − f·(1 − e^−V)). Synthesis during the interval is ignored in
 * both.
 */
public final class ExchangeKinetics {
    private ExchangeKinetics() {
    }

    /** Fraction of an intravascular solute left after exchanging {@code plasmaVolumes} plasma volumes: e^−V. */
    public static double intravascularRemaining(double plasmaVolumes) {
        requireVolumes(plasmaVolumes);
        return Math.exp(-plasmaVolumes);
    }

    /**
     * Fraction of the whole-body paraprotein left, r = 1 − f·(1 − e^−V), where f is the isotype's intravascular
     * fraction (Reverberi &amp; Reverberi 2007 via DOMAIN.md §4/§6): the plasma level once the extravascular pool has
     * flowed back. Always in (0, 1].
     */
    public static double paraproteinRemaining(double intravascularFraction, double plasmaVolumes) {
        requireFraction(intravascularFraction);
        return 1 - intravascularFraction * (1 - intravascularRemaining(plasmaVolumes));
    }

    /**
     * Both projections of a plasma level: immediate = start × e^−V, after redistribution = start × (1 − f(1 − e^−V)).
     * The one API the worksheet and the course of treatment share.
     *
     * @param start                 the level before the exchange, in any unit (the result is in the same unit)
     * @param intravascularFraction f, 0–1
     * @param plasmaVolumes         V, ≥ 0
     */
    public static ExchangeProjection project(double start, double intravascularFraction, double plasmaVolumes) {
        if (!(start >= 0) || !Double.isFinite(start)) {
            throw new IllegalArgumentException("starting level must be a finite number ≥ 0, was " + start);
        }
        return ordered(start * intravascularRemaining(plasmaVolumes),
                start * paraproteinRemaining(intravascularFraction, plasmaVolumes));
    }

    /**
     * Both projections of the serum viscosity, each by the log-linear rule of {@link #projectedSerumViscosity} with
     * the paraprotein fraction left at that moment (e^−V right after, 1 − f(1 − e^−V) after redistribution).
     */
    public static ExchangeProjection projectSerumViscosity(double serumViscosity, double referenceSerumViscosity,
                                                           double intravascularFraction, double plasmaVolumes) {
        return ordered(
                projectedSerumViscosity(serumViscosity, referenceSerumViscosity,
                        intravascularRemaining(plasmaVolumes)),
                projectedSerumViscosity(serumViscosity, referenceSerumViscosity,
                        paraproteinRemaining(intravascularFraction, plasmaVolumes)));
    }

    /**
     * Serum viscosity with a fraction r of the paraprotein left, log-linear in r:
     * SV_after = SV_ref × (SV / SV_ref)^r (DOMAIN.md §4; from memory that protein-solution viscosity rises roughly
     * exponentially with concentration). An approximation. At or below the reference there is no excess to remove,
     * so the measured value is kept.
     *
     * @param serumViscosity          the patient's value, on the lab's scale
     * @param referenceSerumViscosity the normal reference on the same scale
     * @param paraproteinRemaining    r, 0–1
     */
    public static double projectedSerumViscosity(double serumViscosity, double referenceSerumViscosity,
                                                 double paraproteinRemaining) {
        BloodVolume.requirePositive(serumViscosity, "serum viscosity", "cP");
        BloodVolume.requirePositive(referenceSerumViscosity, "reference serum viscosity", "cP");
        if (!(paraproteinRemaining >= 0 && paraproteinRemaining <= 1)) {
            throw new IllegalArgumentException("paraprotein remaining must be 0–1, was " + paraproteinRemaining);
        }
        if (serumViscosity <= referenceSerumViscosity) {
            return serumViscosity;
        }
        return referenceSerumViscosity * Math.pow(serumViscosity / referenceSerumViscosity, paraproteinRemaining);
    }

    /** At f = 1 both moments agree; rounding must not put the later one below the earlier. */
    private static ExchangeProjection ordered(double immediate, double afterRedistribution) {
        return new ExchangeProjection(immediate, Math.max(immediate, afterRedistribution));
    }

    private static void requireFraction(double intravascularFraction) {
        if (!(intravascularFraction >= 0 && intravascularFraction <= 1)) {
            throw new IllegalArgumentException("intravascular fraction must be 0–1, was " + intravascularFraction);
        }
    }

    private static void requireVolumes(double plasmaVolumes) {
        if (!(plasmaVolumes >= 0) || !Double.isFinite(plasmaVolumes)) {
            throw new IllegalArgumentException("plasma volumes must be ≥ 0, was " + plasmaVolumes);
        }
    }
}
