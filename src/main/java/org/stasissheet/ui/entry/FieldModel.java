package org.stasissheet.ui.entry;

import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyListProperty;
import javafx.beans.property.ReadOnlyListWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.UnitOption;

/**
 * The view-model of one field: the raw text typed (and for a quantity the unit code picked), the reader's
 * message for it, and the unit fixes on offer. The text is kept exactly as typed, valid or not.
 */
public final class FieldModel {
    private final FieldSpec spec;
    private final StringProperty text = new SimpleStringProperty(this, "text", "");
    private final StringProperty unit = new SimpleStringProperty(this, "unit", "");
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper(this, "problem", "");
    private final ReadOnlyBooleanWrapper leftOut = new ReadOnlyBooleanWrapper(this, "leftOut", false);
    private final ReadOnlyListWrapper<UnitFix> fixes =
            new ReadOnlyListWrapper<>(this, "fixes", FXCollections.observableArrayList());

    FieldModel(FieldSpec spec) {
        this.spec = Objects.requireNonNull(spec, "spec");
    }

    public FieldSpec spec() {
        return spec;
    }

    /** The raw text (or choice code) as typed. */
    public StringProperty textProperty() {
        return text;
    }

    /** The UCUM code of a quantity's unit; unused for other kinds. */
    public StringProperty unitProperty() {
        return unit;
    }

    /** The reader's message(s) for this field, one per line; empty when the field is fine. */
    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    /** True while the worksheet is computed without this field because of its problem. */
    public ReadOnlyBooleanProperty leftOutProperty() {
        return leftOut.getReadOnlyProperty();
    }

    public ReadOnlyListProperty<UnitFix> fixesProperty() {
        return fixes.getReadOnlyProperty();
    }

    /** Switches to the fix's unit, keeping the number typed. */
    public void apply(UnitFix fix) {
        unit.set(fix.ucum());
    }

    void show(List<String> messages, boolean excluded) {
        problem.set(String.join("\n", messages));
        leftOut.set(excluded);
        fixes.setAll(messages.isEmpty() ? List.of() : unitFixes());
    }

    /**
     * Every other accepted unit in which the number typed is plausible, one per distinct conversion factor, in
     * picker order: the alternatives the reader's "did you mean" names, taken from the same analyte catalogue.
     */
    List<UnitFix> unitFixes() {
        Optional<Analyte> analyte = spec.analyte();
        Optional<BigDecimal> number = number(text.get());
        if (analyte.isEmpty() || number.isEmpty()) {
            return List.of();
        }
        Optional<UnitOption> entered = analyte.get().unitOption(unit.get().strip());
        if (entered.isEmpty()) {
            return List.of();
        }
        double value = number.get().doubleValue();
        return analyte.get().unitsMakingPlausible(value, entered.get()).stream()
                .map(other -> new UnitFix(other.ucum(), other.display(), Numbers.rounded(value * other.toCanonical(), 6)
                        + " " + analyte.get().canonicalOption().display()))
                .toList();
    }

    private static Optional<BigDecimal> number(String s) {
        try {
            return Optional.of(new BigDecimal(s.strip()));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }
}
