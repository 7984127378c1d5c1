package org.stasissheet.ui.draft;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.stasissheet.ui.app.MainWindow;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The answers to the restore question in a running form (issue 18, item 6): the question names when, which
 * patient label, which case file and which draft file; closing it keeps the draft for the next start; only
 * "delete" deletes, and the status bar says which happened.
 */
@ExtendWith(ApplicationExtension.class)
class RestoreChoiceFormTest {
    @TempDir
    Path data;

    MainWindow window;

    @Start
    void start(Stage stage) {
        window = MainWindow.open(stage, FormHarness.settings(data, new ScriptedShell()));
    }

    private Path crashWithDraft(String label) throws Exception {
        FormHarness.fx(() -> window.session().entry().field("patient.label").textProperty().set(label));
        Path draft = window.drafts().draftFile();
        FormHarness.waitUntil(() -> Files.exists(draft) && read(draft).contains(label));
        FormHarness.crash(window);
        return draft;
    }

    @Test
    @DisplayName("the question names the time, the label and the draft file; closing it keeps the draft, "
            + "offered again at the next start")
    void keepForLater(FxRobot robot) throws Exception {
        Path draft = crashWithDraft("Invented patient, bed 21");
        ScriptedShell next = new ScriptedShell();
        MainWindow again = FormHarness.open(FormHarness.settings(data, next));
        String asked = next.asked.stream().filter(q -> q.startsWith("restore: ")).findFirst().orElseThrow();
        assertTrue(asked.contains("Patient label: Invented patient, bed 21"), asked);
        assertTrue(asked.contains("Draft file: " + draft), asked);
        assertTrue(asked.contains("Saved at: "), asked);
        assertTrue(asked.contains("Case file: none (never saved to a case file)"), asked);
        assertTrue(Files.exists(draft), "kept");
        assertTrue(again.actions().statusProperty().get().contains("Draft kept for later"),
                again.actions().statusProperty().get());
        // this window ends cleanly: its own draft goes, the kept one stays
        FormHarness.fx(() -> {
            if (again.actions().closeRequested()) {
                again.stage().hide();
            }
        });
        assertTrue(Files.exists(draft), "still kept after a clean end of the next window");

        ScriptedShell third = new ScriptedShell();
        third.restore = true;
        MainWindow last = FormHarness.open(FormHarness.settings(data, third));
        assertEquals("Invented patient, bed 21", last.session().entry().field("patient.label").textProperty().get(),
                "offered again, and restored");
        FormHarness.fx(() -> last.stage().hide());
    }

    @Test
    @DisplayName("only 'delete' deletes the draft, and the status bar says so")
    void deleteDeletes(FxRobot robot) throws Exception {
        Path draft = crashWithDraft("Invented patient, bed 22");
        ScriptedShell next = new ScriptedShell();
        next.declined = RestoreChoice.DELETE;
        MainWindow again = FormHarness.open(FormHarness.settings(data, next));
        assertFalse(Files.exists(draft));
        assertTrue(again.actions().statusProperty().get().contains("Draft deleted as asked: " + draft),
                again.actions().statusProperty().get());
        FormHarness.fx(() -> again.stage().hide());
    }

    /** The file's text; a file being replaced at this moment reads as empty (the wait tries again). */
    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (java.io.IOException e) {
            return "";
        }
    }
}
