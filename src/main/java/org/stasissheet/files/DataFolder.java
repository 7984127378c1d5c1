package org.stasissheet.files;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Where the form keeps the user's preferences and the autosaved draft, and where the referral register's SQLite
 * file lives by default: the system property {@code stasis.dataDir} when set (tests point it at a temporary folder), else {@code %APPDATA%\stasis-sheet}
 * on Windows, else {@code $XDG_DATA_HOME/stasis-sheet}, else {@code ~/.local/share/stasis-sheet}
 * (the XDG base directory convention).
 */
public final class DataFolder {
    public static final String PROPERTY = "stasis.dataDir";
    private static final String NAME = "stasis-sheet";

    private DataFolder() {
    }

    /** The folder for this user on this machine; not created here. */
    public static Path resolve() {
        return resolve(System.getProperties().entrySet().stream()
                        .collect(java.util.stream.Collectors.toMap(e -> String.valueOf(e.getKey()),
                                e -> String.valueOf(e.getValue()))),
                System.getenv());
    }

    /** The same rule over given properties and environment, so it can be checked without changing either. */
    static Path resolve(Map<String, String> properties, Map<String, String> environment) {
        Objects.requireNonNull(properties, "properties");
        Objects.requireNonNull(environment, "environment");
        Optional<String> override = nonBlank(properties.get(PROPERTY));
        if (override.isPresent()) {
            return Path.of(override.get());
        }
        String os = properties.getOrDefault("os.name", "").toLowerCase(Locale.ROOT);
        if (os.startsWith("windows")) {
            Optional<String> appData = nonBlank(environment.get("APPDATA"));
            if (appData.isPresent()) {
                return Path.of(appData.get(), NAME);
            }
        }
        Optional<String> xdg = nonBlank(environment.get("XDG_DATA_HOME"));
        if (xdg.isPresent()) {
            return Path.of(xdg.get(), NAME);
        }
        return Path.of(properties.getOrDefault("user.home", "."), ".local", "share", NAME);
    }

    private static Optional<String> nonBlank(String s) {
        return s == null || s.isBlank() ? Optional.empty() : Optional.of(s);
    }
}
