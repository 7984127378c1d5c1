package org.stasissheet.register;

import java.util.Objects;
import java.util.OptionalInt;

/**
 * A decision someone wants to record.
 *
 * @param seenVersion the version the decider was looking at; empty means "only if still pending", so a decision
 *                    made without having seen an earlier one can never replace it
 */
public record DecisionRequest(long referralId, OptionalInt seenVersion, Decision decision,
                              Referral.DecisionRecord record) {
    public DecisionRequest {
        Objects.requireNonNull(seenVersion, "seenVersion");
        Objects.requireNonNull(decision, "decision");
        Objects.requireNonNull(record, "record");
        if (decision == Decision.PENDING) {
            throw new IllegalArgumentException("pending is where a referral starts; record one of "
                    + Decision.recordable());
        }
    }
}
