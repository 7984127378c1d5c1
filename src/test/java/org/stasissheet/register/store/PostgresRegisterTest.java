package org.stasissheet.register.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.register.Decision;
import org.stasissheet.register.DecisionOutcome;

/**
 * The register contract on a real PostgreSQL server started for this class (see {@link PostgresServer}), with the
 * password from the environment variable, and the team role with README's grants.
 */
class PostgresRegisterTest extends RegisterContract {
    static PostgresServer server;
    private String database;

    @BeforeAll
    static void startServer() {
        server = PostgresServer.start();
    }

    @AfterAll
    static void stopServer() {
        if (server != null) {
            server.close();
        }
    }

    @Override
    Optional<String> freshDb() {
        database = server.newDatabase();
        return Optional.of(server.url(database, PostgresServer.OWNER));
    }

    @Override
    Map<String, String> environment() {
        return Map.of(RegisterLocation.PASSWORD_VARIABLE, PostgresServer.OWNER_PASSWORD);
    }

    @Override
    Connection raw(Optional<String> db) throws SQLException {
        return server.ownerConnection(database);
    }

    @Override
    void assertSound(Optional<String> db) throws SQLException {
        // PostgreSQL recovers on the server side; a killed client's session ends when the server sees the socket
        // close, which may take a moment: wait up to 10 s for its transaction to be gone
        int open = -1;
        for (int i = 0; i < 100 && open != 0; i++) {
            try (Connection c = raw(db); Statement st = c.createStatement();
                 java.sql.ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM pg_stat_activity WHERE state LIKE "
                         + "'idle in transaction%' AND datname = current_database()")) {
                rs.next();
                open = rs.getInt(1);
            }
            if (open != 0) {
                try {
                    Thread.sleep(100);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    break;
                }
            }
        }
        assertEquals(0, open, "no transaction of the killed writer is left open");
    }

    @Override
    String trueLiteral() {
        return "true";
    }

    @Test
    @DisplayName("without a password from the environment or a .pgpass file the server refuses, and the message says so")
    void noPassword_isAClearRefusal() {
        Optional<String> db = freshDb();
        RegisterUnavailable e = assertThrows(RegisterUnavailable.class,
                () -> Register.open(db, temp, Map.of()));
        assertTrue(e.getMessage().contains(db.orElseThrow()), e.getMessage());
        assertTrue(!e.getMessage().contains(PostgresServer.OWNER_PASSWORD));
    }

    @Test
    @DisplayName("a .pgpass-style file gives the password (read by the PostgreSQL driver)")
    void pgpassFile_givesThePassword() throws Exception {
        Optional<String> db = freshDb();
        Path pgpass = temp.resolve("pgpass");
        // the PostgreSQL .pgpass format: hostname:port:database:username:password
        Files.writeString(pgpass, "127.0.0.1:" + server.port() + ":*:" + PostgresServer.OWNER + ":"
                + PostgresServer.OWNER_PASSWORD + "\n");
        String previous = System.getProperty("org.postgresql.pgpassfile");
        System.setProperty("org.postgresql.pgpassfile", pgpass.toString());
        try {
            Register r = Register.open(db, temp, Map.of());
            r.add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
            assertEquals(1, r.list(true).size());
        } finally {
            if (previous == null) {
                System.clearProperty("org.postgresql.pgpassfile");
            } else {
                System.setProperty("org.postgresql.pgpassfile", previous);
            }
        }
    }

    @Test
    @DisplayName("the team role with README's grants uses the register, and cannot change history even without triggers")
    void teamRole_withReadmeGrants_worksAndCannotRewriteHistory() throws Exception {
        Optional<String> ownerDb = freshDb();
        long id = Register.open(ownerDb, temp, environment())
                .add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
        String role = "stasis_team_" + database;
        try (Connection c = raw(ownerDb); Statement st = c.createStatement()) {
            // the grants README gives for a shared register, word for word
            for (String sql : List.of(
                    "CREATE ROLE " + role + " LOGIN PASSWORD 'team-secret'",
                    "GRANT CONNECT ON DATABASE " + database + " TO " + role,
                    "GRANT USAGE ON SCHEMA public TO " + role,
                    "GRANT SELECT ON register_schema_history TO " + role,
                    "GRANT SELECT, INSERT, UPDATE ON referral TO " + role,
                    "GRANT SELECT, INSERT ON referral_event TO " + role)) {
                st.execute(sql);
            }
        }
        Register team = Register.open(Optional.of(server.url(database, role)), temp,
                Map.of(RegisterLocation.PASSWORD_VARIABLE, "team-secret"));
        long second = team.add(RegisterFixtures.referral(RegisterFixtures.REVIEW_CASE, T0));
        assertInstanceOf(DecisionOutcome.Recorded.class,
                team.decide(decision(id, OptionalInt.of(1), Decision.ACCEPTED, "Invented team member")));
        assertEquals(List.of(id, second), team.list(false).stream().map(r -> r.id()).toList());
        try (Connection c = new org.postgresql.Driver().connect(server.url(database, role),
                props("team-secret")); Statement st = c.createStatement()) {
            SQLException denied = assertThrows(SQLException.class,
                    () -> st.executeUpdate("ALTER TABLE referral_event DISABLE TRIGGER ALL"));
            assertTrue(denied.getMessage().contains("must be owner"), denied.getMessage());
            assertThrows(SQLException.class, () -> st.executeUpdate("DELETE FROM referral_event"));
        }
    }

    private static java.util.Properties props(String password) {
        java.util.Properties p = new java.util.Properties();
        p.setProperty("password", password);
        return p;
    }
}
