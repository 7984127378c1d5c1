package org.stasissheet.register;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/** One field a decision changes, before and after (empty text for "not set"); each becomes one history event. */
public record Change(String what, String from, String to) {
    public Change {
        Objects.requireNonNull(what, "what");
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
    }

    /** What recording {@code request} on {@code before} changes: the decision always, the rest when different. */
    public static List<Change> of(Referral before, DecisionRequest request) {
        Referral.DecisionRecord now = request.record();
        List<Change> changes = new ArrayList<>();
        changes.add(new Change(RegisterEvent.DECISION, before.decision().code(), request.decision().code()));
        String slotBefore = before.decisionRecord().flatMap(Referral.DecisionRecord::plannedSlot)
                .map(RegisterTime::format).orElse("");
        add(changes, RegisterEvent.SLOT, slotBefore, now.plannedSlot().map(RegisterTime::format).orElse(""));
        add(changes, RegisterEvent.ACCESS,
                before.decisionRecord().map(Referral.DecisionRecord::vascularAccess).orElse(""), now.vascularAccess());
        add(changes, RegisterEvent.FLUID,
                before.decisionRecord().map(Referral.DecisionRecord::replacementFluid).orElse(""),
                now.replacementFluid());
        add(changes, RegisterEvent.NOTE, before.decisionRecord().map(Referral.DecisionRecord::note).orElse(""),
                now.note());
        return List.copyOf(changes);
    }

    private static void add(List<Change> changes, String what, String from, String to) {
        if (!from.equals(to)) {
            changes.add(new Change(what, from, to));
        }
    }
}
