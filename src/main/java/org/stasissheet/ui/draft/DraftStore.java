package org.stasissheet.ui.draft;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.ui.app.Storage;

/**
 * The autosaved draft in the user's data folder: {@code draft.json} (the form as case JSON, mistakes and all) and
 * {@code session.json}, a marker written when a session starts and removed when it ends cleanly. A marker found
 * at start-up means the last session did not end cleanly (a crash, a killed process, a power cut), so its draft
 * is offered for restoring. Both files are written atomically and readable by the owner only.
 *
 * <p>Blocking file I/O: call from the background executor, except {@link #crashedDraft()} at start-up (two
 * small files, read before the window shows).
 */
public final class DraftStore {
    static final String DRAFT = "draft.json";
    static final String MARKER = "session.json";
    private static final ObjectMapper JSON = new ObjectMapper();

    private final Path folder;

    public DraftStore(Path folder) {
        this.folder = Objects.requireNonNull(folder, "folder");
    }

    public Path folder() {
        return folder;
    }

    /** A draft left by a session that did not end cleanly, if any. */
    public Optional<Draft> crashedDraft() {
        Path marker = folder.resolve(MARKER);
        Path draft = folder.resolve(DRAFT);
        if (!Files.exists(marker) || !Files.exists(draft)) {
            return Optional.empty();
        }
        try {
            byte[] json = Files.readAllBytes(draft);
            Optional<Path> document = Optional.empty();
            try {
                JsonNode m = JSON.readTree(Files.readAllBytes(marker));
                JsonNode doc = m.get("document");
                if (doc != null && doc.isTextual() && !doc.asText().isBlank()) {
                    document = Optional.of(Path.of(doc.asText()));
                }
            } catch (IOException | RuntimeException unreadableMarker) {
                // the draft itself is what matters; a damaged marker only loses the file name
            }
            return Optional.of(new Draft(json, document, Files.getLastModifiedTime(draft).toInstant()));
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    /** Marks a session as running, remembering which file (if any) the form shows. */
    public void markRunning(Optional<Path> document) throws IOException {
        ObjectNode m = JSON.createObjectNode();
        m.put("running", true);
        document.ifPresent(d -> m.put("document", d.toAbsolutePath().toString()));
        Storage.writePrivately(folder.resolve(MARKER), JSON.writeValueAsBytes(m));
    }

    public void saveDraft(byte[] caseJson) throws IOException {
        Storage.writePrivately(folder.resolve(DRAFT), caseJson);
    }

    /** The session ends cleanly: the draft has been saved or deliberately thrown away. */
    public void endCleanly() throws IOException {
        deleteIfThere(folder.resolve(DRAFT));
        deleteIfThere(folder.resolve(MARKER));
    }

    /** Throws the draft away (the user declined to restore it, or saved the case). */
    public void discardDraft() throws IOException {
        deleteIfThere(folder.resolve(DRAFT));
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
     * @param caseJson the form as case JSON
     * @param document the file the form showed then, if it had one
     * @param savedAt  when the draft was last written
     */
    public record Draft(byte[] caseJson, Optional<Path> document, Instant savedAt) {
        public Draft {
            Objects.requireNonNull(caseJson, "caseJson");
            Objects.requireNonNull(document, "document");
            Objects.requireNonNull(savedAt, "savedAt");
        }

        public String text() {
            return new String(caseJson, StandardCharsets.UTF_8);
        }
    }
}
