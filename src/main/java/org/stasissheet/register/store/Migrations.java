package org.stasissheet.register.store;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;
import org.flywaydb.core.api.MigrationInfo;
import org.flywaydb.core.api.MigrationState;
import org.flywaydb.core.api.logging.Log;
import org.flywaydb.core.api.logging.LogCreator;
import org.flywaydb.core.api.logging.LogFactory;

/**
 * Brings the register's schema up to this program's version with Flyway: the tables are the same SQL for both
 * databases (an identity column is the one placeholder); the append-only triggers need each database's own
 * dialect and sit beside them under the same version number. A database already at a newer version, written by a
 * newer program, is refused before anything is changed.
 */
final class Migrations {
    static final String HISTORY_TABLE = "register_schema_history";
    private static final String ROOT = "classpath:org/stasissheet/register/migrations/";

    private Migrations() {
    }

    static void migrate(Connections connections) {
        LogFactory.setLogCreator(new Quiet());
        boolean sqlite = connections.isSqlite();
        RegisterLocation location = connections.location();
        String url = sqlite ? location.shown() : ((RegisterLocation.Postgres) location).url();
        String password = location instanceof RegisterLocation.Postgres pg ? pg.password().orElse(null) : null;
        Flyway flyway = Flyway.configure(Migrations.class.getClassLoader())
                .dataSource(url, null, password)
                .locations(ROOT + "common", ROOT + (sqlite ? "sqlite" : "postgresql"))
                .placeholders(Map.of("id_column", sqlite ? "INTEGER PRIMARY KEY AUTOINCREMENT"
                        : "BIGINT GENERATED ALWAYS AS IDENTITY PRIMARY KEY"))
                .table(HISTORY_TABLE)
                .loggers(Quiet.class.getName())
                .cleanDisabled(true)
                .validateMigrationNaming(true)
                .load();
        try {
            List<MigrationInfo> newer = Arrays.stream(flyway.info().all())
                    .filter(m -> m.getState() == MigrationState.FUTURE_SUCCESS
                            || m.getState() == MigrationState.FUTURE_FAILED)
                    .toList();
            if (!newer.isEmpty()) {
                MigrationInfo last = newer.get(newer.size() - 1);
                throw new RegisterUnavailable(location.shown() + ": this register was written by a newer version "
                        + "of Stasis Sheet (schema version " + last.getVersion() + "; this program knows up to "
                        + latestKnown(flyway) + "). It was not changed. Use the newer program, or another register "
                        + "with --db.");
            }
            // an up-to-date register is only read: the team's role needs no right to change the schema history
            if (flyway.info().pending().length > 0) {
                flyway.migrate();
            }
        } catch (FlywayException e) {
            throw new RegisterUnavailable(location.shown() + ": the register could not be opened or brought up "
                    + "to date (" + firstLine(e.getMessage()) + ")");
        }
    }

    private static String latestKnown(Flyway flyway) {
        return Arrays.stream(flyway.info().all())
                .filter(m -> !m.getState().name().startsWith("FUTURE"))
                .map(m -> m.getVersion().toString())
                .reduce((a, b) -> b).orElse("none");
    }

    static String firstLine(String message) {
        if (message == null) {
            return "no message";
        }
        String line = message.strip().lines().findFirst().orElse("");
        return line.length() > 300 ? line.substring(0, 300) + "…" : line;
    }

    /**
     * Flyway's progress lines are not the user's business; what matters reaches them as a message. Named to Flyway
     * by class, so it replaces whatever logger Flyway would have picked.
     */
    public static final class Quiet implements LogCreator, Log {
        @Override
        public Log createLogger(Class<?> type) {
            return this;
        }

        @Override
        public void debug(String message) {
        }

        @Override
        public void info(String message) {
        }

        @Override
        public void warn(String message) {
        }

        @Override
        public void error(String message) {
        }

        @Override
        public void error(String message, Exception e) {
        }

        @Override
        public void notice(String message) {
        }
    }
}
