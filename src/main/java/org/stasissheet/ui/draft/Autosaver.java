package org.stasissheet.ui.draft;

import java.time.Clock;
import java.time.Duration;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.util.Arrays;
import java.util.Objects;
import java.util.function.Supplier;
import javafx.animation.PauseTransition;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.value.ObservableValue;
import org.stasissheet.ui.app.Background;

/**
 * Saves the draft a few seconds after the last edit (so a burst of typing is one write), on the background
 * thread, and reports what it did in words for the status bar. A write that fails is reported, not retried
 * silently: the next edit tries again.
 */
public final class Autosaver {
    public static final Duration DEFAULT_DELAY = Duration.ofSeconds(2);
    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("HH:mm:ss");

    private final DraftStore store;
    private final Background background;
    private final Supplier<byte[]> draft;
    private final Clock clock;
    private final PauseTransition pause;
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
    private byte[] lastWritten = new byte[0];

    /**
     * @param edits ticks on every edit
     * @param draft the current form as case JSON; called on the JavaFX thread
     */
    public Autosaver(DraftStore store, Background background, ObservableValue<?> edits, Supplier<byte[]> draft,
                     Duration delay, Clock clock) {
        this.store = Objects.requireNonNull(store, "store");
        this.background = Objects.requireNonNull(background, "background");
        this.draft = Objects.requireNonNull(draft, "draft");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.pause = new PauseTransition(javafx.util.Duration.millis(delay.toMillis()));
        pause.setOnFinished(e -> saveNow());
        edits.addListener(o -> pause.playFromStart());
    }

    /** "Draft saved 02:41:07", or why it could not be. */
    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** Writes the draft now if it changed since the last write (also used before a clean close). */
    public void saveNow() {
        pause.stop();
        byte[] bytes = draft.get();
        if (Arrays.equals(bytes, lastWritten)) {
            return;
        }
        lastWritten = bytes;
        background.run(() -> {
            store.saveDraft(bytes);
            return LocalTime.now(clock);
        }, at -> status.set("Draft saved " + TIME.format(at)),
                e -> {
                    lastWritten = new byte[0];
                    status.set("Draft NOT saved: " + e.getMessage());
                });
    }

    /** Stops a pending write (the draft is about to be thrown away). */
    public void cancel() {
        pause.stop();
    }

    /** Forgets what was written, so the next save writes even identical bytes (after the draft was deleted). */
    public void forget() {
        lastWritten = new byte[0];
    }
}
