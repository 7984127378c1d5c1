package org.stasissheet.ui.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The suggested pulmonary grade beside its picker. Cut-offs from memory (a 94–98 % saturation target in acute oxygen
 * guidelines; PaO2 below 60 mmHg / 8 kPa as hypoxaemic respiratory failure), the artefacts at high counts from Van de
 * Louw A et al., Respir Care 2016 [published]. The values typed are invented.
 */
class PulmonarySuggestionFormTest extends FormFixture {
    @Start
    void start(Stage stage) {
        open(stage);
    }

    private void type(FxRobot robot, String id, String text) throws Exception {
        TextField f = node(robot, id);
        FormHarness.scrollTo(f);
        FormHarness.fx(() -> {
            f.requestFocus();
            f.selectAll();
        });
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private String grade() {
        return window.session().entry().field("findings.pulmonaryGrade").textProperty().get();
    }

    @Test
    @DisplayName("SpO2 88 % offers grade 3 with the oxygen need, sets nothing until accepted, then the grade is 3")
    void saturationOffersGradeThree(FxRobot robot) throws Exception {
        FormHarness.fx(() -> window.actions().newCase());
        FormHarness.settle(window);
        Node box = node(robot, "pulmonary-suggestion");
        type(robot, "labs-wbc", "120");
        type(robot, "labs-spo2", "88");
        FormHarness.fx(() -> window.session().recomputeNow());
        FormHarness.waitUntil(() -> ((Label) node(robot, "pulmonary-suggestion-text")).getText()
                .contains("Suggested pulmonary grade 3"));
        String text = ((Label) node(robot, "pulmonary-suggestion-text")).getText();
        assertTrue(box.isVisible());
        assertTrue(text.contains("Oxygen needed: SpO2 88 % is below 94 %"), text);
        assertTrue(text.contains("mislead either way"), "oximetry caution at WBC 120: " + text);
        assertTrue(text.contains("Basis: "), text);
        assertEquals("", grade(), "never set silently");

        Button accept = node(robot, "pulmonary-suggestion-accept");
        assertTrue(accept.isVisible());
        // the button's action, as a click or Alt+A gives it (a robot click can miss a window that other tests of
        // the same run left in front)
        FormHarness.fx(accept::fire);
        assertEquals("3", grade());
        FormHarness.fx(() -> window.session().recomputeNow());
        FormHarness.waitUntil(() -> !accept.isVisible());
        text = ((Label) node(robot, "pulmonary-suggestion-text")).getText();
        assertTrue(text.contains("already covers the oxygen need"), text);
        // the leukostasis card on the worksheet side says the same
        Node card = node(robot, "verdict-leukostasis");
        assertTrue(robot.from(card).lookup((Label l) -> l.getText().contains("already covers the oxygen need"))
                .tryQuery().isPresent());
    }

    @Test
    @DisplayName("a grade the clinician set higher is never lowered by normal oxygen values")
    void normalValuesKeepTheGrade(FxRobot robot) throws Exception {
        FormHarness.fx(() -> window.actions().openFile(Path.of("samples", "aml-breathless.json")));
        FormHarness.settle(window);
        // the invented sample: PaO2 6.9 kPa at WBC 182, pulmonary grade 2 set -> grade 3 offered, with both cautions
        FormHarness.waitUntil(() -> ((Button) node(robot, "pulmonary-suggestion-accept")).isVisible());
        String text = ((Label) node(robot, "pulmonary-suggestion-text")).getText();
        assertTrue(text.contains("PaO2 6.9 kPa is below 8 kPa") || text.contains("PaO2 6.9 kPa is below 60 mmHg"),
                text);
        assertTrue(text.contains("may be spurious"), text);
        assertEquals("2", grade());

        type(robot, "labs-pao2", "11");
        FormHarness.fx(() -> window.session().entry().field("findings.pulmonaryGrade").textProperty().set("3"));
        FormHarness.fx(() -> window.session().recomputeNow());
        FormHarness.waitUntil(() -> !((Button) node(robot, "pulmonary-suggestion-accept")).isVisible());
        assertEquals("3", grade());
        assertEquals(Optional.empty(), window.session().sheet().content().worksheet().orElseThrow()
                .pulmonarySuggestion().suggested());
        assertFalse(((Label) node(robot, "pulmonary-suggestion-text")).getText().contains("SUGGESTION"));
    }
}
