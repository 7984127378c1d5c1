package org.stasissheet.intake;

import java.time.OffsetDateTime;
import java.util.Objects;
import java.util.Optional;

/**
 * One assessment of one patient at one time: the domain form of a {@code stasis-case/1} file.
 *
 * <p>Null policy for the whole core: no component is ever null; what may be missing is an {@link Optional},
 * an empty string, or an explicit "not assessed" constant.
 *
 * @param extraJson the case file's {@code extra} object, kept verbatim as compact JSON ({@code {}} when none)
 */
public record Case(Patient patient, Condition condition, Labs labs, Labs baseline, Findings findings, Plan plan,
                   Optional<OffsetDateTime> assessedAt, String assessor, String extraJson) {
    public static final String FORMAT = "stasis-case/1";

    public static final Case EMPTY = new Case(Patient.UNKNOWN, Condition.UNKNOWN, Labs.NONE, Labs.NONE,
            Findings.NOT_ASSESSED, Plan.NOTHING, Optional.empty(), "", "{}");

    public Case {
        Objects.requireNonNull(patient, "patient");
        Objects.requireNonNull(condition, "condition");
        Objects.requireNonNull(labs, "labs");
        Objects.requireNonNull(baseline, "baseline");
        Objects.requireNonNull(findings, "findings");
        Objects.requireNonNull(plan, "plan");
        Objects.requireNonNull(assessedAt, "assessedAt");
        Objects.requireNonNull(assessor, "assessor");
        Objects.requireNonNull(extraJson, "extraJson");
    }

    /**
     * This case without what identifies a person: the patient label, the assessor and {@code extra} (where a
     * hospital number would live). For teaching and audit copies; everything clinical stays.
     */
    public Case withoutIdentifiers() {
        Patient p = new Patient("", patient.sex(), patient.ageYears(), patient.height(), patient.weight());
        return new Case(p, condition, labs, baseline, findings, plan, assessedAt, "", "{}");
    }
}
