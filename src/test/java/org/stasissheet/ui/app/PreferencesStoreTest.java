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
                .withRuleFolder(Optional.of(dir.resolve("rules"))).withHighContrast(true).withTextScale(1.25)
                .withAssessor("Dr Invented Resident");
        PreferencesStore store = new PreferencesStore(dir);
        store.save(p);
        assertEquals(p, store.load());
        assertEquals("rw-------", PosixFilePermissions.toString(
                Files.getPosixFilePermissions(dir.resolve(PreferencesStore.FILE))));
    }

    @Test
    @DisplayName("the assessor is kept on one line, cut to its length limit, and empty when absent or not text")
    void assessor() throws Exception {
        assertEquals("Dr A. Invented", Preferences.DEFAULTS.withAssessor("  Dr A.\nInvented\u0085 ").assessor()
                .replace("  ", " "));
        assertEquals(Preferences.MAX_ASSESSOR, Preferences.DEFAULTS.withAssessor("x".repeat(500)).assessor().length());
        Files.writeString(dir.resolve(PreferencesStore.FILE), "{\"assessor\": 42}");
        assertEquals("", new PreferencesStore(dir).load().assessor());
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
