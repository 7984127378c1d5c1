package org.stasissheet.register.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.register.Decision;
import org.stasissheet.register.DecisionOutcome;
import org.stasissheet.register.DecisionRequest;
import org.stasissheet.register.Referral;
import org.stasissheet.register.RegisterEvent;
import org.stasissheet.rules.Level;

/**
 * What every register database must do, run against a real SQLite file and a real PostgreSQL server by the two
 * subclasses. Raw SQL (not the tool's code) checks what the database itself enforces.
 */
abstract class RegisterContract {
    static final Instant T0 = Instant.parse("2026-03-05T01:40:00Z");

    @TempDir
    Path temp;

    /** The {@code --db} value of a fresh, empty register. */
    abstract Optional<String> freshDb();

    abstract Map<String, String> environment();

    /** A connection to the same database that bypasses the tool (as its owner). */
    abstract Connection raw(Optional<String> db) throws SQLException;

    Register open(Optional<String> db) {
        return Register.open(db, temp.resolve("data"), environment());
    }

    static DecisionRequest decision(long id, OptionalInt seen, Decision d, String by) {
        return new DecisionRequest(id, seen, d, new Referral.DecisionRecord(by, T0.plusSeconds(3600), Optional.empty(),
                "", "", ""));
    }

    @Test
    @DisplayName("list: most urgent level first, then the earliest received, then the lowest id")
    void list_ordersByUrgencyThenReceivedTime() {
        Register r = open(freshDb());
        long reviewEarly = r.add(RegisterFixtures.referral(RegisterFixtures.REVIEW_CASE, T0));
        long actLate = r.add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0.plusSeconds(600)));
        long actEarly = r.add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0.plusSeconds(60)));
        assertEquals(List.of(actEarly, actLate, reviewEarly), r.list(false).stream().map(Referral::id).toList());
        // the levels come from the shipped rules on the demo cases (see RegisterFixtures)
        assertEquals(Optional.of(Level.ACT_NOW), r.find(actEarly).orElseThrow().snapshot().highestLevel());
        assertEquals(Optional.of(Level.REVIEW), r.find(reviewEarly).orElseThrow().snapshot().highestLevel());
    }

    @Test
    @DisplayName("a referral keeps the case JSON it was assessed on and the rule set's name, version and SHA-256")
    void add_keepsTheSnapshot() {
        Register r = open(freshDb());
        long id = r.add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
        Referral back = r.find(id).orElseThrow();
        String json = RegisterFixtures.caseJson(RegisterFixtures.ACT_NOW_CASE);
        assertEquals(json, back.snapshot().caseJson());
        assertInstanceOf(CaseReader.Accepted.class, CaseReader.read(back.snapshot().caseJson()
                .getBytes(StandardCharsets.UTF_8)), "the stored case reads back");
        assertEquals(RuleSources.shippedSha256(), back.snapshot().ruleSet().sha256());
        assertEquals(RegisterFixtures.SHIPPED.provenance().version(), back.snapshot().ruleSet().version());
        assertEquals(T0, back.receivedAt());
        assertEquals(Decision.PENDING, back.decision());
        assertEquals(1, back.version());
        List<RegisterEvent> events = r.history(id);
        assertEquals(1, events.size());
        assertEquals(RegisterEvent.RECEIVED, events.get(0).what());
    }

    @Test
    @DisplayName("a decision raises the version and appends one event per changed field, with who and when")
    void decide_recordsAndAppendsEvents() {
        Register r = open(freshDb());
        long id = r.add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
        Instant slot = T0.plusSeconds(4 * 3600);
        DecisionOutcome outcome = r.decide(new DecisionRequest(id, OptionalInt.of(1), Decision.ACCEPTED,
                new Referral.DecisionRecord("Invented consultant", T0.plusSeconds(1800), Optional.of(slot),
                        "central venous catheter", "albumin 5 %", "urgent")));
        Referral now = assertInstanceOf(DecisionOutcome.Recorded.class, outcome).referral();
        assertEquals(2, now.version());
        assertEquals(Decision.ACCEPTED, now.decision());
        assertEquals(Optional.of(slot), now.decisionRecord().orElseThrow().plannedSlot());
        List<RegisterEvent> events = r.history(id);
        assertEquals(List.of("received", "decision", "slot", "access", "fluid", "note"),
                events.stream().map(RegisterEvent::what).toList());
        assertEquals("pending", events.get(1).from());
        assertEquals("accepted", events.get(1).to());
        assertEquals("Invented consultant", events.get(1).actor());
        assertEquals(T0.plusSeconds(1800), events.get(1).at());
        assertEquals(List.of(id), r.list(false).stream().map(Referral::id).toList());
        assertEquals(List.of(), r.list(true), "an accepted referral is no longer open");
    }

    @Test
    @DisplayName("two clinicians decide on the same version: the second gets a conflict and nothing of theirs is saved")
    void decide_secondOnSameVersion_conflicts() {
        Register r = open(freshDb());
        long id = r.add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
        assertInstanceOf(DecisionOutcome.Recorded.class,
                r.decide(decision(id, OptionalInt.of(1), Decision.ACCEPTED, "Invented A")));
        DecisionOutcome second = r.decide(decision(id, OptionalInt.of(1), Decision.DECLINED, "Invented B"));
        DecisionOutcome.Conflict conflict = assertInstanceOf(DecisionOutcome.Conflict.class, second);
        assertTrue(conflict.message().contains("now version 2: accepted by Invented A"), conflict.message());
        assertTrue(conflict.message().contains("Nothing was saved"), conflict.message());
        assertEquals(Decision.ACCEPTED, r.find(id).orElseThrow().decision());
        assertEquals(2, r.history(id).size(), "received + decision; the refused one left no event");
        // without a version a decision is taken only while pending
        assertInstanceOf(DecisionOutcome.Conflict.class,
                r.decide(decision(id, OptionalInt.empty(), Decision.DEFERRED, "Invented C")));
        // naming the version now seen, a change goes through
        assertInstanceOf(DecisionOutcome.Recorded.class,
                r.decide(decision(id, OptionalInt.of(2), Decision.DEFERRED, "Invented C")));
        assertInstanceOf(DecisionOutcome.NotFound.class,
                r.decide(decision(999, OptionalInt.empty(), Decision.DEFERRED, "Invented C")));
    }

    @Test
    @DisplayName("eight deciders at once on version 1: exactly one is recorded, seven get a conflict")
    void decide_concurrently_exactlyOneWins() throws Exception {
        Optional<String> db = freshDb();
        long id = open(db).add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
        int n = 8;
        ExecutorService pool = Executors.newFixedThreadPool(n);
        CountDownLatch go = new CountDownLatch(1);
        try {
            List<Future<DecisionOutcome>> results = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                String who = "Invented decider " + i;
                Callable<DecisionOutcome> task = () -> {
                    Register own = open(db);
                    go.await();
                    return own.decide(decision(id, OptionalInt.of(1), Decision.ACCEPTED, who));
                };
                results.add(pool.submit(task));
            }
            go.countDown();
            int recorded = 0;
            int conflicts = 0;
            for (Future<DecisionOutcome> f : results) {
                DecisionOutcome o = f.get();
                if (o instanceof DecisionOutcome.Recorded) {
                    recorded++;
                } else if (o instanceof DecisionOutcome.Conflict) {
                    conflicts++;
                }
            }
            assertEquals(1, recorded);
            assertEquals(n - 1, conflicts);
            assertEquals(2, open(db).find(id).orElseThrow().version());
            assertEquals(2, open(db).history(id).size());
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    @DisplayName("the database itself refuses to change or remove history, remove a referral or change its snapshot")
    void appendOnly_isEnforcedByTheDatabase() throws Exception {
        Optional<String> db = freshDb();
        Register r = open(db);
        long id = r.add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
        r.decide(decision(id, OptionalInt.of(1), Decision.ACCEPTED, "Invented A"));
        try (Connection c = raw(db)) {
            for (String sql : List.of("UPDATE referral_event SET actor = 'someone else'",
                    "UPDATE referral_event SET to_value = 'declined' WHERE what = 'decision'",
                    "DELETE FROM referral_event",
                    "DELETE FROM referral",
                    "UPDATE referral SET case_json = '{}'",
                    "UPDATE referral SET rule_set_sha256 = 'x', version = version + 1",
                    "UPDATE referral SET decision = 'declined', version = 1")) {
                try (Statement st = c.createStatement()) {
                    assertThrows(SQLException.class, () -> st.executeUpdate(sql), sql);
                }
            }
            try (Statement st = c.createStatement();
                 ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM referral_event WHERE actor = 'Invented A'")) {
                rs.next();
                assertEquals(1, rs.getInt(1), "the history is as it was");
            }
        }
        assertEquals(2, r.history(id).size());
        assertEquals(RegisterFixtures.caseJson(RegisterFixtures.ACT_NOW_CASE),
                r.find(id).orElseThrow().snapshot().caseJson());
    }

    @Test
    @DisplayName("a register written by a newer schema version is refused with a clear message and left unchanged")
    void newerSchema_isRefusedUntouched() throws Exception {
        Optional<String> db = freshDb();
        long id = open(db).add(RegisterFixtures.referral(RegisterFixtures.ACT_NOW_CASE, T0));
        try (Connection c = raw(db); Statement st = c.createStatement()) {
            st.executeUpdate("INSERT INTO " + Migrations.HISTORY_TABLE + " (installed_rank, version, description, "
                    + "type, script, checksum, installed_by, execution_time, success) VALUES (99, '99', 'from a "
                    + "newer program', 'SQL', 'V99__newer.sql', 0, 'a newer program', 1, "
                    + trueLiteral() + ")");
        }
        String before = fingerprint(db);
        RegisterUnavailable e = assertThrows(RegisterUnavailable.class, () -> open(db));
        assertTrue(e.getMessage().contains("written by a newer version of Stasis Sheet (schema version 99; this "
                + "program knows up to 2)"), e.getMessage());
        assertTrue(e.getMessage().contains("It was not changed"), e.getMessage());
        assertEquals(before, fingerprint(db), "nothing in the database changed");
        assertTrue(before.contains("referral " + id), before);
    }

    @Test
    @DisplayName("kill -9 of a writing process mid-batch, then reopen: every referral is whole, none is partial")
    void killedWriter_leavesNoPartialReferral() throws Exception {
        Optional<String> db = freshDb();
        open(db);
        List<String> command = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), RegisterWriterProcess.class.getName(), db.orElseThrow(),
                temp.resolve("data").toString());
        ProcessBuilder pb = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD);
        pb.environment().putAll(environment());
        Process writer = pb.start();
        int seen = 0;
        try (var lines = new java.io.BufferedReader(new java.io.InputStreamReader(writer.getInputStream(),
                StandardCharsets.UTF_8))) {
            while (seen < 25 && lines.readLine() != null) {
                seen++;
            }
            // SIGKILL on POSIX: no shutdown hook, no finally block, no chance to tidy up
            writer.destroyForcibly();
            writer.waitFor();
        }
        assertEquals(25, seen, "the writer was adding referrals when it was killed");
        assertSound(db);
        Register after = open(db);
        List<Referral> all = after.list(false);
        assertTrue(all.size() >= 25, "every referral whose id was printed was committed: " + all.size());
        try (Connection c = raw(db); Statement st = c.createStatement()) {
            try (ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM referral r WHERE (SELECT COUNT(*) FROM "
                    + "referral_event e WHERE e.referral_id = r.id AND e.what = 'received') <> 1")) {
                rs.next();
                assertEquals(0, rs.getInt(1), "every referral has exactly one received event");
            }
            try (ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM referral_event e WHERE NOT EXISTS "
                    + "(SELECT 1 FROM referral r WHERE r.id = e.referral_id)")) {
                rs.next();
                assertEquals(0, rs.getInt(1), "no event without its referral");
            }
        }
        for (Referral r : all) {
            String sample = r.snapshot().highestLevel().equals(Optional.of(Level.ACT_NOW))
                    ? RegisterFixtures.ACT_NOW_CASE : RegisterFixtures.REVIEW_CASE;
            assertEquals(RegisterFixtures.caseJson(sample), r.snapshot().caseJson(), "referral " + r.id());
        }
        assertInstanceOf(DecisionOutcome.Recorded.class, after.decide(decision(all.get(0).id(), OptionalInt.empty(),
                Decision.ACCEPTED, "Invented A")), "the register is usable after the crash");
    }

    /** The database's own consistency check after a crash, where it has one. */
    abstract void assertSound(Optional<String> db) throws SQLException;

    /** SQLite stores booleans as integers. */
    abstract String trueLiteral();

    /** Every row of the schema history, the referrals and the events, as text. */
    String fingerprint(Optional<String> db) throws SQLException {
        StringBuilder sb = new StringBuilder();
        try (Connection c = raw(db); Statement st = c.createStatement()) {
            for (String q : List.of("SELECT installed_rank, version, checksum FROM " + Migrations.HISTORY_TABLE
                    + " ORDER BY installed_rank", "SELECT id, version, decision FROM referral ORDER BY id",
                    "SELECT id, what, to_value FROM referral_event ORDER BY id")) {
                try (ResultSet rs = st.executeQuery(q)) {
                    int cols = rs.getMetaData().getColumnCount();
                    while (rs.next()) {
                        if (q.contains("FROM referral ")) {
                            sb.append("referral ");
                        }
                        for (int i = 1; i <= cols; i++) {
                            sb.append(rs.getString(i)).append('|');
                        }
                        sb.append('\n');
                    }
                }
            }
        }
        return sb.toString();
    }
}
