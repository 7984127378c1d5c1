package org.stasissheet.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.Arrays;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.stasissheet.load.Inputs;
import org.stasissheet.ui.app.FormSettings;
import org.stasissheet.ui.app.MainWindow;
import org.stasissheet.ui.entry.FieldModel;

/**
 * Benchmark, not a test: how long from an edit (a new serum viscosity in its field) to an updated, laid-out
 * worksheet. Each round, on the JavaFX thread, sets the field and recomputes at once (the form otherwise waits a
 * 120 ms pause after the last keystroke, so a burst of typing is computed once); then the next pulse does what
 * it does for every change: the CSS of the nodes that changed, and layout. The figure is the sum of the two
 * pieces of work (edit and recompute, plus the pulse from its pre-layout to its post-layout listener), so the
 * wait for the pulse timer (up to one 60 Hz frame) is not counted; it is printed apart, as the time from the
 * edit to the end of that pulse.
 *
 * <p>An earlier version called {@code root.applyCss()} on the whole scene each round; that forces every node's
 * styles to be recomputed, which no real pulse does, and it measured that forced pass more than the edit.
 *
 * <p>Prints the median and the 95th percentile over many edits, after a warm-up. Run it with
 * {@code src/bench/edit-latency.sh} (headless) or from an IDE.
 */
public final class EditLatencyBench {
    static final int WARM_UP = 200;
    static final int MEASURED = 1000;

    /** Times of the round in flight, written and read on the JavaFX thread only. */
    private static long preLayout;
    private static CompletableFuture<long[]> inFlight;
    private static long editStart;
    private static long editEnd;

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
        Platform.runLater(() -> {
            MainWindow w = MainWindow.open(new Stage(), settings);
            Scene scene = w.stage().getScene();
            scene.addPreLayoutPulseListener(() -> preLayout = System.nanoTime());
            scene.addPostLayoutPulseListener(() -> {
                CompletableFuture<long[]> round = inFlight;
                if (round != null) {
                    long now = System.nanoTime();
                    inFlight = null;
                    round.complete(new long[] {(editEnd - editStart) + (now - preLayout), editEnd - editStart,
                            now - preLayout, now - editStart});
                }
            });
            window.complete(w);
        });
        MainWindow w = window.get(30, TimeUnit.SECONDS);

        long[] work = new long[measured];
        long[] recompute = new long[measured];
        long[] pulse = new long[measured];
        long[] wall = new long[measured];
        for (int i = 0; i < WARM_UP + measured; i++) {
            String value = String.valueOf(1.5 + (i % 60) * 0.1).substring(0, 3);
            int index = i - WARM_UP;
            CompletableFuture<long[]> round = new CompletableFuture<>();
            Platform.runLater(() -> {
                FieldModel sv = w.session().entry().field("labs.serumViscosity");
                editStart = System.nanoTime();
                sv.textProperty().set(value);
                w.session().recomputeNow();
                editEnd = System.nanoTime();
                inFlight = round;
                Platform.requestNextPulse();
            });
            long[] took = round.get(30, TimeUnit.SECONDS);
            if (index >= 0) {
                work[index] = took[0];
                recompute[index] = took[1];
                pulse[index] = took[2];
                wall[index] = took[3];
            }
        }
        for (long[] a : new long[][] {work, recompute, pulse, wall}) {
            Arrays.sort(a);
        }
        System.out.println("edit -> worksheet updated and laid out, " + measured + " edits after " + WARM_UP
                + " warm-up (plus the 120 ms typing pause in normal use):");
        System.out.println("  median " + millis(work[measured / 2]) + " ms");
        System.out.println("  p95    " + millis(work[p95(measured)]) + " ms");
        System.out.println("  max    " + millis(work[measured - 1]) + " ms");
        System.out.println("  of which (medians): edit and recompute " + millis(recompute[measured / 2])
                + " ms, the pulse's CSS and layout " + millis(pulse[measured / 2]) + " ms");
        System.out.println("  edit -> end of the pulse, waiting for the pulse timer included: median "
                + millis(wall[measured / 2]) + " ms, p95 " + millis(wall[p95(measured)]) + " ms");
        Platform.runLater(() -> w.stage().hide());
        Platform.exit();
        System.exit(0);
    }

    private static int p95(int n) {
        return (int) Math.ceil(n * 0.95) - 1;
    }

    private static String millis(long nanos) {
        return org.stasissheet.measure.Numbers.rounded(nanos / 1e6, 3);
    }
}
