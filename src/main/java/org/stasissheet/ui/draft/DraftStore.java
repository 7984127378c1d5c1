package org.stasissheet.ui.draft;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.UUID;
import org.stasissheet.files.AtomicFiles;
import org.stasissheet.ui.app.Storage;

/**
 * The autosaved drafts in the user's data folder, one set of files per running form, so that two windows open at
 * once never overwrite or delete each other's draft. A session {@code ID} has:
 * <ul>
 *   <li>{@code draft-ID.json}: the form as case JSON, mistakes and all;</li>
 *   <li>{@code session-ID.json}: which file the form showed, so a restored draft knows its document;</li>
 *   <li>{@code session-ID.lock}: locked for as long as the session runs. The operating system lets go of the
 *       lock when the process ends, however it ends, so a draft whose lock can be taken belongs to a session that
 *       did not end cleanly (a crash, a killed process, a power cut) and is offered for restoring.</li>
 * </ul>
 * A clean end deletes the session's files. The draft and marker are written atomically and readable by the owner
 * only.
 *
 * <p>Blocking file I/O: call from the background executor, except {@link #crashedDrafts()} at start-up (a few
 * small files, read before the window shows).
 */
public final class DraftStore {
    static final String DRAFT_PREFIX = "draft-";
    static final String MARKER_PREFIX = "session-";
    static final String JSON = ".json";
    static final String LOCK = ".lock";
    /** A draft that could not be read back is renamed with this prefix: kept, but not offered again. */
    static final String SET_ASIDE_PREFIX = "unreadable-";
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private final Path folder;
    private final String session;
    private FileChannel lockChannel;
    private FileLock lock;
    private boolean lockUnsupported;

    /** A store for a new session in {@code folder}; nothing is written until the session marks itself running. */
    public DraftStore(Path folder) {
        this(folder, UUID.randomUUID().toString());
    }

    DraftStore(Path folder, String session) {
        this.folder = Objects.requireNonNull(folder, "folder");
        this.session = Objects.requireNonNull(session, "session");
    }

    public Path folder() {
        return folder;
    }

    /** This session's draft file (written by {@link #saveDraft}). */
    public Path draftFile() {
        return draftOf(session);
    }

    /** Where a crashed session's draft file is (for the restore question, which names it). */
    public Path fileOf(Draft crashed) {
        return draftOf(crashed.session());
    }

    /**
     * Drafts left by sessions that did not end cleanly, newest first. Drafts of forms still open elsewhere are
     * not among them: their lock is held.
     */
    public List<Draft> crashedDrafts() {
        List<Draft> found = new ArrayList<>();
        if (!Files.isDirectory(folder)) {
            return found;
        }
        try {
            for (String id : otherSessions(DRAFT_PREFIX, JSON)) {
                if (!running(id)) {
                    read(id).ifPresent(found::add);
                }
            }
            // housekeeping: half-written drafts of killed autosaves (they may hold patient data) ...
            AtomicFiles.removeStaleTemps(folder, Instant.now());
            // ... and the marker and lock of sessions that ended, uncleanly, before they wrote any draft
            for (String id : otherSessions(MARKER_PREFIX, LOCK)) {
                if (!Files.exists(draftOf(id)) && !running(id)) {
                    forget(id);
                }
            }
        } catch (IOException e) {
            // an unlistable folder offers what was found so far; the files stay where they are
        }
        found.sort(Comparator.comparing(Draft::savedAt).reversed());
        return found;
    }

    /** The ids of the sessions other than this one that have a file {@code prefix + id + suffix}. */
    private List<String> otherSessions(String prefix, String suffix) throws IOException {
        List<String> ids = new ArrayList<>();
        try (DirectoryStream<Path> files = Files.newDirectoryStream(folder, prefix + "*" + suffix)) {
            for (Path f : files) {
                String name = f.getFileName().toString();
                String id = name.substring(prefix.length(), name.length() - suffix.length());
                if (!id.equals(session)) {
                    ids.add(id);
                }
            }
        }
        return ids;
    }

    /** Marks this session as running (taking its lock), remembering which file (if any) the form shows. */
    public synchronized void markRunning(Optional<Path> document) throws IOException {
        holdLock();
        ObjectNode m = MAPPER.createObjectNode();
        m.put("running", true);
        document.ifPresent(d -> m.put("document", d.toAbsolutePath().toString()));
        // for file systems without locks: which process runs the session, told apart from a later one by its start
        ProcessHandle self = ProcessHandle.current();
        m.put("pid", self.pid());
        self.info().startInstant().ifPresent(t -> m.put("started", t.toString()));
        Storage.writePrivately(markerOf(session), MAPPER.writeValueAsBytes(m));
    }

    public synchronized void saveDraft(byte[] caseJson) throws IOException {
        holdLock();
        Storage.writePrivately(draftOf(session), caseJson);
    }

    /**
     * Takes over a crashed session's draft after its content was restored into this session: the draft file
     * becomes this session's draft (one atomic move, so a crash at any moment leaves it findable), and the old
     * session's other files go.
     */
    public synchronized void adopt(Draft crashed) throws IOException {
        holdLock();
        Files.move(draftOf(crashed.session()), draftOf(session), StandardCopyOption.REPLACE_EXISTING,
                StandardCopyOption.ATOMIC_MOVE);
        forget(crashed.session());
    }

    /** Throws a crashed session's draft away (the user declined it), with its other files. */
    public void discard(Draft crashed) throws IOException {
        deleteIfThere(draftOf(crashed.session()));
        forget(crashed.session());
    }

    /**
     * Keeps a crashed draft that cannot be read back into the form under another name, so it is neither lost
     * nor offered at every start; returns where it now is.
     */
    public Path setAside(Draft crashed) throws IOException {
        Path kept = folder.resolve(SET_ASIDE_PREFIX + draftOf(crashed.session()).getFileName());
        Files.move(draftOf(crashed.session()), kept, StandardCopyOption.REPLACE_EXISTING);
        forget(crashed.session());
        return kept;
    }

    /** Deletes the marker and lock of an ended session whose draft has been dealt with. */
    private void forget(String id) throws IOException {
        deleteIfThere(markerOf(id));
        deleteIfThere(lockOf(id));
    }

    /** The session ends cleanly: its draft has been saved or deliberately thrown away. */
    public synchronized void endCleanly() throws IOException {
        deleteIfThere(draftOf(session));
        deleteIfThere(markerOf(session));
        releaseLock();
        deleteIfThere(lockOf(session));
    }

    /** Throws this session's draft away (the case was saved to a file, which holds it now). */
    public synchronized void discardDraft() throws IOException {
        deleteIfThere(draftOf(session));
    }

    /**
     * What a crash does to the store: lets go of the lock and leaves every file in place. For a process that
     * goes on after its form was torn down without a clean end (and for tests that simulate a crash).
     */
    public synchronized void abandon() {
        releaseLock();
    }

    /**
     * Takes this session's lock once. Where the file system has no locks, the session goes on without one (the
     * draft matters more than the lock); its marker's process id then tells whether it still runs.
     */
    private void holdLock() throws IOException {
        if (lock != null || lockUnsupported) {
            return;
        }
        Path file = lockOf(session);
        if (!Files.exists(file)) {
            Storage.writePrivately(file, new byte[0]);
        }
        FileChannel channel = FileChannel.open(file, StandardOpenOption.WRITE);
        FileLock taken = null;
        try {
            // null would mean another program holds this session's own lock, which a fresh random id rules out
            taken = channel.tryLock();
        } catch (IOException noLocksHere) {
            // a file system without locks: go on without one
        } finally {
            if (taken == null) {
                channel.close();
            }
        }
        if (taken == null) {
            lockUnsupported = true;
            return;
        }
        lockChannel = channel;
        lock = taken;
    }

    private void releaseLock() {
        try {
            if (lock != null) {
                lock.release();
            }
            if (lockChannel != null) {
                lockChannel.close();
            }
        } catch (IOException e) {
            // closing the channel releases the lock whatever happens here; nothing is lost
        } finally {
            lock = null;
            lockChannel = null;
        }
    }

    /**
     * True when another form is still running session {@code id}: its lock is held, by another process or by
     * another window of this one. A session without a lock file never took it, so it is not running either.
     */
    private boolean running(String id) {
        Path file = lockOf(id);
        if (!Files.exists(file)) {
            return false;
        }
        try (FileChannel channel = FileChannel.open(file, StandardOpenOption.WRITE)) {
            FileLock probe = channel.tryLock();
            if (probe == null) {
                return true;
            }
            probe.release();
            return false;
        } catch (OverlappingFileLockException sameProcess) {
            return true;
        } catch (IOException noLocksHere) {
            return processRuns(id);
        }
    }

    /**
     * Whether the process a session's marker names is still the one that wrote it (same id, same start); when
     * the marker or the process's start time cannot be read, the session counts as running: when in doubt,
     * another session's files are left alone.
     */
    boolean processRuns(String id) {
        try {
            JsonNode m = MAPPER.readTree(Files.readAllBytes(markerOf(id)));
            if (m == null || !m.path("pid").canConvertToLong()) {
                return true;
            }
            Optional<ProcessHandle> process = ProcessHandle.of(m.path("pid").asLong());
            if (process.isEmpty() || !process.get().isAlive()) {
                return false;
            }
            Optional<Instant> started = process.get().info().startInstant();
            return started.isEmpty() || !m.path("started").isTextual()
                    || started.get().toString().equals(m.path("started").asText());
        } catch (IOException | RuntimeException unreadable) {
            return true;
        }
    }

    private Optional<Draft> read(String id) {
        try {
            byte[] json = Files.readAllBytes(draftOf(id));
            Instant savedAt = Files.getLastModifiedTime(draftOf(id)).toInstant();
            return Optional.of(new Draft(id, json, document(id), savedAt));
        } catch (IOException e) {
            return Optional.empty(); // gone meanwhile (another form took it) or unreadable: left where it is
        }
    }

    /** The document a session's marker names; a missing or damaged marker only loses the file name. */
    private Optional<Path> document(String id) {
        try {
            JsonNode doc = MAPPER.readTree(Files.readAllBytes(markerOf(id))).get("document");
            if (doc != null && doc.isTextual() && !doc.asText().isBlank()) {
                return Optional.of(Path.of(doc.asText()));
            }
        } catch (IOException | RuntimeException noMarker) {
            // the draft itself is what matters
        }
        return Optional.empty();
    }

    private Path draftOf(String id) {
        return folder.resolve(DRAFT_PREFIX + id + JSON);
    }

    private Path markerOf(String id) {
        return folder.resolve(MARKER_PREFIX + id + JSON);
    }

    private Path lockOf(String id) {
        return folder.resolve(MARKER_PREFIX + id + LOCK);
    }

    private static void deleteIfThere(Path p) throws IOException {
        try {
            Files.delete(p);
        } catch (NoSuchFileException gone) {
            // already gone: nothing to do
        }
    }

    /**
     * A draft found at start-up.
     *
     * @param session  the session that wrote it
     * @param caseJson the form as case JSON
     * @param document the file the form showed then, if it had one
     * @param savedAt  when the draft was last written
     */
    public record Draft(String session, byte[] caseJson, Optional<Path> document, Instant savedAt) {
        public Draft {
            Objects.requireNonNull(session, "session");
            Objects.requireNonNull(caseJson, "caseJson");
            Objects.requireNonNull(document, "document");
            Objects.requireNonNull(savedAt, "savedAt");
        }

        public String text() {
            return new String(caseJson, StandardCharsets.UTF_8);
        }
    }
}
