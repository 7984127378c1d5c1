package org.stasissheet.ui.chart;

import java.util.List;
import java.util.Objects;
import org.stasissheet.flow.FlowPoint;

/**
 * One line of the flow chart.
 *
 * @param shownAtStart whether its toggle starts on (the patient's series) or off (what-ifs)
 * @param assumptions  what the series assumes, shown under the chart while the series is on
 */
public record FlowSeries(String id, String name, List<FlowPoint> points, boolean shownAtStart,
                         List<String> assumptions) {
    public FlowSeries {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        points = List.copyOf(points);
        assumptions = List.copyOf(assumptions);
    }
}
