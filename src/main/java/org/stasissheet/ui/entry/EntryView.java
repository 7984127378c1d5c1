package org.stasissheet.ui.entry;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Supplier;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Control;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.stasissheet.measure.UnitOption;

/**
 * The entry side: one collapsible group per {@link Section}, one row per field, in the order of
 * {@link FormFields} (which is also the tab order). Each row has its label, its input, a unit picker for
 * quantities, and under it the reader's message with any unit fixes. Enter moves to the next field, so a column
 * of lab values can be typed without the mouse.
 *
 * <p>Ids: each input is {@code #<path with dashes>} ({@code #labs-wbc}), its unit picker {@code #labs-wbc-unit},
 * its message {@code #labs-wbc-problem}, a fix button {@code #labs-wbc-fix-<ucum>}.
 */
public final class EntryView {
    private final EntryViewModel model;
    private final VBox groups = new VBox();
    private final ScrollPane root = new ScrollPane(groups);
    private final List<Control> inputs = new ArrayList<>();
    private final Supplier<String> now;

    /** @param now the current date and time as ISO text, for the "now" button beside "assessed at" */
    public EntryView(EntryViewModel model, Supplier<String> now) {
        this.model = Objects.requireNonNull(model, "model");
        this.now = Objects.requireNonNull(now, "now");
        groups.getStyleClass().add("entry-groups");
        root.getStyleClass().add("entry-side");
        root.setFitToWidth(true);
        root.setAccessibleText("Case entry");
        groups.getChildren().add(otherProblems());
        for (Section s : Section.values()) {
            groups.getChildren().add(section(s));
        }
        groups.addEventFilter(KeyEvent.KEY_PRESSED, this::enterMovesOn);
    }

    public Node node() {
        return root;
    }

    /** The inputs in tab order (first the patient label). */
    public List<Control> inputs() {
        return List.copyOf(inputs);
    }

    private Node otherProblems() {
        VBox box = new VBox();
        box.setId("other-problems");
        box.getStyleClass().add("other-problems");
        Label head = new Label("PROBLEM: the case file has entries the form cannot place");
        head.getStyleClass().add("problem-heading");
        box.getChildren().add(head);
        Label list = new Label();
        list.setWrapText(true);
        list.textProperty().bind(Bindings.createStringBinding(
                () -> String.join("\n", model.otherProblemsProperty()), model.otherProblemsProperty()));
        box.getChildren().add(list);
        box.visibleProperty().bind(model.otherProblemsProperty().emptyProperty().not());
        box.managedProperty().bind(box.visibleProperty());
        return box;
    }

    private TitledPane section(Section s) {
        GridPane grid = new GridPane();
        grid.getStyleClass().add("entry-grid");
        ColumnConstraints label = new ColumnConstraints();
        label.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        ColumnConstraints input = new ColumnConstraints();
        input.setHgrow(Priority.ALWAYS);
        input.setMinWidth(90);
        grid.getColumnConstraints().addAll(label, input, new ColumnConstraints());
        int row = 0;
        for (FieldSpec spec : FormFields.of(s)) {
            row = addRow(grid, row, model.field(spec.path()));
        }
        TitledPane pane = new TitledPane(s.title(), grid);
        pane.setId("section-" + s.name().toLowerCase(java.util.Locale.ROOT));
        pane.setExpanded(s.expandedAtStart());
        pane.setAccessibleText(s.title());
        return pane;
    }

    private int addRow(GridPane grid, int row, FieldModel field) {
        FieldSpec spec = field.spec();
        Label label = new Label(spec.label());
        label.getStyleClass().add("field-label");
        Control input = input(field);
        input.setId(spec.id());
        input.setAccessibleText(spec.label());
        if (!spec.hint().isEmpty()) {
            input.setAccessibleHelp(spec.hint());
            input.setTooltip(new Tooltip(spec.hint()));
        }
        label.setLabelFor(input);
        inputs.add(input);
        grid.add(label, 0, row);
        if (spec.kind() == FieldKind.QUANTITY) {
            grid.add(input, 1, row);
            grid.add(unitPicker(field), 2, row);
        } else if (spec.kind() == FieldKind.DATE_TIME) {
            Button nowButton = new Button("now");
            nowButton.setId(spec.id() + "-now");
            nowButton.setAccessibleText("Set " + spec.label() + " to the current date and time");
            nowButton.setOnAction(e -> field.textProperty().set(now.get()));
            grid.add(input, 1, row);
            grid.add(nowButton, 2, row);
        } else {
            grid.add(input, 1, row, 2, 1);
        }
        if (!spec.hint().isEmpty() && spec.kind() != FieldKind.GRADE) {
            row++;
            Label hint = new Label(spec.hint());
            hint.getStyleClass().add("field-hint");
            hint.setWrapText(true);
            grid.add(hint, 1, row, 2, 1);
        }
        row++;
        grid.add(problem(field), 0, row, 3, 1);
        return row + 1;
    }

    private Control input(FieldModel field) {
        FieldSpec spec = field.spec();
        switch (spec.kind()) {
            case CHOICE, GRADE, SIGN -> {
                ComboBox<Choice> box = new ComboBox<>();
                PickerBinding.bind(box, field.textProperty(), spec.choices(), Choice::code, Choice::unrecognised,
                        Choice::label, Choice::label);
                box.setMaxWidth(Double.MAX_VALUE);
                return box;
            }
            case SWITCH -> {
                CheckBox box = new CheckBox("yes");
                box.setSelected("true".equals(field.textProperty().get()));
                field.textProperty().addListener((o, was, now) -> box.setSelected("true".equals(now)));
                box.selectedProperty().addListener((o, was, now) -> field.textProperty().set(now ? "true" : "false"));
                return box;
            }
            default -> {
                TextField text = new TextField();
                text.textProperty().bindBidirectional(field.textProperty());
                text.getStyleClass().add(spec.kind() == FieldKind.QUANTITY || spec.kind() == FieldKind.WHOLE
                        ? "number-input" : "text-input-field");
                if (spec.kind() == FieldKind.DATE) {
                    text.setPromptText("YYYY-MM-DD");
                }
                field.problemProperty().addListener((o, was, now) -> {
                    text.pseudoClassStateChanged(PROBLEM, !now.isEmpty());
                });
                return text;
            }
        }
    }

    static final javafx.css.PseudoClass PROBLEM = javafx.css.PseudoClass.getPseudoClass("problem");

    private Control unitPicker(FieldModel field) {
        FieldSpec spec = field.spec();
        ComboBox<UnitOption> box = new ComboBox<>();
        box.setId(spec.id() + "-unit");
        box.setAccessibleText("Unit of " + spec.label());
        PickerBinding.bind(box, field.unitProperty(), spec.units(), UnitOption::ucum,
                code -> new UnitOption(code, code.isEmpty() ? "(no unit)" : code + " (not accepted)", 1,
                        "not an accepted unit"),
                UnitOption::display, u -> u.display() + "   ·  UCUM " + u.ucum());
        Tooltip tip = new Tooltip();
        tip.textProperty().bind(Bindings.concat("UCUM code in the file: ", field.unitProperty()));
        box.setTooltip(tip);
        box.getStyleClass().add("unit-picker");
        inputs.add(box);
        return box;
    }

    private Node problem(FieldModel field) {
        String id = field.spec().id();
        Label message = new Label();
        message.setId(id + "-problem");
        message.getStyleClass().add("field-problem");
        message.setWrapText(true);
        message.textProperty().bind(Bindings.createStringBinding(() -> {
            String p = field.problemProperty().get();
            if (p.isEmpty()) {
                return "";
            }
            return "PROBLEM: " + p + (field.leftOutProperty().get() ? "\n(the worksheet leaves this value out)" : "");
        }, field.problemProperty(), field.leftOutProperty()));
        message.setAccessibleRole(javafx.scene.AccessibleRole.TEXT);
        FlowPane fixes = new FlowPane(6, 4);
        fixes.getStyleClass().add("fixes");
        field.fixesProperty().addListener((javafx.collections.ListChangeListener<UnitFix>) c -> {
            fixes.getChildren().clear();
            for (UnitFix fix : field.fixesProperty()) {
                Button b = new Button(fix.label());
                b.setId(id + "-fix-" + fix.ucum().replaceAll("[^A-Za-z0-9]", "_"));
                b.getStyleClass().add("fix-button");
                b.setAccessibleText(fix.label() + " for " + field.spec().label() + " (means " + fix.canonical() + ")");
                b.setTooltip(new Tooltip("means " + fix.canonical()));
                b.setOnAction(e -> field.apply(fix));
                fixes.getChildren().add(b);
            }
        });
        VBox box = new VBox(2, message, fixes);
        box.getStyleClass().add("problem-box");
        box.setPadding(new Insets(0, 0, 4, 0));
        box.visibleProperty().bind(field.problemProperty().isNotEmpty());
        box.managedProperty().bind(box.visibleProperty());
        HBox.setHgrow(box, Priority.ALWAYS);
        return box;
    }

    /** Enter in a text field moves to the next text field, as Tab would but skipping the unit pickers. */
    private void enterMovesOn(KeyEvent e) {
        if (e.getCode() != KeyCode.ENTER || !(e.getTarget() instanceof TextField current)) {
            return;
        }
        int i = inputs.indexOf(current);
        for (int j = i + 1; i >= 0 && j < inputs.size(); j++) {
            Control next = inputs.get(j);
            if (next instanceof TextField && next.isVisible()) {
                expandSectionOf(next);
                next.requestFocus();
                e.consume();
                return;
            }
        }
    }

    private static void expandSectionOf(Node n) {
        for (Node p = n.getParent(); p != null; p = p.getParent()) {
            if (p instanceof TitledPane t) {
                t.setExpanded(true);
                return;
            }
        }
    }
}
