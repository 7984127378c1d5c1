package org.stasissheet.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.stasissheet.register.store.PostgresServer;

/**
 * The register commands against a real PostgreSQL server; the password comes from a .pgpass-format file, as a
 * user's would (the driver reads it; here named by the driver's own system property instead of PGPASSFILE).
 */
class PostgresRegisterCommandTest extends RegisterCommandContract {
    static PostgresServer server;
    private String previous;

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

    @BeforeEach
    void pgpass() throws Exception {
        Path file = temp.resolve("pgpass");
        // the .pgpass format: hostname:port:database:username:password
        Files.writeString(file, "127.0.0.1:" + server.port() + ":*:" + PostgresServer.OWNER + ":"
                + PostgresServer.OWNER_PASSWORD + "\n");
        previous = System.getProperty("org.postgresql.pgpassfile");
        System.setProperty("org.postgresql.pgpassfile", file.toString());
    }

    @AfterEach
    void restore() {
        if (previous == null) {
            System.clearProperty("org.postgresql.pgpassfile");
        } else {
            System.setProperty("org.postgresql.pgpassfile", previous);
        }
    }

    @Override
    String db() {
        return server.url(server.newDatabase(), PostgresServer.OWNER);
    }
}
