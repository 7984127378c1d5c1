package org.stasissheet.intake;

import java.util.Objects;
import java.util.Optional;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Quantity;
import org.stasissheet.measure.UnitOption;

/**
 * One measured value as entered, tied to its analyte. Guarantees: the unit is one the analyte accepts, so
 * {@link #canonical()} always exists. Plausibility is checked by the case reader, not here, so that a form can
 * hold an implausible value while it shows the message beside the field.
 *
 * @param temperature only for serum viscosity: the measuring temperature in {@code Cel}, when the lab gave it
 */
public record Measurement(Analyte analyte, Quantity entered, Optional<Quantity> temperature) {
    public Measurement {
        Objects.requireNonNull(analyte, "analyte");
        Objects.requireNonNull(entered, "entered");
        Objects.requireNonNull(temperature, "temperature");
        if (analyte.unitOption(entered.unit()).isEmpty()) {
            throw new IllegalArgumentException(analyte.key() + ": unit " + entered.unit() + " is not accepted");
        }
    }

    public static Measurement of(Analyte analyte, double value, String unit) {
        return new Measurement(analyte, new Quantity(value, unit), Optional.empty());
    }

    public UnitOption unitOption() {
        return analyte.unitOption(entered.unit()).orElseThrow();
    }

    /** The value in the analyte's canonical unit. */
    public double canonical() {
        return entered.value() * unitOption().toCanonical();
    }

    public Quantity canonicalQuantity() {
        return new Quantity(canonical(), analyte.canonicalUnit());
    }
}
