package org.stasissheet.ui.entry;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import javafx.beans.InvalidationListener;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyListProperty;
import javafx.beans.property.ReadOnlyListWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;

/**
 * The view-model of the entry side: one {@link FieldModel} per field of {@link FormFields}, the problems that
 * belong to no field, and an edit counter that ticks on every change so that the worksheet and the autosave can
 * follow. It holds text only; it never decides what is valid (the case reader does).
 */
public final class EntryViewModel {
    private final Map<String, FieldModel> fields = new LinkedHashMap<>();
    private final ReadOnlyIntegerWrapper edits = new ReadOnlyIntegerWrapper(this, "edits", 0);
    private final ReadOnlyListWrapper<String> otherProblems =
            new ReadOnlyListWrapper<>(this, "otherProblems", FXCollections.observableArrayList());
    private final ObjectProperty<UnitSystem> unitSystem = new SimpleObjectProperty<>(this, "unitSystem", UnitSystem.SI);
    private String unmappedJson = "{}";
    private boolean loading;

    public EntryViewModel(UnitSystem startingUnits) {
        unitSystem.set(startingUnits);
        InvalidationListener edited = o -> {
            if (!loading) {
                edits.set(edits.get() + 1);
            }
        };
        for (FieldSpec spec : FormFields.all()) {
            FieldModel m = new FieldModel(spec);
            m.textProperty().addListener(edited);
            m.unitProperty().addListener(edited);
            fields.put(spec.path(), m);
        }
        unitSystem.addListener((o, was, now) -> restartEmptyUnits(now));
        load(FormJson.blank(startingUnits));
    }

    public Collection<FieldModel> fields() {
        return fields.values();
    }

    public FieldModel field(String path) {
        FieldModel m = fields.get(path);
        if (m == null) {
            throw new NoSuchElementException("the form has no field " + path);
        }
        return m;
    }

    /** Ticks once per change of any field, and once per {@link #load}. */
    public ReadOnlyIntegerProperty editsProperty() {
        return edits.getReadOnlyProperty();
    }

    /** Messages that belong to no field (a key the form does not know, a whole-file problem). */
    public ReadOnlyListProperty<String> otherProblemsProperty() {
        return otherProblems.getReadOnlyProperty();
    }

    /** The unit a new entry starts with; changing it moves every still-empty quantity to the new starting unit. */
    public ObjectProperty<UnitSystem> unitSystemProperty() {
        return unitSystem;
    }

    /** Everything typed, as it stands. */
    public FormState snapshot() {
        Map<String, String> values = new LinkedHashMap<>();
        for (FieldModel m : fields.values()) {
            values.put(m.spec().valueKey(), m.textProperty().get());
            if (m.spec().kind() == FieldKind.QUANTITY) {
                values.put(m.spec().unitKey(), m.unitProperty().get());
            }
        }
        return new FormState(values, unmappedJson);
    }

    /** Replaces everything on the form; counts as one edit. Keys missing from the state become empty. */
    public void load(FormState state) {
        FormState blank = FormJson.blank(unitSystem.get());
        loading = true;
        try {
            for (FieldModel m : fields.values()) {
                String key = m.spec().valueKey();
                m.textProperty().set(state.values().containsKey(key) ? state.get(key) : blank.get(key));
                if (m.spec().kind() == FieldKind.QUANTITY) {
                    String unitKey = m.spec().unitKey();
                    m.unitProperty().set(state.values().containsKey(unitKey) ? state.get(unitKey)
                            : blank.get(unitKey));
                }
            }
            unmappedJson = state.unmappedJson();
        } finally {
            loading = false;
        }
        edits.set(edits.get() + 1);
    }

    /**
     * Shows the reader's messages: each beside its field (keyed by field path), the rest above the form.
     *
     * @param leftOut the field paths the worksheet is currently computed without
     */
    public void showProblems(Map<String, List<String>> byField, List<String> other, Set<String> leftOut) {
        for (FieldModel m : fields.values()) {
            String path = m.spec().path();
            m.show(byField.getOrDefault(path, List.of()), leftOut.contains(path));
        }
        otherProblems.setAll(new ArrayList<>(other));
    }

    private void restartEmptyUnits(UnitSystem units) {
        for (FieldModel m : fields.values()) {
            if (m.spec().kind() == FieldKind.QUANTITY && m.textProperty().get().isBlank()) {
                m.unitProperty().set(FormJson.startingUnit(m.spec(), units));
            }
        }
    }
}
