package org.stasissheet.register;

import java.time.Instant;
import java.util.Objects;

/**
 * One line of a referral's history: who changed what, when, from which value to which. Events are only ever
 * appended; the database refuses to change or remove one.
 *
 * @param what what changed: {@code received} (the referral was added), {@code decision}, {@code slot},
 *             {@code access}, {@code fluid} or {@code note}
 * @param from the value before, empty for something new
 */
public record RegisterEvent(long id, long referralId, Instant at, String actor, String what, String from,
                            String to) {
    public static final String RECEIVED = "received";
    public static final String DECISION = "decision";
    public static final String SLOT = "slot";
    public static final String ACCESS = "access";
    public static final String FLUID = "fluid";
    public static final String NOTE = "note";

    public RegisterEvent {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(actor, "actor");
        Objects.requireNonNull(what, "what");
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
    }
}
