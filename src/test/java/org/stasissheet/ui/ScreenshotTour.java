package org.stasissheet.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.List;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.application.Application;
import javafx.scene.Node;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TitledPane;
import javafx.stage.Stage;
import org.stasissheet.ui.app.FormSettings;
import org.stasissheet.ui.app.MainWindow;
import org.stasissheet.load.Inputs;

/**
 * Walks the form through the views shown in the README's screenshots, printing {@code STEP n name} before each
 * pause so a script can take the picture (see {@code src/site/screenshots.sh}). Runs on a real or virtual display
 * with a throw-away data folder; not a test.
 */
public final class ScreenshotTour extends Application {
    static final double PAUSE_SECONDS = 8;

    /** The entry point lives outside the Application class, so the launcher does not ask for JavaFX modules. */
    public static final class Run {
        private Run() {
        }

        public static void main(String[] args) {
            launch(ScreenshotTour.class, args);
        }
    }

    @Override
    public void start(Stage stage) throws Exception {
        Path data = Files.createTempDirectory("stasis-tour");
        ScriptedShell shell = new ScriptedShell();
        FormSettings settings = new FormSettings(data, s -> shell, Clock.systemDefaultZone(), Duration.ofSeconds(2),
                Duration.ofMillis(120), Inputs::ruleSet, FormSettings.DEFAULT_SAMPLE);
        MainWindow w = MainWindow.open(stage, settings);
        stage.setX(0);
        stage.setY(0);
        stage.setWidth(javafx.stage.Screen.getPrimary().getVisualBounds().getWidth());
        stage.setHeight(javafx.stage.Screen.getPrimary().getVisualBounds().getHeight());
        List<Runnable> steps = List.of(
                () -> step(1, "overview"),
                () -> {
                    scrollSheetTo(stage, "flow-section");
                    step(2, "flow-chart");
                },
                () -> {
                    scrollSheetTo(stage, "exchange-table");
                    step(3, "apheresis");
                },
                () -> {
                    w.session().entry().field("labs.wbc").textProperty().set("150000");
                    w.session().recomputeNow();
                    scrollEntryTo(stage, "labs-wbc");
                    scrollSheetTo(stage, "rule-set-badge");
                    step(4, "implausible-wbc");
                },
                () -> {
                    shell.unsavedAnswers.push(org.stasissheet.ui.app.Shell.UnsavedChoice.DISCARD);
                    w.actions().openSample("aml-breathless.json");
                    w.preferences().set(w.preferences().get().withHighContrast(true));
                    scrollEntryTo(stage, "section-patient");
                    scrollSheetTo(stage, "rule-set-badge");
                    step(5, "high-contrast");
                },
                () -> {
                    w.preferences().set(w.preferences().get().withHighContrast(false));
                    shell.unsavedAnswers.push(org.stasissheet.ui.app.Shell.UnsavedChoice.DISCARD);
                    w.actions().openFile(Path.of("samples", "courses", "igm-exchange-series.json"));
                    w.showCourse();
                },
                () -> {
                    scrollTo(stage.getScene().lookup("#course-charts"));
                    step(6, "course");
                },
                () -> {
                    System.out.println("DONE");
                    System.out.flush();
                    w.preferences().set(w.preferences().get().withHighContrast(false));
                    javafx.application.Platform.exit();
                });
        Timeline t = new Timeline();
        for (int i = 0; i < steps.size(); i++) {
            Runnable r = steps.get(i);
            t.getKeyFrames().add(new KeyFrame(javafx.util.Duration.seconds(2 + i * PAUSE_SECONDS), e -> r.run()));
        }
        t.play();
    }

    private static void step(int n, String name) {
        System.out.println("STEP " + n + " " + name);
        System.out.flush();
    }

    private static void scrollSheetTo(Stage stage, String id) {
        scrollTo(stage.getScene().lookup("#" + id));
    }

    private static void scrollEntryTo(Stage stage, String id) {
        Node n = stage.getScene().lookup("#" + id);
        for (Node p = n.getParent(); p != null; p = p.getParent()) {
            if (p instanceof TitledPane t) {
                t.setExpanded(true);
            }
        }
        scrollTo(n);
    }

    private static void scrollTo(Node node) {
        Node n = node;
        while (n != null && !(n instanceof ScrollPane)) {
            n = n.getParent();
        }
        if (n instanceof ScrollPane pane) {
            pane.layout();
            Node content = pane.getContent();
            double y = content.sceneToLocal(node.localToScene(0, 0)).getY();
            double extra = content.getBoundsInLocal().getHeight() - pane.getViewportBounds().getHeight();
            pane.setVvalue(extra > 0 ? Math.max(0, Math.min(1, (y - 10) / extra)) : 0);
        }
    }
}
