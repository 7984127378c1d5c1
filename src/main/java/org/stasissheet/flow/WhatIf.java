package org.stasissheet.flow;

import java.util.List;
import java.util.Objects;
import org.stasissheet.measure.Estimate;

/**
 * One "what would happen if" scenario: what it assumes, in words, and the relative-flow series it leads to
 * (against the same reference as the main estimate).
 *
 * @param id          a stable key, e.g. {@code transfusion-1-unit}
 * @param name        a short title for people
 * @param assumptions every simplification the scenario makes, one sentence each
 * @param byDiameter  the relative-flow series under the scenario, or why it cannot be made
 * @param leukocrit   the leukocrit series under the scenario, or why not
 * @param changes     which series the scenario moves, so a chart draws that one and not an unchanged copy
 */
public record WhatIf(String id, String name, List<String> assumptions, Estimate<List<FlowPoint>> byDiameter,
                     Estimate<List<FlowPoint>> leukocrit, Changes changes) {
    /** What a scenario acts on. */
    public enum Changes {
        /** Hematocrit or plasma viscosity: the main series moves (transfusion, plasma exchange). */
        MAIN_SERIES,
        /** Only the white cells: the main series stays as it is, the leukocrit series moves (leukapheresis). */
        LEUKOCRIT_ONLY
    }

    public WhatIf {
        Objects.requireNonNull(changes, "changes");
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(byDiameter, "byDiameter");
        Objects.requireNonNull(leukocrit, "leukocrit");
        assumptions = List.copyOf(assumptions);
    }

    /** The series this scenario moves: the one to draw against the patient's own line. */
    public Estimate<List<FlowPoint>> movedSeries() {
        return changes == Changes.LEUKOCRIT_ONLY ? leukocrit : byDiameter;
    }
}
