package org.stasissheet.register.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.files.AtomicFiles;
import org.stasissheet.files.FileWriteException;
import org.stasissheet.intake.Enums;
import org.stasissheet.register.Change;
import org.stasissheet.register.Decision;
import org.stasissheet.register.DecisionOutcome;
import org.stasissheet.register.DecisionRequest;
import org.stasissheet.register.NewReferral;
import org.stasissheet.register.Procedure;
import org.stasissheet.register.Referral;
import org.stasissheet.register.RegisterAccess;
import org.stasissheet.register.RegisterEvent;
import org.stasissheet.register.RegisterTime;
import org.stasissheet.register.Snapshot;
import org.stasissheet.register.Urgency;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.Provenance;

/**
 * The referral register in its database, with plain JDBC: every operation opens a connection, does its work in
 * one transaction and closes it, so a crash at any point leaves either all of a change or none of it, and no
 * session state outlives a call. A decision is saved only on the version the decider saw (optimistic check);
 * every change appends history events, which the database itself refuses to change or remove.
 */
public final class Register implements RegisterAccess {
    private static final String COLUMNS = "id, version, received_at, referrer, location, procedure_asked, "
            + "patient_label, case_json, rule_set_name, rule_set_version, rule_set_sha256, highest_level, "
            + "hyperviscosity, leukostasis, tumor_lysis, top_flag, decision, decided_by, decided_at, planned_slot, "
            + "vascular_access, replacement_fluid, decision_note, added_by, added_at";

    private final Connections connections;

    private Register(Connections connections) {
        this.connections = connections;
    }

    /**
     * Opens the register named by {@code --db} (empty: the SQLite file in {@code dataFolder}), creating or
     * updating its schema; a register written by a newer program is refused untouched.
     *
     * @param environment where the password variable is read from
     */
    public static Register open(Optional<String> db, Path dataFolder, Map<String, String> environment) {
        Connections connections = new Connections(RegisterLocation.of(db, dataFolder, environment));
        connections.prepare();
        Migrations.migrate(connections);
        return new Register(connections);
    }

    /** The database as it may be shown (never with a password). */
    @Override
    public String shown() {
        return connections.location().shown();
    }

    public boolean isSqlite() {
        return connections.isSqlite();
    }

    /** Adds a referral, pending, with its {@code received} event; returns its id. */
    public long add(NewReferral r) {
        return inTransaction("add the referral", c -> {
            long id;
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO referral (version, received_at, referrer, "
                    + "location, procedure_asked, patient_label, case_json, rule_set_name, rule_set_version, "
                    + "rule_set_sha256, highest_level, urgency_rank, hyperviscosity, leukostasis, tumor_lysis, "
                    + "top_flag, decision, added_by, added_at) VALUES (1, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, "
                    + "?, ?, ?, ?) RETURNING id")) {
                Snapshot s = r.snapshot();
                int i = 1;
                ps.setString(i++, RegisterTime.format(r.receivedAt()));
                ps.setString(i++, r.referrer());
                ps.setString(i++, r.location());
                ps.setString(i++, r.procedure().code());
                ps.setString(i++, s.patientLabel());
                ps.setString(i++, s.caseJson());
                ps.setString(i++, s.ruleSet().name());
                ps.setString(i++, s.ruleSet().version());
                ps.setString(i++, s.ruleSet().sha256());
                ps.setString(i++, Urgency.code(s.highestLevel()));
                ps.setInt(i++, Urgency.rank(s.highestLevel()));
                ps.setString(i++, s.hyperviscosity());
                ps.setString(i++, s.leukostasis());
                ps.setString(i++, s.tumorLysis());
                ps.setString(i++, s.topFlag());
                ps.setString(i++, Decision.PENDING.code());
                ps.setString(i++, r.addedBy());
                ps.setString(i, RegisterTime.format(r.addedAt()));
                try (ResultSet rs = ps.executeQuery()) {
                    rs.next();
                    id = rs.getLong(1);
                }
            }
            appendEvent(c, id, r.addedAt(), r.addedBy(),
                    new Change(RegisterEvent.RECEIVED, "", Decision.PENDING.code()));
            return id;
        });
    }

    /** Every referral (or only the open ones), most urgent first, then the earliest received. */
    @Override
    public List<Referral> list(boolean openOnly) {
        String where = openOnly ? " WHERE decision IN ('pending', 'deferred', 'more-information')" : "";
        List<Referral> out = inTransaction("list the referrals", c -> {
            List<Referral> rows = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT " + COLUMNS + " FROM referral" + where
                    + " ORDER BY urgency_rank, received_at, id");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    rows.add(referral(rs));
                }
            }
            return rows;
        });
        // the stored rank and text times already give this order; sorting again keeps one definition in charge
        List<Referral> sorted = new ArrayList<>(out);
        sorted.sort(Urgency.MOST_URGENT_FIRST);
        return List.copyOf(sorted);
    }

    public Optional<Referral> find(long id) {
        return inTransaction("read referral " + id, c -> read(c, id, false));
    }

    /** A referral's events, oldest first; empty when there is no such referral. */
    @Override
    public List<RegisterEvent> history(long id) {
        return inTransaction("read the history of referral " + id, c -> {
            List<RegisterEvent> events = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT id, referral_id, at, actor, what, from_value, "
                    + "to_value FROM referral_event WHERE referral_id = ? ORDER BY id")) {
                ps.setLong(1, id);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        events.add(new RegisterEvent(rs.getLong(1), rs.getLong(2), RegisterTime.parse(rs.getString(3)),
                                rs.getString(4), rs.getString(5), rs.getString(6), rs.getString(7)));
                    }
                }
            }
            return List.copyOf(events);
        });
    }

    /**
     * Records a decision if the referral is still what the decider saw: the version they name, or, when they
     * name none, still pending. Otherwise nothing is saved and the conflict says what it is now.
     */
    @Override
    public DecisionOutcome decide(DecisionRequest request) {
        return inTransaction("record the decision on referral " + request.referralId(), c -> {
            Optional<Referral> found = read(c, request.referralId(), true);
            if (found.isEmpty()) {
                return new DecisionOutcome.NotFound(request.referralId());
            }
            Referral before = found.get();
            boolean seen = request.seenVersion().isPresent()
                    ? request.seenVersion().getAsInt() == before.version()
                    : before.decision() == Decision.PENDING;
            if (!seen) {
                return new DecisionOutcome.Conflict(before, request);
            }
            Referral.DecisionRecord d = request.record();
            try (PreparedStatement ps = c.prepareStatement("UPDATE referral SET version = version + 1, decision = ?, "
                    + "decided_by = ?, decided_at = ?, planned_slot = ?, vascular_access = ?, replacement_fluid = ?, "
                    + "decision_note = ? WHERE id = ? AND version = ?")) {
                ps.setString(1, request.decision().code());
                ps.setString(2, d.by());
                ps.setString(3, RegisterTime.format(d.at()));
                ps.setString(4, d.plannedSlot().map(RegisterTime::format).orElse(null));
                ps.setString(5, d.vascularAccess());
                ps.setString(6, d.replacementFluid());
                ps.setString(7, d.note());
                ps.setLong(8, before.id());
                ps.setInt(9, before.version());
                if (ps.executeUpdate() != 1) {
                    // another writer got in between the read and the update (the row lock makes this rare)
                    c.rollback();
                    return new DecisionOutcome.Conflict(read(c, before.id(), false).orElse(before), request);
                }
            }
            for (Change change : Change.of(before, request)) {
                appendEvent(c, before.id(), d.at(), d.by(), change);
            }
            return new DecisionOutcome.Recorded(read(c, before.id(), false).orElseThrow());
        });
    }

    /**
     * A number that changes whenever the register does (every change appends an event, and event ids only grow):
     * the form polls it to know when to reload.
     */
    @Override
    public long changeStamp() {
        return inTransaction("read the register", c -> {
            try (Statement st = c.createStatement();
                 ResultSet rs = st.executeQuery("SELECT COALESCE(MAX(id), 0) FROM referral_event")) {
                rs.next();
                return rs.getLong(1);
            }
        });
    }

    /**
     * A consistent copy of the SQLite register ({@code VACUUM INTO}, which reads one snapshot), written owner-only
     * and atomically to {@code target}: an existing file there is replaced only by a complete copy.
     */
    public void backup(Path target) throws FileWriteException {
        if (!isSqlite()) {
            throw new RegisterUnavailable("register backup copies the SQLite file; for a PostgreSQL register use the "
                    + "server's own tools (pg_dump), which know its roles and grants");
        }
        Path scratch;
        try {
            scratch = Files.createTempDirectory("stasis-register-backup",
                    PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rwx------")));
        } catch (IOException | UnsupportedOperationException e) {
            throw new RegisterUnavailable("cannot make a scratch folder for the backup (" + e.getClass().getSimpleName()
                    + ")");
        }
        Path copy = scratch.resolve("register-copy.sqlite");
        try {
            inTransaction("copy the register", c -> {
                c.commit();
                c.setAutoCommit(true);
                try (PreparedStatement ps = c.prepareStatement("VACUUM INTO ?")) {
                    ps.setString(1, copy.toString());
                    ps.execute();
                }
                return null;
            });
            AtomicFiles.write(target, Files.readAllBytes(copy), AtomicFiles.Access.OWNER_ONLY);
        } catch (IOException e) {
            throw new FileWriteException("cannot write " + target + ": " + e.getClass().getSimpleName(), e);
        } finally {
            try {
                Files.deleteIfExists(copy);
                Files.deleteIfExists(scratch);
            } catch (IOException e) {
                // a leftover scratch copy is owner-only in the temporary folder; nothing more to do
            }
        }
    }

    private Optional<Referral> read(Connection c, long id, boolean forUpdate) throws SQLException {
        // PostgreSQL locks the row until commit; SQLite already holds the write lock (immediate transactions)
        String lock = forUpdate && !isSqlite() ? " FOR UPDATE" : "";
        try (PreparedStatement ps = c.prepareStatement("SELECT " + COLUMNS + " FROM referral WHERE id = ?" + lock)) {
            ps.setLong(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(referral(rs)) : Optional.empty();
            }
        }
    }

    private static void appendEvent(Connection c, long referralId, Instant at, String actor, Change change)
            throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO referral_event (referral_id, at, actor, what, "
                + "from_value, to_value) VALUES (?, ?, ?, ?, ?, ?)")) {
            ps.setLong(1, referralId);
            ps.setString(2, RegisterTime.format(at));
            ps.setString(3, actor);
            ps.setString(4, change.what());
            ps.setString(5, change.from());
            ps.setString(6, change.to());
            ps.executeUpdate();
        }
    }

    private static Referral referral(ResultSet rs) throws SQLException {
        Optional<Level> level = Enums.parse(Level.class, text(rs, "highest_level"));
        Snapshot snapshot = new Snapshot(text(rs, "patient_label"), text(rs, "case_json"),
                new Provenance(text(rs, "rule_set_name"), text(rs, "rule_set_version"), text(rs, "rule_set_sha256"),
                        false),
                level, text(rs, "hyperviscosity"), text(rs, "leukostasis"), text(rs, "tumor_lysis"),
                text(rs, "top_flag"));
        Decision decision = Decision.fromCode(text(rs, "decision")).orElseThrow(
                () -> new SQLException("unknown decision word in the register"));
        Optional<Referral.DecisionRecord> record = Optional.empty();
        if (decision != Decision.PENDING) {
            record = Optional.of(new Referral.DecisionRecord(text(rs, "decided_by"),
                    RegisterTime.parse(text(rs, "decided_at")),
                    Optional.ofNullable(rs.getString("planned_slot")).map(RegisterTime::parse),
                    text(rs, "vascular_access"), text(rs, "replacement_fluid"), text(rs, "decision_note")));
        }
        return new Referral(rs.getLong("id"), rs.getInt("version"), RegisterTime.parse(text(rs, "received_at")),
                text(rs, "referrer"), text(rs, "location"),
                Procedure.fromCode(text(rs, "procedure_asked")).orElse(Procedure.NOT_STATED), snapshot, decision,
                record, text(rs, "added_by"), RegisterTime.parse(text(rs, "added_at")));
    }

    private static String text(ResultSet rs, String column) {
        try {
            String s = rs.getString(column);
            return s == null ? "" : s;
        } catch (SQLException e) {
            throw new IllegalStateException("column " + column + " could not be read", e);
        }
    }

    /** Work inside one transaction on a fresh connection. */
    private interface Work<T> {
        T run(Connection c) throws SQLException;
    }

    private <T> T inTransaction(String action, Work<T> work) {
        try (Connection c = connections.open()) {
            c.setAutoCommit(false);
            try {
                T result = work.run(c);
                if (!c.getAutoCommit()) {
                    c.commit();
                }
                return result;
            } catch (SQLException | RuntimeException e) {
                if (!c.getAutoCommit()) {
                    c.rollback();
                }
                throw e;
            }
        } catch (SQLException e) {
            throw new RegisterUnavailable("cannot " + action + " in " + shown() + " (" + describe(e) + ")");
        }
    }

    /** The database's own words, first line only: PostgreSQL puts row values on later lines ("Detail: ..."). */
    static String describe(SQLException e) {
        String state = e.getSQLState() == null ? "" : "SQL state " + e.getSQLState() + ": ";
        return state + Migrations.firstLine(e.getMessage());
    }
}
