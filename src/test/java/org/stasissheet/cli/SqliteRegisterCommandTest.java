package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The register commands on SQLite files in a temporary folder, and the SQLite-only backup command. */
class SqliteRegisterCommandTest extends RegisterCommandContract {
    private final AtomicInteger n = new AtomicInteger();

    @Override
    String db() {
        return "jdbc:sqlite:" + temp.resolve("register-" + n.incrementAndGet() + ".sqlite");
    }

    @Test
    @DisplayName("register backup writes a copy that opens as a register with the same referrals")
    void backup_copyOpensAsRegister() throws Exception {
        String db = db();
        assertEquals(ExitCode.DONE, run("register", "add", "samples/igm-symptomatic.json", "--db", db));
        Path copy = temp.resolve("backup.sqlite");
        assertEquals(ExitCode.DONE, run("register", "backup", copy.toString(), "--db", db));
        assertEquals(ExitCode.DONE, run("register", "list", "--csv", "--db", "jdbc:sqlite:" + copy));
        assertEquals(2, parseCsv(run0()).size());
    }

    @Test
    @DisplayName("a password in --db is refused before any connection, without echoing it")
    void passwordInUrl_isRefused() {
        assertEquals(ExitCode.INVALID_INPUT, run("register", "list", "--db",
                "jdbc:postgresql://127.0.0.1:1/r?user=a&password=hunter2"));
        String e = errText();
        assertTrue(e.startsWith("--db: the URL carries a password"), e);
        assertTrue(!e.contains("hunter2"), e);
    }
}
