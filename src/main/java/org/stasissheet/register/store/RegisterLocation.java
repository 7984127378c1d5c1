package org.stasissheet.register.store;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Which database holds the register: the SQLite file in the data folder by default, another SQLite file
 * ({@code jdbc:sqlite:PATH}) or a shared PostgreSQL database ({@code jdbc:postgresql://HOST:PORT/DB?user=NAME}).
 * A password never travels in the URL, where {@code ps} and shell histories would show it: it comes from the
 * environment variable {@value #PASSWORD_VARIABLE} or from a {@code .pgpass}-style file ({@code PGPASSFILE} or
 * {@code ~/.pgpass}, read by the PostgreSQL driver itself).
 */
public sealed interface RegisterLocation {
    String PASSWORD_VARIABLE = "STASIS_DB_PASSWORD";
    String DEFAULT_FILE = "register.sqlite";

    /** The URL as it may be shown: it never holds a password (one is refused). */
    String shown();

    record Sqlite(Path file) implements RegisterLocation {
        public Sqlite {
            Objects.requireNonNull(file, "file");
        }

        @Override
        public String shown() {
            return "jdbc:sqlite:" + file;
        }
    }

    /** @param password from {@value #PASSWORD_VARIABLE}; empty lets the driver read a .pgpass-style file */
    record Postgres(String url, Optional<String> password) implements RegisterLocation {
        public Postgres {
            Objects.requireNonNull(url, "url");
            Objects.requireNonNull(password, "password");
        }

        @Override
        public String shown() {
            return url;
        }

        @Override
        public String toString() {
            return "Postgres[" + url + (password.isPresent() ? ", password from " + PASSWORD_VARIABLE : "") + "]";
        }
    }

    Pattern PASSWORD_IN_URL = Pattern.compile("(?i)([?&;]password=)|(//[^/@]*:[^/@]*@)");

    /**
     * The location for a {@code --db} value (empty: the default file in {@code dataFolder}).
     *
     * @throws RegisterUnavailable naming the option and the value (with any password masked) when it is not one of
     *                             the accepted forms
     */
    static RegisterLocation of(Optional<String> db, Path dataFolder, Map<String, String> environment) {
        if (db.isEmpty()) {
            return new Sqlite(dataFolder.resolve(DEFAULT_FILE));
        }
        String url = db.get().strip();
        if (PASSWORD_IN_URL.matcher(url).find()) {
            throw new RegisterUnavailable("--db: the URL carries a password; a command line is visible to other "
                    + "users (ps, shell history). Put the password in the environment variable " + PASSWORD_VARIABLE
                    + " or in a .pgpass file (PGPASSFILE or ~/.pgpass), and give the URL without it.");
        }
        String lower = url.toLowerCase(Locale.ROOT);
        if (lower.startsWith("jdbc:sqlite:")) {
            String path = url.substring("jdbc:sqlite:".length());
            if (path.isBlank() || path.startsWith(":memory:") || path.startsWith("file:")) {
                throw new RegisterUnavailable("--db: \"" + url + "\" does not name a SQLite file; give "
                        + "jdbc:sqlite:PATH with the path of the register file");
            }
            return new Sqlite(Path.of(path));
        }
        if (lower.startsWith("jdbc:postgresql://")) {
            return new Postgres(url, Optional.ofNullable(environment.get(PASSWORD_VARIABLE))
                    .filter(p -> !p.isEmpty()));
        }
        throw new RegisterUnavailable("--db: \"" + url + "\" is not a register database URL; accepted: "
                + "jdbc:sqlite:PATH or jdbc:postgresql://HOST:PORT/DATABASE?user=NAME");
    }
}
