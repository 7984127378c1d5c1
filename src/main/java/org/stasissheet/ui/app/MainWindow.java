package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.geometry.Orientation;
import javafx.scene.Scene;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.stasissheet.ui.course.CourseModel;
import org.stasissheet.ui.course.CourseView;
import org.stasissheet.ui.labs.LabImportWindow;
import org.stasissheet.ui.labs.LabLanding;
import org.stasissheet.ui.draft.Autosaver;
import org.stasissheet.ui.draft.DraftStore;
import org.stasissheet.ui.entry.EntryView;
import org.stasissheet.ui.entry.EntryViewModel;
import org.stasissheet.ui.entry.FormJson;
import org.stasissheet.ui.entry.UnitSystem;
import org.stasissheet.ui.grade.PulmonarySuggestionView;
import org.stasissheet.ui.sheet.SheetView;
import org.stasissheet.worksheet.Cautions;

/**
 * The form's window: menu bar, the standing caution (always visible, outside the scrolling areas), entry side
 * and, in tabs, the worksheet and the course of treatment, and a status bar. It wires views, view-models and
 * {@link Actions} together and computes nothing itself.
 */
public final class MainWindow {
    /** Class-path style sheets (JavaFX resolves a scheme-less name through the class loader). */
    public static final String STYLESHEET = "org/stasissheet/ui/form.css";
    public static final String HIGH_CONTRAST = "org/stasissheet/ui/high-contrast.css";

    private final Stage stage;
    private final CaseSession session;
    private final Actions actions;
    private final Autosaver autosaver;
    private final DraftStore drafts;
    private final Background background;
    private final ObjectProperty<Preferences> preferences;
    private final BorderPane root = new BorderPane();
    private final FormSettings settings;
    private final Shell shell;
    private final LabLanding labLanding;
    private final PulmonarySuggestionView suggestion;
    private final CourseModel course;
    private final CourseView courseView;
    private final TabPane sideTabs = new TabPane();
    /** The demo case as read at the start, in the units the preferences start new entries in. */
    private final Optional<org.stasissheet.ui.entry.FormState> demo;
    private final UnitSystem demoUnits;

    private MainWindow(Stage stage, FormSettings settings, HeadStart.Read read) {
        this.stage = Objects.requireNonNull(stage, "stage");
        this.settings = Objects.requireNonNull(settings, "settings");
        this.demo = read.demo();
        this.demoUnits = read.preferences().units();
        PreferencesStore preferenceStore = new PreferencesStore(settings.dataFolder());
        preferences = new SimpleObjectProperty<>(this, "preferences", read.preferences());
        drafts = new DraftStore(settings.dataFolder());
        background = new Background();
        shell = settings.shell().apply(stage);

        EntryViewModel entry = new EntryViewModel(preferences.get().units());
        labLanding = new LabLanding(entry);
        RuleLoad first = read.rules();
        session = new CaseSession(entry, first.rules(), settings.recomputeDelay());
        course = new CourseModel(session);
        // a course's draft holds the whole course besides the form, so a crash loses neither; the pause restarts on
        // a typed edit and on a change of the course (a procedure added): a property, not a lazy binding, so every
        // change is heard
        IntegerProperty draftChanges = new SimpleIntegerProperty();
        entry.editsProperty().addListener(o -> draftChanges.set(draftChanges.get() + 1));
        course.changesProperty().addListener(o -> draftChanges.set(draftChanges.get() + 1));
        autosaver = new Autosaver(drafts, background, draftChanges,
                () -> course.active() ? course.draftJson() : session.caseJson(), settings.autosaveDelay(),
                settings.clock());
        actions = new Actions(session, shell, background, drafts, autosaver, preferenceStore, preferences,
                settings.rules(), settings.clock());
        actions.ruleFolderProperty().set(first.folder());
        actions.attachCourse(course);
        entry.unitSystemProperty().bind(Bindings.createObjectBinding(() -> preferences.get().units(), preferences));

        EntryView entryView = new EntryView(entry, settings.clock());
        SheetView sheetView = new SheetView(session.sheet());
        suggestion = new PulmonarySuggestionView(session.sheet(), entry.field("findings.pulmonaryGrade"));
        PulmonarySuggestionView.attachUnder(entryView.inputs(), "findings-pulmonaryGrade", suggestion.node());
        courseView = new CourseView(course);
        Tab sheetTab = new Tab("Worksheet", sheetView.node());
        // the course panel joins the window when its tab is first chosen: a tab behind another is styled and laid
        // out all the same, and the first screen shows the worksheet
        Tab courseTab = new Tab("Course of treatment");
        courseTab.setId("tab-course");
        courseTab.selectedProperty().addListener(new javafx.beans.InvalidationListener() {
            @Override
            public void invalidated(javafx.beans.Observable o) {
                if (courseTab.isSelected()) {
                    courseTab.selectedProperty().removeListener(this);
                    courseTab.setContent(courseView.node());
                }
            }
        });
        sideTabs.getTabs().addAll(sheetTab, courseTab);
        sideTabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        sideTabs.setId("side-tabs");
        sideTabs.setAccessibleText("Worksheet or course of treatment");
        SplitPane sides = new SplitPane(entryView.node(), sideTabs);
        sides.setOrientation(Orientation.HORIZONTAL);
        sides.setDividerPositions(0.42);

        Label caution = new Label("CAUTION: " + Cautions.SHORT);
        caution.setId("standing-caution");
        caution.getStyleClass().add("standing-caution");
        caution.setWrapText(true);
        caution.setMaxWidth(Double.MAX_VALUE);
        root.setTop(new VBox(menus(), caution));
        root.setCenter(sides);
        root.setBottom(statusBar());
        root.getStyleClass().add("form-root");

        javafx.geometry.Rectangle2D screen = javafx.stage.Screen.getPrimary().getVisualBounds();
        Scene scene = new Scene(root, Math.min(1280, screen.getWidth()), Math.min(860, screen.getHeight()));
        scene.getStylesheets().add(STYLESHEET);
        preferences.addListener((o, was, now) -> applyLook(scene, now));
        applyLook(scene, preferences.get());
        stage.setScene(scene);
        stage.titleProperty().bind(Bindings.createStringBinding(() -> "Stasis Sheet — " + (course.active()
                        ? "course " + course.documentName() : session.documentProperty().get()
                        .map(p -> p.getFileName().toString()).orElse("case not saved to a file"))
                        + (unsaved() ? " • unsaved changes" : ""),
                session.documentProperty(), session.dirtyProperty(), course.courseProperty(),
                course.documentProperty(), course.dirtyProperty()));
        stage.setOnCloseRequest(e -> {
            if (!actions.closeRequested()) {
                e.consume();
            } else {
                background.close();
            }
        });
        first.problem().ifPresent(lines -> shell.showProblems(
                "The local rule set was refused; the shipped rule set is in use", lines));
    }

    /**
     * Builds the window on {@code stage}, shows it, then offers a crashed session's draft or opens the demo case.
     */
    public static MainWindow open(Stage stage, FormSettings settings) {
        return open(stage, settings, Optional.empty());
    }

    /**
     * As {@link #open(Stage, FormSettings)}, then opens {@code file} (a case, a course or a worksheet PDF given on
     * the command line) instead of the demo case; after a restored draft it asks before replacing it.
     */
    public static MainWindow open(Stage stage, FormSettings settings, Optional<Path> file) {
        return open(stage, settings, file, HeadStart.now(settings));
    }

    /** As {@link #open(Stage, FormSettings, Optional)}, with the start-up files read ahead ({@link HeadStart}). */
    public static MainWindow open(Stage stage, FormSettings settings, Optional<Path> file, HeadStart head) {
        MainWindow w = new MainWindow(stage, settings, head.get());
        stage.setMinWidth(Math.min(900, javafx.stage.Screen.getPrimary().getVisualBounds().getWidth()));
        stage.setMinHeight(Math.min(600, javafx.stage.Screen.getPrimary().getVisualBounds().getHeight()));
        // Nothing to ask and no file to open: the demo case goes in before the window shows, so that the form and
        // its worksheet are styled and laid out in one pass. A draft to offer needs the window shown first.
        boolean demoFirst = file.isEmpty() && w.drafts.crashedDrafts().isEmpty();
        if (demoFirst) {
            w.loadDemo();
        }
        stage.show();
        if (demoFirst) {
            // loaded above
        } else if (w.actions.offerDraft()) {
            file.ifPresent(w.actions::openRecent);
        } else if (file.isPresent()) {
            w.actions.openFile(file.get());
        } else {
            w.loadDemo();
        }
        w.actions.markRunning();
        return w;
    }

    private void loadDemo() {
        UnitSystem units = preferences.get().units();
        // read ahead in the units the preferences had then; read again should they have changed since
        Optional<org.stasissheet.ui.entry.FormState> state = units == demoUnits ? demo
                : Samples.read(settings.demoSample()).flatMap(b -> FormJson.read(b, units));
        session.load(state.orElse(FormJson.blank(units)), Optional.empty());
    }

    public CaseSession session() {
        return session;
    }

    public Actions actions() {
        return actions;
    }

    public Autosaver autosaver() {
        return autosaver;
    }

    /** This window's draft files (one set per window, so two windows never share a draft). */
    public DraftStore drafts() {
        return drafts;
    }

    public Background background() {
        return background;
    }

    /** The course of treatment the form may hold. */
    public CourseModel course() {
        return course;
    }

    /** The course panel (charts and table). */
    public CourseView courseView() {
        return courseView;
    }

    /** Brings the course panel to the front. */
    public void showCourse() {
        sideTabs.getSelectionModel().select(1);
    }

    public ObjectProperty<Preferences> preferences() {
        return preferences;
    }

    /** Lands accepted lab imports in the form and undoes the last one. */
    public LabLanding labLanding() {
        return labLanding;
    }

    /** Opens the import window: paste or open a report, preview, answer, accept. */
    public LabImportWindow importLabs() {
        LabImportWindow w = new LabImportWindow(stage, near -> shell.chooseLabReport(near),
                labLanding::current, labLanding::land, stage.getScene().getStylesheets());
        w.show();
        return w;
    }

    public Stage stage() {
        return stage;
    }

    private static void applyLook(Scene scene, Preferences p) {
        scene.getStylesheets().remove(HIGH_CONTRAST);
        if (p.highContrast()) {
            scene.getStylesheets().add(HIGH_CONTRAST);
        }
        // Text scales from the system font size: every size in the style sheets is in em of this one.
        scene.getRoot().setStyle("-fx-font-size: " + (javafx.scene.text.Font.getDefault().getSize() * p.textScale())
                + "px;");
    }

    private MenuBar menus() {
        Menu file = new Menu("_Case");
        file.setId("menu-case");
        MenuItem newCase = item("_New case", "Shortcut+N", "action-new", actions::newCase);
        MenuItem open = item("_Open case, course or PDF…", "Shortcut+O", "action-open", actions::open);
        Menu recent = new Menu("Open _recent");
        recent.setId("menu-recent");
        recent.setOnShowing(e -> fillRecent(recent));
        fillRecent(recent);
        preferences.addListener((o, was, now) -> fillRecent(recent));
        Menu samples = new Menu("Open a _demo case");
        for (String name : Samples.NAMES) {
            samples.getItems().add(item(name, null, "sample-" + name.replace(".json", ""),
                    () -> actions.openSample(name)));
        }
        MenuItem save = item("_Save", "Shortcut+S", "action-save", actions::save);
        MenuItem saveAs = item("Save _as…", "Shortcut+Shift+S", "action-save-as", actions::saveAs);
        MenuItem quit = item("_Close window", "Shortcut+Q", "action-close", () -> {
            if (actions.closeRequested()) {
                background.close();
                stage.close();
            }
        });
        MenuItem importLabs = item("_Import lab results…", "Shortcut+I", "action-import-labs", this::importLabs);
        MenuItem undoLabs = item("_Undo the lab import", null, "action-undo-labs", labLanding::undo);
        undoLabs.disableProperty().bind(labLanding.canUndoProperty().not());
        file.getItems().addAll(newCase, open, recent, samples, new SeparatorMenuItem(), importLabs, undoLabs,
                new SeparatorMenuItem(), save, saveAs, new SeparatorMenuItem(), quit);

        Menu sheet = new Menu("_Worksheet");
        MenuItem export = item("_Export PDF…", "Shortcut+E", "action-export", actions::exportPdf);
        MenuItem note = item("Copy the _handoff note", "Shortcut+Shift+C", "action-copy-note",
                actions::copyHandoffNote);
        // Only a complete case makes a PDF or a note; the menu says why when it is not.
        for (MenuItem m : java.util.List.of(export, note)) {
            m.disableProperty().bind(Bindings.createBooleanBinding(
                    () -> session.completeWorksheetProperty().get().isEmpty(), session.completeWorksheetProperty()));
        }
        MenuItem why = new MenuItem("(fix the entries marked PROBLEM to export)");
        why.setDisable(true);
        why.visibleProperty().bind(export.disableProperty());
        sheet.getItems().addAll(export, note, why);

        Menu rules = new Menu("_Rules");
        MenuItem folder = item("Use a _local rule folder…", "Shortcut+L", "action-rule-folder",
                actions::chooseRuleFolder);
        MenuItem shipped = item("Use the _shipped rules", null, "action-shipped-rules", actions::useShippedRules);
        shipped.disableProperty().bind(Bindings.createBooleanBinding(() -> actions.ruleFolderProperty().get().isEmpty(),
                actions.ruleFolderProperty()));
        rules.getItems().addAll(folder, shipped);

        Menu view = new Menu("_Settings");
        ToggleGroup units = new ToggleGroup();
        for (UnitSystem u : UnitSystem.values()) {
            RadioMenuItem r = new RadioMenuItem("New entries in " + u.label());
            r.setId("units-" + u.name().toLowerCase(java.util.Locale.ROOT));
            r.setToggleGroup(units);
            r.setSelected(preferences.get().units() == u);
            r.setOnAction(e -> actions.updatePreferences(preferences.get().withUnits(u)));
            view.getItems().add(r);
        }
        CheckMenuItem contrast = new CheckMenuItem("_High contrast");
        contrast.setId("high-contrast");
        contrast.setAccelerator(KeyCombination.keyCombination("Shortcut+Shift+H"));
        contrast.setSelected(preferences.get().highContrast());
        contrast.setOnAction(e -> actions.updatePreferences(preferences.get().withHighContrast(contrast.isSelected())));
        MenuItem larger = item("_Larger text", "Shortcut+EQUALS", "text-larger",
                () -> actions.updatePreferences(preferences.get().withTextScale(preferences.get().textScale() + 0.1)));
        MenuItem smaller = item("S_maller text", "Shortcut+MINUS", "text-smaller",
                () -> actions.updatePreferences(preferences.get().withTextScale(preferences.get().textScale() - 0.1)));
        MenuItem normal = item("System text size", "Shortcut+DIGIT0", "text-normal",
                () -> actions.updatePreferences(preferences.get().withTextScale(1)));
        MenuItem assessor = item("_Assessor for new cases…", null, "action-assessor", actions::chooseAssessor);
        view.getItems().addAll(new SeparatorMenuItem(), contrast, larger, smaller, normal, new SeparatorMenuItem(),
                assessor);

        Menu register = new Menu("Re_gister");
        register.setId("menu-register");
        register.getItems().add(item("Open the referral _register…", "Shortcut+R", "action-register",
                () -> org.stasissheet.ui.register.RegisterLauncher.open(settings, background,
                        actions::report)));

        Menu courseMenu = new Menu("C_ourse");
        courseMenu.setId("menu-course");
        courseMenu.getItems().add(item("Show the _course of treatment", "Shortcut+U", "action-show-course",
                this::showCourse));
        MenuBar bar = new MenuBar(file, sheet, courseMenu, rules, register, view);
        bar.setId("menu-bar");
        return bar;
    }

    private void fillRecent(Menu recent) {
        recent.getItems().clear();
        for (Path p : preferences.get().recentFiles()) {
            MenuItem i = new MenuItem(p.getFileName() + "  —  " + p.toAbsolutePath().getParent());
            i.setMnemonicParsing(false);
            i.setOnAction(e -> actions.openRecent(p));
            recent.getItems().add(i);
        }
        if (recent.getItems().isEmpty()) {
            MenuItem none = new MenuItem("(none yet)");
            none.setDisable(true);
            recent.getItems().add(none);
        }
    }

    private static MenuItem item(String text, String accelerator, String id, Runnable action) {
        MenuItem i = new MenuItem(text);
        i.setId(id);
        if (accelerator != null) {
            i.setAccelerator(KeyCombination.keyCombination(accelerator));
        }
        i.setOnAction(e -> action.run());
        return i;
    }

    /** Whether the document the window holds (the course, or else the case) has unsaved changes. */
    private boolean unsaved() {
        return course.active() ? course.dirtyProperty().get() : session.dirtyProperty().get();
    }

    private HBox statusBar() {
        Label saved = new Label();
        saved.setId("autosave-status");
        saved.textProperty().bind(autosaver.statusProperty());
        Label dirty = new Label();
        dirty.setId("dirty-status");
        dirty.textProperty().bind(Bindings.createStringBinding(() -> unsaved() ? "UNSAVED CHANGES" : "saved",
                session.dirtyProperty(), course.courseProperty(), course.dirtyProperty()));
        Label message = new Label();
        message.setId("action-status");
        message.textProperty().bind(actions.statusProperty());
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox bar = new HBox(14, message, gap, saved, dirty);
        bar.getStyleClass().add("status-bar");
        return bar;
    }
}
