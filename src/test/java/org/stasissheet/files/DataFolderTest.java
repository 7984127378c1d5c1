package org.stasissheet.files;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class DataFolderTest {
    @Test
    @DisplayName("the system property wins over everything")
    void property() {
        assertEquals(Path.of("/tmp/x"), DataFolder.resolve(
                Map.of("stasis.dataDir", "/tmp/x", "os.name", "Linux", "user.home", "/home/u"),
                Map.of("XDG_DATA_HOME", "/xdg")));
    }

    @Test
    @DisplayName("XDG_DATA_HOME, then ~/.local/share (XDG base directory convention)")
    void xdg() {
        assertEquals(Path.of("/xdg/stasis-sheet"), DataFolder.resolve(
                Map.of("os.name", "Linux", "user.home", "/home/u"), Map.of("XDG_DATA_HOME", "/xdg")));
        assertEquals(Path.of("/home/u/.local/share/stasis-sheet"), DataFolder.resolve(
                Map.of("os.name", "Linux", "user.home", "/home/u"), Map.of()));
    }

    @Test
    @DisplayName("Windows uses %APPDATA%")
    void windows() {
        assertEquals(Path.of("C:/Users/u/AppData/Roaming", "stasis-sheet"), DataFolder.resolve(
                Map.of("os.name", "Windows 11", "user.home", "C:/Users/u"),
                Map.of("APPDATA", "C:/Users/u/AppData/Roaming")));
    }
}
