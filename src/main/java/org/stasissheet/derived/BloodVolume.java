package org.stasissheet.derived;

import java.util.Objects;
import org.stasissheet.intake.Sex;

/**
 * Blood and plasma volume formulas in litres. Pure arithmetic with checked arguments; choosing whether a formula
 * applies to a patient is {@link CaseQuantities}' job.
 */
public final class BloodVolume {
    private BloodVolume() {
    }

    /**
     * Total blood volume by Nadler, Hidalgo &amp; Bloch (Surgery 1962;51:224–232), coefficients as in DOMAIN.md §4:
     * men 0.3669·H³ + 0.03219·W + 0.6041, women 0.3561·H³ + 0.03308·W + 0.1833 (H in metres, W in kg).
     */
    public static double nadlerLitres(Sex sex, double heightCm, double weightKg) {
        Objects.requireNonNull(sex, "sex");
        requirePositive(heightCm, "height", "cm");
        requirePositive(weightKg, "weight", "kg");
        double h = heightCm / 100;
        double h3 = h * h * h;
        return switch (sex) {
            case MALE -> 0.3669 * h3 + 0.03219 * weightKg + 0.6041;
            case FEMALE -> 0.3561 * h3 + 0.03308 * weightKg + 0.1833;
        };
    }

    /** Estimated plasma volume by Kaplan (ASAIO Trans 1990;36:M597–599): 0.065 × weight × (1 − Hct). */
    public static double kaplanPlasmaLitres(double weightKg, double hematocrit) {
        requirePositive(weightKg, "weight", "kg");
        requireFraction(hematocrit);
        return 0.065 * weightKg * (1 - hematocrit);
    }

    /** The alternative plasma volume: total blood volume × (1 − Hct) (DOMAIN.md §4). */
    public static double plasmaFromBloodVolumeLitres(double bloodVolumeL, double hematocrit) {
        requirePositive(bloodVolumeL, "blood volume", "L");
        requireFraction(hematocrit);
        return bloodVolumeL * (1 - hematocrit);
    }

    static void requirePositive(double value, String name, String unit) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a positive number of " + unit + ", was " + value);
        }
    }

    static void requireFraction(double hematocrit) {
        if (!(hematocrit > 0 && hematocrit < 1)) {
            throw new IllegalArgumentException("hematocrit must be a fraction 0 < H < 1, was " + hematocrit);
        }
    }
}
