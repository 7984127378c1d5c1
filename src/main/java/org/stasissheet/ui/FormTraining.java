package org.stasissheet.ui;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import javafx.application.Platform;
import javafx.scene.control.TabPane;
import javafx.stage.Window;
import javafx.stage.WindowEvent;

/**
 * The form's part of the class-data archive's training run (reached by name from the launcher's hidden training
 * entry): starts the form exactly as a user's start without arguments does ({@link FormApp#open}), waits until the
 * demo case's worksheet (its verdict cards) is laid out in a showing window, brings the course panel to the front
 * for one pulse (so its classes are trained too), then closes the window the normal way, through its close
 * request. Returns when the toolkit has stopped.
 */
public final class FormTraining {
    private FormTraining() {
    }

    /** How an answer starts when the toolkit could not open a window at all (a display that is set but unusable). */
    public static final String NO_WINDOW = "no window: ";

    /**
     * Returns an empty string when the first worksheet was laid out and the form closed, else why not; starting
     * with {@link #NO_WINDOW} when the toolkit could not start.
     */
    public static String run(long timeoutSeconds) {
        CountDownLatch shown = new CountDownLatch(1);
        CountDownLatch closed = new CountDownLatch(1);
        AtomicBoolean armed = new AtomicBoolean();
        Thread watcher = new Thread(() -> {
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(timeoutSeconds);
            while (shown.getCount() > 0 && System.nanoTime() < deadline) {
                try {
                    Platform.runLater(() -> check(armed, shown, closed));
                } catch (IllegalStateException notStartedYet) {
                    // the toolkit is not up yet: look again shortly
                }
                pause(10);
            }
            try {
                // a close that hangs (a dialog nobody answers) must not hang the training either
                closed.await(Math.max(1, deadline - System.nanoTime()), TimeUnit.NANOSECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            if (closed.getCount() > 0) {
                try {
                    Platform.exit(); // give up: launch returns, the command-line training stands
                } catch (IllegalStateException e) {
                    // the toolkit never started
                }
            }
        }, "archive-training-watcher");
        watcher.setDaemon(true);
        watcher.start();
        try {
            FormApp.open(new String[0]);
        } catch (RuntimeException | LinkageError e) {
            return NO_WINDOW + e;
        }
        if (shown.getCount() > 0) {
            return "the first worksheet was not laid out within " + timeoutSeconds + " s";
        }
        return closed.getCount() == 0 ? "" : "the form did not close within " + timeoutSeconds + " s";
    }

    /** On the JavaFX thread: once the verdicts are in a showing window, the next laid-out pulse counts. */
    private static void check(AtomicBoolean armed, CountDownLatch shown, CountDownLatch closed) {
        if (!armed.get()
                && FirstWorksheetWatch.arm(w -> Platform.runLater(() -> showCourseThenClose(w, shown, closed)))) {
            armed.set(true);
        }
    }

    private static void showCourseThenClose(Window w, CountDownLatch shown, CountDownLatch closed) {
        if (w.getScene().lookup("#side-tabs") instanceof TabPane tabs && tabs.getTabs().size() > 1) {
            tabs.getSelectionModel().select(1);
        }
        w.getScene().addPostLayoutPulseListener(new Runnable() {
            @Override
            public void run() {
                w.getScene().removePostLayoutPulseListener(this);
                shown.countDown();
                Platform.runLater(() -> close(w, closed));
            }
        });
        Platform.requestNextPulse();
    }

    /**
     * As the window manager's close button does: the close request (the form ends its session cleanly), then the
     * window hidden; hidden even if the request was refused, since the training's scratch data needs no keeping.
     */
    private static void close(Window w, CountDownLatch closed) {
        w.fireEvent(new WindowEvent(w, WindowEvent.WINDOW_CLOSE_REQUEST));
        w.hide();
        closed.countDown();
        Platform.exit();
    }

    private static void pause(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
