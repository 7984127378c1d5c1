package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.register.RegisterReport;

/**
 * Every register command end to end through the command line, against a real database (SQLite and PostgreSQL
 * subclasses). CSV output is read back with Jackson's RFC 4180 CSV parser, not with the tool's own code.
 */
abstract class RegisterCommandContract {
    @TempDir
    Path temp;

    private StringWriter out = new StringWriter();
    private StringWriter err = new StringWriter();

    /** The {@code --db} value of a fresh register. */
    abstract String db();

    int run(String... args) {
        out = new StringWriter();
        err = new StringWriter();
        return StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    String run0() {
        return out.toString();
    }

    String errText() {
        return err.toString();
    }

    static List<List<String>> parseCsv(String csv) throws IOException {
        CsvMapper mapper = new CsvMapper();
        mapper.enable(CsvParser.Feature.WRAP_AS_ARRAY);
        try (MappingIterator<List<String>> it = mapper.readerForListOf(String.class).readValues(csv)) {
            return it.readAll();
        }
    }

    @Test
    @DisplayName("add, list, decide, conflict, history, export, triage --register: the whole round through the CLI")
    void everyCommand_endToEnd() throws Exception {
        String db = db();
        assertEquals(ExitCode.DONE, run("register", "add", "src/test/resources/cases/cll-review.json", "--procedure", "leukapheresis",
                "--received", "2026-03-05T01:00:00Z", "--from", "Invented registrar", "--db", db), err::toString);
        assertEquals("1", out.toString().strip());
        assertEquals(ExitCode.DONE, run("register", "add", "samples/igm-symptomatic.json", "--procedure",
                "plasma-exchange", "--received", "2026-03-05T02:40:00+01:00", "--from", "Invented night resident",
                "--location", "Invented General, ward 7", "--by", "Invented coordinator", "--db", db), err::toString);
        assertEquals("2", out.toString().strip());

        assertEquals(ExitCode.DONE, run("register", "list", "--db", db));
        String list = out.toString();
        assertTrue(list.startsWith("Decision support only"), list);
        assertTrue(list.indexOf("Demo patient A") < list.indexOf("Demo patient D"),
                "the act-now referral (2) is listed before the earlier review one (1): " + list);

        assertEquals(ExitCode.DONE, run("register", "list", "--open", "--csv", "--db", db));
        List<List<String>> rows = parseCsv(out.toString());
        assertEquals(RegisterReport.CSV_COLUMNS, rows.get(0));
        assertEquals(List.of("2", "1"), rows.subList(1, rows.size()).stream().map(r -> r.get(0)).toList());
        assertEquals("act-now", rows.get(1).get(RegisterReport.CSV_COLUMNS.indexOf("highest_level")));

        assertEquals(ExitCode.DONE, run("register", "decide", "2", "--decision", "accepted", "--by",
                "Invented consultant", "--slot", "2026-03-05T04:00:00Z", "--access", "central venous catheter",
                "--fluid", "albumin 5 %", "--db", db), err::toString);
        assertTrue(out.toString().contains("referral 2: accepted recorded (version 2)"), out.toString());
        assertEquals(ExitCode.DONE, run("register", "list", "--csv", "--db", db));
        // received 02:40 +01:00 = 01:40 UTC; slot 04:00 UTC: 2 h 20 min = 2.3 h
        assertEquals("2.3", parseCsv(out.toString()).get(1).get(RegisterReport.CSV_COLUMNS.indexOf("hours_to_slot")));
        assertEquals(ExitCode.CONFLICT, run("register", "decide", "2", "--decision", "declined", "--by",
                "Invented registrar", "--db", db));
        assertTrue(err.toString().startsWith("Conflict: referral 2 was changed by someone else (now version 2: "
                + "accepted by Invented consultant"), err.toString());
        assertEquals(ExitCode.CONFLICT, run("register", "decide", "2", "--decision", "declined", "--version", "1",
                "--by", "Invented registrar", "--db", db));
        assertEquals(ExitCode.DONE, run("register", "decide", "2", "--decision", "deferred", "--version", "2",
                "--by", "Invented consultant", "--note", "awaiting viscosity", "--db", db), err::toString);

        assertEquals(ExitCode.DONE, run("register", "history", "2", "--db", db));
        String history = out.toString();
        assertTrue(history.contains("Invented consultant: decision pending -> accepted"), history);
        assertTrue(history.contains("Invented consultant: decision accepted -> deferred"), history);
        assertTrue(history.contains("rule set: stasis-sheet-shipped"), history);
        assertTrue(history.contains("Invented consultant: slot 2026-03-05T04:00:00.000Z -> (none)"), history);
        assertFalse(history.contains("declined"), "the refused decisions left no trace but the refusal: " + history);

        Path export = temp.resolve("export.csv");
        assertEquals(ExitCode.DONE, run("register", "export", "--csv", export.toString(), "--no-identifiers",
                "--db", db), err::toString);
        List<List<String>> exported = parseCsv(Files.readString(export, StandardCharsets.UTF_8));
        assertEquals(3, exported.size());
        int patient = RegisterReport.CSV_COLUMNS.indexOf("patient");
        int note = RegisterReport.CSV_COLUMNS.indexOf("note");
        assertEquals(List.of("", ""), exported.subList(1, 3).stream().map(r -> r.get(patient)).toList());
        assertEquals(List.of("", ""), exported.subList(1, 3).stream().map(r -> r.get(note)).toList());
        // the deferral names no slot, so the planned slot is cleared (and the history says so)
        assertEquals("", exported.get(1).get(RegisterReport.CSV_COLUMNS.indexOf("planned_slot")));
        assertEquals("deferred", exported.get(1).get(RegisterReport.CSV_COLUMNS.indexOf("decision")));
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(export)));

        Path in = temp.resolve("referrals");
        Files.createDirectories(in);
        for (String s : List.of("aml-breathless.json", "iga-borderline.json")) {
            Files.copy(Path.of("samples", s), in.resolve(s));
        }
        Files.writeString(in.resolve("broken.json"), "{\"format\":\"stasis-case/1\",\"labs\":{\"wbcc\":1}}");
        assertEquals(ExitCode.DONE, run("triage", in.toString(), "-o", temp.resolve("out").toString(),
                "--register", "--db", db), err::toString);
        assertTrue(err.toString().contains("aml-breathless.json ok (register: referral 3)"), err.toString());
        assertEquals(ExitCode.DONE, run("register", "list", "--csv", "--db", db));
        assertEquals(5, parseCsv(out.toString()).size(), "two referrals from triage; the broken file is not added");
    }

    @Test
    @DisplayName("bad values name the option, the value and what is allowed; nothing is added")
    void badValues_areNamed() throws Exception {
        String db = db();
        assertEquals(ExitCode.INVALID_INPUT, run("register", "add", "samples/cll-extreme.json", "--procedure",
                "plasmapheresis", "--db", db));
        assertEquals("--procedure: \"plasmapheresis\" is not allowed; allowed: plasma-exchange | leukapheresis | "
                + "not-stated", err.toString().strip());
        assertEquals(ExitCode.INVALID_INPUT, run("register", "add", "samples/cll-extreme.json", "--received",
                "05/03/2026 02:40", "--db", db));
        assertTrue(err.toString().startsWith("--received: \"05/03/2026 02:40\" is not an ISO 8601 time"), err.toString());
        assertEquals(ExitCode.INVALID_INPUT, run("register", "decide", "1", "--decision", "maybe", "--by", "X",
                "--db", db));
        assertTrue(err.toString().contains("allowed: accepted | declined | deferred | more-information"),
                err.toString());
        assertEquals(ExitCode.INVALID_INPUT, run("register", "history", "41", "--db", db));
        assertEquals("referral 41 is not in the register", err.toString().strip());
        assertEquals(ExitCode.DONE, run("register", "list", "--csv", "--db", db));
        assertEquals(1, parseCsv(out.toString()).size(), "only the header: nothing was added");
        assertFalse(err.toString().contains("\tat "), "no stack trace");
    }
}
