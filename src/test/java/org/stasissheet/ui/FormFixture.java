package org.stasissheet.ui;

import java.nio.file.Path;
import javafx.scene.Node;
import javafx.stage.Stage;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.ui.app.MainWindow;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;

/**
 * What most form tests start from: a fresh window on an empty data folder of its own, with a scripted shell that
 * answers dialogs and file choosers as each test says. TestFX (4.0.18) looks for {@code @Start} only among a test
 * class's own methods, so each test class keeps a two-line {@code @Start} that calls {@link #open}.
 */
@ExtendWith(ApplicationExtension.class)
public abstract class FormFixture {
    /** This test's data folder alone: preferences, drafts and the recent list start empty. */
    @TempDir
    protected Path data;

    protected final ScriptedShell shell = new ScriptedShell();

    protected MainWindow window;

    /** The node with this id ({@code #id}) in the form. */
    protected static <T extends Node> T node(FxRobot robot, String id) {
        return robot.lookup("#" + id).query();
    }

    /** Opens the form in the stage TestFX hands to the test class's {@code @Start}. */
    protected final void open(Stage stage) {
        window = MainWindow.open(stage, FormHarness.settings(data, shell));
    }
}
