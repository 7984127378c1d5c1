package org.stasissheet.ui.app;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.ui.entry.UnitSystem;

/**
 * Reads and writes {@code preferences.json} in the data folder ({@code stasis-preferences/1}). A missing or
 * damaged file gives the defaults (a damaged setting never stops the form from opening); writing is atomic
 * and owner-only.
 */
public final class PreferencesStore {
    static final String FILE = "preferences.json";
    static final String FORMAT = "stasis-preferences/1";
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private final Path file;

    public PreferencesStore(Path dataFolder) {
        this.file = Objects.requireNonNull(dataFolder, "dataFolder").resolve(FILE);
    }

    /** Small and local: read once at start-up, before the window shows. */
    public Preferences load() {
        if (!Files.isRegularFile(file)) {
            return Preferences.DEFAULTS;
        }
        try {
            return parse(JSON.readTree(Files.readAllBytes(file)));
        } catch (IOException | RuntimeException e) {
            return Preferences.DEFAULTS;
        }
    }

    static Preferences parse(JsonNode root) {
        Preferences p = Preferences.DEFAULTS;
        if (!(root instanceof ObjectNode)) {
            return p;
        }
        String units = root.path("units").asText("");
        for (UnitSystem u : UnitSystem.values()) {
            if (u.name().equalsIgnoreCase(units)) {
                p = p.withUnits(u);
            }
        }
        List<Path> recent = new ArrayList<>();
        root.path("recentFiles").forEach(n -> path(n).ifPresent(recent::add));
        for (int i = recent.size() - 1; i >= 0; i--) {
            p = p.withRecent(recent.get(i));
        }
        p = p.withRuleFolder(path(root.path("ruleFolder")));
        p = p.withHighContrast(root.path("highContrast").asBoolean(false));
        double scale = root.path("textScale").asDouble(1);
        p = p.withAssessor(root.path("assessor").isTextual() ? root.path("assessor").asText() : "");
        return p.withTextScale(Double.isFinite(scale) ? scale : 1).withExportFolder(path(root.path("exportFolder")));
    }

    private static Optional<Path> path(JsonNode n) {
        if (!n.isTextual() || n.asText().isBlank()) {
            return Optional.empty();
        }
        try {
            return Optional.of(Path.of(n.asText()));
        } catch (InvalidPathException e) {
            return Optional.empty();
        }
    }

    /** Blocking: call from the background executor. */
    public void save(Preferences p) throws IOException {
        ObjectNode root = JSON.createObjectNode();
        root.put("format", FORMAT);
        root.put("units", p.units().name().toLowerCase(java.util.Locale.ROOT));
        ArrayNode recent = root.putArray("recentFiles");
        p.recentFiles().forEach(f -> recent.add(f.toString()));
        if (p.ruleFolder().isPresent()) {
            root.put("ruleFolder", p.ruleFolder().get().toString());
        } else {
            root.putNull("ruleFolder");
        }
        root.put("highContrast", p.highContrast());
        root.put("textScale", p.textScale());
        root.put("assessor", p.assessor());
        if (p.exportFolder().isPresent()) {
            root.put("exportFolder", p.exportFolder().get().toString());
        } else {
            root.putNull("exportFolder");
        }
        Storage.writePrivately(file, JSON.writeValueAsBytes(root));
    }
}
