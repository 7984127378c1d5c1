package org.stasissheet.cli;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code register ...}: the apheresis team's referral register. The options are plain values; the work (and the
 * database classes) live in {@link RegisterRuns}, loaded only when a register command runs.
 */
@Command(name = "register",
        description = "The referral register: every referral, decision and change, with its history. "
                + "Decision support only: it supports, and never replaces, clinical judgement, local protocols "
                + "and licensed practice.",
        subcommands = {RegisterCommand.Add.class, RegisterCommand.ListCommand.class, RegisterCommand.Decide.class,
                RegisterCommand.History.class, RegisterCommand.Export.class, RegisterCommand.Backup.class})
final class RegisterCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    @Command(name = "add",
            description = "Assess CASE and add it to the register as a pending referral; prints the new id.")
    static final class Add implements Callable<Integer> {
        @Parameters(paramLabel = "CASE", description = "the case file (stasis-case/1 JSON) or a worksheet PDF")
        Path caseFile;

        @Option(names = "--received", paramLabel = "ISO",
                description = "when the referral came, ISO 8601 with offset (2026-03-05T02:40:00+01:00); default now")
        String received;

        @Option(names = "--from", paramLabel = "TEXT", description = "who referred: name, role, contact")
        String from = "";

        @Option(names = "--location", paramLabel = "TEXT", description = "where the patient is: ward, unit, hospital")
        String location = "";

        @Option(names = "--procedure", paramLabel = "WORD",
                description = "plasma-exchange | leukapheresis | not-stated (default)")
        String procedure = "not-stated";

        @Option(names = "--by", paramLabel = "NAME", description = "who adds it; default the system user name")
        String by;

        @Mixin
        RulesOption rules;

        @Mixin
        DatabaseOption db;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            return RegisterRuns.add(spec.commandLine(), db.value(), caseFile, Optional.ofNullable(received), from,
                    location, procedure, Optional.ofNullable(by), rules.dir());
        }
    }

    @Command(name = "list",
            description = "List referrals, most urgent first, then by received time.")
    static final class ListCommand implements Callable<Integer> {
        @Option(names = "--open", description = "only open referrals (pending, deferred, more-information)")
        boolean open;

        @Option(names = "--csv", description = "print RFC 4180 CSV (the export's columns) instead of text")
        boolean csv;

        @Mixin
        DatabaseOption db;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            return RegisterRuns.list(spec.commandLine(), db.value(), open, csv);
        }
    }

    @Command(name = "decide",
            description = "Record the team's decision on referral ID. Without --version it is recorded only while "
                    + "the referral is pending; to change a decision, name the version you looked at.")
    static final class Decide implements Callable<Integer> {
        @Parameters(paramLabel = "ID", description = "the referral's id")
        long id;

        @Option(names = "--decision", required = true, paramLabel = "WORD",
                description = "accepted | declined | deferred | more-information")
        String decision;

        @Option(names = "--by", required = true, paramLabel = "NAME", description = "who decided")
        String by;

        @Option(names = "--note", paramLabel = "TEXT", description = "why, or what is needed")
        String note = "";

        @Option(names = "--version", paramLabel = "N",
                description = "the version you looked at (register list/history show it)")
        Integer version;

        @Option(names = "--slot", paramLabel = "ISO", description = "planned procedure time, ISO 8601 with offset")
        String slot;

        @Option(names = "--access", paramLabel = "TEXT", description = "planned vascular access")
        String access = "";

        @Option(names = "--fluid", paramLabel = "TEXT", description = "planned replacement fluid")
        String fluid = "";

        @Mixin
        DatabaseOption db;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            return RegisterRuns.decide(spec.commandLine(), db.value(), id, decision, by, note,
                    Optional.ofNullable(version), Optional.ofNullable(slot), access, fluid);
        }
    }

    @Command(name = "history",
            description = "Print referral ID as it stands, what it was assessed with, and every change.")
    static final class History implements Callable<Integer> {
        @Parameters(paramLabel = "ID", description = "the referral's id")
        long id;

        @Mixin
        DatabaseOption db;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            return RegisterRuns.history(spec.commandLine(), db.value(), id);
        }
    }

    @Command(name = "export",
            description = "Write every referral as RFC 4180 CSV, with hours from referral to decision and slot.")
    static final class Export implements Callable<Integer> {
        @Option(names = "--csv", required = true, paramLabel = "OUT", description = "the CSV file to write")
        Path out;

        @Option(names = "--no-identifiers", description = "leave out patient labels and free-text notes")
        boolean noIdentifiers;

        @Mixin
        DatabaseOption db;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            return RegisterRuns.export(spec.commandLine(), db.value(), out, !noIdentifiers);
        }
    }

    @Command(name = "backup",
            description = "Write a consistent copy of the SQLite register to OUT (owner-only).")
    static final class Backup implements Callable<Integer> {
        @Parameters(paramLabel = "OUT", description = "the copy to write")
        Path out;

        @Mixin
        DatabaseOption db;

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            return RegisterRuns.backup(spec.commandLine(), db.value(), out);
        }
    }
}
