package org.stasissheet.measure;

import java.util.Objects;

/**
 * One accepted unit of an analyte: its UCUM code, how clinicians write it, and the linear factor that turns a
 * value in this unit into the analyte's canonical unit ({@code canonical = value × toCanonical}).
 *
 * @param ucum        the UCUM code as written in a case file, e.g. {@code 10*9/L}
 * @param display     the way it is printed for people, e.g. {@code ×10⁹/L}
 * @param toCanonical strictly positive, finite factor
 * @param source      where the factor comes from (a definition, a molar mass with its source)
 */
public record UnitOption(String ucum, String display, double toCanonical, String source) {
    public UnitOption {
        Objects.requireNonNull(ucum, "ucum");
        Objects.requireNonNull(display, "display");
        Objects.requireNonNull(source, "source");
        if (!(toCanonical > 0) || !Double.isFinite(toCanonical)) {
            throw new IllegalArgumentException("toCanonical must be positive and finite: " + toCanonical);
        }
    }
}
