package org.stasissheet.ui.app;

import java.io.IOException;
import java.time.Duration;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import javafx.application.Platform;
import org.stasissheet.ui.entry.EntryViewModel;
import org.stasissheet.ui.entry.FormJson;
import org.stasissheet.ui.entry.FormState;

/**
 * Saves the draft when the process is told to stop without the window being closed: SIGTERM at logout or from
 * {@code kill}, SIGINT, SIGHUP, an IDE's stop button, or (when asked to, for {@code mvn javafx:run}) the end of the
 * parent process; and stops the form in order, without a stack trace.
 *
 * <p>What it does, once: stops the background thread taking new work, lets the jobs in flight finish for at most
 * {@link #DEFAULT_WAIT}, then writes the draft on its own thread, there and then, through
 * {@link org.stasissheet.ui.draft.DraftStore#saveDraft} (atomic). It does not ask the JavaFX thread for the form:
 * at SIGTERM the toolkit's own shutdown hook stops that thread at the same moment (the first version waited for it
 * and saved nothing). Instead the form's text is recorded on the JavaFX thread after every edit (a copy of the
 * fields' strings, microseconds) and turned into case JSON at shutdown. A form that differs from what was last
 * saved or opened keeps its draft, so the next start offers it; a form identical to it ends its session cleanly.
 * It prints nothing: at shutdown nobody reads a terminal, and a stack trace would only alarm. A window closed the
 * normal way removes the hook, because the close has already dealt with the draft.
 */
public final class ShutdownGuard {
    /** How long the shutdown path lets background jobs in flight finish before it writes the draft. */
    public static final Duration DEFAULT_WAIT = Duration.ofSeconds(2);
    /** System property that makes the form stop with its parent process (set by the javafx:run configuration). */
    public static final String EXIT_WITH_PARENT = "stasis.exitWithParent";

    private final MainWindow window;
    private final Duration wait;
    private final AtomicBoolean done = new AtomicBoolean();
    private final Thread hook;
    /** The form's text after the last edit, recorded on the JavaFX thread. */
    private final AtomicReference<FormState> latest = new AtomicReference<>();
    /** The form's text when it last had no unsaved changes; empty while it has some. */
    private final AtomicReference<Optional<FormState>> clean = new AtomicReference<>(Optional.empty());
    /**
     * While the form holds a course: the course draft as the autosave would write it (the course, which assessment
     * the form shows and the form as typed), recorded after each change; a case draft would replace it and lose
     * the course. Empty without a course.
     */
    private final AtomicReference<Optional<byte[]>> courseDraft = new AtomicReference<>(Optional.empty());
    private final AtomicBoolean courseUnsaved = new AtomicBoolean();

    /** Call on the JavaFX thread: it starts recording the form's text. */
    ShutdownGuard(MainWindow window, Duration wait) {
        this.window = Objects.requireNonNull(window, "window");
        this.wait = Objects.requireNonNull(wait, "wait");
        this.hook = new Thread(this::saveDraft, "stasis-shutdown");
        EntryViewModel entry = window.session().entry();
        latest.set(entry.snapshot());
        markClean(entry);
        // an edit only moves "latest": the unsaved-changes flag follows a moment later, so it is not trusted here
        entry.editsProperty().addListener(o -> {
            latest.set(entry.snapshot());
            recordCourse();
        });
        window.session().dirtyProperty().addListener(o -> markClean(entry));
        window.course().changesProperty().addListener(o -> recordCourse());
        window.course().dirtyProperty().addListener(o -> recordCourse());
        recordCourse();
    }

    private void recordCourse() {
        boolean active = window.course().active();
        courseDraft.set(active ? Optional.of(window.course().draftJson()) : Optional.empty());
        courseUnsaved.set(active && window.course().dirtyProperty().get());
    }

    private void markClean(EntryViewModel entry) {
        clean.set(window.session().dirtyProperty().get() ? Optional.empty() : Optional.of(entry.snapshot()));
    }

    /**
     * Call on the JavaFX thread. Registers the shutdown hook and the signal handlers for this window (and, when
     * {@link #EXIT_WITH_PARENT} is set, stops the form when the parent process ends); removes the hook when the
     * window closes the normal way.
     */
    public static ShutdownGuard install(MainWindow window) {
        ShutdownGuard g = new ShutdownGuard(window, DEFAULT_WAIT);
        Runtime.getRuntime().addShutdownHook(g.hook);
        g.handleSignals(Thread.currentThread());
        window.stage().addEventHandler(javafx.stage.WindowEvent.WINDOW_HIDDEN, e -> g.closedNormally());
        if (Boolean.getBoolean(EXIT_WITH_PARENT)) {
            Thread fx = Thread.currentThread();
            ProcessHandle.current().parent().ifPresent(parent -> parent.onExit()
                    .thenRun(() -> g.stopInOrder(fx, 0)));
        }
        return g;
    }

    /**
     * SIGTERM (logout, {@code kill}), SIGINT (Ctrl+C) and SIGHUP (the terminal closed) stop the form in order: the
     * draft is saved, the toolkit is stopped, then the process ends. Left to the JVM's default, the toolkit's own
     * shutdown hook stops its render thread while the JavaFX thread may still draw a frame, and JavaFX prints that
     * frame's RejectedExecutionException with a stack trace. A signal the platform does not know (SIGHUP on Windows)
     * keeps the default, and the shutdown hook still saves the draft.
     */
    private void handleSignals(Thread fxThread) {
        for (String name : List.of("TERM", "INT", "HUP")) {
            try {
                sun.misc.Signal.handle(new sun.misc.Signal(name), signal -> stopInOrder(fxThread,
                        128 + signal.getNumber()));
            } catch (IllegalArgumentException e) {
                // not a signal of this platform, or one the JVM keeps for itself
            }
        }
    }

    /** Saves the draft, stops the toolkit, waits (bounded) for the JavaFX thread to finish, ends the process. */
    private void stopInOrder(Thread fxThread, int status) {
        saveDraft();
        try {
            Platform.exit();
            fxThread.join(wait.toMillis());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (RuntimeException e) {
            // the toolkit is already down
        }
        System.exit(status);
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
     * The shutdown path: new background work refused quietly, jobs in flight given the bounded wait, then the
     * recorded form written as the draft there and then; or, with nothing unsaved, the session ended cleanly. Runs
     * once; may be called from any thread; never throws, never prints.
     *
     * @return true when a draft was written or the session ended cleanly
     */
    public boolean saveDraft() {
        if (!done.compareAndSet(false, true)) {
            return false;
        }
        try {
            window.background().close();
            window.background().drain(wait.toMillis(), TimeUnit.MILLISECONDS);
            FormState form = latest.get();
            boolean formClean = clean.get().map(form::equals).orElse(false);
            Optional<byte[]> course = courseDraft.get();
            if (formClean && !courseUnsaved.get()) {
                window.drafts().endCleanly();
            } else {
                window.drafts().saveDraft(course.orElseGet(() -> FormJson.write(form)));
            }
            return true;
        } catch (IOException | RuntimeException e) {
            return false; // nothing more can be done at this point; the last autosave stands
        }
    }
}
