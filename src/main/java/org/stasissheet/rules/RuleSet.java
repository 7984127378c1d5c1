package org.stasissheet.rules;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Objects;

/**
 * A validated, complete rule set: the manifest, every named parameter and every rule. A rule set is only ever
 * built whole by the loader, never partly (see RuleSetLoader).
 */
public record RuleSet(Provenance provenance, String description, Map<String, Parameter> parameters) {
    public RuleSet {
        Objects.requireNonNull(provenance, "provenance");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(parameters, "parameters");
        parameters = Collections.unmodifiableMap(new LinkedHashMap<>(parameters));
    }

    /** The parameter with this id; the validator guarantees that every parameter the code needs is present. */
    public Parameter parameter(String id) {
        Parameter p = parameters.get(id);
        if (p == null) {
            throw new NoSuchElementException("rule set " + provenance.name() + " has no parameter " + id);
        }
        return p;
    }

    /** The parameter's value, checked to be in the unit the caller computes with. */
    public double value(String id, String unit) {
        Parameter p = parameter(id);
        if (!p.value().unit().equals(unit)) {
            throw new IllegalStateException("parameter " + id + " is in " + p.value().unit() + ", expected " + unit);
        }
        return p.value().value();
    }
}
