package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import javafx.animation.PauseTransition;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.SimpleObjectProperty;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.ui.entry.EntryViewModel;
import org.stasissheet.ui.entry.FieldKind;
import org.stasissheet.ui.entry.FieldSpec;
import org.stasissheet.ui.entry.FormFields;
import org.stasissheet.ui.entry.FormJson;
import org.stasissheet.ui.entry.FormState;
import org.stasissheet.ui.sheet.SheetViewModel;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * The view-model of one open case: what is typed (entry side), what the core makes of it (worksheet side), which
 * file it belongs to and whether it has unsaved changes.
 *
 * <p>After every edit, and a short pause, the form's text is written as case JSON and read back by
 * {@link CaseReader}, exactly as the command line reads a file, so every message is the command line's. An
 * accepted case goes to {@link Assessor#assess}. When some fields are wrong, the worksheet is computed without
 * them and says which were left out, so the rest of the sheet stays live. Everything here runs on the JavaFX
 * thread; it is pure computation.
 */
public final class CaseSession {
    public static final Duration DEFAULT_RECOMPUTE_DELAY = Duration.ofMillis(120);

    private final EntryViewModel entry;
    private final SheetViewModel sheet = new SheetViewModel();
    private final ObjectProperty<RuleSet> ruleSet = new SimpleObjectProperty<>(this, "ruleSet");
    private final ReadOnlyObjectWrapper<Optional<Path>> document =
            new ReadOnlyObjectWrapper<>(this, "document", Optional.empty());
    private final ReadOnlyObjectWrapper<Optional<Case>> completeCase =
            new ReadOnlyObjectWrapper<>(this, "completeCase", Optional.empty());
    private final ReadOnlyObjectWrapper<Optional<Worksheet>> completeWorksheet =
            new ReadOnlyObjectWrapper<>(this, "completeWorksheet", Optional.empty());
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty", false);
    private final ReadOnlyIntegerWrapper recomputations = new ReadOnlyIntegerWrapper(this, "recomputations", 0);
    private final PauseTransition pause;
    private byte[] savedJson = new byte[0];

    public CaseSession(EntryViewModel entry, RuleSet rules, Duration recomputeDelay) {
        this.entry = Objects.requireNonNull(entry, "entry");
        ruleSet.set(Objects.requireNonNull(rules, "rules"));
        pause = new PauseTransition(javafx.util.Duration.millis(recomputeDelay.toMillis()));
        pause.setOnFinished(e -> recomputeNow());
        entry.editsProperty().addListener(o -> pause.playFromStart());
        ruleSet.addListener(o -> recomputeNow());
        recomputeNow();
    }

    public EntryViewModel entry() {
        return entry;
    }

    public SheetViewModel sheet() {
        return sheet;
    }

    /** The rule set in use: the shipped one, or a local protocol the user chose. */
    public ObjectProperty<RuleSet> ruleSetProperty() {
        return ruleSet;
    }

    /** The case file this form belongs to; empty for a new case, a demo, or one read from a PDF. */
    public ReadOnlyObjectProperty<Optional<Path>> documentProperty() {
        return document.getReadOnlyProperty();
    }

    /** The case, when every field is valid; exports and the handoff note need it. */
    public ReadOnlyObjectProperty<Optional<Case>> completeCaseProperty() {
        return completeCase.getReadOnlyProperty();
    }

    /** The worksheet of the complete case (empty while any field is wrong). */
    public ReadOnlyObjectProperty<Optional<Worksheet>> completeWorksheetProperty() {
        return completeWorksheet.getReadOnlyProperty();
    }

    /** True when the form differs from the file it was opened from or last saved to. */
    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    /** Ticks after each recomputation (for the status bar and the latency benchmark). */
    public ReadOnlyIntegerProperty recomputationsProperty() {
        return recomputations.getReadOnlyProperty();
    }

    /** The form as case JSON, exactly what Save writes. */
    public byte[] caseJson() {
        return FormJson.write(entry.snapshot());
    }

    /** Replaces the form with a loaded case; {@code savedAs} is what is on disk, so the form starts clean. */
    public void load(FormState state, Optional<Path> file) {
        entry.load(state);
        document.set(file);
        savedJson = caseJson();
        recomputeNow();
    }

    /** Replaces the form with a restored draft: not saved anywhere yet, so it starts with unsaved changes. */
    public void restore(FormState state, Optional<Path> file) {
        entry.load(state);
        document.set(file);
        savedJson = new byte[0];
        recomputeNow();
    }

    /** The form has been written to {@code file}. */
    public void saved(Path file, byte[] json) {
        document.set(Optional.of(file));
        savedJson = json.clone();
        dirty.set(!Arrays.equals(caseJson(), savedJson));
    }

    /** Recomputes at once, skipping the pause (also used by tests and the benchmark). */
    public void recomputeNow() {
        pause.stop();
        FormState state = entry.snapshot();
        byte[] json = FormJson.write(state);
        dirty.set(!Arrays.equals(json, savedJson));
        CaseReader.Result result = CaseReader.read(json);
        if (result instanceof CaseReader.Accepted accepted) {
            entry.showProblems(Map.of(), List.of(), Set.of());
            Worksheet ws = Assessor.assess(accepted.c(), ruleSet.get());
            completeCase.set(Optional.of(accepted.c()));
            completeWorksheet.set(Optional.of(ws));
            sheet.show(ws, List.of());
        } else {
            showWithout(state, ((CaseReader.Rejected) result).problems());
        }
        recomputations.set(recomputations.get() + 1);
    }

    /** Places every message, then assesses what is left once the wrong fields are taken out. */
    private void showWithout(FormState state, List<CaseReader.Problem> problems) {
        Map<String, List<String>> byField = new LinkedHashMap<>();
        List<String> other = new ArrayList<>();
        boolean extraWrong = false;
        for (CaseReader.Problem p : problems) {
            Optional<FieldSpec> owner = FormFields.owning(p.path());
            if (owner.isPresent()) {
                byField.computeIfAbsent(owner.get().path(), k -> new ArrayList<>()).add(p.toString());
            } else {
                other.add(p.toString());
                extraWrong |= p.path().startsWith("extra");
            }
        }
        FormState reduced = state.withUnmapped(extraWrong ? "{}" : FormJsonSupport.onlyExtra(state.unmappedJson()));
        Set<String> leftOut = new LinkedHashSet<>();
        for (String path : byField.keySet()) {
            for (FieldSpec f : FormFields.all()) {
                if (f.path().equals(path) || f.path().startsWith(path + ".")) {
                    reduced = reduced.with(f.valueKey(), f.kind() == FieldKind.SWITCH ? "false" : "");
                    leftOut.add(f.path());
                }
            }
        }
        completeCase.set(Optional.empty());
        completeWorksheet.set(Optional.empty());
        CaseReader.Result partial = CaseReader.read(FormJson.write(reduced));
        if (partial instanceof CaseReader.Accepted accepted) {
            entry.showProblems(byField, other, leftOut);
            List<String> labels = new ArrayList<>();
            leftOut.forEach(path -> FormFields.byPath(path).ifPresent(f -> labels.add(f.path())));
            if (!other.isEmpty()) {
                labels.add("keys the form does not show (see the messages above the form)");
            }
            sheet.show(Assessor.assess(accepted.c(), ruleSet.get()), labels);
        } else {
            entry.showProblems(byField, other, Set.of());
            List<String> all = new ArrayList<>();
            problems.forEach(p -> all.add(p.toString()));
            sheet.showNothing(all);
        }
    }
}
