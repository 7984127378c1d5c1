package org.stasissheet.ui.draft;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DraftStoreTest {
    @TempDir
    Path dir;

    @Test
    @DisplayName("a draft left without a clean end is found, with its document; the files are owner-only")
    void crashed() throws Exception {
        DraftStore store = new DraftStore(dir.resolve("data"));
        byte[] json = "{\"format\":\"stasis-case/1\"}".getBytes(StandardCharsets.UTF_8);
        store.markRunning(Optional.of(dir.resolve("case.json")));
        store.saveDraft(json);
        DraftStore.Draft d = new DraftStore(dir.resolve("data")).crashedDraft().orElseThrow();
        assertArrayEquals(json, d.caseJson());
        assertEquals(Optional.of(dir.resolve("case.json").toAbsolutePath()), d.document());
        assertEquals("rw-------", PosixFilePermissions.toString(
                Files.getPosixFilePermissions(dir.resolve("data").resolve(DraftStore.DRAFT))));
        assertEquals("rwx------", PosixFilePermissions.toString(
                Files.getPosixFilePermissions(dir.resolve("data"))));
    }

    @Test
    @DisplayName("after a clean end nothing is offered")
    void clean() throws Exception {
        DraftStore store = new DraftStore(dir);
        store.markRunning(Optional.empty());
        store.saveDraft(new byte[] {'{', '}'});
        store.endCleanly();
        assertTrue(store.crashedDraft().isEmpty());
        assertTrue(Files.list(dir).findAny().isEmpty(), "no temporary files left behind");
    }
}
