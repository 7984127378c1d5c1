package org.stasissheet.ui.draft;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DraftStoreTest {
    @TempDir
    Path dir;

    private static byte[] bytes(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private List<String> names() throws Exception {
        try (var files = Files.list(dir)) {
            return files.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    @DisplayName("a draft left without a clean end is found, with its document; the files are owner-only")
    void crashed() throws Exception {
        DraftStore store = new DraftStore(dir.resolve("data"));
        byte[] json = bytes("{\"format\":\"stasis-case/1\"}");
        store.markRunning(Optional.of(dir.resolve("case.json")));
        store.saveDraft(json);
        store.abandon();
        DraftStore.Draft d = new DraftStore(dir.resolve("data")).crashedDrafts().get(0);
        assertArrayEquals(json, d.caseJson());
        assertEquals(Optional.of(dir.resolve("case.json").toAbsolutePath()), d.document());
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(store.draftFile())));
        assertEquals("rwx------", PosixFilePermissions.toString(
                Files.getPosixFilePermissions(dir.resolve("data"))));
    }

    @Test
    @DisplayName("a half-written draft of a killed autosave (older than two minutes) is removed at the next start;"
            + " a fresh one, which may be another window's save in progress, is kept")
    void staleTemporaryDraftsRemoved() throws Exception {
        Path data = Files.createDirectories(dir.resolve("data"));
        Path stale = Files.write(data.resolve(".draft-abc.json.5f3e2a1b00c0ffee.tmp"), bytes("{\"patient\": {\"label\""));
        Files.setLastModifiedTime(stale, FileTime.from(Instant.now().minus(
                org.stasissheet.files.AtomicFiles.STALE_AFTER).minusSeconds(1)));
        Path fresh = Files.write(data.resolve(".draft-def.json.0123456789abcdef.tmp"), bytes("{"));
        new DraftStore(data).crashedDrafts();
        assertFalse(Files.exists(stale), "patient data from a killed write does not stay behind");
        assertTrue(Files.exists(fresh));
    }

    @Test
    @DisplayName("after a clean end nothing is offered and nothing of the session is left")
    void clean() throws Exception {
        DraftStore store = new DraftStore(dir);
        store.markRunning(Optional.empty());
        store.saveDraft(new byte[] {'{', '}'});
        store.endCleanly();
        assertTrue(new DraftStore(dir).crashedDrafts().isEmpty());
        assertEquals(List.of(), names(), "no draft, marker, lock or temporary file left behind");
    }

    @Test
    @DisplayName("two sessions in one folder: separate files, neither offered the other's running draft, "
            + "and one's clean end leaves the other's files")
    void twoSessions() throws Exception {
        DraftStore a = new DraftStore(dir);
        DraftStore b = new DraftStore(dir);
        a.markRunning(Optional.empty());
        a.saveDraft(bytes("{\"a\":1}"));
        b.markRunning(Optional.empty());
        b.saveDraft(bytes("{\"b\":2}"));
        assertTrue(a.crashedDrafts().isEmpty());
        assertTrue(b.crashedDrafts().isEmpty());
        assertTrue(new DraftStore(dir).crashedDrafts().isEmpty(), "a third session sees two running ones");

        b.endCleanly();
        assertArrayEquals(bytes("{\"a\":1}"), Files.readAllBytes(a.draftFile()));
        assertFalse(Files.exists(b.draftFile()));
        a.abandon();
        List<DraftStore.Draft> found = new DraftStore(dir).crashedDrafts();
        assertEquals(1, found.size());
        assertArrayEquals(bytes("{\"a\":1}"), found.get(0).caseJson());
    }

    @Test
    @DisplayName("several crashed drafts come newest first; adopting one moves it, discarding one removes it")
    void adoptAndDiscard() throws Exception {
        DraftStore older = new DraftStore(dir, "older");
        older.saveDraft(bytes("{\"n\":1}"));
        older.abandon();
        Files.setLastModifiedTime(older.draftFile(), FileTime.from(Instant.parse("2026-03-05T01:00:00Z")));
        DraftStore newer = new DraftStore(dir, "newer");
        newer.markRunning(Optional.empty());
        newer.saveDraft(bytes("{\"n\":2}"));
        newer.abandon();
        Files.setLastModifiedTime(newer.draftFile(), FileTime.from(Instant.parse("2026-03-05T02:00:00Z")));

        DraftStore next = new DraftStore(dir, "next");
        List<DraftStore.Draft> found = next.crashedDrafts();
        assertEquals(List.of("newer", "older"), found.stream().map(DraftStore.Draft::session).toList());

        next.adopt(found.get(0));
        assertArrayEquals(bytes("{\"n\":2}"), Files.readAllBytes(next.draftFile()));
        next.discard(found.get(1));
        assertEquals(List.of("draft-next.json", "session-next.lock"), names());
        next.endCleanly();
        assertEquals(List.of(), names());
    }

    @Test
    @DisplayName("the marker and lock of a session that crashed before writing a draft are swept away")
    void sweep() throws Exception {
        DraftStore early = new DraftStore(dir, "early");
        early.markRunning(Optional.empty());
        early.abandon();
        assertEquals(List.of("session-early.json", "session-early.lock"), names());
        assertTrue(new DraftStore(dir).crashedDrafts().isEmpty());
        assertEquals(List.of(), names());
    }

    @Test
    @DisplayName("without file locks, the marker's process id and start time tell a running session from a "
            + "crashed one, and an unreadable marker counts as running (its files are left alone)")
    void processIdFallback() throws Exception {
        DraftStore self = new DraftStore(dir, "self");
        self.markRunning(Optional.empty());
        DraftStore probe = new DraftStore(dir, "probe");
        assertTrue(probe.processRuns("self"), "this very process, same start");

        String started = ProcessHandle.current().info().startInstant().map(Instant::toString).orElse("");
        long pid = ProcessHandle.current().pid();
        Files.writeString(dir.resolve("session-reused.json"),
                "{\"pid\":" + pid + ",\"started\":\"1999-01-01T00:00:00Z\"}");
        assertEquals(started.isEmpty(), probe.processRuns("reused"),
                "the same id with another start time is another process (where the start time is known)");

        Process ended = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-version").redirectErrorStream(true).start();
        ended.getInputStream().readAllBytes();
        assertTrue(ended.waitFor(30, TimeUnit.SECONDS));
        Files.writeString(dir.resolve("session-ended.json"), "{\"pid\":" + ended.pid() + "}");
        assertFalse(probe.processRuns("ended"), "a process that has exited");

        Files.writeString(dir.resolve("session-garbled.json"), "{ not json");
        assertTrue(probe.processRuns("garbled"));
        assertTrue(probe.processRuns("missing"));
    }

    @Test
    @DisplayName("a form in another process: its draft is not offered while it runs, and is offered once the "
            + "process is killed (a real crash: the operating system lets go of the lock)")
    void otherProcess() throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process holder = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                DraftHolder.class.getName(), dir.toString(), "{\"bed\":21}")
                .redirectError(ProcessBuilder.Redirect.INHERIT).start();
        try {
            BufferedReader out = new BufferedReader(new InputStreamReader(holder.getInputStream(),
                    StandardCharsets.UTF_8));
            assertEquals("ready", out.readLine());
            assertTrue(new DraftStore(dir).crashedDrafts().isEmpty(), "a running form's draft is left alone");
        } finally {
            holder.destroyForcibly();
            assertTrue(holder.waitFor(30, TimeUnit.SECONDS));
        }
        List<DraftStore.Draft> found = new DraftStore(dir).crashedDrafts();
        assertEquals(1, found.size());
        assertArrayEquals(bytes("{\"bed\":21}"), found.get(0).caseJson());
    }
}
