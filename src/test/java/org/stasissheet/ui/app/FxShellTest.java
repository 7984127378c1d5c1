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

    @Test
    @DisplayName("the restore dialog names the draft and answers true for 'Restore the draft', false otherwise")
    void restore(FxRobot robot) throws Exception {
        FxShell shell = new FxShell(owner);
        CompletableFuture<Boolean> yes = open(() -> shell.offerRestore("A draft saved at 02:41 was found."));
        DialogPane pane = waitForDialog(robot, "restore-draft-dialog");
        assertTrue(pane.getContentText().contains("A draft saved at 02:41 was found."), pane.getContentText());
        click(robot, pane, "Restore the draft");
        assertTrue(yes.get(20, TimeUnit.SECONDS));

        CompletableFuture<Boolean> no = open(() -> shell.offerRestore("Another draft."));
        click(robot, waitForDialog(robot, "restore-draft-dialog"), "Throw it away");
        assertFalse(no.get(20, TimeUnit.SECONDS));
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
