package org.stasissheet.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;

/**
 * The right-hand side of a comparison: a number with its unit, written in the rule or taken from a parameter,
 * with the source's own figures in other units ({@link Parameter#equivalents()}).
 *
 * <p>How a lab value is compared: when the threshold has a figure in the unit the value was entered in, the two
 * are compared as written; otherwise both are converted to the analyte's canonical unit. Equality is judged to
 * one part in 10⁹ so that a conversion's floating-point rounding never moves a value across a limit.
 */
public record Threshold(Quantity value, List<Quantity> equivalents, Optional<String> parameterId) {
    static final double RELATIVE_TOLERANCE = 1e-9;

    public Threshold {
        Objects.requireNonNull(value, "value");
        equivalents = List.copyOf(equivalents);
        Objects.requireNonNull(parameterId, "parameterId");
    }

    public static Threshold of(Parameter p) {
        return new Threshold(p.value(), p.equivalents(), Optional.of(p.id()));
    }

    public static Threshold literal(Quantity q) {
        return new Threshold(q, List.of(), Optional.empty());
    }

    /** This threshold scaled by a factor (for "25 % above baseline"): equivalents are dropped. */
    public Threshold times(double factor) {
        return new Threshold(new Quantity(value.value() * factor, value.unit()), List.of(), Optional.empty());
    }

    /** Every figure: the main one first. */
    public List<Quantity> figures() {
        List<Quantity> all = new ArrayList<>();
        all.add(value);
        all.addAll(equivalents);
        return all;
    }

    /** The value in an analyte's canonical unit. */
    public double canonical(Analyte analyte) {
        return value.value() * analyte.unitOption(value.unit())
                .orElseThrow(() -> new IllegalStateException(value.unit() + " is not a unit of " + analyte.key()))
                .toCanonical();
    }

    /** Tests a lab value against this threshold. */
    public boolean test(Measurement m, Comparison op) {
        for (Quantity q : figures()) {
            if (q.unit().equals(m.entered().unit())) {
                return op.test(m.entered().value(), q.value());
            }
        }
        return op.test(m.canonical(), canonical(m.analyte()));
    }

    /** Tests a plain number in {@code unit} of {@code dimension}. */
    public boolean test(double number, Dimension dimension, String unit, Comparison op) {
        return op.test(number, dimension.convert(value.value(), value.unit(), unit));
    }

    /**
     * The limit for people, "4 cP", "100 ×10⁹/L": the parameter's id belongs in the sources and provenance, never in a
     * sentence.
     */
    public String describe() {
        return value.toString();
    }

    /** The four comparisons of the condition vocabulary. */
    public enum Comparison {
        AT_LEAST("atLeast", "≥"),
        ABOVE("above", ">"),
        AT_MOST("atMost", "≤"),
        BELOW("below", "<");

        private final String key;
        private final String symbol;

        Comparison(String key, String symbol) {
            this.key = key;
            this.symbol = symbol;
        }

        /** The key in a rule file. */
        public String key() {
            return key;
        }

        public String symbol() {
            return symbol;
        }

        public boolean test(double left, double right) {
            double slack = RELATIVE_TOLERANCE * Math.abs(right);
            return switch (this) {
                case AT_LEAST -> left >= right - slack;
                case ABOVE -> left > right + slack;
                case AT_MOST -> left <= right + slack;
                case BELOW -> left < right - slack;
            };
        }

        public static Optional<Comparison> byKey(String key) {
            for (Comparison c : values()) {
                if (c.key.equals(key)) {
                    return Optional.of(c);
                }
            }
            return Optional.empty();
        }
    }
}
