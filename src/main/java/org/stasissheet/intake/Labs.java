package org.stasissheet.intake;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.stasissheet.measure.Analyte;

/** An immutable set of lab values keyed by analyte; any analyte may be absent. */
public record Labs(Map<Analyte, Measurement> values) {
    public static final Labs NONE = new Labs(Map.of());

    public Labs {
        Objects.requireNonNull(values, "values");
        EnumMap<Analyte, Measurement> copy = new EnumMap<>(Analyte.class);
        values.forEach((analyte, m) -> {
            if (m.analyte() != analyte) {
                throw new IllegalArgumentException("measurement of " + m.analyte() + " filed under " + analyte);
            }
            if (analyte.isBodyMeasure()) {
                throw new IllegalArgumentException(analyte.key() + " belongs to the patient, not to labs");
            }
            copy.put(analyte, m);
        });
        values = Collections.unmodifiableMap(copy);
    }

    public Optional<Measurement> get(Analyte analyte) {
        return Optional.ofNullable(values.get(analyte));
    }

    /** The value in canonical units, empty when not measured. */
    public OptionalDouble canonical(Analyte analyte) {
        Measurement m = values.get(analyte);
        return m == null ? OptionalDouble.empty() : OptionalDouble.of(m.canonical());
    }

    public boolean has(Analyte analyte) {
        return values.containsKey(analyte);
    }

    public Labs with(Measurement m) {
        EnumMap<Analyte, Measurement> copy = new EnumMap<>(Analyte.class);
        copy.putAll(values);
        copy.put(m.analyte(), m);
        return new Labs(copy);
    }

    public Labs without(Analyte analyte) {
        EnumMap<Analyte, Measurement> copy = new EnumMap<>(Analyte.class);
        copy.putAll(values);
        copy.remove(analyte);
        return new Labs(copy);
    }
}
