package org.stasissheet.cli;

import java.util.Optional;
import picocli.CommandLine.Option;

/** The {@code --db URL} option of every register command; without it, the SQLite register in the data folder. */
public final class DatabaseOption {
    @Option(names = "--db", paramLabel = "URL",
            description = "The register database: jdbc:sqlite:PATH, or jdbc:postgresql://HOST:PORT/DB?user=NAME "
                    + "for a shared register (password from STASIS_DB_PASSWORD or a .pgpass file, never here). "
                    + "Default: register.sqlite in the data folder.")
    String url;

    public Optional<String> value() {
        return Optional.ofNullable(url);
    }
}
