package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.Parent;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.stage.Stage;
import javafx.stage.WindowEvent;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.stasissheet.ui.entry.FieldSpec;
import org.stasissheet.ui.entry.FormFields;
import org.stasissheet.ui.entry.Section;
import org.stasissheet.worksheet.Cautions;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The first screen, built for a quick start: the demo case's worksheet and the standing caution are in the window
 * the moment it shows; a closed entry section and the course panel join the window when first opened, and work
 * there as before (values kept, Enter into a closed section opens it).
 */
@ExtendWith(ApplicationExtension.class)
class FirstScreenTest {
    @TempDir
    Path data;

    MainWindow window;
    /** What the window held at the moment it was shown: the verdict cards' count and the standing caution. */
    final List<String> atShow = new ArrayList<>();

    @Start
    void start(Stage stage) {
        // (the test framework shares this stage with later test classes: the handler goes once it has looked)
        javafx.event.EventHandler<WindowEvent> look = new javafx.event.EventHandler<>() {
            @Override
            public void handle(WindowEvent e) {
                stage.removeEventHandler(WindowEvent.WINDOW_SHOWN, this);
                Parent verdicts = (Parent) stage.getScene().lookup("#verdicts");
                atShow.add("verdicts " + verdicts.getChildrenUnmodifiable().size());
                atShow.add(((Label) stage.getScene().lookup("#standing-caution")).getText());
                atShow.add(((TextField) stage.getScene().lookup("#patient-label")).getText());
            }
        };
        stage.addEventHandler(WindowEvent.WINDOW_SHOWN, look);
        try {
            window = MainWindow.open(stage, FormHarness.settings(data, new ScriptedShell()));
        } finally {
            stage.removeEventHandler(WindowEvent.WINDOW_SHOWN, look);
        }
    }

    @Test
    @DisplayName("the demo case's worksheet and the standing caution are in the window when it first shows")
    void demoWorksheetAtFirstShow() {
        assertEquals(3, atShow.size(), atShow.toString());
        assertFalse(atShow.get(0).equals("verdicts 0"), "the verdict cards were there at show: " + atShow);
        assertEquals("CAUTION: " + Cautions.SHORT, atShow.get(1));
        String demoLabel = Samples.read(FormSettings.DEFAULT_SAMPLE)
                .flatMap(b -> org.stasissheet.ui.entry.FormJson.read(b, window.preferences().get().units()))
                .orElseThrow().get("patient.label");
        assertFalse(demoLabel.isBlank(), "the demo case has a label");
        assertEquals(demoLabel, atShow.get(2), "the demo case was in the form when the window showed");
        assertEquals("verdicts " + ((Parent) window.stage().getScene().lookup("#verdicts"))
                .getChildrenUnmodifiable().size(), atShow.get(0), "and its worksheet, not a blank form's");
        assertFalse(window.session().dirtyProperty().get(), "the demo case opens clean");
    }

    @Test
    @DisplayName("a closed section's fields join the window when it opens, holding the values the form has")
    void closedSectionJoinsWhenOpened(FxRobot robot) throws Exception {
        FieldSpec first = FormFields.of(Section.BASELINE).get(0);
        assertTrue(robot.lookup("#" + first.id()).tryQuery().isEmpty(), "not in the window while closed");
        FormHarness.fx(() -> window.session().entry().field(first.path()).textProperty().set("12.5"));
        TitledPane section = robot.lookup("#section-baseline").query();
        FormHarness.fx(() -> section.setExpanded(true));
        TextField input = robot.lookup("#" + first.id()).query();
        assertEquals("12.5", input.getText());
        assertTrue(input.getScene() != null && input.isVisible());
    }

    @Test
    @DisplayName("Enter in the last field before a closed section opens it and moves into its first field")
    void enterOpensTheClosedSection(FxRobot robot) throws Exception {
        List<FieldSpec> plan = FormFields.of(Section.PLAN);
        String last = plan.get(plan.size() - 1).id();
        FormHarness.fx(() -> robot.lookup("#" + last).query().requestFocus());
        robot.type(javafx.scene.input.KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(((TitledPane) robot.lookup("#section-baseline").query()).isExpanded());
        assertEquals(FormFields.of(Section.BASELINE).get(0).id(), window.stage().getScene().getFocusOwner().getId());
    }

    @Test
    @DisplayName("a row's message joins the window when the row first has one, and shows the reader's words")
    void rowMessageJoinsWhenNeeded(FxRobot robot) throws Exception {
        assertTrue(robot.lookup("#labs-wbc-problem").tryQuery().isEmpty(), "no message, no node");
        FormHarness.fx(() -> {
            window.session().entry().field("labs.wbc").textProperty().set("150000");
            window.session().recomputeNow();
        });
        Label problem = robot.lookup("#labs-wbc-problem").query();
        assertTrue(problem.getParent().isVisible());
        assertTrue(problem.getText().startsWith("PROBLEM: "), problem.getText());
    }

    @Test
    @DisplayName("the course panel joins the window when its tab is chosen, with its own caution")
    void coursePanelJoinsWhenChosen(FxRobot robot) throws Exception {
        assertTrue(robot.lookup("#course-view").tryQuery().isEmpty(), "not in the window behind the worksheet");
        FormHarness.fx(window::showCourse);
        assertTrue(robot.lookup("#course-view").tryQuery().isPresent());
        Label caution = robot.lookup("#course-caution").query();
        assertTrue(caution.isVisible() && !caution.getText().isBlank(), caution.getText());
        assertTrue(robot.lookup("#standing-caution").tryQuery().isPresent(), "the standing caution stays");
    }
}
