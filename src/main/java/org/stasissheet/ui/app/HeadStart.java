package org.stasissheet.ui.app;

import java.util.Objects;
import java.util.Optional;
import org.stasissheet.load.Ahead;
import org.stasissheet.ui.entry.FormJson;
import org.stasissheet.ui.entry.FormState;

/**
 * What a window reads before it can be built, none of which needs the toolkit: the preferences, the rule set it
 * starts with, and the demo case as the form will hold it. A real start reads them on a thread of its own while
 * JavaFX starts ({@link #begin}), which takes most of a second here; the window then takes them ({@link #get}),
 * waiting only if they are not ready yet. Tests and later windows read them there and then ({@link #now}).
 */
public final class HeadStart {
    /** The values read, or the failure reading them, handed over whole. */
    record Read(Preferences preferences, RuleLoad rules, Optional<FormState> demo) {
        Read {
            Objects.requireNonNull(preferences, "preferences");
            Objects.requireNonNull(rules, "rules");
            Objects.requireNonNull(demo, "demo");
        }
    }

    private final Ahead<Read> read;

    private HeadStart(Ahead<Read> read) {
        this.read = read;
    }

    /** Starts reading on a thread of its own and returns at once. */
    public static HeadStart begin(FormSettings settings) {
        return new HeadStart(Ahead.start("form-head-start", () -> read(settings)));
    }

    /** Reads on the calling thread, before returning. */
    static HeadStart now(FormSettings settings) {
        return new HeadStart(Ahead.now(() -> read(settings)));
    }

    /** The values; a failure reading them is thrown here, on the caller's thread, as if read there. */
    Read get() {
        return read.get();
    }

    private static Read read(FormSettings settings) {
        Preferences preferences = new PreferencesStore(settings.dataFolder()).load();
        RuleLoad rules = RuleLoad.first(settings.rules(), preferences.ruleFolder());
        Optional<FormState> demo = Samples.read(settings.demoSample())
                .flatMap(b -> FormJson.read(b, preferences.units()));
        return new Read(preferences, rules, demo);
    }
}
