package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import org.stasissheet.measure.Quantity;

/**
 * A named threshold or constant from the rule set, e.g. the serum viscosity at which symptoms become typical.
 * Guarantees: non-blank id and source, a basis, a finite value with a UCUM unit.
 *
 * @param note        free text from the rule file (e.g. "sources disagree: …"), empty when none
 * @param what        one line saying what the number is, for lists and the limits section; empty when none
 * @param equivalents the same limit as the source prints it in other units (Cairo–Bishop gives 476 µmol/L and
 *                    8.0 mg/dL): a value entered in one of those units is compared against that figure, so the
 *                    rounding of a published conversion never moves a result across the limit
 */
public record Parameter(String id, Quantity value, String source, Basis basis, String note, String what,
                        List<Quantity> equivalents) {
    public Parameter {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(note, "note");
        Objects.requireNonNull(what, "what");
        equivalents = List.copyOf(equivalents);
        if (id.isBlank() || source.isBlank()) {
            throw new IllegalArgumentException("parameter id and source must not be blank");
        }
    }

    /** The foundation's original shape: no description, no equivalents. */
    public Parameter(String id, Quantity value, String source, Basis basis, String note) {
        this(id, value, source, basis, note, "", List.of());
    }
}
