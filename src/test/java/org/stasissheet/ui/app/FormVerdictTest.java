package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.files.CaseFiles;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The worksheet side against the core: what the form shows is what {@code assess} says for the same case. */
class FormVerdictTest extends FormFixture {
    private static final RuleSet SHIPPED = org.stasissheet.load.Inputs.ruleSet(Optional.empty());

    @Start
    void start(Stage stage) {
        open(stage);
    }

    private String shown(FxRobot robot, String verdict) {
        Label word = robot.lookup("#verdict-" + verdict + "-word").query();
        return word.getText().substring(2); // after the mark: "● " raised, "○ " not
    }

    private static String word(org.stasissheet.rules.HyperviscosityVerdict v) {
        return org.stasissheet.report.VerdictWords.hyperviscosity(v).toUpperCase(Locale.ROOT);
    }

    private static String word(org.stasissheet.rules.LeukostasisVerdict v) {
        return org.stasissheet.report.VerdictWords.leukostasis(v).toUpperCase(Locale.ROOT);
    }

    private static Worksheet assess(byte[] json) {
        return Assessor.assess(((CaseReader.Accepted) CaseReader.read(json)).c(), SHIPPED);
    }

    @Test
    @DisplayName("typing a serum viscosity changes the hyperviscosity verdict to what assess says")
    void typingViscosity(FxRobot robot) throws Exception {
        Path sample = Path.of("samples", "igm-symptomatic.json");
        Worksheet before = Assessor.assess(((CaseReader.Accepted) CaseFiles.read(sample)).c(), SHIPPED);
        assertTrue(shown(robot, "hyperviscosity").equals(word(before.hyperviscosity())),
                shown(robot, "hyperviscosity"));

        TextField sv = robot.lookup("#labs-serumViscosity").query();
        FormHarness.fx(() -> {
            sv.requestFocus();
            sv.selectAll();
        });
        robot.write("1.5");
        WaitForAsyncUtils.waitForFxEvents();
        FormHarness.waitUntil(() -> !shown(robot, "hyperviscosity")
                .equals(word(before.hyperviscosity())));

        ObjectNode edited = (ObjectNode) new ObjectMapper().readTree(Files.readAllBytes(sample));
        ((ObjectNode) edited.path("labs").path("serumViscosity")).put("value", 1.5);
        Worksheet after = assess(new ObjectMapper().writeValueAsBytes(edited));
        assertNotEquals(before.hyperviscosity().assessment(), after.hyperviscosity().assessment(),
                "the sample must be one where the viscosity decides");
        assertTrue(shown(robot, "hyperviscosity").equals(word(after.hyperviscosity())),
                shown(robot, "hyperviscosity"));
    }

    @Test
    @DisplayName("opening each sample shows the same three verdicts and flags as assess")
    void samplesAsAssess(FxRobot robot) throws Exception {
        for (String name : Samples.NAMES) {
            Path file = Path.of("samples", name);
            FormHarness.fx(() -> window.actions().openFile(file));
            FormHarness.settle(window);
            Worksheet expected = Assessor.assess(((CaseReader.Accepted) CaseFiles.read(file)).c(), SHIPPED);
            assertEquals(Optional.of(file), window.session().documentProperty().get(), name);
            assertTrue(shown(robot, "hyperviscosity").equals(word(expected.hyperviscosity())),
                    name + ": " + shown(robot, "hyperviscosity"));
            assertTrue(shown(robot, "leukostasis").startsWith(word(expected.leukostasis())),
                    name + ": " + shown(robot, "leukostasis"));
            String tl = shown(robot, "tumor-lysis");
            if (expected.tumorLysis().applies()) {
                assertTrue(tl.contains("LABORATORY " + org.stasissheet.report.VerdictWords.laboratory(
                        expected.tumorLysis()).toUpperCase(Locale.ROOT)), name + ": " + tl);
                assertTrue(tl.contains("CLINICAL " + org.stasissheet.report.VerdictWords.clinical(
                        expected.tumorLysis()).toUpperCase(Locale.ROOT)), name + ": " + tl);
            } else {
                assertTrue(tl.contains("NOT CHECKED"), name + ": " + tl);
            }
            Worksheet shownSheet = window.session().completeWorksheetProperty().get().orElseThrow();
            assertEquals(expected.flags(), shownSheet.flags(), name);
            for (var flag : expected.flags()) {
                assertTrue(robot.lookup("#flag-" + flag.id().replaceAll("[^A-Za-z0-9_-]", "_")).tryQuery().isPresent(),
                        name + ": flag " + flag.id() + " on screen");
            }
            assertEquals(false, window.session().dirtyProperty().get(), name + " opens clean");
        }
    }


    @Test
    @DisplayName("regression: the flow chart keeps following edits after a garbage collection (its binding was collected)")
    void chartFollowsEdits(FxRobot robot) throws Exception {
        @SuppressWarnings("unchecked")
        javafx.scene.chart.LineChart<Number, Number> chart = robot.lookup("#flow-chart").query();
        double before = chart.getData().get(1).getData().get(0).getYValue().doubleValue();
        System.gc();
        FormHarness.fx(() -> {
            window.session().entry().field("labs.hematocrit").textProperty().set("45");
            window.session().recomputeNow();
        });
        double after = chart.getData().get(1).getData().get(0).getYValue().doubleValue();
        assertNotEquals(before, after, 1e-9, "a higher hematocrit changes the relative flow");
        assertEquals(window.session().completeWorksheetProperty().get().orElseThrow().flow().byDiameter().known()
                .orElseThrow().get(0).relativeFlow(), after, 1e-12, "the chart plots the worksheet's own numbers");
    }

    @Test
    @DisplayName("the rule-set badge shows name and version, the hash one hover away; the standing caution is always on screen")
    void badgeAndCaution(FxRobot robot) {
        Label badge = robot.lookup("#rule-set-badge").query();
        assertTrue(badge.getText().contains(SHIPPED.provenance().name() + " " + SHIPPED.provenance().version()),
                badge.getText());
        assertFalse(badge.getText().contains(SHIPPED.provenance().shortHash()), "no hash in the sentence");
        assertEquals("SHA-256 " + SHIPPED.provenance().sha256(), badge.getTooltip().getText());
        Label caution = robot.lookup("#standing-caution").query();
        assertTrue(caution.getText().contains(org.stasissheet.worksheet.Cautions.SHORT));
        assertTrue(caution.isVisible());
        Label local = robot.lookup("#local-protocol").query();
        assertTrue(!local.isVisible(), "the shipped set is not a local protocol");
    }
}
