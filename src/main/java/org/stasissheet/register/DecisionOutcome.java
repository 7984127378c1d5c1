package org.stasissheet.register;

import java.util.Objects;

/** What became of a decision: recorded, refused because someone else changed the referral first, or no referral. */
public sealed interface DecisionOutcome {

    /** Saved; {@code referral} is the new state (version one higher). */
    record Recorded(Referral referral) implements DecisionOutcome {
        public Recorded {
            Objects.requireNonNull(referral, "referral");
        }
    }

    /** Nothing was saved: the referral is no longer what the decider saw. {@code current} is what it is now. */
    record Conflict(Referral current, DecisionRequest refused) implements DecisionOutcome {
        public Conflict {
            Objects.requireNonNull(current, "current");
            Objects.requireNonNull(refused, "refused");
        }

        /** One paragraph for the person whose decision was refused: what changed, by whom, and what to do. */
        public String message() {
            String now = current.decisionRecord()
                    .map(d -> current.decision().code() + " by " + d.by() + " at " + d.at())
                    .orElse(current.decision().code());
            String seen = refused.seenVersion().isPresent()
                    ? "you decided on version " + refused.seenVersion().getAsInt()
                    : "you decided without naming a version, which is allowed only while it is pending";
            return "Conflict: referral " + current.id() + " was changed by someone else (now version "
                    + current.version() + ": " + now + "); " + seen + ". Nothing was saved. Look at the referral "
                    + "again (register history " + current.id() + ") and decide again with --version "
                    + current.version() + " if your decision still stands.";
        }
    }

    record NotFound(long referralId) implements DecisionOutcome {
        public String message() {
            return "referral " + referralId + " is not in the register";
        }
    }
}
