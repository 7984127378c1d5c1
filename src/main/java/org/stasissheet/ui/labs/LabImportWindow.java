package org.stasissheet.ui.labs;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Modality;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.stasissheet.interop.LabReports;
import org.stasissheet.interop.ReportRefused;
import org.stasissheet.labs.LabImport;
import org.stasissheet.worksheet.Cautions;

/**
 * The "Import lab results" window: paste (or open a report file), read the preview, answer every question, accept.
 * It only binds {@link LabPreview} to controls; accepting hands the answered import to the form.
 */
public final class LabImportWindow {
    private final Stage stage = new Stage();
    private final LabPreview preview;
    private final Label status = new Label();

    /**
     * @param chooseFile asks for a report file (the form's shell), given nothing
     * @param onAccept   receives the answered import; the window closes after it
     */
    public LabImportWindow(Window owner, Function<Optional<Path>, Optional<Path>> chooseFile,
                           Function<org.stasissheet.measure.Analyte, String> current,
                           Consumer<LabImport> onAccept, java.util.List<String> stylesheets) {
        preview = new LabPreview(current);
        stage.initOwner(owner);
        stage.initModality(Modality.WINDOW_MODAL);
        stage.setTitle("Import lab results");

        Label caution = new Label("CAUTION: " + Cautions.SHORT + " Check every imported value against the report.");
        caution.setId("lab-caution");
        caution.getStyleClass().add("standing-caution");
        caution.setWrapText(true);

        Label how = new Label("Paste the results as copied from the result screen or report (one result per line: "
                + "name, value, unit, flag, range), or open a report file (text, FHIR R4 Bundle, HL7 v2 ORU^R01).");
        how.setWrapText(true);

        TextArea paste = new TextArea();
        paste.setId("lab-paste");
        paste.setPromptText("WBC 182.4 x10^9/L H\nK+  6,8 mmol/l\nIgM 48 g/L *");
        paste.setAccessibleText("Pasted lab results");
        paste.setPrefRowCount(8);
        paste.textProperty().bindBidirectional(preview.textProperty());

        Button open = new Button("Open a report _file…");
        open.setId("lab-open-file");
        open.setOnAction(e -> chooseFile.apply(Optional.empty()).ifPresent(this::openFile));

        TableView<LabPreview.Row> table = new TableView<>(preview.rows());
        table.setId("lab-preview");
        table.setAccessibleText("Preview of the lab results as understood");
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.getColumns().add(column("Line", LabPreview.Row::where, 70));
        table.getColumns().add(column("Recognised as", LabPreview.Row::analyte, 140));
        table.getColumns().add(column("Value", LabPreview.Row::value, 70));
        table.getColumns().add(column("Unit as understood", LabPreview.Row::unit, 130));
        table.getColumns().add(column("Canonical value", LabPreview.Row::canonical, 120));
        table.getColumns().add(column("What happens", LabPreview.Row::outcome, 320));
        table.setPlaceholder(new Label("Nothing pasted yet."));
        VBox.setVgrow(table, Priority.ALWAYS);

        VBox questions = new VBox(6);
        questions.setId("lab-questions");
        preview.questions().addListener((ListChangeListener<LabPreview.Question>) c -> fillQuestions(questions));

        Button accept = new Button("_Accept: put these values in the form");
        accept.setId("lab-accept");
        accept.setDefaultButton(true);
        accept.disableProperty().bind(preview.acceptableProperty().not());
        accept.setOnAction(e -> preview.accepted().ifPresent(read -> {
            onAccept.accept(read);
            stage.close();
        }));
        Button cancel = new Button("Cancel");
        cancel.setId("lab-cancel");
        cancel.setCancelButton(true);
        cancel.setOnAction(e -> stage.close());
        status.setId("lab-status");
        status.setWrapText(true);
        status.textProperty().bind(Bindings.createStringBinding(this::summary, preview.rows(),
                preview.acceptableProperty()));

        VBox root = new VBox(8, caution, how, paste, open, table, questions, status, new HBox(8, accept, cancel));
        root.setPadding(new Insets(12));
        Scene scene = new Scene(root, 900, 640);
        scene.getStylesheets().addAll(stylesheets);
        stage.setScene(scene);
    }

    public void show() {
        stage.show();
    }

    public Stage stage() {
        return stage;
    }

    public LabPreview preview() {
        return preview;
    }

    private void openFile(Path file) {
        try {
            byte[] bytes = Files.readAllBytes(file);
            preview.textProperty().set("");
            preview.show(Optional.of(LabReports.read(bytes)));
        } catch (ReportRefused e) {
            preview.show(Optional.empty());
            status.textProperty().unbind();
            status.setText(file.getFileName() + " was not read: " + String.join("; ", e.problems()));
        } catch (IOException e) {
            status.textProperty().unbind();
            status.setText(file.getFileName() + " could not be read (" + e.getClass().getSimpleName() + ")");
        }
    }

    private String summary() {
        Optional<LabImport> r = preview.readingProperty().get();
        if (r.isEmpty()) {
            return "";
        }
        long open = preview.questions().stream().filter(q -> q.chosen().get() == null).count();
        return r.get().taken().size() + " value(s) to import, " + r.get().questions().size() + " question(s)"
                + (open > 0 ? " (" + open + " still to answer)" : "") + ", " + r.get().left().size()
                + " line(s) not imported. Read from " + r.get().source().label() + ".";
    }

    private void fillQuestions(VBox box) {
        box.getChildren().clear();
        int n = 0;
        for (LabPreview.Question q : preview.questions()) {
            Label label = new Label("QUESTION, " + q.asked().where() + " (\"" + q.asked().text() + "\"): "
                    + q.asked().question());
            label.setWrapText(true);
            ComboBox<LabPreview.Answer> choice = new ComboBox<>();
            choice.setId("lab-question-" + n++);
            choice.getItems().setAll(q.answers());
            choice.setPromptText("choose an answer");
            choice.setAccessibleText(q.asked().question());
            choice.valueProperty().bindBidirectional(q.chosen());
            box.getChildren().add(new VBox(2, label, choice));
        }
    }

    private static TableColumn<LabPreview.Row, String> column(String title,
                                                              Function<LabPreview.Row, String> value, double width) {
        TableColumn<LabPreview.Row, String> c = new TableColumn<>(title);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        c.setPrefWidth(width);
        return c;
    }
}
