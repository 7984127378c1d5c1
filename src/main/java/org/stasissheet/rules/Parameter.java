package org.stasissheet.rules;

import java.util.Objects;
import org.stasissheet.measure.Quantity;

/**
 * A named threshold or constant from the rule set, e.g. the serum viscosity at which symptoms become typical.
 * Guarantees: non-blank id and source, a basis, a finite value with a UCUM unit.
 *
 * @param note free text from the rule file (e.g. "sources disagree: …"), empty when none
 */
public record Parameter(String id, Quantity value, String source, Basis basis, String note) {
    public Parameter {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(note, "note");
        if (id.isBlank() || source.isBlank()) {
            throw new IllegalArgumentException("parameter id and source must not be blank");
        }
    }
}
