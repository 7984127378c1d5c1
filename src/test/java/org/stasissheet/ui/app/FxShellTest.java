package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.DialogPane;
import javafx.scene.control.TextArea;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.stasissheet.ui.draft.RestoreChoice;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real dialogs of {@link FxShell} (the other form tests answer through a scripted stand-in): each is opened,
 * found by its id, answered with a click on the button whose words say what it does, and its answer checked.
 */
@ExtendWith(ApplicationExtension.class)
class FxShellTest {
    Stage owner;

    @Start
    void start(Stage stage) {
        owner = stage;
        stage.setScene(new Scene(new StackPane(), 400, 300));
        stage.show();
    }

    /** Opens a dialog on the JavaFX thread (it blocks there until answered) and hands back its answer. */
    private <T> CompletableFuture<T> open(Supplier<T> dialog) {
        CompletableFuture<T> answer = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                answer.complete(dialog.get());
            } catch (RuntimeException e) {
                answer.completeExceptionally(e);
            }
        });
        return answer;
    }

    private DialogPane waitForDialog(FxRobot robot, String id) throws Exception {
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> robot.lookup("#" + id).tryQuery().isPresent());
        return robot.lookup("#" + id).query();
    }

    private static void click(FxRobot robot, DialogPane pane, String words) {
        Button b = pane.getButtonTypes().stream()
                .filter(t -> t.getText().equals(words))
                .map(t -> (Button) pane.lookupButton(t))
                .findFirst().orElseThrow(() -> new AssertionError("no button \"" + words + "\""));
        robot.clickOn(b);
    }

    /** The texts a label or button actually draws: JavaFX draws "A draft save…" when it cuts one short. */
    private static List<String> cutTexts(DialogPane pane) {
        List<String> cut = new java.util.ArrayList<>();
        for (javafx.scene.Node n : pane.lookupAll(".text")) {
            if (n instanceof javafx.scene.text.Text drawn && drawn.getParent() instanceof javafx.scene.control.Labeled l
                    && l.isVisible() && l.getText() != null && !l.getText().isEmpty()
                    && !drawn.getText().equals(l.getText())) {
                cut.add(l.getText() + " → drawn as: " + drawn.getText());
            }
        }
        return cut;
    }

    @Test
    @DisplayName("the restore dialog shows its whole text (when, label, case file, draft file) and whole buttons")
    void restoreShowsEverything(FxRobot robot) throws Exception {
        FxShell shell = new FxShell(owner);
        org.stasissheet.ui.draft.DraftStore.Draft draft = new org.stasissheet.ui.draft.DraftStore.Draft("s1",
                new byte[0], java.util.Optional.of(java.nio.file.Path.of("/home/resident/cases/bed-12-invented.json")),
                java.time.Instant.parse("2026-03-05T01:41:07Z"));
        String text = org.stasissheet.ui.draft.RestoreDialog.text(draft, "Invented patient, bed 12",
                java.nio.file.Path.of("/home/resident/.local/share/stasis-sheet/draft-0f6c1d2e-8a4b-4c6e-9d21-"
                        + "5b7a3e9f0c11.json"), java.time.ZoneOffset.ofHours(1), 1, 2);
        CompletableFuture<RestoreChoice> answer = open(() -> shell.offerRestore(text));
        DialogPane pane = waitForDialog(robot, "restore-draft-dialog");
        WaitForAsyncUtils.waitForFxEvents();
        javafx.scene.control.Label body = robot.lookup("#restore-draft-text").query();
        assertEquals(text, body.getText());
        for (String part : List.of("2026-03-05 02:41:07", "Invented patient, bed 12", "bed-12-invented.json",
                "draft-0f6c1d2e-8a4b-4c6e-9d21-5b7a3e9f0c11.json", "Keep it for later", "removes it for good")) {
            assertTrue(text.contains(part), part);
        }
        assertEquals(List.of(), cutTexts(pane), "nothing is cut short");
        javafx.stage.Window dialog = pane.getScene().getWindow();
        assertTrue(dialog.getWidth() <= 1366 && dialog.getHeight() <= 768,
                "fits a 1366×768 screen: " + dialog.getWidth() + "×" + dialog.getHeight());
        click(robot, pane, "Restore the draft");
        assertEquals(RestoreChoice.RESTORE, answer.get(20, TimeUnit.SECONDS));
    }

    @Test
    @DisplayName("Escape keeps the draft for later; only 'Delete the draft file' deletes")
    void restoreEscapeKeeps(FxRobot robot) throws Exception {
        FxShell shell = new FxShell(owner);
        CompletableFuture<RestoreChoice> escaped = open(() -> shell.offerRestore("A draft saved at 02:41 was found."));
        waitForDialog(robot, "restore-draft-dialog");
        robot.type(javafx.scene.input.KeyCode.ESCAPE);
        assertEquals(RestoreChoice.KEEP_FOR_LATER, escaped.get(20, TimeUnit.SECONDS));

        CompletableFuture<RestoreChoice> closed = open(() -> shell.offerRestore("Another draft."));
        DialogPane pane = waitForDialog(robot, "restore-draft-dialog");
        // the window's close box: what the dialog does for it is what its cancel button does
        Platform.runLater(() -> pane.getScene().getWindow().fireEvent(new javafx.stage.WindowEvent(
                pane.getScene().getWindow(), javafx.stage.WindowEvent.WINDOW_CLOSE_REQUEST)));
        assertEquals(RestoreChoice.KEEP_FOR_LATER, closed.get(20, TimeUnit.SECONDS));

        CompletableFuture<RestoreChoice> deleted = open(() -> shell.offerRestore("A third draft."));
        click(robot, waitForDialog(robot, "restore-draft-dialog"), "Delete the draft file");
        assertEquals(RestoreChoice.DELETE, deleted.get(20, TimeUnit.SECONDS));
    }

    @Test
    @DisplayName("the assessor question shows the name kept, answers what was typed with OK, nothing with Escape")
    void assessor(FxRobot robot) throws Exception {
        FxShell shell = new FxShell(owner);
        CompletableFuture<java.util.Optional<String>> typed = open(() -> shell.askAssessor("Dr Invented Resident"));
        DialogPane pane = waitForDialog(robot, "assessor-dialog");
        javafx.scene.control.TextField name = robot.lookup("#assessor-name").query();
        assertEquals("Dr Invented Resident", name.getText());
        Platform.runLater(() -> {
            name.requestFocus();
            name.setText("Dr Invented Registrar");
        });
        WaitForAsyncUtils.waitForFxEvents();
        click(robot, pane, "OK");
        assertEquals(java.util.Optional.of("Dr Invented Registrar"), typed.get(20, TimeUnit.SECONDS));

        CompletableFuture<java.util.Optional<String>> cancelled = open(() -> shell.askAssessor(""));
        waitForDialog(robot, "assessor-dialog");
        robot.type(javafx.scene.input.KeyCode.ESCAPE);
        assertEquals(java.util.Optional.empty(), cancelled.get(20, TimeUnit.SECONDS));
    }

    @Test
    @DisplayName("the unsaved-changes dialog names the document and maps each button to its choice")
    void unsaved(FxRobot robot) throws Exception {
        FxShell shell = new FxShell(owner);
        for (Shell.UnsavedChoice expected : Shell.UnsavedChoice.values()) {
            CompletableFuture<Shell.UnsavedChoice> choice = open(() -> shell.askUnsaved("bed4.json"));
            DialogPane pane = waitForDialog(robot, "unsaved-dialog");
            assertEquals("Save the changes to bed4.json?", pane.getHeaderText());
            click(robot, pane, switch (expected) {
                case SAVE -> "Save";
                case DISCARD -> "Discard changes";
                case CANCEL -> "Cancel";
            });
            assertEquals(expected, choice.get(20, TimeUnit.SECONDS));
        }
    }

    @Test
    @DisplayName("the problems dialog lists every line, read-only, and closes with OK")
    void problems(FxRobot robot) throws Exception {
        FxShell shell = new FxShell(owner);
        List<String> lines = List.of("labs.wbc: 150000 10*9/L is not plausible", "labs.igmm: unknown key");
        CompletableFuture<Boolean> closed = open(() -> {
            shell.showProblems("The case was not read", lines);
            return true;
        });
        DialogPane pane = waitForDialog(robot, "problems-dialog");
        TextArea text = (TextArea) pane.getContent();
        assertEquals(String.join("\n", lines), text.getText());
        assertFalse(text.isEditable());
        click(robot, pane, "OK");
        assertTrue(closed.get(20, TimeUnit.SECONDS));
    }
}
