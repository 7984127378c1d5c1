package org.stasissheet.ui.register;

import java.time.Clock;
import java.time.Duration;
import java.util.Objects;
import java.util.Optional;
import javafx.animation.Animation;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import javafx.util.StringConverter;
import org.stasissheet.register.Decision;
import org.stasissheet.register.Referral;
import org.stasissheet.register.RegisterAccess;
import org.stasissheet.register.RegisterTime;
import org.stasissheet.register.Urgency;
import org.stasissheet.ui.app.Background;
import org.stasissheet.ui.app.FormSettings;
import org.stasissheet.ui.app.MainWindow;
import org.stasissheet.ui.sheet.SheetView;
import org.stasissheet.worksheet.Cautions;

/**
 * The register window: open referrals most urgent first, the selected one's worksheet and history, and a form to
 * record the team's decision. It polls the register so another user's change shows up without a restart. It binds
 * controls to {@link RegisterViewModel} and computes nothing itself.
 */
public final class RegisterWindow {
    public static final Duration DEFAULT_POLL = Duration.ofSeconds(5);

    private final Stage stage;
    private final RegisterViewModel model;
    private final Background background;
    private final Timeline polling;

    private RegisterWindow(Stage stage, RegisterAccess register, FormSettings settings, Duration poll) {
        this.stage = Objects.requireNonNull(stage, "stage");
        this.background = new Background();
        Clock clock = settings.clock();
        this.model = new RegisterViewModel(register, background, clock, settings.rules());

        Label caution = new Label("CAUTION: " + Cautions.SHORT);
        caution.setId("register-caution");
        caution.getStyleClass().add("standing-caution");
        caution.setWrapText(true);
        caution.setMaxWidth(Double.MAX_VALUE);
        Label where = new Label("Register: " + model.location());
        where.setId("register-location");

        TableView<Referral> table = table(clock);
        SheetView sheetView = new SheetView(model.sheet());
        Label provenance = new Label();
        provenance.setId("register-provenance");
        provenance.setWrapText(true);
        provenance.textProperty().bind(model.provenanceProperty());
        ListView<String> history = new ListView<>(model.history());
        history.setId("register-history");
        history.setAccessibleText("History of the selected referral, oldest first");
        TabPane tabs = new TabPane(new Tab("Worksheet", new BorderPane(sheetView.node(), provenance, null, null, null)),
                new Tab("History", history));
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);

        BorderPane right = new BorderPane(tabs);
        right.setBottom(decisionForm());
        SplitPane split = new SplitPane(table, right);
        split.setOrientation(Orientation.HORIZONTAL);
        split.setDividerPositions(0.45);

        Label status = new Label();
        status.setId("register-status");
        status.setWrapText(true);
        status.textProperty().bind(model.statusProperty());

        BorderPane root = new BorderPane(split);
        root.setTop(new VBox(4, caution, where));
        root.setBottom(status);
        root.setPadding(new Insets(6));
        root.getStyleClass().add("form-root");
        Scene scene = new Scene(root, 1200, 780);
        scene.getStylesheets().add(MainWindow.STYLESHEET);
        stage.setScene(scene);
        stage.setTitle("Stasis Sheet — referral register");

        polling = new Timeline(new KeyFrame(javafx.util.Duration.millis(poll.toMillis()), e -> model.poll()));
        polling.setCycleCount(Animation.INDEFINITE);
        stage.setOnHidden(e -> {
            polling.stop();
            background.close();
        });
    }

    /** Opens the window on {@code stage} over {@code register}, loads it and starts polling every {@code poll}. */
    public static RegisterWindow open(Stage stage, RegisterAccess register, FormSettings settings, Duration poll) {
        RegisterWindow w = new RegisterWindow(stage, register, settings, poll);
        stage.show();
        w.model.reload();
        w.polling.play();
        return w;
    }

    public RegisterViewModel model() {
        return model;
    }

    public Background background() {
        return background;
    }

    public Stage stage() {
        return stage;
    }

    private TableView<Referral> table(Clock clock) {
        TableView<Referral> table = new TableView<>(model.referrals());
        table.setId("register-table");
        table.setAccessibleText("Open referrals, most urgent first, then by received time");
        table.getColumns().add(column("Id", r -> Long.toString(r.id())));
        table.getColumns().add(column("Level", r -> Urgency.badge(r.snapshot().highestLevel())));
        table.getColumns().add(column("Received", r -> RegisterTime.show(r.receivedAt(), clock.getZone())));
        table.getColumns().add(column("Procedure", r -> r.procedure().words()));
        table.getColumns().add(column("Decision", r -> r.decision().code()));
        table.getColumns().add(column("Patient", r -> r.snapshot().patientLabel()));
        table.getColumns().add(column("Top flag", r -> r.snapshot().topFlag()));
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.getSelectionModel().selectedItemProperty().addListener((o, was, now) -> {
            if (now != null && model.selectedProperty().get().map(r -> r.id() != now.id() || r.version() != now.version())
                    .orElse(true)) {
                model.select(Optional.of(now));
            }
        });
        model.selectedProperty().addListener((o, was, now) -> {
            if (now.isEmpty()) {
                table.getSelectionModel().clearSelection();
            } else if (table.getSelectionModel().getSelectedItem() == null
                    || table.getSelectionModel().getSelectedItem().id() != now.get().id()) {
                table.getSelectionModel().select(now.get());
            }
        });
        return table;
    }

    private static TableColumn<Referral, String> column(String title, java.util.function.Function<Referral, String> f) {
        TableColumn<Referral, String> c = new TableColumn<>(title);
        c.setCellValueFactory(cell -> new ReadOnlyObjectWrapper<>(f.apply(cell.getValue())));
        c.setSortable(false);
        return c;
    }

    private GridPane decisionForm() {
        ComboBox<Decision> decision = new ComboBox<>();
        decision.getItems().addAll(Decision.ACCEPTED, Decision.DECLINED, Decision.DEFERRED, Decision.MORE_INFORMATION);
        decision.setId("register-decision");
        decision.setAccessibleText("Decision");
        decision.setConverter(new StringConverter<>() {
            @Override
            public String toString(Decision d) {
                return d == null ? "" : d.code();
            }

            @Override
            public Decision fromString(String s) {
                return Decision.fromCode(s).orElse(null);
            }
        });
        TextField by = field("register-by", "Decided by (name, role)");
        TextField note = field("register-note", "Note: why, or what is needed");
        TextField slot = field("register-slot", "Planned slot, e.g. 2026-03-05T08:00:00+01:00");
        TextField access = field("register-access", "Vascular access planned");
        TextField fluid = field("register-fluid", "Replacement fluid planned");
        Button record = new Button("Record decision");
        record.setId("register-record");
        record.disableProperty().bind(model.selectedProperty().map(Optional::isEmpty));
        record.setOnAction(e -> model.decide(decision.getValue(), by.getText(), note.getText(), slot.getText(),
                access.getText(), fluid.getText()));
        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(4);
        grid.setPadding(new Insets(6, 0, 0, 0));
        grid.addRow(0, new Label("Decision"), decision, new Label("Decided by"), by);
        grid.addRow(1, new Label("Planned slot"), slot, new Label("Access"), access);
        grid.addRow(2, new Label("Replacement fluid"), fluid, new Label("Note"), note);
        grid.add(record, 3, 3);
        return grid;
    }

    private static TextField field(String id, String prompt) {
        TextField f = new TextField();
        f.setId(id);
        f.setPromptText(prompt);
        f.setAccessibleText(prompt);
        return f;
    }
}
