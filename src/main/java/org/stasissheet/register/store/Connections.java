package org.stasissheet.register.store;

import java.io.IOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.Properties;

/**
 * Opens connections to the register's database, straight from its driver (no driver manager scan): the one
 * connection the tool makes, to the database the user named.
 */
final class Connections {
    private final RegisterLocation location;

    Connections(RegisterLocation location) {
        this.location = location;
    }

    RegisterLocation location() {
        return location;
    }

    boolean isSqlite() {
        return location instanceof RegisterLocation.Sqlite;
    }

    /**
     * Creates the SQLite file owner-only before SQLite first opens it (SQLite gives its journal the same
     * permissions), and its folder owner-only when it has to be created.
     */
    void prepare() {
        if (!(location instanceof RegisterLocation.Sqlite sqlite)) {
            return;
        }
        Path file = sqlite.file().toAbsolutePath();
        try {
            Path folder = file.getParent();
            if (!Files.isDirectory(folder)) {
                if (posix(folder.getParent())) {
                    Files.createDirectories(folder, PosixFilePermissions.asFileAttribute(
                            PosixFilePermissions.fromString("rwx------")));
                } else {
                    Files.createDirectories(folder);
                }
            }
            if (!Files.exists(file)) {
                if (posix(folder)) {
                    Files.createFile(file, PosixFilePermissions.asFileAttribute(
                            PosixFilePermissions.fromString("rw-------")));
                } else {
                    Files.createFile(file);
                }
            }
        } catch (FileAlreadyExistsException e) {
            // another process created it a moment ago: use it
        } catch (IOException e) {
            throw new RegisterUnavailable("cannot create the register file " + file + " ("
                    + e.getClass().getSimpleName() + ")");
        }
    }

    private static boolean posix(Path p) {
        return p != null && Files.exists(p) && p.getFileSystem().supportedFileAttributeViews().contains("posix");
    }

    Connection open() throws SQLException {
        Properties props = new Properties();
        if (location instanceof RegisterLocation.Sqlite sqlite) {
            props.setProperty("foreign_keys", "true");
            // a second writer waits up to 10 s for the first instead of failing at once
            props.setProperty("busy_timeout", "10000");
            // take the write lock when a transaction starts, so two writers queue instead of deadlocking
            props.setProperty("transaction_mode", "IMMEDIATE");
            Connection c = new org.sqlite.JDBC().connect("jdbc:sqlite:" + sqlite.file(), props);
            if (c == null) {
                throw new SQLException("the SQLite driver did not accept the file " + sqlite.file());
            }
            return c;
        }
        RegisterLocation.Postgres pg = (RegisterLocation.Postgres) location;
        pg.password().ifPresent(p -> props.setProperty("password", p));
        props.setProperty("ApplicationName", "stasis-register");
        Connection c = new org.postgresql.Driver().connect(pg.url(), props);
        if (c == null) {
            throw new SQLException("the PostgreSQL driver did not accept the URL " + pg.url());
        }
        return c;
    }
}
