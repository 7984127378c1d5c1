package org.stasissheet.intake;

import java.time.LocalDate;
import java.util.Objects;
import java.util.Optional;

/**
 * The underlying disease as far as the assessment needs it.
 *
 * @param monocytic      AML with monocytic differentiation (lower hyperleukocytosis threshold)
 * @param therapyStarted the first day of cytoreductive therapy, for the tumor lysis time window
 */
public record Condition(Paraprotein paraprotein, Leukemia leukemia, boolean monocytic,
                        Cryoglobulin cryoglobulin, Optional<LocalDate> therapyStarted) {
    public static final Condition UNKNOWN =
            new Condition(Paraprotein.NONE, Leukemia.NONE, false, Cryoglobulin.UNKNOWN, Optional.empty());

    public Condition {
        Objects.requireNonNull(paraprotein, "paraprotein");
        Objects.requireNonNull(leukemia, "leukemia");
        Objects.requireNonNull(cryoglobulin, "cryoglobulin");
        Objects.requireNonNull(therapyStarted, "therapyStarted");
    }
}
