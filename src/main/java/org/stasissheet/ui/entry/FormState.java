package org.stasissheet.ui.entry;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * Everything on the form as typed, valid or not: the raw text of every field by its form-state key (see
 * {@link FieldSpec#valueKey()}), plus whatever a loaded file held that the form has no field for, kept as JSON
 * so that saving writes it back untouched (the {@code extra} object, and unknown keys the reader will name).
 *
 * @param unmappedJson a JSON object, {@code {}} when nothing was left over
 */
public record FormState(Map<String, String> values, String unmappedJson) {
    public static final FormState BLANK = new FormState(Map.of(), "{}");

    public FormState {
        Objects.requireNonNull(values, "values");
        Objects.requireNonNull(unmappedJson, "unmappedJson");
        values.forEach((k, v) -> {
            Objects.requireNonNull(k, "key");
            Objects.requireNonNull(v, k);
        });
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** The text of a key, {@code ""} when the field is empty or unknown. */
    public String get(String key) {
        return values.getOrDefault(key, "");
    }

    public FormState with(String key, String value) {
        Map<String, String> copy = new LinkedHashMap<>(values);
        copy.put(key, value);
        return new FormState(copy, unmappedJson);
    }

    public FormState withUnmapped(String json) {
        return new FormState(values, json);
    }
}
