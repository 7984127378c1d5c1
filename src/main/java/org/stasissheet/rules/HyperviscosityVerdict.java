package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import org.stasissheet.intake.Enums;

/**
 * Whether hyperviscosity syndrome is likely, as decided by {@link Verdicts#hyperviscosity}.
 *
 * @param signs       at least one sign present (mucosal bleeding, visual disturbance, retinopathy of venous
 *                    dilation or worse, neurological grade ≥ 1, heart failure)
 * @param unassessed  the signs that were not assessed and so counted as absent, by case path
 * @param reason      one or two sentences in plain words naming the values and thresholds used
 */
public record HyperviscosityVerdict(Assessment assessment, Route route, boolean signs, List<String> unassessed,
                                    String reason) {
    public HyperviscosityVerdict {
        Objects.requireNonNull(assessment, "assessment");
        Objects.requireNonNull(route, "route");
        unassessed = List.copyOf(unassessed);
        Objects.requireNonNull(reason, "reason");
    }

    /** The output word of {@code hyperviscosity.assessment}. */
    public enum Assessment implements Enums.Coded {
        LIKELY("likely"),
        POSSIBLE("possible"),
        UNLIKELY("unlikely"),
        NOT_ASSESSABLE("not-assessable");

        private final String code;

        Assessment(String code) {
            this.code = code;
        }

        @Override
        public String code() {
            return code;
        }
    }

    /** What the assessment rested on: a measured viscosity, a paraprotein level, the clinical picture alone, nothing. */
    public enum Route implements Enums.Coded {
        VISCOSITY("viscosity"),
        PARAPROTEIN("paraprotein"),
        CLINICAL_PICTURE("clinical-picture"),
        NONE("none");

        private final String code;

        Route(String code) {
            this.code = code;
        }

        @Override
        public String code() {
            return code;
        }
    }
}
