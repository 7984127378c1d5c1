package org.stasissheet.ui.app;

import java.io.IOException;
import java.time.Duration;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicBoolean;
import javafx.application.Platform;

/**
 * Saves the draft when the process is told to stop without the window being closed: SIGTERM at logout or from
 * {@code kill}, an IDE's stop button, or (when asked to, for {@code mvn javafx:run}) the end of the parent process.
 *
 * <p>What it does, once: takes the form's case JSON on the JavaFX thread (waiting at most {@link #DEFAULT_WAIT}; if the
 * JavaFX thread does not answer, the last autosave stays as it is), then writes the draft on its own thread, there
 * and then, through {@link org.stasissheet.ui.draft.DraftStore#saveDraft} (atomic). A form with unsaved changes keeps
 * its draft, so the next start offers it; a form with nothing unsaved ends its session cleanly. It prints nothing:
 * at shutdown nobody reads a terminal, and a stack trace would only alarm. A window closed the normal way removes
 * the hook, because the close has already dealt with the draft.
 */
public final class ShutdownGuard {
    /** How long the shutdown path waits for the JavaFX thread to hand over the form (a few frames' work). */
    public static final Duration DEFAULT_WAIT = Duration.ofSeconds(2);
    /** System property that makes the form stop with its parent process (set by the javafx:run configuration). */
    public static final String EXIT_WITH_PARENT = "stasis.exitWithParent";

    private final MainWindow window;
    private final Duration wait;
    private final AtomicBoolean done = new AtomicBoolean();
    private final Thread hook;

    ShutdownGuard(MainWindow window, Duration wait) {
        this.window = Objects.requireNonNull(window, "window");
        this.wait = Objects.requireNonNull(wait, "wait");
        this.hook = new Thread(this::saveDraft, "stasis-shutdown");
    }

    /**
     * Registers the shutdown hook for this window (and, when {@link #EXIT_WITH_PARENT} is set, ends the process
     * when the parent process ends); removes the hook when the window closes the normal way.
     */
    public static ShutdownGuard install(MainWindow window) {
        ShutdownGuard g = new ShutdownGuard(window, DEFAULT_WAIT);
        Runtime.getRuntime().addShutdownHook(g.hook);
        window.stage().addEventHandler(javafx.stage.WindowEvent.WINDOW_HIDDEN, e -> g.closedNormally());
        if (Boolean.getBoolean(EXIT_WITH_PARENT)) {
            ProcessHandle.current().parent().ifPresent(parent -> parent.onExit().thenRun(() -> {
                g.saveDraft();
                System.exit(0);
            }));
        }
        return g;
    }

    /** The window was closed through its close request (or the process is ending): the hook is not needed. */
    private void closedNormally() {
        if (!window.background().isClosed()) {
            return; // hidden without the close request (a crash in a test): leave the hook to the process end
        }
        done.set(true);
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException e) {
            // the process is already shutting down
        }
    }

    /**
     * The shutdown path: the form's case JSON from the JavaFX thread (bounded wait), written as the draft there and
     * then; or, with nothing unsaved, the session ended cleanly. Runs once; never throws, never prints.
     *
     * @return true when a draft was written or the session ended cleanly
     */
    public boolean saveDraft() {
        if (!done.compareAndSet(false, true)) {
            return false;
        }
        try {
            Optional<Snapshot> snapshot = snapshot();
            if (snapshot.isEmpty()) {
                return false; // the JavaFX thread did not answer: the last autosave stands
            }
            // jobs already given (an autosave, a render) may finish within the wait; new ones are ignored
            window.background().drain(wait.toMillis(), TimeUnit.MILLISECONDS);
            if (snapshot.get().dirty()) {
                window.drafts().saveDraft(snapshot.get().caseJson());
            } else {
                window.drafts().endCleanly();
            }
            return true;
        } catch (IOException | RuntimeException e) {
            return false; // nothing more can be done at this point; the last autosave stands
        }
    }

    private record Snapshot(byte[] caseJson, boolean dirty) {
    }

    private Optional<Snapshot> snapshot() {
        CompletableFuture<Snapshot> taken = new CompletableFuture<>();
        Runnable take = () -> {
            try {
                window.autosaver().cancel(); // the write happens here, not on the background thread
                window.background().close();
                taken.complete(new Snapshot(window.session().caseJson(), window.session().dirtyProperty().get()));
            } catch (RuntimeException e) {
                taken.completeExceptionally(e);
            }
        };
        if (Platform.isFxApplicationThread()) {
            take.run();
        } else {
            try {
                Platform.runLater(take);
            } catch (IllegalStateException e) {
                return Optional.empty(); // the toolkit has already stopped
            }
        }
        try {
            return Optional.of(taken.get(wait.toMillis(), TimeUnit.MILLISECONDS));
        } catch (TimeoutException | ExecutionException e) {
            return Optional.empty();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Optional.empty();
        }
    }
}
