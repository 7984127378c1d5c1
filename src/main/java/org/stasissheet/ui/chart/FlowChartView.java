package org.stasissheet.ui.chart;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import javafx.beans.value.ObservableValue;
import javafx.scene.Node;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.VBox;
import org.stasissheet.flow.FlowPoint;
import org.stasissheet.measure.Numbers;

/**
 * The flow chart: relative flow (patient ÷ reference blood) against vessel diameter on a log axis, the reference
 * level 1 as a line of its own, one toggle per series (what-ifs start off), and under it why any series is
 * missing, the notes and the caveats. Series differ by dash pattern and marker shape as well as colour
 * (see the style sheet), and the chart's accessible text reads out the patient's values.
 *
 * <p>An edit that only moves the curves keeps the chart's nodes and sets the new values into them; the series,
 * toggles and notes are rebuilt only when they change (new nodes are what makes a live edit slow).
 */
public final class FlowChartView {
    static final double MIN_DIAMETER_UM = 4;
    static final double MAX_DIAMETER_UM = 1000;
    static final List<Double> SPOKEN_DIAMETERS = List.of(5.0, 10.0, 20.0, 50.0, 100.0);

    private final LineChart<Number, Number> chart;
    private final FlowPane toggles = new FlowPane(10, 4);
    private final VBox notes = new VBox(2);
    private final VBox assumptions = new VBox(2);
    private final VBox root;
    private final Map<String, Boolean> shown = new LinkedHashMap<>();
    /** The plotted series by id, with the model they show. */
    private final Map<String, XYChart.Series<Number, Number>> plotted = new LinkedHashMap<>();
    private FlowChartModel current;
    /** Held here: a binding passed in is otherwise only weakly reachable and would stop updating. */
    private final ObservableValue<FlowChartModel> model;

    public FlowChartView(ObservableValue<FlowChartModel> model) {
        this.model = Objects.requireNonNull(model, "model");
        LogAxis x = new LogAxis("vessel diameter (µm, log scale)", MIN_DIAMETER_UM, MAX_DIAMETER_UM);
        NumberAxis y = new NumberAxis();
        y.setLabel("relative flow (1 = reference)");
        y.setForceZeroInRange(true);
        chart = new LineChart<>(x, y);
        chart.setId("flow-chart");
        chart.setAnimated(false);
        chart.setCreateSymbols(true);
        chart.setLegendVisible(true);
        chart.getStyleClass().add("flow-chart");
        chart.setMinHeight(260);
        chart.setPrefHeight(320);
        toggles.setId("flow-toggles");
        toggles.getStyleClass().add("flow-toggles");
        notes.getStyleClass().add("flow-notes");
        Label title = new Label("Microvascular flow: an illustration, not a measurement");
        title.getStyleClass().add("sheet-heading");
        assumptions.setId("what-if-assumptions");
        root = new VBox(6, title, toggles, chart, assumptions, notes);
        root.getStyleClass().add("flow-section");
        root.setId("flow-section");
        model.addListener((o, was, now) -> show(now));
        show(model.getValue());
    }

    public Node node() {
        return root;
    }

    private void show(FlowChartModel m) {
        FlowChartModel was = current;
        current = m;
        // no series (no hematocrit): no empty frame; the notes below say why
        boolean drawn = !m.series().isEmpty();
        for (Node n : List.of(chart, toggles)) {
            n.setVisible(drawn);
            n.setManaged(drawn);
        }
        if (m.equals(was)) {
            return;
        }
        boolean sameSeries = was != null && sameSeries(was, m);
        if (!sameSeries) {
            toggles.getChildren().clear();
            for (FlowSeries s : m.series()) {
                boolean on = shown.getOrDefault(s.id(), s.shownAtStart());
                CheckBox box = new CheckBox(s.name());
                box.setId("series-" + s.id());
                box.setSelected(on);
                box.setAccessibleText("Show the series " + s.name());
                box.selectedProperty().addListener((o, before, now) -> {
                    shown.put(s.id(), now);
                    plot(current);
                });
                toggles.getChildren().add(box);
            }
        }
        if (was == null || !was.missing().equals(m.missing()) || !was.notes().equals(m.notes())
                || !was.caveats().equals(m.caveats())) {
            notes.getChildren().clear();
            m.missing().forEach(t -> notes.getChildren().add(note("not shown: " + t, "flow-missing")));
            m.notes().forEach(t -> notes.getChildren().add(note(t, "flow-note")));
            m.caveats().forEach(t -> notes.getChildren().add(note("CAVEAT: " + t, "flow-caveat")));
        }
        if (sameSeries) {
            moveCurves(m);
            showAssumptions(m);
        } else {
            plot(m);
        }
    }

    /** The same series (ids, names, number of points, shown or not at start): only values and texts moved. */
    private static boolean sameSeries(FlowChartModel a, FlowChartModel b) {
        if (a.series().size() != b.series().size()) {
            return false;
        }
        for (int i = 0; i < a.series().size(); i++) {
            FlowSeries x = a.series().get(i);
            FlowSeries y = b.series().get(i);
            if (!x.id().equals(y.id()) || !x.name().equals(y.name()) || x.points().size() != y.points().size()
                    || x.shownAtStart() != y.shownAtStart()) {
                return false;
            }
        }
        return true;
    }

    /** The assumptions of the series that are on, under the chart. */
    private void showAssumptions(FlowChartModel m) {
        List<String> texts = new java.util.ArrayList<>();
        for (FlowSeries s : m.series()) {
            if (isShown(s)) {
                s.assumptions().forEach(a -> texts.add(s.name() + ": " + a));
            }
        }
        List<Node> labels = assumptions.getChildren();
        if (labels.size() == texts.size()) {
            for (int i = 0; i < texts.size(); i++) {
                ((Label) labels.get(i)).setText(texts.get(i));
            }
        } else {
            assumptions.getChildren().setAll(texts.stream().map(t -> (Node) note(t, "flow-assumption")).toList());
        }
    }

    /** Sets the new values into the plotted points, and the spoken text to match. */
    private void moveCurves(FlowChartModel m) {
        for (FlowSeries s : m.series()) {
            XYChart.Series<Number, Number> series = plotted.get(s.id());
            if (series == null) {
                continue;
            }
            for (int i = 0; i < s.points().size(); i++) {
                FlowPoint p = s.points().get(i);
                XYChart.Data<Number, Number> d = series.getData().get(i);
                d.setXValue(p.diameterUm());
                d.setYValue(p.relativeFlow());
            }
        }
        chart.setAccessibleText(spoken(m));
    }

    private void plot(FlowChartModel m) {
        chart.getData().clear();
        plotted.clear();
        if (!m.series().isEmpty()) {
            XYChart.Series<Number, Number> reference = new XYChart.Series<>();
            reference.setName("Reference blood (1)");
            reference.getData().add(new XYChart.Data<>(MIN_DIAMETER_UM, 1));
            reference.getData().add(new XYChart.Data<>(MAX_DIAMETER_UM, 1));
            chart.getData().add(reference);
        }
        for (FlowSeries s : m.series()) {
            if (!isShown(s)) {
                continue;
            }
            XYChart.Series<Number, Number> series = new XYChart.Series<>();
            series.setName(s.name());
            for (FlowPoint p : s.points()) {
                series.getData().add(new XYChart.Data<>(p.diameterUm(), p.relativeFlow()));
            }
            chart.getData().add(series);
            plotted.put(s.id(), series);
        }
        showAssumptions(m);
        chart.setAccessibleText(spoken(m));
    }

    private boolean isShown(FlowSeries s) {
        return shown.getOrDefault(s.id(), s.shownAtStart());
    }

    /** The patient's values read out at a few diameters, for a screen reader. */
    private String spoken(FlowChartModel m) {
        if (m.series().isEmpty()) {
            return "Flow chart: no estimate";
        }
        StringBuilder spoken = new StringBuilder("Flow chart. ");
        for (FlowSeries s : m.series()) {
            if (!isShown(s)) {
                continue;
            }
            spoken.append(s.name()).append(':');
            for (FlowPoint p : s.points()) {
                if (SPOKEN_DIAMETERS.contains(p.diameterUm())) {
                    spoken.append(' ').append(Numbers.plain(p.diameterUm())).append(" µm ")
                            .append(Numbers.rounded(p.relativeFlow(), 2)).append(',');
                }
            }
            spoken.append(". ");
        }
        return spoken.toString();
    }

    private static Label note(String text, String style) {
        Label l = new Label(text);
        l.setWrapText(true);
        l.getStyleClass().add(style);
        return l;
    }
}
