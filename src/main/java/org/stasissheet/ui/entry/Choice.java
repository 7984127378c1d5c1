package org.stasissheet.ui.entry;

import java.util.Objects;

/**
 * One entry of a picker: the exact word written to the case file ({@code ""} for "not entered") and the text
 * people see.
 */
public record Choice(String code, String label) {
    public Choice {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(label, "label");
    }

    /** A word read from a file that the picker does not offer: kept and shown, so the reader's message has a home. */
    public static Choice unrecognised(String code) {
        return new Choice(code, code + " (not recognised)");
    }

    @Override
    public String toString() {
        return label;
    }
}
