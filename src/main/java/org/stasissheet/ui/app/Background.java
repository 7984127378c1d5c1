package org.stasissheet.ui.app;

import java.util.Objects;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Consumer;
import javafx.application.Platform;

/**
 * The one background thread of the form: file reads and writes, PDF rendering. Jobs run one after another in the
 * order given, so an autosave never races a save. Results and errors come back on the JavaFX thread.
 *
 * <p>After {@link #close()} new jobs are ignored, not refused with an exception: at shutdown a pending autosave or
 * render may still ask for the thread, and the draft is saved by the shutdown path itself ({@link ShutdownGuard}).
 * A result that arrives after the toolkit has stopped is dropped quietly.
 */
public final class Background implements AutoCloseable {
    private final ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "stasis-background");
        t.setDaemon(true);
        return t;
    });
    private volatile boolean closed;

    /** Runs {@code job} off the JavaFX thread; hands its result or its failure to the JavaFX thread. */
    public <T> void run(Callable<T> job, Consumer<T> onDone, Consumer<Exception> onFailure) {
        Objects.requireNonNull(job, "job");
        Objects.requireNonNull(onDone, "onDone");
        Objects.requireNonNull(onFailure, "onFailure");
        if (closed) {
            return;
        }
        try {
            executor.submit(() -> {
                try {
                    T result = job.call();
                    later(() -> onDone.accept(result));
                } catch (Exception e) {
                    later(() -> onFailure.accept(e));
                }
                return null;
            });
        } catch (RejectedExecutionException e) {
            // closed between the check and the submit: ignored like any job after close
        }
    }

    private static void later(Runnable r) {
        try {
            Platform.runLater(r);
        } catch (IllegalStateException e) {
            // the toolkit has stopped (shutdown): nobody is left to show the result
        }
    }

    /** True once {@link #close()} was called: new jobs are ignored. */
    public boolean isClosed() {
        return closed;
    }

    /**
     * Waits until every job given so far has finished: at close, so that nothing is lost half-written.
     *
     * @return false when the wait timed out
     */
    public boolean drain(long timeout, TimeUnit unit) {
        if (closed) {
            try {
                return executor.awaitTermination(timeout, unit);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return false;
            }
        }
        Future<?> marker;
        try {
            marker = executor.submit(() -> { });
        } catch (RejectedExecutionException e) {
            return drain(timeout, unit);
        }
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

    /** Lets the jobs already given finish, and ignores new ones. */
    @Override
    public void close() {
        closed = true;
        executor.shutdown();
    }
}
