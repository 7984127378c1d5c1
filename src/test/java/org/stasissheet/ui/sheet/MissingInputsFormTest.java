package org.stasissheet.ui.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.GridPane;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;

/**
 * The apheresis numbers without height and weight: one sentence says what to enter and where (Nadler's blood volume
 * needs sex, height and weight, Nadler SB et al., Surgery 1962), and the label column keeps its width. The demo case
 * is invented.
 */
class MissingInputsFormTest extends FormFixture {
    @Start
    void start(Stage stage) {
        open(stage);
    }

    @Test
    @DisplayName("height and weight cleared: the sentence once, dashes in the cells, labels never squeezed")
    void saidOnceAndLabelsKeepTheirWidth(FxRobot robot) throws Exception {
        FormHarness.fx(() -> {
            window.session().entry().field("patient.height").textProperty().set("");
            window.session().entry().field("patient.weight").textProperty().set("");
            window.stage().setWidth(900); // the narrow window where the squeeze was seen
            window.session().recomputeNow();
        });
        FormHarness.waitUntil(() -> robot.lookup("#apheresis-missing").tryQuery().isPresent());
        Label missing = robot.lookup("#apheresis-missing").query();
        assertTrue(missing.getText().startsWith("Enter height and weight (Patient) to estimate the blood volume"),
                missing.getText());
        assertEquals(1, robot.lookup((Label l) -> l.getText().startsWith("Enter height and weight")).queryAll().size(),
                "said once");
        assertTrue(robot.lookup((Label l) -> l.getText().contains("not estimated: blood volume not estimated"))
                .queryAll().isEmpty(), "no doubled reason");

        FormHarness.scrollTo(missing);
        FormHarness.fx(() -> { });
        for (String grid : new String[] {"apheresis-volumes", "leukapheresis"}) {
            GridPane g = robot.lookup("#" + grid).query();
            for (Node n : g.getChildren()) {
                Integer column = GridPane.getColumnIndex(n);
                if (n instanceof Label l && (column == null || column == 0)) {
                    double needed = l.prefWidth(-1);
                    assertTrue(l.getWidth() >= needed - 0.5, grid + ": '" + l.getText() + "' is " + l.getWidth()
                            + " px wide, needs " + needed);
                }
            }
        }
        Label blood = robot.lookup((Label l) -> l.getText().equals("Total blood volume (Nadler)")).query();
        Label value = (Label) ((GridPane) blood.getParent()).getChildren()
                .get(((GridPane) blood.getParent()).getChildren().indexOf(blood) + 1);
        assertEquals(SheetContent.SEE_ABOVE, value.getText());
        assertFalse(value.getText().contains("not estimated"));
    }
}
