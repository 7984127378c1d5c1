package org.stasissheet.flow;

/**
 * Poiseuille's law for steady laminar flow of a Newtonian fluid in a rigid straight tube:
 * Q = π r⁴ ΔP / (8 μ L), resistance R = 8 μ L / (π r⁴). Any consistent units (SI recommended: Pa·s, m, Pa).
 * Blood is not Newtonian in small vessels; the Pries laws supply the apparent viscosity that makes this usable.
 */
public final class Poiseuille {
    private Poiseuille() {
    }

    /** R = 8 μ L / (π r⁴). */
    public static double resistance(double viscosity, double length, double radius) {
        requirePositive(viscosity, "viscosity");
        requirePositive(length, "length");
        requirePositive(radius, "radius");
        return 8 * viscosity * length / (Math.PI * Math.pow(radius, 4));
    }

    /** Q = ΔP / R. */
    public static double flow(double pressureDrop, double viscosity, double length, double radius) {
        if (!Double.isFinite(pressureDrop)) {
            throw new IllegalArgumentException("pressure drop must be finite, was " + pressureDrop);
        }
        return pressureDrop / resistance(viscosity, length, radius);
    }

    /**
     * Flow of the patient relative to the reference at the same pressure and geometry: μ_reference / μ_patient
     * (everything else in the law cancels).
     */
    public static double relativeFlow(double referenceViscosity, double patientViscosity) {
        requirePositive(referenceViscosity, "reference viscosity");
        requirePositive(patientViscosity, "patient viscosity");
        return referenceViscosity / patientViscosity;
    }

    private static void requirePositive(double value, String name) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a positive finite number, was " + value);
        }
    }
}
