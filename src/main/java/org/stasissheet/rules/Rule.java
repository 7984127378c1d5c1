package org.stasissheet.rules;

import java.util.Objects;

/**
 * One rule of the set: when its condition holds for a case, the worksheet carries a {@link Flag} with this
 * rule's id, level, title, explanation, source and basis.
 *
 * @param topic the group the rule belongs to (e.g. {@code hyperviscosity}), for listings and counts
 * @param note  free text from the rule file (a disagreement between sources, a local remark), empty when none
 */
public record Rule(String id, String topic, Level level, Condition when, String title, String explanation,
                   String source, Basis basis, String note) {
    public Rule {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(topic, "topic");
        Objects.requireNonNull(level, "level");
        Objects.requireNonNull(when, "when");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(explanation, "explanation");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(note, "note");
        if (id.isBlank() || source.isBlank() || title.isBlank()) {
            throw new IllegalArgumentException("rule id, title and source must not be blank");
        }
    }

    public Flag flag() {
        return new Flag(id, level, title, explanation, source, basis);
    }
}
