package org.stasissheet.ui.grade;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.ObjectBinding;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Control;
import javafx.scene.control.Label;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Pane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.stasissheet.report.VerdictWords;
import org.stasissheet.rules.PulmonarySuggestion;
import org.stasissheet.ui.entry.FieldModel;
import org.stasissheet.ui.sheet.SheetViewModel;

/**
 * The suggested pulmonary grade, shown under the pulmonary grade picker: the oxygen need, the artefact cautions,
 * the basis, and a button that takes the suggestion. The grade is never set without that button (Alt+A or a
 * click); the suggestion comes from the worksheet and only ever offers a higher grade than the one set.
 *
 * <p>Ids: {@code #pulmonary-suggestion} (the box), {@code #pulmonary-suggestion-text},
 * {@code #pulmonary-suggestion-accept}.
 */
public final class PulmonarySuggestionView {
    private final VBox box = new VBox(3);
    private final Label text = new Label();
    private final Button accept = new Button();
    /** Held so the binding lives as long as the view. */
    private final ObjectBinding<Optional<PulmonarySuggestion>> suggestion;

    public PulmonarySuggestionView(SheetViewModel sheet, FieldModel pulmonaryGrade) {
        Objects.requireNonNull(sheet, "sheet");
        Objects.requireNonNull(pulmonaryGrade, "pulmonaryGrade");
        suggestion = Bindings.createObjectBinding(() -> sheet.content().worksheet()
                .map(w -> w.pulmonarySuggestion()), sheet.contentProperty());
        box.setId("pulmonary-suggestion");
        box.getStyleClass().add("grade-suggestion");
        text.setId("pulmonary-suggestion-text");
        text.setWrapText(true);
        text.getStyleClass().add("grade-suggestion-text");
        accept.setId("pulmonary-suggestion-accept");
        accept.getStyleClass().add("grade-suggestion-accept");
        accept.setOnAction(e -> suggestion.get().flatMap(PulmonarySuggestion::suggested)
                .ifPresent(g -> pulmonaryGrade.textProperty().set(Integer.toString(g))));
        box.getChildren().addAll(accept, text);
        box.managedProperty().bind(box.visibleProperty());
        suggestion.addListener((o, was, now) -> show(now, sheet));
        show(suggestion.get(), sheet);
    }

    public Node node() {
        return box;
    }

    private void show(Optional<PulmonarySuggestion> s, SheetViewModel sheet) {
        List<String> lines = sheet.content().worksheet().map(VerdictWords::pulmonarySuggestion).orElse(List.of());
        box.setVisible(!lines.isEmpty());
        text.setText(String.join("\n", lines));
        Optional<Integer> g = s.flatMap(PulmonarySuggestion::suggested);
        accept.setVisible(g.isPresent());
        accept.setManaged(g.isPresent());
        accept.setText("_Accept the suggested grade " + g.map(String::valueOf).orElse(""));
        accept.setAccessibleText("Set the pulmonary grade to the suggested grade " + g.map(String::valueOf).orElse(""));
    }

    /**
     * Places {@code extra} under the input whose id is {@code inputId}, in the same grid cell, so that it sits beside
     * the field it belongs to without the entry view knowing of it. False when the input was not found or does not
     * sit in a pane.
     */
    public static boolean attachUnder(List<Control> inputs, String inputId, Node extra) {
        Optional<Control> input = inputs.stream().filter(c -> inputId.equals(c.getId())).findFirst();
        if (input.isEmpty() || !(input.get().getParent() instanceof Pane pane)) {
            return false;
        }
        Control c = input.get();
        int index = pane.getChildren().indexOf(c);
        Integer column = GridPane.getColumnIndex(c);
        Integer row = GridPane.getRowIndex(c);
        // the field's label stays level with its input, not in the middle of the taller cell
        pane.getChildren().stream().filter(n -> n != c && Objects.equals(GridPane.getRowIndex(n), row))
                .forEach(n -> GridPane.setValignment(n, javafx.geometry.VPos.TOP));
        Integer columnSpan = GridPane.getColumnSpan(c);
        Priority grow = GridPane.getHgrow(c);
        pane.getChildren().remove(index);
        VBox stack = new VBox(4, c, extra);
        stack.setFillWidth(true);
        pane.getChildren().add(index, stack);
        if (column != null && row != null) {
            GridPane.setConstraints(stack, column, row, columnSpan == null ? 1 : columnSpan, 1);
            GridPane.setHgrow(stack, grow);
        }
        return true;
    }
}
