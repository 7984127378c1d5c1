package org.stasissheet.ui.labs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.entry.FieldModel;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The form's "Import lab results…": paste, preview, answer a question, accept, undo; driven through the window. */
class LabImportFormTest extends FormFixture {
    LabImportWindow dialog;

    @Start
    void start(Stage stage) {
        open(stage);
    }

    private void openAndPaste(FxRobot robot, String text) throws Exception {
        dialog = WaitForAsyncUtils.asyncFx(() -> window.importLabs()).get(20, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitForFxEvents();
        TextArea paste = robot.lookup("#lab-paste").query();
        FormHarness.fx(() -> {
            ClipboardContent content = new ClipboardContent();
            content.putString(text);
            Clipboard.getSystemClipboard().setContent(content);
            paste.requestFocus();
            paste.paste();
        });
    }

    private FieldModel field(String path) {
        return window.session().entry().field(path);
    }

    @Test
    @DisplayName("paste shows a preview of every line: recognised analyte, value, unit as understood, canonical value")
    void paste_showsPreview(FxRobot robot) throws Exception {
        openAndPaste(robot, "WBC 182.4 x10^9/L H\nK+  6,8 mmol/l\nIgM 48 g/L *\nLDH 1890 U/L\n");
        TableView<LabPreview.Row> table = robot.lookup("#lab-preview").query();
        assertEquals(4, table.getItems().size());
        LabPreview.Row wbc = table.getItems().get(0);
        assertEquals("white cell count", wbc.analyte());
        assertEquals("182.4", wbc.value());
        assertEquals("×10⁹/L (10*9/L)", wbc.unit());
        assertEquals("182.4 ×10⁹/L", wbc.canonical());
        assertEquals("6.8", table.getItems().get(1).value());
        String wbcNow = field("labs.wbc").textProperty().get();
        assertTrue(wbcNow.isBlank() || wbc.outcome().contains("replacing " + wbcNow), wbc.outcome());
        assertTrue(table.getItems().get(3).outcome().startsWith("NOT IMPORTED"), table.getItems().get(3).outcome());
        Label caution = robot.lookup("#lab-caution").query();
        assertTrue(caution.getText().contains("never replaces, clinical judgement"));
        assertFalse(((Button) robot.lookup("#lab-accept").query()).isDisabled());
    }

    @Test
    @DisplayName("accept puts the values in the form's fields with their units; undo puts back what was there")
    void accept_landsInFields_undoRestores(FxRobot robot) throws Exception {
        String wbcBefore = field("labs.wbc").textProperty().get();
        String wbcUnitBefore = field("labs.wbc").unitProperty().get();
        openAndPaste(robot, "WBC 182.4 x10^9/L H\nK+  6,8 mmol/l\n");
        robot.clickOn("#lab-accept");
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(dialog.stage().isShowing(), "the window closes on accept");
        assertEquals("182.4", field("labs.wbc").textProperty().get());
        assertEquals("10*9/L", field("labs.wbc").unitProperty().get());
        assertEquals("6.8", field("labs.potassium").textProperty().get());
        assertEquals("mmol/L", field("labs.potassium").unitProperty().get());
        assertTrue(window.session().entry().snapshot().unmappedJson().contains("\"labImport\""));
        assertTrue(window.labLanding().canUndoProperty().get());

        FormHarness.fx(() -> window.labLanding().undo());
        assertEquals(wbcBefore, field("labs.wbc").textProperty().get());
        assertEquals(wbcUnitBefore, field("labs.wbc").unitProperty().get());
        assertFalse(window.session().entry().snapshot().unmappedJson().contains("\"labImport\""));
        assertFalse(window.labLanding().canUndoProperty().get());
    }

    @Test
    @DisplayName("an ambiguous line is asked: accept stays off until it is answered, and the answer lands")
    void ambiguousLine_askedThenAnswered(FxRobot robot) throws Exception {
        openAndPaste(robot, "WBC 182.4 x10^9/L\nK 6.8\n");
        Button accept = robot.lookup("#lab-accept").query();
        assertTrue(accept.isDisabled(), "accept waits for the answer");
        TableView<LabPreview.Row> table = robot.lookup("#lab-preview").query();
        assertTrue(table.getItems().get(1).outcome().startsWith("QUESTION: no unit printed after 6.8"),
                table.getItems().get(1).outcome());
        ComboBox<LabPreview.Answer> question = robot.lookup("#lab-question-0").query();
        assertTrue(question.getItems().stream().anyMatch(a -> a.label().startsWith("6.8 mmol/L")),
                question.getItems().toString());
        robot.clickOn("#lab-question-0");
        WaitForAsyncUtils.waitForFxEvents();
        FormHarness.fx(() -> {
            question.getSelectionModel().select(question.getItems().stream()
                    .filter(a -> a.label().startsWith("6.8 mmol/L")).findFirst().orElseThrow());
            question.hide();
        });
        assertFalse(accept.isDisabled());
        robot.clickOn("#lab-accept");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("6.8", field("labs.potassium").textProperty().get());
        assertEquals("mmol/L", field("labs.potassium").unitProperty().get());
    }

    @Test
    @DisplayName("a report file (HL7 v2) opens into the same preview; cancel changes nothing")
    void reportFile_previewThenCancel(FxRobot robot) throws Exception {
        String before = field("labs.wbc").textProperty().get();
        dialog = WaitForAsyncUtils.asyncFx(() -> window.importLabs()).get(20, TimeUnit.SECONDS);
        shell.files.add(Path.of("lab-reports", "aml-night.hl7"));
        robot.clickOn("#lab-open-file");
        WaitForAsyncUtils.waitForFxEvents();
        TableView<LabPreview.Row> table = robot.lookup("#lab-preview").query();
        assertEquals("OBX 1", table.getItems().get(0).where());
        assertTrue(((Label) robot.lookup("#lab-status").query()).getText().contains("HL7 v2"));
        robot.clickOn("#lab-cancel");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, field("labs.wbc").textProperty().get());
    }
}
