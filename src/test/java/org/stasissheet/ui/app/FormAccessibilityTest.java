package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Control;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.rules.Level;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

@ExtendWith(ApplicationExtension.class)
class FormAccessibilityTest {
    @TempDir
    Path data;

    MainWindow window;

    @Start
    void start(Stage stage) {
        window = MainWindow.open(stage, FormHarness.settings(data, new ScriptedShell()));
    }

    private static void collect(Node n, List<Node> out) {
        out.add(n);
        if (n instanceof Parent p) {
            p.getChildrenUnmodifiable().forEach(c -> collect(c, out));
        }
    }

    @Test
    @DisplayName("every focusable control has accessible text or a visible text of its own")
    void accessibleText() throws Exception {
        // the closed sections and the course panel join the window when first opened: open them, so they are checked
        FormHarness.fx(() -> {
            for (Node n : window.stage().getScene().getRoot().lookupAll(".titled-pane")) {
                ((javafx.scene.control.TitledPane) n).setExpanded(true);
            }
            window.showCourse();
        });
        WaitForAsyncUtils.waitForFxEvents();
        List<Node> all = new ArrayList<>();
        collect(window.stage().getScene().getRoot(), all);
        List<String> missing = new ArrayList<>();
        int controls = 0;
        for (Node n : all) {
            if (n instanceof Control c && c.isFocusTraversable() && !(n.getParent() instanceof Control)) {
                controls++;
                boolean named = c.getAccessibleText() != null && !c.getAccessibleText().isBlank()
                        || c instanceof Labeled l && l.getText() != null && !l.getText().isBlank();
                if (!named) {
                    missing.add(c.getClass().getSimpleName() + " #" + c.getId());
                }
            }
        }
        assertTrue(controls > 100, "the form has its controls: " + controls);
        assertEquals(List.of(), missing);
    }

    @Test
    @DisplayName("Tab follows the field order: label, sex, age, height and its unit")
    void tabOrder(FxRobot robot) throws Exception {
        TextField label = robot.lookup("#patient-label").query();
        FormHarness.fx(label::requestFocus);
        List<String> seen = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            robot.type(javafx.scene.input.KeyCode.TAB);
            WaitForAsyncUtils.waitForFxEvents();
            seen.add(window.stage().getScene().getFocusOwner().getId());
        }
        assertEquals(List.of("patient-sex", "patient-ageYears", "patient-height", "patient-height-unit"), seen);
    }

    @Test
    @DisplayName("Enter in a value moves to the next value, skipping unit pickers")
    void enterMovesOn(FxRobot robot) throws Exception {
        TextField sv = robot.lookup("#labs-serumViscosity").query();
        FormHarness.fx(sv::requestFocus);
        robot.type(javafx.scene.input.KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("labs-serumViscosity-temperature", window.stage().getScene().getFocusOwner().getId());
        robot.type(javafx.scene.input.KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("labs-igm", window.stage().getScene().getFocusOwner().getId());
    }

    @Test
    @DisplayName("flag groups carry the level's word and symbol, not only a colour")
    void levelsInWords(FxRobot robot) {
        for (Level level : Level.values()) {
            robot.lookup("#flag-group-" + level.code()).tryQuery().ifPresent(n ->
                    assertTrue(((Labeled) n).getText().startsWith(level.badge()), ((Labeled) n).getText()));
        }
        assertTrue(robot.lookup("#flag-group-act-now").tryQuery().isPresent(), "the demo case has an ACT NOW flag");
    }

    @Test
    @DisplayName("the high-contrast style sheet is applied and removed by the setting")
    void highContrast() throws Exception {
        String sheet = MainWindow.HIGH_CONTRAST;
        assertTrue(MainWindow.class.getClassLoader().getResource(sheet) != null, "packaged");
        FormHarness.fx(() -> window.preferences().set(window.preferences().get().withHighContrast(true)));
        assertTrue(window.stage().getScene().getStylesheets().contains(sheet));
        FormHarness.fx(() -> window.preferences().set(window.preferences().get().withHighContrast(false)));
        assertTrue(!window.stage().getScene().getStylesheets().contains(sheet));
    }
}
