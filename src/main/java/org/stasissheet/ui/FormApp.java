package org.stasissheet.ui;

import java.time.Clock;
import javafx.application.Application;
import javafx.stage.Stage;
import org.stasissheet.ui.app.CaseSession;
import org.stasissheet.files.DataFolder;
import org.stasissheet.ui.app.FormSettings;
import org.stasissheet.ui.app.FxShell;
import org.stasissheet.ui.app.HeadStart;
import org.stasissheet.ui.app.MainWindow;
import org.stasissheet.ui.app.ShutdownGuard;
import org.stasissheet.load.Inputs;
import org.stasissheet.ui.draft.Autosaver;

/**
 * The desktop form's JavaFX application. {@link org.stasissheet.Main} calls {@link #open} by name when started
 * without arguments or with one file to open, so the command line never loads JavaFX.
 */
public final class FormApp extends Application {
    /** Starts the toolkit and opens the form window; returns when the last window has closed. */
    public static void open(String[] args) {
        // the preferences, the rule set and the demo case need no toolkit: they are read while JavaFX starts
        headStart = HeadStart.begin(userSettings());
        Application.launch(FormApp.class, args);
    }

    /** Read ahead by {@link #open}; a start through {@code Application.launch} alone reads them in {@link #start}. */
    private static volatile HeadStart headStart;

    /** The settings of a real session: the user's data folder, the desktop's dialogs, the system clock. */
    public static FormSettings userSettings() {
        return new FormSettings(DataFolder.resolve(), FxShell::new, Clock.systemDefaultZone(),
                Autosaver.DEFAULT_DELAY, CaseSession.DEFAULT_RECOMPUTE_DELAY, Inputs::ruleSet,
                FormSettings.DEFAULT_SAMPLE);
    }

    @Override
    public void start(Stage stage) {
        // one argument is a file to open (Main has checked that it exists); none opens the demo case
        java.util.Optional<java.nio.file.Path> file = getParameters().getRaw().stream().findFirst()
                .map(java.nio.file.Path::of);
        // SIGTERM (logout, kill) saves the draft instead of losing the last edits
        FormSettings settings = userSettings();
        HeadStart head = headStart;
        headStart = null;
        ShutdownGuard.install(head == null ? MainWindow.open(stage, settings, file)
                : MainWindow.open(stage, settings, file, head));
    }
}
