package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import org.stasissheet.intake.Enums;

/**
 * Whether hyperviscosity syndrome is likely, as decided by {@link Verdicts#hyperviscosity}.
 *
 * <p>Guarantees: {@code UNLIKELY} is given only when either a trusted serum viscosity lies in the normal range, or
 * every sign that could change the verdict was examined ({@code toExamine} is then empty); otherwise the verdict
 * is {@code NOT_ASSESSABLE} and {@code toExamine} names what to examine.
 *
 * @param signs       at least one sign present (mucosal bleeding, visual disturbance, retinopathy of venous
 *                    dilation or worse, neurological grade ≥ 1, heart failure)
 * @param unassessed  the signs that were not assessed, by case path
 * @param viscosity   whether the serum viscosity may be used to lower the verdict
 * @param toExamine   the signs (case paths) that must be examined before the sheet may call hyperviscosity
 *                    unlikely; empty when nothing reassuring was withheld
 * @param reason      one or two sentences in plain words naming the values and thresholds used
 */
public record HyperviscosityVerdict(Assessment assessment, Route route, boolean signs, List<String> unassessed,
                                    ViscosityTrust viscosity, List<String> toExamine, String reason) {
    public HyperviscosityVerdict {
        Objects.requireNonNull(assessment, "assessment");
        Objects.requireNonNull(route, "route");
        unassessed = List.copyOf(unassessed);
        Objects.requireNonNull(viscosity, "viscosity");
        toExamine = List.copyOf(toExamine);
        Objects.requireNonNull(reason, "reason");
        if (!toExamine.isEmpty() && assessment != Assessment.NOT_ASSESSABLE) {
            throw new IllegalArgumentException("signs left to examine go with an undecided verdict only");
        }
    }

    /** A sign's case path in clinical words ("findings.retinopathy" is "the fundi"), for every human text. */
    public static String signName(String path) {
        return switch (path) {
            case "findings.mucosalBleeding" -> "mucosal bleeding";
            case "findings.visualDisturbance" -> "visual disturbance";
            case "findings.retinopathy" -> "the fundi";
            case "findings.neurologicalGrade" -> "neurological symptoms (grade)";
            case "findings.heartFailure" -> "heart failure";
            default -> path;
        };
    }

    /** The question does not apply to this patient (no paraprotein, cryoglobulin or serum viscosity recorded). */
    public boolean applies() {
        return route != Route.NONE;
    }

    /** The output word of {@code hyperviscosity.assessment}. */
    public enum Assessment implements Enums.Coded {
        LIKELY("likely", 2),
        POSSIBLE("possible", 1),
        UNLIKELY("unlikely", 0),
        NOT_ASSESSABLE("not-assessable", 0);

        private final String code;
        private final int alarm;

        Assessment(String code, int alarm) {
            this.code = code;
            this.alarm = alarm;
        }

        @Override
        public String code() {
            return code;
        }

        /** How much action the verdict calls for: 2 likely, 1 possible, 0 otherwise. */
        public int alarm() {
            return alarm;
        }
    }

    /**
     * What the assessment rested on: a measured viscosity, a paraprotein level, the clinical picture alone; or
     * {@code MISSING} (a paraprotein, cryoglobulin or viscosity is recorded but no usable value or sign decides it)
     * and {@code NONE} (nothing points to hyperviscosity: the question does not apply).
     */
    public enum Route implements Enums.Coded {
        VISCOSITY("viscosity"),
        PARAPROTEIN("paraprotein"),
        CLINICAL_PICTURE("clinical-picture"),
        MISSING("missing"),
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

    /**
     * Whether a serum viscosity may lower the verdict. A cryoglobulin precipitates as the sample cools and takes
     * protein out of the serum, so a cooled sample reads falsely low (common practice, laboratory handbooks); with no
     * cryoglobulin a cold sample reads high rather than low, so it may stand.
     */
    public enum ViscosityTrust implements Enums.Coded {
        NOT_MEASURED("not-measured"),
        TRUSTED("trusted"),
        /** Cryoglobulin unknown and no temperature recorded: the value stands, with a note to confirm. */
        WARMTH_UNCONFIRMED("warmth-unconfirmed"),
        /** Read cold (or at an unrecorded temperature) with a cryoglobulin present or unknown: may only raise. */
        NOT_TRUSTED("not-trusted");

        private final String code;

        ViscosityTrust(String code) {
            this.code = code;
        }

        @Override
        public String code() {
            return code;
        }
    }
}
