package org.stasissheet.ui.entry;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.UnitOption;

/**
 * One field of the form: its dotted path in the case file (the same path the case reader names in its
 * messages), the label people see, how it is entered, and for pickers the choices.
 *
 * <p>Guarantees: a {@link FieldKind#QUANTITY} has at least one unit; a picker kind has at least one choice;
 * other kinds have neither.
 *
 * @param analyte the analyte of a quantity, empty for the measuring temperature (which is not an analyte)
 * @param units   the accepted units of a quantity, in picker order
 * @param hint    a short help text (format, what "not assessed" means), empty when none
 */
public record FieldSpec(Section section, String path, String label, FieldKind kind, List<Choice> choices,
                        Optional<Analyte> analyte, List<UnitOption> units, String hint) {
    public FieldSpec {
        Objects.requireNonNull(section, "section");
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(kind, "kind");
        choices = List.copyOf(choices);
        Objects.requireNonNull(analyte, "analyte");
        units = List.copyOf(units);
        Objects.requireNonNull(hint, "hint");
        boolean picker = kind == FieldKind.CHOICE || kind == FieldKind.GRADE || kind == FieldKind.SIGN;
        if (picker == choices.isEmpty()) {
            throw new IllegalArgumentException(path + ": pickers need choices, other fields none");
        }
        if ((kind == FieldKind.QUANTITY) == units.isEmpty()) {
            throw new IllegalArgumentException(path + ": a quantity needs units, other fields none");
        }
    }

    /** The form-state key of the text typed: the path itself, or {@code path.value} for a quantity. */
    public String valueKey() {
        return kind == FieldKind.QUANTITY ? path + ".value" : path;
    }

    /** The form-state key of a quantity's unit code. */
    public String unitKey() {
        if (kind != FieldKind.QUANTITY) {
            throw new IllegalStateException(path + " has no unit");
        }
        return path + ".unit";
    }

    /** The last segment of the path, e.g. {@code wbc} for {@code labs.wbc}. */
    public String key() {
        return path.substring(path.lastIndexOf('.') + 1);
    }

    /** A CSS- and lookup-friendly id such as {@code labs-wbc}. */
    public String id() {
        return path.replace('.', '-');
    }
}
