package org.stasissheet.ui.chart;

import java.util.List;

/**
 * What the flow chart shows: its series, why any series is missing, the notes under it and the caveats that
 * always go with it.
 */
public record FlowChartModel(List<FlowSeries> series, List<String> missing, List<String> notes,
                             List<String> caveats) {
    public static final FlowChartModel EMPTY = new FlowChartModel(List.of(), List.of(), List.of(), List.of());

    public FlowChartModel {
        series = List.copyOf(series);
        missing = List.copyOf(missing);
        notes = List.copyOf(notes);
        caveats = List.copyOf(caveats);
    }
}
