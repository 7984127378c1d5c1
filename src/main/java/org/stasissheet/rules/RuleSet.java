package org.stasissheet.rules;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Objects;
import org.stasissheet.measure.Analyte;

/**
 * A validated, complete rule set: the manifest, every named parameter and every rule. A rule set is only ever
 * built whole by {@link RuleSetLoader}, never partly; the loader guarantees every id in
 * {@link RequiredParameters#ALL} is present in a unit of the right kind.
 */
public record RuleSet(Provenance provenance, String description, Map<String, Parameter> parameters,
                      List<Rule> rules) {
    public RuleSet {
        Objects.requireNonNull(provenance, "provenance");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(parameters, "parameters");
        parameters = Collections.unmodifiableMap(new LinkedHashMap<>(parameters));
        rules = List.copyOf(rules);
    }

    /** The foundation's original shape, without rules. */
    public RuleSet(Provenance provenance, String description, Map<String, Parameter> parameters) {
        this(provenance, description, parameters, List.of());
    }

    /** The parameter with this id; the validator guarantees that every parameter the code needs is present. */
    public Parameter parameter(String id) {
        Parameter p = parameters.get(id);
        if (p == null) {
            throw new NoSuchElementException("rule set " + provenance.name() + " has no parameter " + id);
        }
        return p;
    }

    /**
     * The parameter's value in the unit the caller computes with, converted when the rule file used another unit
     * of the same kind (for example {@code mL} for {@code L}, {@code %} for {@code 1}).
     */
    public double value(String id, String unit) {
        Parameter p = parameter(id);
        String from = p.value().unit();
        if (from.equals(unit)) {
            return p.value().value();
        }
        return Dimension.of(from).filter(d -> d.accepts(unit))
                .map(d -> d.convert(p.value().value(), from, unit))
                .orElseThrow(() -> new IllegalStateException(
                        "parameter " + id + " is in " + from + ", which does not convert to " + unit));
    }

    /** The parameter as a threshold for comparisons with lab values. */
    public Threshold threshold(String id) {
        return Threshold.of(parameter(id));
    }

    /** The parameter's value in the analyte's canonical unit. */
    public double canonical(String id, Analyte analyte) {
        return threshold(id).canonical(analyte);
    }
}
