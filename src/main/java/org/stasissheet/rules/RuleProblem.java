package org.stasissheet.rules;

import java.util.Objects;

/**
 * One reason a rule set was refused, located in its file. Lines and columns are 1-based; 0 means "the file as a
 * whole" (for example a file that the manifest lists but that is missing).
 */
public record RuleProblem(String file, int line, int column, String message) {
    public RuleProblem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        if (line < 0 || column < 0) {
            throw new IllegalArgumentException("line and column must be ≥ 0");
        }
    }

    /** {@code hyperviscosity.yaml:12:5: unknown key "sorce"}: the form editors and compilers use. */
    @Override
    public String toString() {
        return line == 0 ? file + ": " + message : file + ":" + line + ":" + column + ": " + message;
    }
}
