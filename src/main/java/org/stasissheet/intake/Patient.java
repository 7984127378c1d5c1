package org.stasissheet.intake;

import java.util.Objects;
import java.util.Optional;
import org.stasissheet.measure.Analyte;

/**
 * Who the case is about. The label is free text chosen by the user (never required to identify anyone);
 * an empty label means none was given.
 *
 * @param ageYears whole years, 0–130 when present
 * @param height   a {@link Analyte#HEIGHT} measurement when present
 * @param weight   a {@link Analyte#WEIGHT} measurement when present
 */
public record Patient(String label, Optional<Sex> sex, Optional<Integer> ageYears,
                      Optional<Measurement> height, Optional<Measurement> weight) {
    public static final Patient UNKNOWN =
            new Patient("", Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty());

    public Patient {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(sex, "sex");
        Objects.requireNonNull(ageYears, "ageYears");
        Objects.requireNonNull(height, "height");
        Objects.requireNonNull(weight, "weight");
        ageYears.ifPresent(a -> {
            if (a < 0 || a > 130) {
                throw new IllegalArgumentException("ageYears must be 0–130, was " + a);
            }
        });
        height.ifPresent(h -> requireAnalyte(h, Analyte.HEIGHT));
        weight.ifPresent(w -> requireAnalyte(w, Analyte.WEIGHT));
    }

    private static void requireAnalyte(Measurement m, Analyte expected) {
        if (m.analyte() != expected) {
            throw new IllegalArgumentException("expected " + expected.key() + ", got " + m.analyte().key());
        }
    }

    /** A child for the tumor lysis limits: age known and under 18. */
    public boolean isChild() {
        return ageYears.map(a -> a < 18).orElse(false);
    }
}
