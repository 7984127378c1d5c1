package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.ui.entry.UnitSystem;

class PreferencesStoreTest {
    @TempDir
    Path dir;

    @Test
    @DisplayName("what is saved is read back, owner-only")
    void roundTrip() throws Exception {
        Preferences p = Preferences.DEFAULTS.withUnits(UnitSystem.CONVENTIONAL)
                .withRecent(dir.resolve("a.json")).withRecent(dir.resolve("b.json"))
                .withRuleFolder(Optional.of(dir.resolve("rules"))).withHighContrast(true).withTextScale(1.25);
        PreferencesStore store = new PreferencesStore(dir);
        store.save(p);
        assertEquals(p, store.load());
        assertEquals("rw-------", PosixFilePermissions.toString(
                Files.getPosixFilePermissions(dir.resolve(PreferencesStore.FILE))));
    }

    @Test
    @DisplayName("a damaged file gives the defaults instead of stopping the form")
    void damaged() throws Exception {
        Files.writeString(dir.resolve(PreferencesStore.FILE), "{ not json");
        assertEquals(Preferences.DEFAULTS, new PreferencesStore(dir).load());
    }

    @Test
    @DisplayName("the recent list keeps the newest first, without duplicates, at most eight")
    void recent() {
        Preferences p = Preferences.DEFAULTS;
        for (int i = 0; i < 10; i++) {
            p = p.withRecent(dir.resolve("f" + i + ".json"));
        }
        p = p.withRecent(dir.resolve("f5.json"));
        assertEquals(Preferences.MAX_RECENT, p.recentFiles().size());
        assertEquals(dir.resolve("f5.json"), p.recentFiles().get(0));
        assertEquals(dir.resolve("f9.json"), p.recentFiles().get(1));
    }
}
