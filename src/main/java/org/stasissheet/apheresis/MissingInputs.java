package org.stasissheet.apheresis;

import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.stasissheet.measure.Estimate;

/**
 * What the apheresis numbers lack that the user can enter, said once: one sentence naming the fields and where they
 * are ("Enter height and weight (Patient) to estimate the blood volume, …"), and the reasons of the estimates that
 * sentence stands for, so that renderers print a dash there instead of repeating it in every cell.
 *
 * @param sentence what to enter and what it gives; empty when nothing enterable is missing
 * @param covered  the exact reasons of the unknown estimates the sentence explains
 */
public record MissingInputs(Optional<String> sentence, Set<String> covered) {
    public static final MissingInputs NONE = new MissingInputs(Optional.empty(), Set.of());

    public MissingInputs {
        Objects.requireNonNull(sentence, "sentence");
        covered = Set.copyOf(covered);
        if (sentence.isEmpty() && !covered.isEmpty()) {
            throw new IllegalArgumentException("covered reasons need the sentence that explains them");
        }
    }

    /** True when the estimate is unknown for a reason the sentence already gives. */
    public boolean covers(Estimate<?> e) {
        return e.whyUnknown().map(covered::contains).orElse(false);
    }
}
