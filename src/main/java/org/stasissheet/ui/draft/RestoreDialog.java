package org.stasissheet.ui.draft;

import java.nio.file.Path;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Objects;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.scene.layout.Region;
import javafx.stage.Window;

/**
 * The question asked at start-up about a draft left by a session that did not end cleanly
 * ({@code #restore-draft-dialog}). It shows the whole text, wrapped, on a 1366×768 screen: when the draft was
 * saved, its patient label, the case file it belonged to and the draft file itself. Closing it or pressing
 * Escape keeps the draft for later; only the button that says it deletes the draft does so.
 */
public final class RestoreDialog {
    public static final ButtonType RESTORE = new ButtonType("Restore the draft", ButtonBar.ButtonData.YES);
    public static final ButtonType KEEP = new ButtonType("Keep it for later", ButtonBar.ButtonData.CANCEL_CLOSE);
    public static final ButtonType DELETE = new ButtonType("Delete the draft file", ButtonBar.ButtonData.NO);
    /** Wide enough for the text on a 1366-pixel screen, with room for the window frame. */
    static final double WIDTH = 640;
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss (xxx)");

    private RestoreDialog() {
    }

    /**
     * The text of the question about one draft, every line whole.
     *
     * @param label the draft's patient label, empty when it has none
     * @param file  where the draft file is
     */
    public static String text(DraftStore.Draft draft, String label, Path file, ZoneId zone, int index, int count) {
        Objects.requireNonNull(draft, "draft");
        return "The form was not closed normally last time (a crash, a power cut, the computer switched off), "
                + "and its draft was kept" + (count > 1 ? " (draft " + index + " of " + count + ")" : "") + ".\n\n"
                + "Saved at: " + WHEN.format(draft.savedAt().atZone(zone)) + "\n"
                + "Patient label: " + (label.isBlank() ? "(none entered)" : label.strip()) + "\n"
                + "Case file: " + draft.document().map(Path::toString).orElse("none (never saved to a case file)")
                + "\n"
                + "Draft file: " + file + "\n\n"
                + "\"" + KEEP.getText() + "\" (also Escape or closing this window) leaves the draft file where it "
                + "is; it is offered again at the next start. \"" + DELETE.getText() + "\" removes it for good.";
    }

    /** Asks, on the JavaFX thread, and waits for the answer. */
    public static RestoreChoice ask(Window owner, String text, List<String> styleSheets) {
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "", RESTORE, KEEP, DELETE);
        a.initOwner(owner);
        a.setTitle("Stasis Sheet");
        a.setHeaderText("Restore the unsaved draft?");
        a.getDialogPane().setId("restore-draft-dialog");
        a.getDialogPane().getStylesheets().setAll(styleSheets);
        Label body = new Label(text);
        body.setId("restore-draft-text");
        body.setWrapText(true);
        body.setMinHeight(Region.USE_PREF_SIZE);
        body.setPrefWidth(WIDTH - 40);
        body.setMaxWidth(WIDTH - 40);
        a.getDialogPane().setContent(body);
        a.getDialogPane().setPrefWidth(WIDTH);
        a.getDialogPane().setMinHeight(Region.USE_PREF_SIZE);
        a.setResizable(true);
        for (ButtonType t : a.getButtonTypes()) {
            Button b = (Button) a.getDialogPane().lookupButton(t);
            b.setMinWidth(Region.USE_PREF_SIZE);
        }
        ButtonType answer = a.showAndWait().orElse(KEEP);
        return answer == RESTORE ? RestoreChoice.RESTORE : answer == DELETE ? RestoreChoice.DELETE
                : RestoreChoice.KEEP_FOR_LATER;
    }
}
