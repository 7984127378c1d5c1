package org.stasissheet.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.Arrays;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.stasissheet.ui.app.FormSettings;
import org.stasissheet.ui.app.MainWindow;
import org.stasissheet.load.Inputs;
import org.stasissheet.ui.entry.FieldModel;

/**
 * Benchmark, not a test: how long from an edit (a new serum viscosity in its field) to an updated, laid-out
 * worksheet. Each round sets the field, recomputes at once (the form otherwise waits a 120 ms pause after the
 * last keystroke, so a burst of typing is computed once) and lays the scene out, on the JavaFX thread.
 * Prints the median and the 95th percentile over many edits, after a warm-up. Run it with
 * {@code src/bench/edit-latency.sh} (headless) or from an IDE.
 */
public final class EditLatencyBench {
    static final int WARM_UP = 200;
    static final int MEASURED = 1000;

    public static void main(String[] args) throws Exception {
        int measured = args.length > 0 ? Integer.parseInt(args[0]) : MEASURED;
        CompletableFuture<Void> started = new CompletableFuture<>();
        Platform.startup(() -> started.complete(null));
        started.get(30, TimeUnit.SECONDS);
        Path data = Files.createTempDirectory("stasis-bench");
        ScriptedShell shell = new ScriptedShell();
        FormSettings settings = new FormSettings(data, s -> shell, Clock.systemUTC(), Duration.ofSeconds(2),
                Duration.ofMillis(120), Inputs::ruleSet, FormSettings.DEFAULT_SAMPLE);
        CompletableFuture<MainWindow> window = new CompletableFuture<>();
        Platform.runLater(() -> window.complete(MainWindow.open(new Stage(), settings)));
        MainWindow w = window.get(30, TimeUnit.SECONDS);

        long[] nanos = new long[measured];
        for (int i = 0; i < WARM_UP + measured; i++) {
            String value = String.valueOf(1.5 + (i % 60) * 0.1).substring(0, 3);
            int index = i - WARM_UP;
            CompletableFuture<Long> round = new CompletableFuture<>();
            Platform.runLater(() -> {
                FieldModel sv = w.session().entry().field("labs.serumViscosity");
                long t0 = System.nanoTime();
                sv.textProperty().set(value);
                w.session().recomputeNow();
                w.stage().getScene().getRoot().applyCss();
                w.stage().getScene().getRoot().layout();
                round.complete(System.nanoTime() - t0);
            });
            long took = round.get(30, TimeUnit.SECONDS);
            if (index >= 0) {
                nanos[index] = took;
            }
        }
        Arrays.sort(nanos);
        System.out.println("edit -> worksheet updated and laid out, " + measured + " edits after " + WARM_UP
                + " warm-up (plus the 120 ms typing pause in normal use):");
        System.out.println("  median " + millis(nanos[measured / 2]) + " ms");
        System.out.println("  p95    " + millis(nanos[(int) Math.ceil(measured * 0.95) - 1]) + " ms");
        System.out.println("  max    " + millis(nanos[measured - 1]) + " ms");
        Platform.runLater(() -> w.stage().hide());
        Platform.exit();
        System.exit(0);
    }

    private static String millis(long nanos) {
        return org.stasissheet.measure.Numbers.rounded(nanos / 1e6, 3);
    }
}
