package org.stasissheet.ui.register;

import java.time.Clock;
import java.time.Instant;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.register.Decision;
import org.stasissheet.register.DecisionOutcome;
import org.stasissheet.register.DecisionRequest;
import org.stasissheet.register.Referral;
import org.stasissheet.register.RegisterAccess;
import org.stasissheet.register.RegisterReport;
import org.stasissheet.register.RegisterTime;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.ui.app.Background;
import org.stasissheet.ui.sheet.SheetViewModel;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * The register window's state: the open referrals (most urgent first), the selected one's worksheet and history,
 * and the outcome of the last decision. Database work runs on the background thread; results land here on the
 * JavaFX thread.
 */
public final class RegisterViewModel {
    private final RegisterAccess register;
    private final Background background;
    private final Clock clock;
    private final Function<Optional<java.nio.file.Path>, RuleSet> rules;
    private final ObservableList<Referral> referrals = FXCollections.observableArrayList();
    private final ObservableList<String> history = FXCollections.observableArrayList();
    private final ReadOnlyObjectWrapper<Optional<Referral>> selected =
            new ReadOnlyObjectWrapper<>(this, "selected", Optional.empty());
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
    private final ReadOnlyStringWrapper provenance = new ReadOnlyStringWrapper(this, "provenance", "");
    private final SheetViewModel sheet = new SheetViewModel();
    private long lastStamp = -1;
    /** The referral this window last decided: its leaving the open list is no news to this user. */
    private long decidedHere = -1;

    public RegisterViewModel(RegisterAccess register, Background background, Clock clock,
                             Function<Optional<java.nio.file.Path>, RuleSet> rules) {
        this.register = Objects.requireNonNull(register, "register");
        this.background = Objects.requireNonNull(background, "background");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.rules = Objects.requireNonNull(rules, "rules");
        sheet.showNothing(List.of("Select a referral to see its worksheet."));
    }

    public ObservableList<Referral> referrals() {
        return FXCollections.unmodifiableObservableList(referrals);
    }

    public ObservableList<String> history() {
        return FXCollections.unmodifiableObservableList(history);
    }

    public ReadOnlyObjectProperty<Optional<Referral>> selectedProperty() {
        return selected.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** Which rule set the shown worksheet used, and whether it is the one the referral was assessed with. */
    public ReadOnlyStringProperty provenanceProperty() {
        return provenance.getReadOnlyProperty();
    }

    public SheetViewModel sheet() {
        return sheet;
    }

    public String location() {
        return register.shown();
    }

    /** Reloads when the register changed since the last load (another user's change included). */
    public void poll() {
        background.run(register::changeStamp, stamp -> {
            if (stamp != lastStamp) {
                reload();
            }
        }, this::failed);
    }

    public void reload() {
        background.run(() -> new Loaded(register.changeStamp(), register.list(true)), loaded -> {
            lastStamp = loaded.stamp();
            Optional<Long> keep = selected.get().map(Referral::id);
            referrals.setAll(loaded.referrals());
            Optional<Referral> again = keep.flatMap(id -> loaded.referrals().stream().filter(r -> r.id() == id)
                    .findFirst());
            if (keep.isPresent() && again.isEmpty() && keep.get() != decidedHere) {
                status.set("Referral " + keep.get() + " is no longer open (decided elsewhere); see the export or "
                        + "register history " + keep.get() + ".");
            }
            select(again);
        }, this::failed);
    }

    private record Loaded(long stamp, List<Referral> referrals) {
    }

    /** Shows the referral's worksheet, made again from the case it was assessed on, and its history. */
    public void select(Optional<Referral> referral) {
        selected.set(referral);
        history.clear();
        if (referral.isEmpty()) {
            sheet.showNothing(List.of("Select a referral to see its worksheet."));
            provenance.set("");
            return;
        }
        Referral r = referral.get();
        CaseReader.Result read = CaseReader.read(r.snapshot().caseJson().getBytes(java.nio.charset.StandardCharsets.UTF_8));
        if (read instanceof CaseReader.Accepted accepted) {
            RuleSet set = rules.apply(Optional.empty());
            Worksheet ws = Assessor.assess(accepted.c(), set);
            sheet.show(ws, List.of());
            boolean same = set.provenance().sha256().equals(r.snapshot().ruleSet().sha256());
            provenance.set(same ? "Worksheet with the rule set it was assessed with (" + set.provenance().name() + " "
                    + set.provenance().version() + ")."
                    : "CHECK: assessed with " + r.snapshot().ruleSet().name() + " " + r.snapshot().ruleSet().version()
                    + " (SHA-256 " + r.snapshot().ruleSet().shortHash() + "…); shown now with "
                    + set.provenance().name() + " " + set.provenance().version() + " (" + set.provenance().shortHash()
                    + "…). The decision was made on the first.");
        } else {
            sheet.showNothing(List.of("The stored case could not be read back; see register history " + r.id() + "."));
            provenance.set("");
        }
        long id = r.id();
        background.run(() -> RegisterReport.history(r, register.history(id), clock.getZone()), text -> {
            if (selected.get().map(x -> x.id() == id).orElse(false)) {
                history.setAll(text.lines().toList());
            }
        }, this::failed);
    }

    /**
     * Records a decision on the selected referral at the version shown; a conflict leaves nothing saved and says
     * what the referral is now.
     *
     * @param slot ISO 8601 with offset, or blank
     */
    public void decide(Decision decision, String by, String note, String slot, String access, String fluid) {
        Optional<Referral> target = selected.get();
        if (target.isEmpty()) {
            status.set("Select a referral first.");
            return;
        }
        if (decision == null || decision == Decision.PENDING) {
            status.set("Decision: choose one of " + Decision.recordable() + ".");
            return;
        }
        if (by == null || by.isBlank()) {
            status.set("Decided by: a decision names who made it; the field is empty.");
            return;
        }
        Optional<Instant> plannedSlot = Optional.empty();
        if (slot != null && !slot.isBlank()) {
            plannedSlot = RegisterTime.parseIso(slot);
            if (plannedSlot.isEmpty()) {
                status.set("Planned slot: \"" + slot.strip() + "\" is not an ISO 8601 time with an offset; write it "
                        + "like 2026-03-05T08:00:00+01:00. Nothing was saved.");
                return;
            }
        }
        Referral r = target.get();
        DecisionRequest request = new DecisionRequest(r.id(), OptionalInt.of(r.version()), decision,
                new Referral.DecisionRecord(by.strip(), clock.instant(), plannedSlot, strip(access), strip(fluid),
                        strip(note)));
        background.run(() -> register.decide(request), outcome -> {
            if (outcome instanceof DecisionOutcome.Recorded rec) {
                decidedHere = r.id();
                status.set("Referral " + r.id() + ": " + decision.code() + " recorded (version "
                        + rec.referral().version() + ").");
            } else if (outcome instanceof DecisionOutcome.Conflict conflict) {
                status.set(conflict.message());
            } else {
                status.set(((DecisionOutcome.NotFound) outcome).message());
            }
            reload();
        }, this::failed);
    }

    private static String strip(String s) {
        return s == null ? "" : s.strip();
    }

    private void failed(Exception e) {
        status.set("The register could not be read or written: " + e.getMessage());
    }
}
