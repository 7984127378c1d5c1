package org.stasissheet.apheresis;

/**
 * One-compartment plasma exchange arithmetic (DOMAIN.md §4), written once and used by the exchange rows and by
 * the flow what-ifs. It ignores redistribution from the extravascular space during the run, so it describes the
 * moment the procedure ends, not the rebound afterwards.
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
     * fraction (Reverberi &amp; Reverberi 2007 via DOMAIN.md §4). Always in (0, 1].
     */
    public static double paraproteinRemaining(double intravascularFraction, double plasmaVolumes) {
        if (!(intravascularFraction >= 0 && intravascularFraction <= 1)) {
            throw new IllegalArgumentException(
                    "intravascular fraction must be 0–1, was " + intravascularFraction);
        }
        return 1 - intravascularFraction * (1 - intravascularRemaining(plasmaVolumes));
    }

    /**
     * Serum viscosity projected after an exchange, log-linear in the paraprotein left:
     * SV_after = SV_ref × (SV / SV_ref)^r (DOMAIN.md §4; from memory that protein-solution viscosity rises roughly
     * exponentially with concentration). An approximation: it under-predicts the published falls (the safe side).
     * At or below the reference there is no excess to remove, so the measured value is kept.
     *
     * @param serumViscosity          the patient's value, on the lab's scale
     * @param referenceSerumViscosity the normal reference on the same scale
     * @param paraproteinRemaining    r from {@link #paraproteinRemaining}, 0–1
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

    private static void requireVolumes(double plasmaVolumes) {
        if (!(plasmaVolumes >= 0) || !Double.isFinite(plasmaVolumes)) {
            throw new IllegalArgumentException("plasma volumes must be ≥ 0, was " + plasmaVolumes);
        }
    }
}
