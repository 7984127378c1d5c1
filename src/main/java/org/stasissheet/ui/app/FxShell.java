package org.stasissheet.ui.app;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.TextArea;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.stage.DirectoryChooser;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import org.stasissheet.ui.draft.RestoreChoice;
import org.stasissheet.ui.draft.RestoreDialog;

/**
 * The desktop's own dialogs. Each dialog pane has an id ({@code restore-draft-dialog}, {@code unsaved-dialog},
 * {@code problems-dialog}) and its buttons say what they do, so they can be found by keyboard, screen reader and
 * test alike.
 */
public final class FxShell implements Shell {
    static final ButtonType SAVE = new ButtonType("Save", ButtonBar.ButtonData.YES);
    static final ButtonType DISCARD = new ButtonType("Discard changes", ButtonBar.ButtonData.NO);
    static final ButtonType CANCEL = new ButtonType("Cancel", ButtonBar.ButtonData.CANCEL_CLOSE);

    private final Window owner;

    public FxShell(Window owner) {
        this.owner = Objects.requireNonNull(owner, "owner");
    }

    @Override
    public RestoreChoice offerRestore(String detail) {
        return RestoreDialog.ask(owner, detail, owner.getScene() == null ? List.of()
                : owner.getScene().getStylesheets());
    }

    @Override
    public UnsavedChoice askUnsaved(String documentName) {
        Alert a = alert(Alert.AlertType.CONFIRMATION, "unsaved-dialog", "Save the changes to " + documentName + "?",
                "The case has changes that are not saved in a file.", SAVE, DISCARD, CANCEL);
        ButtonType b = a.showAndWait().orElse(CANCEL);
        return b == SAVE ? UnsavedChoice.SAVE : b == DISCARD ? UnsavedChoice.DISCARD : UnsavedChoice.CANCEL;
    }

    @Override
    public Optional<Path> chooseCaseToOpen(Optional<Path> near) {
        FileChooser c = chooser("Open a case, a course or a worksheet PDF", near);
        c.getExtensionFilters().addAll(
                new FileChooser.ExtensionFilter("Case and course files, worksheet PDFs", "*.json", "*.pdf"),
                new FileChooser.ExtensionFilter("All files", "*"));
        return Optional.ofNullable(c.showOpenDialog(owner)).map(File::toPath);
    }

    @Override
    public Optional<Path> chooseLabReport(Optional<Path> near) {
        FileChooser c = chooser("Open a lab report", near);
        c.getExtensionFilters().addAll(
                new FileChooser.ExtensionFilter("Report text, FHIR bundles, HL7 v2 messages", "*.txt", "*.json",
                        "*.hl7"),
                new FileChooser.ExtensionFilter("All files", "*"));
        return Optional.ofNullable(c.showOpenDialog(owner)).map(File::toPath);
    }

    @Override
    public Optional<Path> chooseCaseTarget(String suggestedName, Optional<Path> near) {
        FileChooser c = chooser("Save the case", near);
        c.setInitialFileName(suggestedName);
        c.getExtensionFilters().add(new FileChooser.ExtensionFilter("Case file", "*.json"));
        return Optional.ofNullable(c.showSaveDialog(owner)).map(File::toPath);
    }

    @Override
    public Optional<Path> choosePdfTarget(String suggestedName, Optional<Path> near) {
        FileChooser c = chooser("Export the worksheet PDF", near);
        c.setInitialFileName(suggestedName);
        c.getExtensionFilters().add(new FileChooser.ExtensionFilter("PDF", "*.pdf"));
        return Optional.ofNullable(c.showSaveDialog(owner)).map(File::toPath);
    }

    @Override
    public Optional<Path> chooseRuleFolder(Optional<Path> near) {
        DirectoryChooser c = new DirectoryChooser();
        c.setTitle("Choose the folder of a local rule set");
        near.filter(Files::isDirectory).ifPresent(p -> c.setInitialDirectory(p.toFile()));
        return Optional.ofNullable(c.showDialog(owner)).map(File::toPath);
    }

    @Override
    public void showProblems(String title, List<String> lines) {
        Alert a = alert(Alert.AlertType.WARNING, "problems-dialog", title, "", ButtonType.OK);
        TextArea text = new TextArea(String.join("\n", lines));
        text.setEditable(false);
        text.setWrapText(true);
        text.setAccessibleText(title);
        a.getDialogPane().setContent(text);
        a.showAndWait();
    }

    @Override
    public Optional<String> askAssessor(String current) {
        javafx.scene.control.TextInputDialog d = new javafx.scene.control.TextInputDialog(current);
        d.initOwner(owner);
        d.setTitle("Stasis Sheet");
        d.setHeaderText("Who assesses new cases on this computer?");
        d.setContentText("Name written as \"Assessed by\" in every new case (empty: none):");
        d.getDialogPane().setId("assessor-dialog");
        d.getEditor().setId("assessor-name");
        d.getEditor().setAccessibleText("Assessor for new cases");
        d.getDialogPane().getStylesheets().setAll(owner.getScene() == null ? List.of()
                : owner.getScene().getStylesheets());
        return d.showAndWait();
    }

    @Override
    public void copyToClipboard(String text) {
        ClipboardContent content = new ClipboardContent();
        content.putString(text);
        Clipboard.getSystemClipboard().setContent(content);
    }

    private Alert alert(Alert.AlertType type, String id, String header, String body, ButtonType... buttons) {
        Alert a = new Alert(type, body, buttons);
        a.initOwner(owner);
        a.setTitle("Stasis Sheet");
        a.setHeaderText(header);
        a.getDialogPane().setId(id);
        a.getDialogPane().getStylesheets().setAll(owner.getScene() == null ? List.of()
                : owner.getScene().getStylesheets());
        return a;
    }

    private static FileChooser chooser(String title, Optional<Path> near) {
        FileChooser c = new FileChooser();
        c.setTitle(title);
        near.map(p -> Files.isDirectory(p) ? p : p.toAbsolutePath().getParent())
                .filter(p -> p != null && Files.isDirectory(p))
                .ifPresent(p -> c.setInitialDirectory(p.toFile()));
        return c;
    }
}
