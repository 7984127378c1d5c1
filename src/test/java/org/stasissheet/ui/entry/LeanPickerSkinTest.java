package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.ComboBox;
import javafx.scene.control.ListView;
import javafx.scene.control.skin.ComboBoxListViewSkin;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.stasissheet.ui.FormHarness;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The entry side's pickers without their closed list in the window: next to a picker with JavaFX's own skin, the
 * same width, the list only in the pop-up, and picking still works both ways.
 */
@ExtendWith(ApplicationExtension.class)
class LeanPickerSkinTest {
    final StringProperty code = new SimpleStringProperty("");
    final List<Choice> choices = FormFields.byPath("findings.neurologicalGrade").orElseThrow().choices();
    ComboBox<Choice> lean;
    ComboBox<Choice> plain;

    @Start
    void start(Stage stage) {
        lean = new ComboBox<>();
        PickerBinding.bind(lean, code, choices, Choice::code, Choice::unrecognised, Choice::label, Choice::label);
        // the same picker with JavaFX's own skin, for the width it would have had
        plain = new ComboBox<>();
        plain.getItems().setAll(choices);
        plain.getSelectionModel().select(0);
        plain.setButtonCell(new javafx.scene.control.ListCell<>() {
            @Override
            protected void updateItem(Choice item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty || item == null ? null : item.label());
            }
        });
        plain.setSkin(new ComboBoxListViewSkin<>(plain));
        stage.setScene(new Scene(new VBox(new HBox(lean), new HBox(plain)), 900, 300));
        stage.show();
    }

    private static boolean listInside(Node picker) {
        return picker instanceof javafx.scene.Parent p && !p.lookupAll(".list-view").isEmpty();
    }

    @Test
    @DisplayName("closed, the list is not in the window (JavaFX's own skin keeps it there), and picking works")
    void closedListStaysOut(FxRobot robot) throws Exception {
        assertTrue(listInside(plain), "sanity: JavaFX's skin keeps its list inside the picker");
        assertTrue(lean.getSkin() instanceof LeanPickerSkin, "bound pickers get the lean skin");
        assertTrue(!listInside(lean), "the lean picker does not");
        FormHarness.fx(() -> lean.setValue(choices.get(2)));
        assertEquals(choices.get(2).code(), code.get(), "a pick reaches the form");
        FormHarness.fx(() -> code.set(choices.get(1).code()));
        assertEquals(choices.get(1), lean.getValue(), "and the form reaches the picker");
    }

    @Test
    @DisplayName("opened, the list shows every choice in its pop-up; a click on one picks it")
    void openedListPicks(FxRobot robot) throws Exception {
        FormHarness.fx(lean::show);
        WaitForAsyncUtils.waitForFxEvents();
        ListView<?> list = (ListView<?>) ((ComboBoxListViewSkin<?>) lean.getSkin()).getPopupContent();
        assertTrue(list.getScene() != null && list.getScene().getWindow().isShowing(), "in the shown pop-up");
        assertEquals(choices.size(), list.getItems().size());
        Choice last = choices.get(choices.size() - 1);
        robot.clickOn(last.label());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(last.code(), code.get());
        assertTrue(!lean.isShowing(), "the pop-up closed on the pick");
    }

    @Test
    @DisplayName("as wide as JavaFX's own picker, at least the widest choice, and it keeps its width on another pick")
    void widthOfTheWidestChoice() throws Exception {
        double[] widths = new double[3];
        FormHarness.fx(() -> {
            widths[0] = lean.prefWidth(-1);
            widths[1] = plain.prefWidth(-1);
            Text widest = new Text(choices.stream().map(Choice::label)
                    .max(java.util.Comparator.comparingDouble(s -> {
                        Text t = new Text(s);
                        t.setFont(lean.getButtonCell().getFont());
                        return t.getLayoutBounds().getWidth();
                    })).orElseThrow());
            widest.setFont(lean.getButtonCell().getFont());
            widths[2] = widest.getLayoutBounds().getWidth();
        });
        assertTrue(widths[0] >= widths[2], "room for the widest choice: " + widths[0] + " < " + widths[2]);
        assertEquals(widths[1], widths[0], 24, "about the width JavaFX's own skin gives it");
        FormHarness.fx(() -> lean.setValue(choices.get(choices.size() - 1)));
        double[] after = new double[1];
        FormHarness.fx(() -> after[0] = lean.prefWidth(-1));
        assertEquals(widths[0], after[0], 0.5, "the same width after another pick");
    }
}
