package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Quantity;

/**
 * Cairo–Bishop tumor lysis (Cairo MS, Bishop M, Br J Haematol 2004), as decided by {@link Verdicts#tumorLysis}.
 *
 * @param applies    worth checking: a leukemia, a start of therapy or a tumor-lysis laboratory value is recorded;
 *                   when false the renderers say in one quiet line that it was not checked, and why
 * @param laboratory empty when fewer than two of the four criteria could be evaluated
 * @param clinical   empty exactly when {@code laboratory} is empty; false when laboratory is false
 * @param window     whether the assessment falls in the published window around the start of therapy, in words
 * @param dependsOnUnconfirmed the laboratory verdict is met only by counting a criterion whose value may be an
 *                   artefact (a potassium at a count where pseudohyperkalaemia occurs): it holds "if confirmed".
 *                   Such a criterion is counted, never silently dropped, and every text says so.
 */
public record TumorLysisVerdict(boolean applies, Optional<Boolean> laboratory, Optional<Boolean> clinical, List<Criterion> criteria,
                                boolean windowConfirmed, String window, String reason, boolean dependsOnUnconfirmed) {
    public TumorLysisVerdict {
        Objects.requireNonNull(laboratory, "laboratory");
        Objects.requireNonNull(clinical, "clinical");
        criteria = List.copyOf(criteria);
        Objects.requireNonNull(window, "window");
        Objects.requireNonNull(reason, "reason");
        if (laboratory.isPresent() != clinical.isPresent()) {
            throw new IllegalArgumentException("clinical is decided exactly when laboratory is");
        }
    }

    /** The one quiet line shown when tumor lysis does not apply. */
    public static final String NOT_CHECKED = "not checked: no leukemia, no therapy and none of its laboratory values"
            + " recorded";

    /**
     * One laboratory criterion.
     *
     * @param value empty when the case has no value for the analyte
     * @param how   how it was met, or why not ("≥ 476 umol/L", "+25 % from baseline 300 umol/L", "not measured")
     * @param unconfirmed met, but the value may be an artefact and needs confirming before it is relied on
     */
    public record Criterion(Analyte analyte, Optional<Quantity> value, boolean met, String how, boolean unconfirmed) {
        public Criterion {
            Objects.requireNonNull(analyte, "analyte");
            Objects.requireNonNull(value, "value");
            Objects.requireNonNull(how, "how");
            if (met && value.isEmpty()) {
                throw new IllegalArgumentException("a criterion without a value cannot be met");
            }
            if (unconfirmed && !met) {
                throw new IllegalArgumentException("only a met criterion can await confirmation");
            }
        }

        public Criterion(Analyte analyte, Optional<Quantity> value, boolean met, String how) {
            this(analyte, value, met, how, false);
        }
    }
}
