package org.stasissheet.ui.entry;

import java.util.Objects;
import java.util.function.Function;
import javafx.scene.Node;
import javafx.scene.control.ComboBox;
import javafx.scene.control.ListCell;
import javafx.scene.control.skin.ComboBoxListViewSkin;
import javafx.scene.text.Font;
import javafx.scene.text.Text;

/**
 * The entry side's picker skin: JavaFX's own, except that the list of choices is not kept inside the picker while
 * it is closed. JavaFX keeps it there, hidden, so that the picker is as wide as its list; but a hidden node in the
 * window is styled and laid out all the same, and the entry side has some forty pickers, each with a list of about
 * twenty nodes: with them the first screen had twice the nodes to style (src/bench/RESULTS.md). The list is moved
 * into its pop-up when first opened, as JavaFX does anyway. The picker stays as wide as its widest choice as it
 * shows them, so it does not change width when another is picked.
 */
final class LeanPickerSkin<T> extends ComboBoxListViewSkin<T> {
    private final ComboBox<T> box;
    private final Function<T, String> shown;
    private Font measuredIn;
    private int measuredItems = -1;
    private double widest;

    /** @param shown the text the closed picker shows for a choice (its button cell's text) */
    LeanPickerSkin(ComboBox<T> box, Function<T, String> shown) {
        super(box);
        this.box = box;
        this.shown = Objects.requireNonNull(shown, "shown");
        getChildren().remove(getPopupContent());
    }

    @Override
    protected double computePrefWidth(double height, double top, double right, double bottom, double left) {
        double own = super.computePrefWidth(height, top, right, bottom, left);
        Node display = getDisplayNode();
        if (!(display instanceof ListCell<?> cell)) {
            return own;
        }
        // the current choice's text is in "own": widen by what the widest choice needs beyond it
        String current = cell.getText() == null ? "" : cell.getText();
        return own + Math.max(0, widest(cell.getFont()) - width(current, cell.getFont()));
    }

    private double widest(Font font) {
        if (!font.equals(measuredIn) || measuredItems != box.getItems().size()) {
            double w = 0;
            for (T item : box.getItems()) {
                w = Math.max(w, width(item == null ? "" : shown.apply(item), font));
            }
            widest = w;
            measuredIn = font;
            measuredItems = box.getItems().size();
        }
        return widest;
    }

    private static double width(String s, Font font) {
        Text probe = new Text(s);
        probe.setFont(font);
        return probe.getLayoutBounds().getWidth();
    }
}
