package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import javafx.stage.WindowEvent;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

class FormWindowTest extends FormFixture {
    @Start
    void start(Stage stage) {
        open(stage);
    }

    /** Focuses a text field and types into it with the robot's keyboard, replacing what was there. */
    private void type(FxRobot robot, String id, String text) throws Exception {
        TextField f = node(robot, id);
        FormHarness.fx(() -> {
            f.requestFocus();
            f.selectAll();
        });
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void recompute() throws Exception {
        FormHarness.fx(() -> window.session().recomputeNow());
    }

    @Test
    @DisplayName("an implausible WBC shows the command line's message beside the field, and the fix button corrects it")
    void implausibleWbc(FxRobot robot) throws Exception {
        type(robot, "labs-wbc", "150000");
        recompute();
        Label problem = node(robot, "labs-wbc-problem");
        assertTrue(problem.getParent().isVisible());
        assertTrue(problem.getText().contains(
                        "labs.wbc: 150000 10*9/L is not plausible; did you mean /uL (= 150 10*9/L)"),
                problem.getText());
        assertTrue(window.session().sheet().content().leftOut().contains("labs.wbc"));
        assertEquals("150000", ((TextField) node(robot, "labs-wbc")).getText(), "the typed value is kept");

        Button fix = node(robot, "labs-wbc-fix-_uL");
        assertEquals("use /µL", fix.getText());
        FormHarness.scrollTo(fix);
        robot.clickOn(fix);
        recompute();
        assertEquals("/uL", window.session().entry().field("labs.wbc").unitProperty().get());
        assertEquals("/uL", ((ComboBox<?>) node(robot, "labs-wbc-unit")).getValue() instanceof
                org.stasissheet.measure.UnitOption u ? u.ucum() : "?");
        Label after = node(robot, "labs-wbc-problem");
        assertEquals("", after.getText());
        assertFalse(after.getParent().isVisible());
        assertTrue(window.session().completeCaseProperty().get().isPresent());
        assertEquals(150, window.session().completeCaseProperty().get().get().labs()
                .canonical(org.stasissheet.measure.Analyte.WBC).getAsDouble(), 1e-9,
                "150000 /µL = 150 ×10⁹/L (definition: 1 µL = 10⁻⁶ L)");
    }

    @Test
    @DisplayName("text that is not a number is kept in the field and named by the reader")
    void notANumber(FxRobot robot) throws Exception {
        type(robot, "labs-hematocrit", "twenty");
        recompute();
        Label problem = node(robot, "labs-hematocrit-problem");
        assertTrue(problem.getText().contains("labs.hematocrit"), problem.getText());
        assertEquals("twenty", window.session().entry().field("labs.hematocrit").textProperty().get());
        assertTrue(window.session().sheet().content().worksheet().isPresent(), "the rest of the sheet stays live");
    }

    @Test
    @DisplayName("closing with unsaved changes asks first; Cancel keeps the window open")
    void closePrompt(FxRobot robot) throws Exception {
        type(robot, "patient-label", "Invented patient, bed 9");
        recompute();
        assertTrue(window.session().dirtyProperty().get());
        shell.unsavedAnswers.push(Shell.UnsavedChoice.CANCEL);
        FormHarness.fx(() -> window.stage().fireEvent(
                new WindowEvent(window.stage(), WindowEvent.WINDOW_CLOSE_REQUEST)));
        assertTrue(shell.asked.stream().anyMatch(q -> q.startsWith("unsaved: ")), shell.asked.toString());
        assertTrue(window.stage().isShowing());
    }

    @Test
    @DisplayName("closing without changes does not ask and ends the session cleanly")
    void closeClean(FxRobot robot) throws Exception {
        FormHarness.fx(() -> window.stage().fireEvent(
                new WindowEvent(window.stage(), WindowEvent.WINDOW_CLOSE_REQUEST)));
        assertTrue(shell.asked.stream().noneMatch(q -> q.startsWith("unsaved: ")), shell.asked.toString());
        try (var left = Files.list(data)) {
            assertTrue(left.noneMatch(f -> f.getFileName().toString().matches("(draft|session)-.*")),
                    "a clean end leaves no draft, marker or lock of its own");
        }
    }

    @Test
    @DisplayName("an autosaved draft is offered after a simulated crash and restored with what was typed")
    void crashRestore(FxRobot robot) throws Exception {
        type(robot, "patient-label", "Invented patient, bed 12");
        Path draft = window.drafts().draftFile();
        FormHarness.waitUntil(() -> Files.exists(draft) && read(draft).contains("bed 12"));
        FormHarness.crash(window);

        ScriptedShell next = new ScriptedShell();
        next.restore = true;
        MainWindow again = FormHarness.open(FormHarness.settings(data, next));
        assertTrue(next.asked.stream().anyMatch(q -> q.startsWith("restore: ")), next.asked.toString());
        assertEquals("Invented patient, bed 12", again.session().entry().field("patient.label").textProperty().get());
        assertTrue(again.session().dirtyProperty().get(), "a restored draft is not saved anywhere yet");
        FormHarness.fx(() -> again.stage().hide());
    }

    @Test
    @DisplayName("closing the restore question keeps the draft for the next start and opens the demo case")
    void crashDecline(FxRobot robot) throws Exception {
        type(robot, "patient-label", "Invented patient, bed 13");
        Path draft = window.drafts().draftFile();
        FormHarness.waitUntil(() -> Files.exists(draft) && read(draft).contains("bed 13"));
        FormHarness.crash(window);

        ScriptedShell next = new ScriptedShell();
        MainWindow again = FormHarness.open(FormHarness.settings(data, next));
        assertEquals("Demo patient A, ward 7", again.session().entry().field("patient.label").textProperty().get());
        assertTrue(Files.exists(draft) && read(draft).contains("bed 13"), "the draft is kept");
        FormHarness.fx(() -> again.stage().hide());
    }

    @Test
    @DisplayName("two windows at once keep their own drafts: neither is offered the other's, and closing one "
            + "leaves the other's draft for its crash recovery")
    void twoWindows(FxRobot robot) throws Exception {
        type(robot, "patient-label", "Invented patient, bed 14");
        Path first = window.drafts().draftFile();
        FormHarness.waitUntil(() -> Files.exists(first) && read(first).contains("bed 14"));

        ScriptedShell secondShell = new ScriptedShell();
        secondShell.restore = true;
        MainWindow second = FormHarness.open(FormHarness.settings(data, secondShell));
        assertTrue(secondShell.asked.stream().noneMatch(q -> q.startsWith("restore: ")),
                "a running window's draft is not offered: " + secondShell.asked);
        assertEquals("Demo patient A, ward 7", second.session().entry().field("patient.label").textProperty().get());
        FormHarness.fx(() -> second.session().entry().field("patient.label").textProperty()
                .set("Invented patient, bed 15"));
        Path secondDraft = second.drafts().draftFile();
        FormHarness.waitUntil(() -> Files.exists(secondDraft) && read(secondDraft).contains("bed 15"));
        assertTrue(read(first).contains("bed 14"), "the second window did not overwrite the first one's draft");

        // the second window closes without saving (the scripted shell discards); the first one's draft stays
        secondShell.unsavedAnswers.push(Shell.UnsavedChoice.DISCARD);
        FormHarness.fx(() -> second.stage().fireEvent(
                new WindowEvent(second.stage(), WindowEvent.WINDOW_CLOSE_REQUEST)));
        assertFalse(Files.exists(secondDraft));
        assertTrue(Files.exists(first) && read(first).contains("bed 14"));

        // and the first window's crash is still recovered
        FormHarness.crash(window);
        ScriptedShell third = new ScriptedShell();
        third.restore = true;
        MainWindow again = FormHarness.open(FormHarness.settings(data, third));
        assertEquals("Invented patient, bed 14", again.session().entry().field("patient.label").textProperty().get());
        assertFalse(Files.exists(first), "the restored draft became the new window's own");
        assertTrue(Files.exists(again.drafts().draftFile()));
        FormHarness.fx(() -> again.stage().hide());
    }

    @Test
    @DisplayName("a crashed draft the form cannot read back is kept under another name and named in the status")
    void unreadableDraft(FxRobot robot) throws Exception {
        Files.writeString(data.resolve("draft-left-by-a-crash.json"), "{ this is not JSON");
        ScriptedShell next = new ScriptedShell();
        next.restore = true;
        MainWindow again = FormHarness.open(FormHarness.settings(data, next));
        assertTrue(next.asked.stream().noneMatch(q -> q.startsWith("restore: ")), next.asked.toString());
        Path kept = data.resolve("unreadable-draft-left-by-a-crash.json");
        assertEquals("{ this is not JSON", read(kept), "nothing of it is lost");
        assertTrue(again.actions().statusProperty().get().contains(kept.toString()),
                again.actions().statusProperty().get());
        FormHarness.fx(() -> again.stage().hide());
    }

    @Test
    @DisplayName("save writes the case JSON the reader accepts, and the form is clean afterwards")
    void saveAs(FxRobot robot) throws Exception {
        Path target = data.resolve("cases").resolve("bed4");
        Files.createDirectories(target.getParent());
        shell.files.add(target);
        FormHarness.fx(() -> window.actions().saveAs());
        FormHarness.settle(window);
        Path written = data.resolve("cases").resolve("bed4.json");
        assertTrue(Files.exists(written));
        assertTrue(org.stasissheet.intake.CaseReader.read(Files.readAllBytes(written))
                instanceof org.stasissheet.intake.CaseReader.Accepted);
        assertFalse(window.session().dirtyProperty().get());
        assertEquals(written.toAbsolutePath().normalize(), window.preferences().get().recentFiles().get(0));
    }

    @Test
    @DisplayName("a local rule folder is used and badged LOCAL PROTOCOL; a refused folder changes nothing")
    void ruleFolder(FxRobot robot) throws Exception {
        Path local = data.resolve("local-rules");
        Files.createDirectories(local);
        try (var files = Files.list(Path.of("rules"))) {
            for (Path f : files.toList()) {
                Files.copy(f, local.resolve(f.getFileName()));
            }
        }
        // a hospital that starts treating from 3.5 cP: any edit makes the set local
        Path hv = local.resolve("hyperviscosity.yaml");
        Files.writeString(hv, Files.readString(hv).replaceFirst("value: 4.0", "value: 3.5"));
        shell.files.add(local);
        FormHarness.fx(() -> window.actions().chooseRuleFolder());
        FormHarness.settle(window);
        assertTrue(window.session().ruleSetProperty().get().provenance().local());
        assertTrue(((Label) node(robot, "local-protocol")).isVisible());
        assertEquals(java.util.Optional.of(local), window.preferences().get().ruleFolder());

        Path broken = data.resolve("broken-rules");
        Files.createDirectories(broken);
        Files.writeString(broken.resolve("manifest.yaml"), "format: stasis-rules/1\nname: [unclosed\n");
        var before = window.session().ruleSetProperty().get();
        FormHarness.fx(() -> window.actions().useRuleFolder(broken));
        FormHarness.settle(window);
        assertTrue(window.session().ruleSetProperty().get() == before, "the rules in use are unchanged");
        assertTrue(shell.asked.stream().anyMatch(q -> q.startsWith("problems: The rule set was refused")),
                shell.asked.toString());
        assertFalse(shell.problemsShown.get(shell.problemsShown.size() - 1).isEmpty());
    }

    @Test
    @DisplayName("opening a file with mistakes keeps every value and shows each message beside its field")
    void openWithMistakes(FxRobot robot) throws Exception {
        Path file = data.resolve("mistakes.json");
        Files.writeString(file, """
                {"format":"stasis-case/1",
                 "patient":{"label":"Invented patient, bed 2","ageYears":"seventy"},
                 "labs":{"wbc":{"value":150000,"unit":"10*9/L"},"hemoglobn":{"value":9,"unit":"g/dL"}},
                 "extra":{"ward":"St. Alder Infirmary"}}
                """);
        FormHarness.fx(() -> window.actions().openFile(file));
        FormHarness.settle(window);
        assertEquals("seventy", window.session().entry().field("patient.ageYears").textProperty().get());
        assertEquals("150000", window.session().entry().field("labs.wbc").textProperty().get());
        assertFalse(window.session().entry().field("patient.ageYears").problemProperty().get().isEmpty());
        assertFalse(window.session().entry().field("labs.wbc").problemProperty().get().isEmpty());
        assertTrue(window.session().entry().otherProblemsProperty().stream()
                .anyMatch(p -> p.startsWith("labs.hemoglobn")), window.session().entry().otherProblemsProperty()
                .toString());
        String saved = new String(window.session().caseJson(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(saved.contains("hemoglobn") && saved.contains("St. Alder Infirmary"), "nothing read is dropped");
        assertFalse(window.session().dirtyProperty().get(), "as opened");
    }

    @Test
    @DisplayName("export writes a worksheet PDF off the JavaFX thread; opening that PDF gives the same case back")
    void exportAndReopen(FxRobot robot) throws Exception {
        Path pdf = data.resolve("out").resolve("bed4");
        Files.createDirectories(pdf.getParent());
        shell.files.add(pdf);
        FormHarness.fx(() -> window.actions().exportPdf());
        FormHarness.settle(window);
        Path written = data.resolve("out").resolve("bed4.pdf");
        assertTrue(Files.exists(written), shell.asked.toString());
        byte[] bytes = Files.readAllBytes(written);
        assertTrue(org.stasissheet.files.WorksheetPdfs.startsWithPdfMagic(bytes));
        try (var doc = org.apache.pdfbox.Loader.loadPDF(bytes)) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
            assertTrue(text.replaceAll("\\s+", " ").contains("never replaces"), "the standing caution is printed");
        }
        byte[] before = window.session().caseJson();

        FormHarness.fx(() -> window.actions().newCase());
        assertEquals("", window.session().entry().field("patient.label").textProperty().get());
        FormHarness.fx(() -> window.actions().openFile(written));
        FormHarness.settle(window);
        assertEquals("Demo patient A, ward 7", window.session().entry().field("patient.label").textProperty().get());
        assertEquals(new String(before, java.nio.charset.StandardCharsets.UTF_8),
                new String(window.session().caseJson(), java.nio.charset.StandardCharsets.UTF_8));
        assertTrue(window.session().documentProperty().get().isEmpty(), "Save does not overwrite the PDF");
    }

    @Test
    @DisplayName("the handoff note goes to the clipboard, the same text the report renders, without the label")
    void handoffNote(FxRobot robot) throws Exception {
        FormHarness.fx(() -> window.actions().copyHandoffNote());
        assertEquals(1, shell.clipboard.size());
        var ws = window.session().completeWorksheetProperty().get().orElseThrow();
        assertEquals(org.stasissheet.report.HandoffNote.render(ws, false), shell.clipboard.get(0));
        assertFalse(shell.clipboard.get(0).contains("Demo patient A"));
    }

    @Test
    @DisplayName("no PDF and no note while a field has a problem; the menu items say so")
    void exportNeedsCompleteCase(FxRobot robot) throws Exception {
        type(robot, "labs-wbc", "150000");
        recompute();
        FormHarness.fx(() -> window.actions().exportPdf());
        assertTrue(shell.asked.stream().anyMatch(q -> q.startsWith("problems: No PDF")), shell.asked.toString());
        assertTrue(shell.asked.stream().noneMatch(q -> q.startsWith("pdf ")));
    }

    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (java.io.IOException e) {
            return "";
        }
    }
}
