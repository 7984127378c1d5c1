package org.stasissheet.rules;

import java.util.Objects;

/**
 * One finding on the worksheet: a rule that fired (or a built-in check), with its level and source.
 *
 * @param explanation a short sentence in our own words saying why and what to do
 */
public record Flag(String id, Level level, String title, String explanation, String source, Basis basis) {
    public Flag {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(level, "level");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(explanation, "explanation");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(basis, "basis");
    }
}
