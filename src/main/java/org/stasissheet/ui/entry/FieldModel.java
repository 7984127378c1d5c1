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
import org.stasissheet.intake.Measurement;
import org.stasissheet.labs.DecimalText;
import org.stasissheet.labs.ValueReading;
import org.stasissheet.labs.ValueText;
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
    private final ReadOnlyStringWrapper reading = new ReadOnlyStringWrapper(this, "reading", "");
    private final ReadOnlyListWrapper<TypedReading> readings =
            new ReadOnlyListWrapper<>(this, "readings", FXCollections.observableArrayList());
    private boolean settingReading;

    FieldModel(FieldSpec spec) {
        this.spec = Objects.requireNonNull(spec, "spec");
        // a new edit makes the last "read as" note or question stale
        text.addListener(o -> {
            if (!settingReading) {
                reading.set("");
                readings.clear();
            }
        });
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

    /**
     * How the text typed or pasted was read ("read 5,6 as 5.6"), or the question it raises ("1,234 reads as
     * 1.234 or 1234: which?") or why it could not be read; empty when there is nothing to say.
     */
    public ReadOnlyStringProperty readingProperty() {
        return reading.getReadOnlyProperty();
    }

    /** The readings on offer when the text reads more than one way (empty otherwise). */
    public ReadOnlyListProperty<TypedReading> readingsProperty() {
        return readings.getReadOnlyProperty();
    }

    /**
     * Reads what was typed or pasted into a quantity field when it is not a plain number already: a decimal comma
     * ("5,6") or a unit ("180 x10^9/L", "6.8 mmol/L"). One reading sets the number and the unit picker and says
     * how it was read; several readings are asked about, never guessed; text that cannot be read stays as typed
     * with the reason. The number and unit texts go through the lab reader of {@code labs}, the one reader of
     * pasted values.
     */
    public void readTyped() {
        String typed = text.get().strip();
        if (spec.kind() != FieldKind.QUANTITY || typed.isEmpty() || number(typed).isPresent()) {
            return;
        }
        String unitShown = spec.units().stream().filter(u -> u.ucum().equals(unit.get().strip())).findFirst()
                .map(UnitOption::display).orElse(unit.get());
        List<BigDecimal> bare = DecimalText.readings(typed);
        if (bare.size() == 1) {
            set(bare.get(0).toPlainString(), unit.get(), "read '" + typed + "' as " + bare.get(0).toPlainString()
                    + " " + unitShown, List.of());
            return;
        }
        if (bare.size() > 1) {
            List<TypedReading> options = bare.stream().map(n -> new TypedReading(n.toPlainString(), unit.get(),
                    "use " + n.toPlainString() + " " + unitShown)).toList();
            set(text.get(), unit.get(), "'" + typed + "' reads as " + bare.get(0).toPlainString() + " or "
                    + bare.get(1).toPlainString() + " (decimal comma or thousands separator): which?", options);
            return;
        }
        if (spec.analyte().isEmpty()) {
            set(text.get(), unit.get(), spec.label().strip() + ": '" + typed + "' is not a number; write it like 37 or "
                    + "37.5 (" + unitShown + ")", List.of());
            return;
        }
        Analyte a = spec.analyte().get();
        ValueReading r = ValueText.read(a, typed);
        if (r instanceof ValueReading.Understood u) {
            Measurement m = u.reading().value();
            String value = Numbers.plain(m.entered().value());
            String note = u.reading().note().isEmpty() ? "" : "; " + u.reading().note();
            String flag = u.reading().flag().isEmpty() ? ""
                    : "; the laboratory's mark '" + u.reading().flag() + "' is not kept";
            set(value, m.entered().unit(), "read '" + typed + "' as " + value + " " + m.unitOption().display()
                    + note + flag, List.of());
        } else if (r instanceof ValueReading.Choice c) {
            set(text.get(), unit.get(), spec.label().strip() + ": " + c.question(), c.options().stream().map(o -> {
                Measurement m = o.reading().value();
                String value = Numbers.plain(m.entered().value());
                return new TypedReading(value, m.entered().unit(), "use " + value + " " + m.unitOption().display());
            }).toList());
        } else if (r instanceof ValueReading.NotUnderstood n) {
            set(text.get(), unit.get(), spec.label().strip() + ": " + n.reason(), List.of());
        }
    }

    /** Takes one of the readings on offer: its number and its unit. */
    public void take(TypedReading r) {
        set(r.value(), r.ucum(), "", List.of());
    }

    private void set(String newText, String newUnit, String message, List<TypedReading> options) {
        settingReading = true;
        try {
            unit.set(newUnit);
            text.set(newText);
        } finally {
            settingReading = false;
        }
        reading.set(message);
        readings.setAll(options);
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
