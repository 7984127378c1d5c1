package org.stasissheet.intake;

import java.util.Objects;
import java.util.Optional;

/**
 * Graded symptoms and bedside signs. Organ grades are 0–3 (0 none … 3 severe) or empty when not assessed;
 * signs are {@link Observation}s so "not assessed" is never confused with "absent".
 */
public record Findings(Optional<Integer> pulmonaryGrade, Optional<Integer> neurologicalGrade,
                       Optional<Integer> otherOrganGrade,
                       Observation mucosalBleeding, Observation visualDisturbance, Retinopathy retinopathy,
                       Observation heartFailure, Observation arrhythmia, Observation seizure) {
    public static final Findings NOT_ASSESSED = new Findings(Optional.empty(), Optional.empty(), Optional.empty(),
            Observation.NOT_ASSESSED, Observation.NOT_ASSESSED, Retinopathy.NOT_EXAMINED,
            Observation.NOT_ASSESSED, Observation.NOT_ASSESSED, Observation.NOT_ASSESSED);

    public Findings {
        requireGrade(pulmonaryGrade, "pulmonaryGrade");
        requireGrade(neurologicalGrade, "neurologicalGrade");
        requireGrade(otherOrganGrade, "otherOrganGrade");
        Objects.requireNonNull(mucosalBleeding, "mucosalBleeding");
        Objects.requireNonNull(visualDisturbance, "visualDisturbance");
        Objects.requireNonNull(retinopathy, "retinopathy");
        Objects.requireNonNull(heartFailure, "heartFailure");
        Objects.requireNonNull(arrhythmia, "arrhythmia");
        Objects.requireNonNull(seizure, "seizure");
    }

    private static void requireGrade(Optional<Integer> grade, String name) {
        Objects.requireNonNull(grade, name);
        grade.ifPresent(g -> {
            if (g < 0 || g > 3) {
                throw new IllegalArgumentException(name + " must be 0–3, was " + g);
            }
        });
    }
}
