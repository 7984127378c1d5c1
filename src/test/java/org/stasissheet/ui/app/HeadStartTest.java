package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.entry.FormJson;
import org.stasissheet.ui.entry.UnitSystem;

/** The start-up files read ahead on a thread of their own give what reading them on the JavaFX thread gave. */
class HeadStartTest {
    @TempDir
    Path data;

    FormSettings settings(java.util.function.Function<java.util.Optional<Path>, org.stasissheet.rules.RuleSet> rules) {
        return new FormSettings(data, stage -> new org.stasissheet.ui.ScriptedShell(), FormHarness.CLOCK,
                Duration.ofMillis(150), Duration.ofMillis(30), rules, FormSettings.DEFAULT_SAMPLE);
    }

    @Test
    @DisplayName("read ahead: the saved preferences, the shipped rule set, and the demo case in the preferred units")
    void readsWhatTheWindowWouldRead() throws Exception {
        new PreferencesStore(data).save(Preferences.DEFAULTS.withUnits(UnitSystem.CONVENTIONAL)
                .withAssessor("Invented assessor"));
        FormSettings s = settings(org.stasissheet.load.Inputs::ruleSet);
        HeadStart.Read ahead = HeadStart.begin(s).get();
        HeadStart.Read there = HeadStart.now(s).get();
        assertEquals(UnitSystem.CONVENTIONAL, ahead.preferences().units());
        assertEquals("Invented assessor", ahead.preferences().assessor());
        assertEquals(there.preferences(), ahead.preferences());
        assertEquals(there.rules().folder(), ahead.rules().folder());
        assertEquals(there.rules().problem(), ahead.rules().problem());
        assertEquals(there.rules().rules().provenance(), ahead.rules().rules().provenance());
        assertEquals(there.rules().rules().rules().size(), ahead.rules().rules().rules().size());
        // the demo case as the window's own reading of the packaged sample gives it, in the preferred units
        assertEquals(Samples.read(FormSettings.DEFAULT_SAMPLE).flatMap(b -> FormJson.read(b, UnitSystem.CONVENTIONAL)),
                ahead.demo());
        assertTrue(ahead.demo().isPresent());
    }

    @Test
    @DisplayName("a failure reading ahead is thrown to the window's thread, the same exception")
    void failureReachesTheCaller() {
        IllegalStateException broken = new IllegalStateException("invented failure reading the rule set");
        AtomicReference<String> readOn = new AtomicReference<>();
        HeadStart h = HeadStart.begin(settings(folder -> {
            readOn.set(Thread.currentThread().getName());
            throw broken;
        }));
        assertSame(broken, assertThrows(IllegalStateException.class, h::get));
        assertEquals("stasis-form-head-start", readOn.get(), "read on a thread of its own");
    }
}
