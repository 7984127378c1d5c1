package org.stasissheet.cli;

import org.stasissheet.load.InvalidInputException;
import org.stasissheet.load.Inputs;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneId;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.stasissheet.files.AtomicFiles;
import org.stasissheet.files.DataFolder;
import org.stasissheet.files.FileWriteException;
import org.stasissheet.register.Decision;
import org.stasissheet.register.DecisionOutcome;
import org.stasissheet.register.DecisionRequest;
import org.stasissheet.register.NewReferral;
import org.stasissheet.register.Procedure;
import org.stasissheet.register.Referral;
import org.stasissheet.register.RegisterReport;
import org.stasissheet.register.RegisterTime;
import org.stasissheet.register.Snapshot;
import org.stasissheet.register.store.Register;
import org.stasissheet.register.store.RegisterUnavailable;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;
import picocli.CommandLine;

/**
 * What the register commands do, apart from their option classes so the database classes load only when one runs.
 * The clock, the time zone and the user name are read here, at the edge.
 */
final class RegisterRuns {
    private RegisterRuns() {
    }

    static Register open(Optional<String> db) {
        try {
            return Register.open(db, DataFolder.resolve(), System.getenv());
        } catch (RegisterUnavailable e) {
            throw new InvalidInputException(e.lines());
        }
    }

    static int add(CommandLine cl, Optional<String> db, Path caseFile, Optional<String> received, String from,
                   String location, String procedureWord, Optional<String> by, Optional<Path> rulesDir) {
        Procedure procedure = Procedure.fromCode(procedureWord).orElseThrow(() -> new InvalidInputException(
                "--procedure: \"" + procedureWord + "\" is not allowed; allowed: " + Procedure.codes()));
        Instant now = Instant.now();
        Instant receivedAt = received.map(r -> time("--received", r)).orElse(now);
        Inputs.LoadedCase loaded = Inputs.loadCase(caseFile, cl.getErr());
        Worksheet sheet = Assessor.assess(loaded.value(), Inputs.ruleSet(rulesDir));
        NewReferral referral = new NewReferral(receivedAt, from.strip(), location.strip(), procedure,
                Snapshot.of(sheet, new String(loaded.json(), StandardCharsets.UTF_8)), actor(by), now);
        long id = run(db, r -> r.add(referral));
        cl.getOut().println(id);
        cl.getOut().flush();
        return ExitCode.DONE;
    }

    static int list(CommandLine cl, Optional<String> db, boolean openOnly, boolean csv) {
        List<Referral> referrals = run(db, r -> r.list(openOnly));
        PrintWriter out = cl.getOut();
        out.print(csv ? RegisterReport.csv(referrals, true) : RegisterReport.text(referrals, ZoneId.systemDefault()));
        out.flush();
        return ExitCode.DONE;
    }

    static int decide(CommandLine cl, Optional<String> db, long id, String decisionWord, String by, String note,
                      Optional<Integer> version, Optional<String> slot, String access, String fluid) {
        Decision decision = Decision.fromCode(decisionWord).filter(d -> d != Decision.PENDING)
                .orElseThrow(() -> new InvalidInputException("--decision: \"" + decisionWord
                        + "\" is not allowed; allowed: " + Decision.recordable()));
        if (by.isBlank()) {
            throw new InvalidInputException("--by: a decision names who made it; the name is empty");
        }
        Optional<Instant> plannedSlot = slot.map(s -> time("--slot", s));
        DecisionRequest request = new DecisionRequest(id,
                version.map(OptionalInt::of).orElse(OptionalInt.empty()), decision,
                new Referral.DecisionRecord(by.strip(), Instant.now(), plannedSlot, access.strip(), fluid.strip(),
                        note.strip()));
        DecisionOutcome outcome = run(db, r -> r.decide(request));
        if (outcome instanceof DecisionOutcome.Recorded recorded) {
            cl.getOut().println("referral " + id + ": " + decision.code() + " recorded (version "
                    + recorded.referral().version() + ")");
            cl.getOut().flush();
            return ExitCode.DONE;
        }
        if (outcome instanceof DecisionOutcome.Conflict conflict) {
            cl.getErr().println(conflict.message());
            cl.getErr().flush();
            return ExitCode.CONFLICT;
        }
        throw new InvalidInputException(((DecisionOutcome.NotFound) outcome).message());
    }

    static int history(CommandLine cl, Optional<String> db, long id) {
        String text = run(db, r -> r.find(id)
                .map(referral -> RegisterReport.history(referral, r.history(id), ZoneId.systemDefault()))
                .orElseThrow(() -> new InvalidInputException("referral " + id + " is not in the register")));
        cl.getOut().print(text);
        cl.getOut().flush();
        return ExitCode.DONE;
    }

    static int export(CommandLine cl, Optional<String> db, Path out, boolean withIdentifiers) {
        List<Referral> referrals = run(db, r -> r.list(false));
        try {
            // owner-only: even without identifiers the export says who was referred for what, and when
            AtomicFiles.write(out, RegisterReport.csv(referrals, withIdentifiers).getBytes(StandardCharsets.UTF_8),
                    AtomicFiles.Access.OWNER_ONLY);
        } catch (FileWriteException e) {
            throw new InvalidInputException(e.getMessage());
        }
        cl.getOut().println("exported " + referrals.size() + " referral" + (referrals.size() == 1 ? "" : "s")
                + " to " + out + (withIdentifiers ? "" : " (without identifiers)"));
        cl.getOut().flush();
        return ExitCode.DONE;
    }

    static int backup(CommandLine cl, Optional<String> db, Path out) {
        String shown = run(db, r -> {
            try {
                r.backup(out);
            } catch (FileWriteException e) {
                throw new InvalidInputException(e.getMessage());
            }
            return r.shown();
        });
        cl.getOut().println("backed up " + shown + " to " + out);
        cl.getOut().flush();
        return ExitCode.DONE;
    }

    /** For {@code triage --register}: one open register that every assessed referral is added to. */
    static ReferralSink sink(Optional<String> db, String addedBy) {
        Register register = open(db);
        return new ReferralSink() {
            @Override
            public long add(String caseJson, Worksheet sheet) {
                Instant now = Instant.now();
                try {
                    return register.add(new NewReferral(now, "", "", Procedure.NOT_STATED,
                            Snapshot.of(sheet, caseJson), addedBy, now));
                } catch (RegisterUnavailable e) {
                    throw new InvalidInputException(e.lines());
                }
            }

            @Override
            public void close() {
                // every add is its own transaction on its own connection: nothing stays open
            }
        };
    }

    static String actor(Optional<String> by) {
        return by.map(String::strip).filter(s -> !s.isEmpty())
                .orElseGet(() -> Optional.ofNullable(System.getProperty("user.name")).filter(s -> !s.isBlank())
                        .orElse("unknown user"));
    }

    private static Instant time(String option, String text) {
        return RegisterTime.parseIso(text).orElseThrow(() -> new InvalidInputException(option + ": \"" + text
                + "\" is not an ISO 8601 time with an offset; write it like 2026-03-05T02:40:00+01:00 or "
                + "2026-03-05T01:40:00Z"));
    }

    private interface Use<T> {
        T apply(Register r);
    }

    private static <T> T run(Optional<String> db, Use<T> use) {
        Register register = open(db);
        try {
            return use.apply(register);
        } catch (RegisterUnavailable e) {
            throw new InvalidInputException(e.lines());
        }
    }
}
