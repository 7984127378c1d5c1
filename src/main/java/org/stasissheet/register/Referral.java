package org.stasissheet.register;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;

/**
 * One referral as the register holds it now: when it came and from whom, what was asked for, the assessment it was
 * seen with, and its current decision. {@code version} starts at 1 and goes up by one with every recorded
 * decision; a decision names the version it was made on, so two people deciding at once cannot overwrite each
 * other.
 *
 * @param referrer who referred: name, role and contact as they gave them
 * @param location where the patient is (ward, unit, hospital)
 * @param decisionRecord empty while the referral is pending
 */
public record Referral(long id, int version, Instant receivedAt, String referrer, String location,
                       Procedure procedure, Snapshot snapshot, Decision decision,
                       Optional<DecisionRecord> decisionRecord, String addedBy, Instant addedAt) {
    public Referral {
        if (id < 1) {
            throw new IllegalArgumentException("id must be 1 or more, was " + id);
        }
        if (version < 1) {
            throw new IllegalArgumentException("version must be 1 or more, was " + version);
        }
        Objects.requireNonNull(receivedAt, "receivedAt");
        Objects.requireNonNull(referrer, "referrer");
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(procedure, "procedure");
        Objects.requireNonNull(snapshot, "snapshot");
        Objects.requireNonNull(decision, "decision");
        Objects.requireNonNull(decisionRecord, "decisionRecord");
        Objects.requireNonNull(addedBy, "addedBy");
        Objects.requireNonNull(addedAt, "addedAt");
        if ((decision == Decision.PENDING) != decisionRecord.isEmpty()) {
            throw new IllegalArgumentException("a pending referral has no decision record, and a decided one has one");
        }
    }

    public boolean isOpen() {
        return decision.isOpen();
    }

    /**
     * Who decided, when, and what was planned.
     *
     * @param plannedSlot      the planned procedure time, when one was set
     * @param vascularAccess   the access planned (free text: the team's own words), empty when not given
     * @param replacementFluid the replacement fluid planned, empty when not given
     */
    public record DecisionRecord(String by, Instant at, Optional<Instant> plannedSlot, String vascularAccess,
                                 String replacementFluid, String note) {
        public DecisionRecord {
            Objects.requireNonNull(by, "by");
            Objects.requireNonNull(at, "at");
            Objects.requireNonNull(plannedSlot, "plannedSlot");
            Objects.requireNonNull(vascularAccess, "vascularAccess");
            Objects.requireNonNull(replacementFluid, "replacementFluid");
            Objects.requireNonNull(note, "note");
            if (by.isBlank()) {
                throw new IllegalArgumentException("a decision names who made it");
            }
        }
    }
}
