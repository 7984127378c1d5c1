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
 */
public record WhatIf(String id, String name, List<String> assumptions, Estimate<List<FlowPoint>> byDiameter,
                     Estimate<List<FlowPoint>> leukocrit) {
    public WhatIf {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(byDiameter, "byDiameter");
        Objects.requireNonNull(leukocrit, "leukocrit");
        assumptions = List.copyOf(assumptions);
    }
}
