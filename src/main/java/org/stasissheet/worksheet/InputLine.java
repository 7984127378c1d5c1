package org.stasissheet.worksheet;

import java.util.Objects;
import org.stasissheet.measure.Quantity;

/**
 * One normalised input as the worksheet shows it: the path in the case file, what was entered, and the
 * same value in canonical units (equal to the entered one when it already was canonical).
 */
public record InputLine(String path, String label, Quantity entered, Quantity canonical) {
    public InputLine {
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(entered, "entered");
        Objects.requireNonNull(canonical, "canonical");
    }
}
