package org.stasissheet.rules;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;

/** The values rule conditions are tested against, keyed by field name (see {@link Fields}). */
public record Facts(Map<String, Fact> values) {
    public Facts {
        Objects.requireNonNull(values, "values");
        values.keySet().forEach(k -> {
            if (Fields.kind(k).isEmpty()) {
                throw new IllegalArgumentException("not a known field: " + k);
            }
        });
        values = Collections.unmodifiableMap(new TreeMap<>(values));
    }

    public Optional<Fact> get(String field) {
        return Optional.ofNullable(values.get(field));
    }
}
