package org.stasissheet.ui.app;

import java.util.Objects;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Consumer;
import javafx.application.Platform;

/**
 * The one background thread of the form: file reads and writes, PDF rendering. Jobs run one after another in the
 * order given, so an autosave never races a save. Results and errors come back on the JavaFX thread.
 */
public final class Background implements AutoCloseable {
    private final ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "stasis-background");
        t.setDaemon(true);
        return t;
    });

    /** Runs {@code job} off the JavaFX thread; hands its result or its failure to the JavaFX thread. */
    public <T> void run(Callable<T> job, Consumer<T> onDone, Consumer<Exception> onFailure) {
        Objects.requireNonNull(job, "job");
        Objects.requireNonNull(onDone, "onDone");
        Objects.requireNonNull(onFailure, "onFailure");
        executor.submit(() -> {
            try {
                T result = job.call();
                Platform.runLater(() -> onDone.accept(result));
            } catch (Exception e) {
                Platform.runLater(() -> onFailure.accept(e));
            }
            return null;
        });
    }

    /**
     * Waits until every job given so far has finished: at close, so that nothing is lost half-written.
     *
     * @return false when the wait timed out
     */
    public boolean drain(long timeout, TimeUnit unit) {
        Future<?> marker = executor.submit(() -> { });
        try {
            marker.get(timeout, unit);
            return true;
        } catch (TimeoutException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        } catch (java.util.concurrent.ExecutionException e) {
            return true;
        }
    }

    @Override
    public void close() {
        executor.shutdown();
    }
}
