package org.stasissheet.rules;

import java.util.Arrays;
import java.util.Map;
import java.util.Optional;

/**
 * The kinds of quantity a rule-set parameter may have, each with the UCUM codes accepted for it and the factor
 * to the dimension's first unit ({@code base = value × factor}). Analyte-specific units (uric acid in mg/dL,
 * potassium in meq/L) are not here: they convert through {@link org.stasissheet.measure.Analyte}, which knows
 * molar masses and valences.
 *
 * <p>Sources of the factors: the definitions of the SI prefixes and UCUM (1 cP = 1 mPa·s; 1 mm[Hg] =
 * 133.322387415 Pa; 1 µL = 1 mm³).
 */
public enum Dimension {
    VOLUME("volume", Map.of("L", 1.0, "dL", 0.1, "mL", 1e-3, "uL", 1e-6, "fL", 1e-15)),
    FRACTION("fraction", Map.of("1", 1.0, "%", 0.01, "L/L", 1.0)),
    DURATION("duration", Map.of("d", 1.0, "h", 1.0 / 24, "wk", 7.0)),
    AGE("age", Map.of("a", 1.0)),
    VISCOSITY("viscosity", Map.of("cP", 1.0, "mPa.s", 1.0, "{rel}", 1.0)),
    MASS_CONCENTRATION("mass concentration", Map.of("g/L", 1.0, "g/dL", 10.0, "mg/dL", 0.01)),
    NUMBER_CONCENTRATION("cell count", Map.of("10*9/L", 1.0, "10*3/uL", 1.0, "/uL", 1e-3, "/mm3", 1e-3)),
    SUBSTANCE_CONCENTRATION("substance concentration", Map.of("mmol/L", 1.0, "umol/L", 1e-3)),
    PRESSURE("pressure", Map.of("mm[Hg]", 1.0, "kPa", 1000 / 133.322387415)),
    TEMPERATURE("temperature", Map.of("Cel", 1.0));

    private final String label;
    private final Map<String, Double> factors;

    Dimension(String label, Map<String, Double> factors) {
        this.label = label;
        this.factors = factors;
    }

    public String label() {
        return label;
    }

    public boolean accepts(String ucum) {
        return factors.containsKey(ucum);
    }

    /** The units of this dimension, sorted, for messages. */
    public String allowed() {
        return String.join(", ", factors.keySet().stream().sorted().toList());
    }

    /** {@code value} in {@code from} expressed in {@code to}; both must belong to this dimension. */
    public double convert(double value, String from, String to) {
        Double f = factors.get(from);
        Double t = factors.get(to);
        if (f == null || t == null) {
            throw new IllegalArgumentException(label + ": cannot convert " + from + " to " + to);
        }
        return from.equals(to) ? value : value * f / t;
    }

    public static Optional<Dimension> of(String ucum) {
        return Arrays.stream(values()).filter(d -> d.accepts(ucum)).findFirst();
    }
}
