package org.stasissheet.register;

import java.util.List;

/** What the form needs from a register: the store implements it; the form never sees a database class. */
public interface RegisterAccess {
    /** Referrals, most urgent first, then the earliest received. */
    List<Referral> list(boolean openOnly);

    /** A referral's events, oldest first. */
    List<RegisterEvent> history(long id);

    DecisionOutcome decide(DecisionRequest request);

    /** Changes whenever anything in the register changes (for polling). */
    long changeStamp();

    /** Where the register is, as it may be shown (never with a password). */
    String shown();
}
