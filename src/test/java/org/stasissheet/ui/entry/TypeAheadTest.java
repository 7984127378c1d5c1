package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import javafx.scene.Scene;
import javafx.scene.control.ComboBox;
import javafx.scene.control.TextField;
import javafx.scene.layout.VBox;
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
 * Type-ahead on the form's own pickers (issue 18, item 2), with a clock the test moves, so "typed quickly" and
 * "a pause" do not depend on how busy the machine is.
 */
@ExtendWith(ApplicationExtension.class)
class TypeAheadTest {
    final AtomicLong millis = new AtomicLong(1_000_000);
    ComboBox<Choice> paraprotein;
    ComboBox<Choice> sign;
    Stage stage;

    @Start
    void start(Stage stage) {
        this.stage = stage;
        paraprotein = picker("condition.paraprotein");
        sign = picker("findings.seizure");
        stage.setScene(new Scene(new VBox(new TextField(), paraprotein, sign), 400, 200));
        stage.show();
    }

    private ComboBox<Choice> picker(String path) {
        ComboBox<Choice> box = new ComboBox<>();
        box.getItems().setAll(FormFields.byPath(path).orElseThrow().choices());
        box.getSelectionModel().select(0);
        TypeAhead.install(box, Choice::label, millis::get);
        return box;
    }

    private void typeQuickly(FxRobot robot, String letters) {
        for (char c : letters.toCharArray()) {
            millis.addAndGet(100);
            robot.write(c);
            WaitForAsyncUtils.waitForFxEvents();
        }
    }

    @Test
    @DisplayName("letters typed quickly make one prefix ('igg' picks IgG); a pause starts a new one ('iga' → IgA)")
    void prefixAndPause(FxRobot robot) throws Exception {
        FormHarness.fx(paraprotein::requestFocus);
        typeQuickly(robot, "igg");
        assertEquals("IgG", paraprotein.getValue().code());
        millis.addAndGet(TypeAhead.PAUSE_MILLIS + 1);
        typeQuickly(robot, "iga");
        assertEquals("IgA", paraprotein.getValue().code());
        millis.addAndGet(TypeAhead.PAUSE_MILLIS + 1);
        typeQuickly(robot, "ig");
        millis.addAndGet(TypeAhead.PAUSE_MILLIS + 1);
        typeQuickly(robot, "n");
        assertEquals("not entered", paraprotein.getValue().label(), "after the pause 'n' alone: the first 'n…'");
        typeQuickly(robot, "on");
        assertEquals("none", paraprotein.getValue().code(), "'non' picks none");
        assertEquals(paraprotein, stage.getScene().getFocusOwner(), "typing never moves the focus");
        assertFalse(paraprotein.isShowing(), "nor opens the list");
    }

    @Test
    @DisplayName("a choice whose words are the prefix wins: 'no' on a sign is no, not 'not assessed'")
    void exactWins(FxRobot robot) throws Exception {
        FormHarness.fx(sign::requestFocus);
        typeQuickly(robot, "n");
        assertEquals("", sign.getValue().code(), "'n' alone: not assessed, the first choice starting with n");
        typeQuickly(robot, "o");
        assertEquals("false", sign.getValue().code());
        millis.addAndGet(TypeAhead.PAUSE_MILLIS + 1);
        typeQuickly(robot, "y");
        assertEquals("true", sign.getValue().code());
    }

    @Test
    @DisplayName("the pure prefix rule: exact words first, then the first choice starting with the prefix")
    void pickRule() {
        List<String> words = List.of("not entered", "none", "IgM", "IgG", "IgG3 (enter the value under IgG)", "IgA");
        assertEquals(2, TypeAhead.pick(words, "i").getAsInt());
        assertEquals(3, TypeAhead.pick(words, "igg").getAsInt());
        assertEquals(1, TypeAhead.pick(words, "none").getAsInt());
        assertFalse(TypeAhead.pick(words, "x").isPresent());
        assertFalse(TypeAhead.pick(words, "").isPresent());
    }
}
