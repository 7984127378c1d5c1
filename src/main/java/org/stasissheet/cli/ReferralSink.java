package org.stasissheet.cli;

import org.stasissheet.worksheet.Worksheet;

/**
 * Where {@code triage --register} sends each assessed referral. An interface, so that the triage command loads
 * the database classes only when {@code --register} is given.
 */
interface ReferralSink extends AutoCloseable {
    /** Adds the referral and returns its register id. */
    long add(String caseJson, Worksheet sheet);

    @Override
    void close();
}
