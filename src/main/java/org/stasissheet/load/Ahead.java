package org.stasissheet.load;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import java.util.function.Supplier;

/**
 * Work started on a thread of its own so that it overlaps what the caller does next; {@link #get()} waits for it
 * and gives its result, or throws what it threw, as if it had run in the caller's place. A cold command reads its
 * case while the rule set loads (and a {@code pdf} while its fonts are parsed): on two cores that takes some 30 ms
 * off each run (src/bench/RESULTS.md). The thread is a daemon: work nobody waits for never holds the program open.
 */
public final class Ahead<T> implements Supplier<T> {
    private final FutureTask<T> task;

    private Ahead(FutureTask<T> task) {
        this.task = task;
    }

    /** Starts {@code work} now on a daemon thread named {@code stasis-<name>}. */
    public static <T> Ahead<T> start(String name, Callable<T> work) {
        FutureTask<T> task = new FutureTask<>(work);
        Thread thread = new Thread(task, "stasis-" + name);
        thread.setDaemon(true);
        thread.start();
        return new Ahead<>(task);
    }

    /** Does {@code work} here and now; {@link #get()} then gives its result or throws its failure, as for {@link #start}. */
    public static <T> Ahead<T> now(Callable<T> work) {
        FutureTask<T> task = new FutureTask<>(work);
        task.run();
        return new Ahead<>(task);
    }

    /** The result, once the work is done; an unchecked exception or error of the work is thrown as it was. */
    @Override
    public T get() {
        boolean interrupted = false;
        try {
            while (true) {
                try {
                    return task.get();
                } catch (InterruptedException e) {
                    interrupted = true; // the work's outcome is still wanted: wait on, and keep the interrupt
                }
            }
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause.getMessage(), cause);
        } finally {
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
