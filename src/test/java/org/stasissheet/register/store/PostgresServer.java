package org.stasissheet.register.store;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.net.ServerSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.UserPrincipal;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Properties;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;

/**
 * A throwaway PostgreSQL server for the tests: the machine's own {@code initdb} and {@code pg_ctl} (Debian's
 * {@code postgresql} package; {@code .ci/run} installs it) on a free port in a temporary folder, with password
 * (SCRAM) authentication over TCP like a shared register. {@code initdb} refuses to run as root, so under root the
 * server runs as the {@code postgres} system user (made by the same package) through {@code runuser}.
 * Where no server can be started the tests are skipped, except under {@code CI=true}, where they fail.
 */
public final class PostgresServer implements AutoCloseable {
    public static final String OWNER = "stasis_owner";
    public static final String OWNER_PASSWORD = "owner-secret-for-tests";
    private static final AtomicInteger DATABASES = new AtomicInteger();

    private final Path bin;
    private final Path dir;
    private final int port;
    private final boolean asPostgresUser;

    private PostgresServer(Path bin, Path dir, int port, boolean asPostgresUser) {
        this.bin = bin;
        this.dir = dir;
        this.port = port;
        this.asPostgresUser = asPostgresUser;
    }

    public static PostgresServer start() {
        Path bin = findBin();
        if (bin == null) {
            unavailable("no PostgreSQL server binaries (initdb, pg_ctl) found; install the postgresql package");
        }
        boolean root = "root".equals(System.getProperty("user.name"));
        try {
            Path dir = Files.createTempDirectory("stasis-pg-");
            if (root) {
                UserPrincipal postgres = dir.getFileSystem().getUserPrincipalLookupService()
                        .lookupPrincipalByName("postgres");
                Files.setOwner(dir, postgres);
            }
            int port;
            try (ServerSocket s = new ServerSocket(0)) {
                port = s.getLocalPort();
            }
            PostgresServer server = new PostgresServer(bin, dir, port, root);
            Path pw = dir.resolve("pw");
            server.runAs(List.of("sh", "-c", "umask 077 && printf '%s\\n' \"$1\" > \"$2\"", "sh", OWNER_PASSWORD,
                    pw.toString()));
            server.runAs(List.of(bin.resolve("initdb").toString(), "-D", dir.resolve("data").toString(), "-U", OWNER,
                    "--auth-local=trust", "--auth-host=scram-sha-256", "--pwfile=" + pw, "-E", "UTF8",
                    "--no-locale", "--no-sync"));
            server.runAs(List.of(bin.resolve("pg_ctl").toString(), "-D", dir.resolve("data").toString(), "-l",
                    dir.resolve("server.log").toString(), "-w", "-t", "60", "-o",
                    "-p " + port + " -k " + dir + " -c listen_addresses=127.0.0.1 -c fsync=off", "start"));
            return server;
        } catch (IOException | InterruptedException | RuntimeException e) {
            unavailable("the PostgreSQL test server did not start: " + e.getMessage());
            return null;
        }
    }

    private static void unavailable(String why) {
        if ("true".equals(System.getenv("CI"))) {
            fail(why + " (CI=true: the PostgreSQL suite must run in CI, so this is a failure, not a skip)");
        }
        Assumptions.abort(why);
    }

    private static Path findBin() {
        String configured = System.getenv("STASIS_PG_BIN");
        if (configured != null && Files.isExecutable(Path.of(configured, "initdb"))) {
            return Path.of(configured);
        }
        Path root = Path.of("/usr/lib/postgresql");
        if (Files.isDirectory(root)) {
            try (Stream<Path> versions = Files.list(root)) {
                return versions.map(v -> v.resolve("bin")).filter(b -> Files.isExecutable(b.resolve("initdb")))
                        .max(Comparator.comparing((Path b) -> numeric(b.getParent().getFileName().toString())))
                        .orElse(null);
            } catch (IOException e) {
                return null;
            }
        }
        return null;
    }

    private static int numeric(String s) {
        try {
            return Integer.parseInt(s);
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    private void runAs(List<String> command) throws IOException, InterruptedException {
        List<String> full = new ArrayList<>();
        if (asPostgresUser) {
            full.addAll(List.of("runuser", "-u", "postgres", "--"));
        }
        full.addAll(command);
        Process p = new ProcessBuilder(full).redirectErrorStream(true).start();
        byte[] out = p.getInputStream().readAllBytes();
        if (!p.waitFor(120, TimeUnit.SECONDS) || p.exitValue() != 0) {
            throw new IOException(command.get(0) + " failed: " + new String(out, StandardCharsets.UTF_8).strip());
        }
    }

    /** A new, empty database on this server, for one test. */
    public String newDatabase() {
        String name = "register_" + DATABASES.incrementAndGet();
        try (Connection c = ownerConnection("postgres"); Statement st = c.createStatement()) {
            st.execute("CREATE DATABASE " + name);
        } catch (SQLException e) {
            throw new IllegalStateException(e);
        }
        return name;
    }

    /** The URL a user would give with {@code --db}: no password in it. */
    public String url(String database, String user) {
        return "jdbc:postgresql://127.0.0.1:" + port + "/" + database + "?user=" + user;
    }

    public int port() {
        return port;
    }

    public Connection ownerConnection(String database) throws SQLException {
        Properties p = new Properties();
        p.setProperty("user", OWNER);
        p.setProperty("password", OWNER_PASSWORD);
        return DriverManager.getConnection("jdbc:postgresql://127.0.0.1:" + port + "/" + database, p);
    }

    @Override
    public void close() {
        try {
            runAs(List.of(bin.resolve("pg_ctl").toString(), "-D", dir.resolve("data").toString(), "-m", "immediate",
                    "-w", "stop"));
        } catch (IOException | InterruptedException e) {
            // the folder goes below either way; a server left running would hold only test data
        }
        try (Stream<Path> all = Files.walk(dir)) {
            all.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a leftover temporary folder holds only invented test data
        }
    }
}
