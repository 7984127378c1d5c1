package org.stasissheet.ui.course;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.scene.AccessibleRole;
import javafx.scene.Node;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Control;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.stasissheet.course.CourseEntry;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.Procedure;
import org.stasissheet.report.CourseText;
import org.stasissheet.report.ReportTime;
import org.stasissheet.report.VerdictWords;
import org.stasissheet.worksheet.Cautions;

/**
 * The course panel: the standing caution and the course's own, the commands (make a course of the case, add a later
 * assessment, add a procedure), the entries with the assessment the form shows, one trend chart per followed value
 * and the projected-versus-measured table. It binds to {@link CourseModel} and computes nothing.
 */
public final class CourseView {
    private final CourseModel model;
    private final ScrollPane root;
    private final VBox charts = new VBox(8);
    private final VBox entries = new VBox(2);
    private final TableView<CourseRows.ReviewRow> table = new TableView<>();

    public CourseView(CourseModel model) {
        this.model = Objects.requireNonNull(model, "model");
        Label caution = new Label("CAUTION: " + Cautions.SHORT + " " + CourseText.COURSE_CAUTION);
        caution.setId("course-caution");
        caution.getStyleClass().add("standing-caution");
        caution.setWrapText(true);
        caution.setMaxWidth(Double.MAX_VALUE);

        Label message = new Label();
        message.setId("course-message");
        message.setWrapText(true);
        message.getStyleClass().add("course-message");
        message.textProperty().bind(model.messageProperty());
        message.setAccessibleRole(AccessibleRole.TEXT);

        Label state = new Label();
        state.setId("course-state");
        state.textProperty().bind(Bindings.createStringBinding(() -> model.courseProperty().get().isEmpty()
                        ? "No course yet: the form holds one case. Make it the first assessment of a course."
                        : "Course " + model.documentName() + (model.dirtyProperty().get() ? " • UNSAVED CHANGES" : "")
                        + (model.formCompleteProperty().get() ? "" : " • the assessment in the form has problems"),
                model.courseProperty(), model.dirtyProperty(), model.formCompleteProperty(),
                model.documentProperty()));

        VBox box = new VBox(10, caution, state, message, startRow(), assessmentRow(), procedureBox(),
                heading("Entries (the form shows the one marked ▶)"), entries,
                heading("Values over time"), legend(), charts,
                heading("Projected against measured"), table, reviewRule());
        box.setPadding(new Insets(8));
        box.getStyleClass().add("course-panel");
        table.setId("course-review-table");
        table.setAccessibleText("Projected against measured values per procedure");
        table.setPrefHeight(420);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_ALL_COLUMNS);
        column("Procedure", 130, CourseRows.ReviewRow::procedure);
        column("Value", 80, CourseRows.ReviewRow::analyte);
        column("Before", 65, CourseRows.ReviewRow::before);
        column("Low □", 75, CourseRows.ReviewRow::projectedLow);
        column("High ○", 75, CourseRows.ReviewRow::projectedHigh);
        column("Measured next", 110, CourseRows.ReviewRow::measuredNext);
        column("Against projected", 110, CourseRows.ReviewRow::difference);
        column("Review", 140, CourseRows.ReviewRow::review);
        charts.setId("course-charts");
        entries.setId("course-entries");

        root = new ScrollPane(box);
        root.setFitToWidth(true);
        root.setId("course-view");
        model.reportProperty().addListener((o, was, now) -> show(now));
        show(model.reportProperty().get());
    }

    public Node node() {
        return root;
    }

    /** The charts shown, for tests: one per followed value measured. */
    public List<LineChart<Number, Number>> charts() {
        @SuppressWarnings("unchecked")
        List<LineChart<Number, Number>> list = charts.getChildren().stream()
                .map(n -> (LineChart<Number, Number>) n).toList();
        return list;
    }

    public TableView<CourseRows.ReviewRow> table() {
        return table;
    }

    private Node startRow() {
        TextField time = field("course-first-time", "Time of the first assessment, when the case has none",
                "e.g. 2026-06-11T08:00+02:00");
        Button start = button("course-start", "Make this case a course", () -> model.start(time.getText()));
        start.disableProperty().bind(Bindings.createBooleanBinding(() -> model.courseProperty().get().isPresent(),
                model.courseProperty()));
        time.disableProperty().bind(start.disableProperty());
        start.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        HBox row = row(new Label("First assessment at (only when the case has no time):"), time, start);
        // once there is a course, the row has nothing to do
        row.visibleProperty().bind(start.disableProperty().not());
        row.managedProperty().bind(row.visibleProperty());
        return row;
    }

    private Node assessmentRow() {
        TextField time = field("course-new-time", "Time of the new assessment", "e.g. 2026-06-11T14:00+02:00");
        Button add = button("course-add-assessment", "Add a later assessment", () -> {
            if (model.addAssessment(time.getText())) {
                time.clear();
            }
        });
        add.disableProperty().bind(Bindings.createBooleanBinding(() -> model.courseProperty().get().isEmpty(),
                model.courseProperty()));
        time.disableProperty().bind(add.disableProperty());
        return row(new Label("New assessment at:"), time, add);
    }

    private Node procedureBox() {
        ComboBox<ProcedureFields.Kind> kind = new ComboBox<>(FXCollections.observableArrayList(
                ProcedureFields.Kind.values()));
        kind.setValue(ProcedureFields.Kind.PLASMA_EXCHANGE);
        kind.setId("course-procedure-kind");
        kind.setAccessibleText("Kind of procedure");
        TextField at = field("course-procedure-time", "Time of the procedure", "e.g. 2026-06-11T10:00+02:00");
        TextField volumes = field("course-procedure-plasma-volumes", "Plasma volumes exchanged, 0.5 to 2.0",
                "0.5–2.0");
        TextField volume = field("course-procedure-volume", "Volume of plasma removed", "e.g. 3500");
        ComboBox<String> unit = new ComboBox<>(FXCollections.observableArrayList("L", "mL"));
        unit.setValue("mL");
        unit.setId("course-procedure-volume-unit");
        unit.setAccessibleText("Unit of the volume removed");
        ComboBox<String> fluid = new ComboBox<>(FXCollections.observableArrayList(
                Procedure.Replacement.ALBUMIN.code(), Procedure.Replacement.PLASMA.code(),
                Procedure.Replacement.ALBUMIN_AND_PLASMA.code()));
        fluid.setValue(Procedure.Replacement.ALBUMIN.code());
        fluid.setId("course-procedure-replacement");
        fluid.setAccessibleText("Replacement fluid");
        TextField blood = field("course-procedure-blood-volumes", "Blood volumes processed, 1 to 4", "1–4");
        Button add = button("course-add-procedure", "Add the procedure", () -> {
            if (model.addProcedure(new ProcedureFields(kind.getValue(), at.getText(), volumes.getText(),
                    volume.getText(), unit.getValue(), fluid.getValue(), blood.getText()))) {
                at.clear();
                volumes.clear();
                volume.clear();
                blood.clear();
            }
        });
        add.disableProperty().bind(Bindings.createBooleanBinding(() -> model.courseProperty().get().isEmpty(),
                model.courseProperty()));
        var exchange = Bindings.createBooleanBinding(() -> kind.getValue() == ProcedureFields.Kind.PLASMA_EXCHANGE,
                kind.valueProperty());
        Label atLabel = labelFor("Time of the procedure", at);
        Label volumesLabel = labelFor("Plasma volumes", volumes);
        Label volumeLabel = labelFor("or Volume removed", volume);
        Label fluidLabel = labelFor("Replacement fluid", fluid);
        Label bloodLabel = labelFor("Blood volumes processed", blood);
        for (Node c : List.of(volumesLabel, volumes, volumeLabel, volume, unit, fluidLabel, fluid)) {
            c.visibleProperty().bind(exchange);
            c.managedProperty().bind(exchange);
        }
        for (Node c : List.of(bloodLabel, blood)) {
            c.visibleProperty().bind(exchange.not());
            c.managedProperty().bind(exchange.not());
        }
        FlowPane pane = new FlowPane(6, 4, new Label("New procedure:"), kind, atLabel, at, volumesLabel, volumes,
                volumeLabel, volume, unit, fluidLabel, fluid, bloodLabel, blood, add);
        pane.setId("course-procedure");
        return pane;
    }

    private static Node legend() {
        Label l = new Label("● measured (joined by a line)   □ projected low: right after the exchange, or the largest "
                + "usual fall after a leukapheresis   ○ projected high: after redistribution, or the smallest usual "
                + "fall   ▲ procedure, on the time axis. Projections sit at the time of the next measurement. The "
                + "table's Low and High columns are the same two values.");
        l.setWrapText(true);
        l.setId("course-legend");
        return l;
    }

    private Node reviewRule() {
        Label rule = new Label("Review rule: " + CourseText.REVIEW_RULE + ". Low and high: for an exchange, the value "
                + "right after it and after redistribution; for a leukapheresis, the largest and the smallest usual "
                + "fall.");
        rule.setWrapText(true);
        return rule;
    }

    private void show(Optional<CourseReport> report) {
        charts.getChildren().clear();
        entries.getChildren().clear();
        table.getItems().clear();
        if (report.isEmpty()) {
            return;
        }
        CourseReport r = report.get();
        int sheet = 0;
        int review = 0;
        int n = 0;
        for (CourseEntry e : r.course().entries()) {
            n++;
            String text;
            if (e instanceof CourseEntry.Assessment) {
                var w = r.worksheets().get(sheet);
                text = (sheet == model.editing() ? "▶ " : "   ") + "#" + n + " " + ReportTime.FORMAT.format(e.at())
                        + "  assessment: " + VerdictWords.hyperviscosity(w.hyperviscosity()) + "; " + VerdictWords.leukostasis(w.leukostasis());
                int index = sheet;
                Button edit = button("course-edit-" + index, "Show in the form", () -> model.edit(index));
                edit.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
                Label line = new Label(text);
                line.setWrapText(true);
                HBox.setHgrow(line, javafx.scene.layout.Priority.ALWAYS);
                entries.getChildren().add(row(edit, line));
                sheet++;
            } else {
                text = "   #" + n + " " + ReportTime.FORMAT.format(e.at()) + "  "
                        + CourseText.describe(r.procedures().get(review++));
                Label line = new Label(text);
                line.setWrapText(true);
                entries.getChildren().add(line);
            }
        }
        table.getItems().setAll(CourseRows.rows(r));
        for (CourseRows.Trend t : CourseRows.trends(r)) {
            charts.getChildren().add(chart(t, r));
        }
    }

    private LineChart<Number, Number> chart(CourseRows.Trend t, CourseReport r) {
        NumberAxis x = new NumberAxis();
        x.setLabel("hours since " + ReportTime.FORMAT.format(r.course().entries().get(0).at()));
        x.setForceZeroInRange(true);
        NumberAxis y = new NumberAxis();
        y.setLabel(t.title());
        y.setForceZeroInRange(true);
        LineChart<Number, Number> chart = new LineChart<>(x, y);
        chart.setTitle(t.title());
        chart.setId("course-chart-" + t.analyte().key());
        chart.setAnimated(false);
        chart.setPrefHeight(240);
        chart.getStyleClass().add("course-chart");
        chart.setAccessibleText("Trend of " + t.title());
        // the legend below all charts names the marks by shape; the chart's own would show colours only
        chart.setLegendVisible(false);
        add(chart, "measured ●", t.measured(), "course-measured");
        add(chart, "projected low □", t.projectedLow(), "course-projected-low");
        add(chart, "projected high ○", t.projectedHigh(), "course-projected-high");
        add(chart, "procedure ▲ (on the time axis)", t.procedures(), "course-procedure-mark");
        return chart;
    }

    /**
     * Adds one series, even an empty one, so each kind keeps its series index and with it its shape in the style
     * sheet ({@code series0} measured, {@code series1} low, {@code series2} high, {@code series3} procedures).
     */
    private static void add(LineChart<Number, Number> chart, String name, List<CourseRows.Point> points,
                            String style) {
        XYChart.Series<Number, Number> s = new XYChart.Series<>();
        s.setName(name);
        for (CourseRows.Point p : points) {
            s.getData().add(new XYChart.Data<>(p.hours(), p.value()));
        }
        chart.getData().add(s);
        for (int i = 0; i < points.size(); i++) {
            Node mark = s.getData().get(i).getNode();
            Tooltip.install(mark, new Tooltip(points.get(i).label()));
        }
    }

    private void column(String title, double width, java.util.function.Function<CourseRows.ReviewRow, String> cell) {
        TableColumn<CourseRows.ReviewRow, String> c = new TableColumn<>(title);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new javafx.beans.property.ReadOnlyStringWrapper(cell.apply(d.getValue())));
        // cells wrap rather than cut: a cut review reason or unit would hide what to check
        c.setCellFactory(col -> new javafx.scene.control.TableCell<>() {
            private final javafx.scene.text.Text text = new javafx.scene.text.Text();

            {
                text.wrappingWidthProperty().bind(col.widthProperty().subtract(8));
                text.getStyleClass().add("course-cell-text");
                setGraphic(text);
            }

            @Override
            protected void updateItem(String item, boolean empty) {
                super.updateItem(item, empty);
                text.setText(empty || item == null ? "" : item);
            }
        });
        table.getColumns().add(c);
    }

    private static Label labelFor(String text, Control field) {
        Label l = new Label(text);
        l.setLabelFor(field);
        return l;
    }

    private static Label heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("course-heading");
        return l;
    }

    private static TextField field(String id, String accessible, String prompt) {
        TextField f = new TextField();
        f.setId(id);
        f.setAccessibleText(accessible);
        f.setPromptText(prompt);
        f.setPrefColumnCount(14);
        return f;
    }

    private static Button button(String id, String text, Runnable action) {
        Button b = new Button(text);
        b.setId(id);
        b.setOnAction(e -> action.run());
        return b;
    }

    private static HBox row(Node... nodes) {
        HBox h = new HBox(6, nodes);
        h.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        return h;
    }
}
