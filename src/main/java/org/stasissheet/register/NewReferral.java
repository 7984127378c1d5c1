package org.stasissheet.register;

import java.time.Instant;
import java.util.Objects;

/** A referral about to be added: everything but the id, version and decision the register gives it. */
public record NewReferral(Instant receivedAt, String referrer, String location, Procedure procedure,
                          Snapshot snapshot, String addedBy, Instant addedAt) {
    public NewReferral {
        Objects.requireNonNull(receivedAt, "receivedAt");
        Objects.requireNonNull(referrer, "referrer");
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(procedure, "procedure");
        Objects.requireNonNull(snapshot, "snapshot");
        Objects.requireNonNull(addedBy, "addedBy");
        Objects.requireNonNull(addedAt, "addedAt");
        if (addedBy.isBlank()) {
            throw new IllegalArgumentException("a referral names who added it");
        }
    }
}
