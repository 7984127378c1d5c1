package org.stasissheet.ui;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import javafx.stage.Stage;
import org.stasissheet.ui.app.FormSettings;
import org.stasissheet.ui.app.MainWindow;
import org.testfx.util.WaitForAsyncUtils;

/** Builds form windows for TestFX tests: a temporary data folder, a scripted shell, a fixed clock. */
public final class FormHarness {
    /** 2026-03-05 02:40 at +01:00: the demo cases' night. */
    public static final Clock CLOCK = Clock.fixed(Instant.parse("2026-03-05T01:40:00Z"), ZoneOffset.ofHours(1));

    private FormHarness() {
    }

    public static FormSettings settings(Path dataFolder, ScriptedShell shell) {
        return new FormSettings(dataFolder, stage -> shell, CLOCK, Duration.ofMillis(150), Duration.ofMillis(30),
                org.stasissheet.load.Inputs::ruleSet, FormSettings.DEFAULT_SAMPLE);
    }

    /** Opens a window on a fresh stage, on the JavaFX thread, and waits until it is up. */
    public static MainWindow open(FormSettings settings) throws Exception {
        return WaitForAsyncUtils.asyncFx(() -> MainWindow.open(new Stage(), settings)).get(20, TimeUnit.SECONDS);
    }

    /** Runs on the JavaFX thread and waits for it. */
    public static void fx(Runnable r) throws Exception {
        WaitForAsyncUtils.asyncFx(r).get(20, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Waits for background work and the JavaFX events it posts. */
    public static void settle(MainWindow w) {
        WaitForAsyncUtils.waitForFxEvents();
        w.background().drain(20, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitForFxEvents();
    }

    public static void waitUntil(BooleanSupplier condition) throws Exception {
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, condition::getAsBoolean);
        WaitForAsyncUtils.waitForFxEvents();
    }

    /**
     * Closes without the close request: what a crash leaves behind (no clean end, draft on disk, and the session
     * lock let go, as the operating system does for a process that ends).
     */
    public static void crash(MainWindow w) throws Exception {
        fx(() -> w.stage().hide());
        w.background().close();
        w.drafts().abandon();
    }

    /** Scrolls the enclosing scroll pane so that the node is on screen (before the robot clicks it). */
    public static void scrollTo(javafx.scene.Node node) throws Exception {
        fx(() -> {
            javafx.scene.Node n = node;
            while (n != null && !(n instanceof javafx.scene.control.ScrollPane)) {
                n = n.getParent();
            }
            if (n instanceof javafx.scene.control.ScrollPane pane) {
                javafx.scene.Node content = pane.getContent();
                double y = content.sceneToLocal(node.localToScene(0, 0)).getY();
                double extra = content.getBoundsInLocal().getHeight() - pane.getViewportBounds().getHeight();
                if (extra > 0) {
                    pane.setVvalue(Math.max(0, Math.min(1, (y - 40) / extra)));
                }
                pane.layout();
            }
        });
    }
}
