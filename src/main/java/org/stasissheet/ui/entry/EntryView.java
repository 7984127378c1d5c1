package org.stasissheet.ui.entry;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.time.Clock;
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
 * quantities, and under it the reader's message with any unit fixes. Enter moves to the next field (pickers and
 * switches included), so a column of lab values can be typed without the mouse; pickers take typed letters
 * ({@link TypeAhead}); the focused input is always scrolled into view ({@link FocusScroll}); a quantity reads a
 * decimal comma or a typed or pasted unit when its focus leaves it ({@link FieldModel#readTyped()}).
 *
 * <p>Ids: each input is {@code #<path with dashes>} ({@code #labs-wbc}), its unit picker {@code #labs-wbc-unit},
 * its message {@code #labs-wbc-problem}, a fix button {@code #labs-wbc-fix-<ucum>}, how typed text was read
 * {@code #labs-wbc-reading} with a button per reading {@code #labs-wbc-take-<n>}; the time of the assessment is
 * {@code #assessedAt-date} and {@code #assessedAt-time}.
 */
public final class EntryView {
    private final EntryViewModel model;
    private final VBox groups = new VBox();
    private final ScrollPane root = new ScrollPane(groups);
    private final List<Control> inputs = new ArrayList<>();
    /** What Enter visits, in order: every field's own input (pickers and switches included), no unit pickers. */
    private final List<Control> enterOrder = new ArrayList<>();
    private final Clock clock;
    /** Each section's grid of fields, and the collapsible group that shows it. */
    private final java.util.Map<Node, TitledPane> sectionOf = new java.util.HashMap<>();

    /**
     * @param clock the current date and time and the time zone, for the time of the assessment (its "now"
     *              button, and the offset a typed time is recorded with)
     */
    public EntryView(EntryViewModel model, Clock clock) {
        this.model = Objects.requireNonNull(model, "model");
        this.clock = Objects.requireNonNull(clock, "clock");
        groups.getStyleClass().add("entry-groups");
        root.getStyleClass().add("entry-side");
        root.setFitToWidth(true);
        root.setAccessibleText("Case entry");
        groups.getChildren().add(otherProblems());
        for (Section s : Section.values()) {
            groups.getChildren().add(section(s));
        }
        groups.addEventFilter(KeyEvent.KEY_PRESSED, this::enterMovesOn);
        FocusScroll.keepInView(root);
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
        TitledPane pane = new TitledPane(s.title(), null);
        // no sliding: a field focused in a section that opens must be scrolled to where it ends up, at once
        pane.setAnimated(false);
        pane.setId("section-" + s.name().toLowerCase(java.util.Locale.ROOT));
        pane.setExpanded(s.expandedAtStart());
        pane.setAccessibleText(s.title());
        sectionOf.put(grid, pane);
        if (s.expandedAtStart()) {
            pane.setContent(grid);
        } else {
            // a closed section's fields (built, bound and in the tab order all the same) join the window when it
            // first opens: until then the first screen does not style and lay out hundreds of hidden nodes
            javafx.beans.InvalidationListener attach = new javafx.beans.InvalidationListener() {
                @Override
                public void invalidated(javafx.beans.Observable o) {
                    if (pane.isExpanded()) {
                        pane.expandedProperty().removeListener(this);
                        pane.setContent(grid);
                    }
                }
            };
            pane.expandedProperty().addListener(attach);
        }
        return pane;
    }

    private int addRow(GridPane grid, int row, FieldModel field) {
        FieldSpec spec = field.spec();
        Label label = new Label(spec.label());
        label.getStyleClass().add("field-label");
        grid.add(label, 0, row);
        if (spec.kind() == FieldKind.DATE_TIME) {
            DateTimeEntry entry = new DateTimeEntry(field, clock);
            label.setLabelFor(entry.date());
            inputs.add(entry.date());
            inputs.add(entry.time());
            enterOrder.add(entry.date());
            enterOrder.add(entry.time());
            grid.add(entry.inputs(), 1, row);
            grid.add(entry.nowButton(), 2, row);
            row++;
            grid.add(entry.message(), 1, row, 2, 1);
            row++;
            Label hint = new Label(spec.hint());
            hint.getStyleClass().add("field-hint");
            hint.setWrapText(true);
            grid.add(hint, 1, row, 2, 1);
            row++;
            grid.add(problem(field, entry.time()), 0, row, 3, 1);
            return row + 1;
        }
        Control input = input(field);
        input.setId(spec.id());
        input.setAccessibleText(spec.label());
        if (!spec.hint().isEmpty()) {
            input.setAccessibleHelp(spec.hint());
            input.setTooltip(new Tooltip(spec.hint()));
        }
        label.setLabelFor(input);
        inputs.add(input);
        enterOrder.add(input);
        if (spec.kind() == FieldKind.QUANTITY) {
            grid.add(input, 1, row);
            grid.add(unitPicker(field), 2, row);
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
        grid.add(problem(field, input), 0, row, 3, 1);
        if (spec.kind() == FieldKind.QUANTITY) {
            row++;
            grid.add(typedReading(field, input), 0, row, 3, 1);
        }
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
                TypeAhead.install(box, Choice::label, () -> System.nanoTime() / 1_000_000);
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
                TextField text = spec.kind() == FieldKind.QUANTITY ? new TextField() {
                    @Override
                    public void paste() {
                        super.paste();
                        field.readTyped(); // a pasted "180 x10^9/L" is read at once, value and unit
                    }
                } : new TextField();
                if (spec.kind() == FieldKind.QUANTITY) {
                    text.focusedProperty().addListener((o, was, now) -> {
                        if (!now) {
                            field.readTyped();
                        }
                    });
                }
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

    /** A row's message under its input: wrapped, read out by screen readers as text. */
    private static Label rowMessage(String id, String styleClass) {
        Label message = new Label();
        message.setId(id);
        message.getStyleClass().add(styleClass);
        message.setWrapText(true);
        message.setAccessibleRole(javafx.scene.AccessibleRole.TEXT);
        return message;
    }

    /** @param input where the focus goes back to after a fix (its button disappears with the problem) */
    private Node problem(FieldModel field, Control input) {
        String id = field.spec().id();
        Label message = rowMessage(id + "-problem", "field-problem");
        message.textProperty().bind(Bindings.createStringBinding(() -> {
            String p = field.problemProperty().get();
            if (p.isEmpty()) {
                return "";
            }
            return "PROBLEM: " + p + (field.leftOutProperty().get() ? "\n(the worksheet leaves this value out)" : "");
        }, field.problemProperty(), field.leftOutProperty()));
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
                b.setOnAction(e -> {
                    field.apply(fix);
                    input.requestFocus();
                });
                fixes.getChildren().add(b);
            }
        });
        VBox box = new VBox(2);
        box.getStyleClass().add("problem-box");
        box.setPadding(new Insets(0, 0, 4, 0));
        javafx.beans.binding.BooleanBinding shown = field.problemProperty().isNotEmpty();
        box.visibleProperty().bind(shown);
        box.managedProperty().bind(box.visibleProperty());
        joinWhenShown(box, shown, message, fixes);
        HBox.setHgrow(box, Priority.ALWAYS);
        return box;
    }

    /**
     * How a typed or pasted value was read, or the question it raises with one button per reading
     * ({@code #labs-wbc-reading}, {@code #labs-wbc-take-0}, ...).
     */
    private Node typedReading(FieldModel field, Control input) {
        String id = field.spec().id();
        Label message = rowMessage(id + "-reading", "field-reading");
        message.textProperty().bind(Bindings.createStringBinding(() -> {
            String r = field.readingProperty().get();
            return r.isEmpty() ? "" : field.readingsProperty().isEmpty() && !r.startsWith("read ") ? "NOT READ: " + r
                    : field.readingsProperty().isEmpty() ? r : "CHECK: " + r;
        }, field.readingProperty(), field.readingsProperty()));
        FlowPane takes = new FlowPane(6, 4);
        field.readingsProperty().addListener((javafx.collections.ListChangeListener<TypedReading>) c -> {
            takes.getChildren().clear();
            int n = 0;
            for (TypedReading r : field.readingsProperty()) {
                Button b = new Button(r.label());
                b.setId(id + "-take-" + n++);
                b.getStyleClass().add("fix-button");
                b.setAccessibleText(r.label() + " for " + field.spec().label());
                b.setOnAction(e -> {
                    field.take(r);
                    input.requestFocus(); // the buttons go with the question
                });
                takes.getChildren().add(b);
            }
        });
        VBox box = new VBox(2);
        box.getStyleClass().add("reading-box");
        javafx.beans.binding.BooleanBinding shown = field.readingProperty().isNotEmpty();
        box.visibleProperty().bind(shown);
        box.managedProperty().bind(box.visibleProperty());
        joinWhenShown(box, shown, message, takes);
        return box;
    }

    /**
     * Puts a row's message and its buttons into their box the first time the box shows. Most rows never have a
     * problem or a question, and nodes that are in the window are styled and laid out even while hidden: with the
     * messages of every row in it, the first screen had twice the nodes. {@code shown} is the binding the box's
     * visibility is bound to, which keeps it (and so this listener) alive as long as the box.
     */
    private static void joinWhenShown(VBox box, javafx.beans.binding.BooleanBinding shown, Node... parts) {
        if (shown.get()) {
            box.getChildren().addAll(parts);
            return;
        }
        shown.addListener(new javafx.beans.InvalidationListener() {
            @Override
            public void invalidated(javafx.beans.Observable o) {
                if (shown.get()) {
                    shown.removeListener(this);
                    box.getChildren().addAll(parts);
                }
            }
        });
    }

    /**
     * Enter moves to the next field's input, as Tab would but skipping the unit pickers: text fields, pickers,
     * switches and the date and time alike. An open picker list keeps its Enter (it takes the highlighted choice).
     * A quantity's typed text is read first ({@link FieldModel#readTyped()}), so "5,6" or a pasted unit is settled
     * before the next field.
     */
    private void enterMovesOn(KeyEvent e) {
        if (e.getCode() != KeyCode.ENTER || e.isShortcutDown() || e.isAltDown()) {
            return;
        }
        Control current = ownInput(e.getTarget());
        if (current == null || current instanceof ComboBox<?> open && open.isShowing()) {
            return;
        }
        if (current instanceof javafx.scene.control.DatePicker picker) {
            DateTimeEntry.commitTyped(picker);
        }
        int i = enterOrder.indexOf(current);
        for (int j = i + 1; j < enterOrder.size(); j++) {
            Control next = enterOrder.get(j);
            if (next.isVisible() && !next.isDisabled()) {
                if (current instanceof TextField) {
                    fieldOf(current).ifPresent(FieldModel::readTyped);
                }
                expandSectionOf(next);
                next.requestFocus();
                e.consume();
                return;
            }
        }
    }

    /** The field input the event target is, or lies inside (the text editor of a date picker). */
    private Control ownInput(Object target) {
        for (Node n = target instanceof Node node ? node : null; n != null; n = n.getParent()) {
            if (n instanceof Control c && enterOrder.contains(c)) {
                return c;
            }
        }
        return null;
    }

    private java.util.Optional<FieldModel> fieldOf(Control input) {
        return model.fields().stream().filter(f -> f.spec().id().equals(input.getId())).findFirst();
    }

    /** Opens the section {@code n} is in (its grid may not be in the window yet: see {@link #section}). */
    private void expandSectionOf(Node n) {
        for (Node p = n.getParent(); p != null; p = p.getParent()) {
            TitledPane t = sectionOf.get(p);
            if (t != null) {
                t.setExpanded(true);
                return;
            }
        }
    }
}
