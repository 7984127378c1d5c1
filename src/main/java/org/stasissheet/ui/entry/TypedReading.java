package org.stasissheet.ui.entry;

import java.util.Objects;

/**
 * One way to read what was typed or pasted into a quantity field, offered when it reads more than one way
 * ("1,234": 1.234 or 1234) or when its unit makes it implausible: the number and unit it would set.
 *
 * @param value the number as the case file writes it (decimal point, no grouping)
 * @param ucum  the unit code it would set
 * @param label the button text, e.g. {@code use 1234 ×10⁹/L}
 */
public record TypedReading(String value, String ucum, String label) {
    public TypedReading {
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(ucum, "ucum");
        Objects.requireNonNull(label, "label");
    }
}
