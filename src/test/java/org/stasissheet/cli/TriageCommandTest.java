package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.files.WorksheetPdfs;

class TriageCommandTest {
    @TempDir
    Path root;

    private Path in;
    private Path outDir;
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @BeforeEach
    void referralFolder() throws IOException {
        in = Files.createDirectory(root.resolve("referrals"));
        outDir = root.resolve("triaged");
        for (String sample : List.of("igm-symptomatic", "aml-breathless", "iga-borderline", "cll-extreme")) {
            Files.copy(Path.of("samples", sample + ".json"), in.resolve(sample + ".json"));
        }
        Files.writeString(in.resolve("broken.json"), "{\"format\": \"stasis-case/1\", \"patient\": {");
        String sample = Files.readString(Path.of("samples", "igm-symptomatic.json"));
        // 150000 entered as 10*9/L: implausible, CASE-FORMAT's own example of a unit slip
        Files.writeString(in.resolve("unit-slip.json"), sample.replace(
                "\"wbc\": {\"value\": 6.1, \"unit\": \"10*9/L\"}", "\"wbc\": {\"value\": 150000, \"unit\": \"10*9/L\"}"));
        Files.writeString(in.resolve("notes.txt"), "not a case");
    }

    private int run(String... args) {
        return StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    /** The CSV's rows split into cells (RFC 4180, enough for these cells: quotes only around whole cells). */
    static List<List<String>> parse(String csv) {
        List<List<String>> rows = new ArrayList<>();
        for (String line : csv.split("\r\n")) {
            List<String> cells = new ArrayList<>();
            StringBuilder cell = new StringBuilder();
            boolean quoted = false;
            for (int i = 0; i < line.length(); i++) {
                char ch = line.charAt(i);
                if (quoted && ch == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    cell.append('"');
                    i++;
                } else if (ch == '"') {
                    quoted = !quoted;
                } else if (ch == ',' && !quoted) {
                    cells.add(cell.toString());
                    cell.setLength(0);
                } else {
                    cell.append(ch);
                }
            }
            cells.add(cell.toString());
            rows.add(cells);
        }
        return rows;
    }

    @Test
    @DisplayName("a folder with a malformed file, an invalid value and valid cases: every file gets its row, exit 0")
    void mixedFolder() throws IOException {
        assertEquals(ExitCode.DONE, run("triage", in.toString(), "-o", outDir.toString()), err.toString());
        List<List<String>> rows = parse(Files.readString(outDir.resolve("summary.csv"), StandardCharsets.UTF_8));
        assertEquals(List.of("file", "patient", "status", "highest_level", "hyperviscosity", "leukostasis",
                "tumor_lysis", "top_flag", "pdf", "message"), rows.get(0));
        assertEquals(8, rows.size(), "header + 6 case files + notes.txt: every entry of the folder gets a row");
        List<List<String>> data = rows.subList(1, rows.size());
        List<String> notes = row(data, "notes.txt");
        assertEquals("skipped", notes.get(2));
        assertTrue(notes.get(9).contains("not a case file"), notes.get(9));
        List<String> broken = row(data, "broken.json");
        assertEquals("error", broken.get(2));
        assertFalse(broken.get(9).isBlank(), "the message says what is wrong");
        List<String> slip = row(data, "unit-slip.json");
        assertEquals("error", slip.get(2));
        assertTrue(slip.get(9).contains("labs.wbc") && slip.get(9).contains("150000"), slip.get(9));
        for (String ok : List.of("igm-symptomatic.json", "aml-breathless.json", "iga-borderline.json",
                "cll-extreme.json")) {
            List<String> r = row(data, ok);
            assertEquals("ok", r.get(2), ok + ": " + r);
            String pdf = r.get(8);
            assertTrue(Files.exists(outDir.resolve(pdf)), pdf);
            assertTrue(WorksheetPdfs.extractCase(Files.readAllBytes(outDir.resolve(pdf))).length > 0);
            assertTrue(r.get(1).startsWith("Demo patient"), "the label is in the summary: " + r);
        }
        assertFalse(Files.exists(outDir.resolve("broken.pdf")), "no PDF for a bad file");
        assertTrue(err.toString().contains("[1/7] aml-breathless.json ok"), err.toString());
        assertTrue(err.toString().contains("broken.json error"), err.toString());
    }

    @Test
    @DisplayName("rows are ranked most urgent first: act-now rows lead, then unread files, then the rest")
    void ranking() throws IOException {
        run("triage", in.toString(), "-o", outDir.toString());
        List<List<String>> data = parse(Files.readString(outDir.resolve("summary.csv"))).subList(1, 7);
        List<Integer> rank = new ArrayList<>();
        for (List<String> r : data) {
            String level = r.get(3);
            rank.add(level.contains("ACT NOW") ? 0 : r.get(2).equals("ok") ? (level.contains("REVIEW") ? 2 : 3) : 1);
        }
        List<Integer> sorted = new ArrayList<>(rank);
        sorted.sort(null);
        assertEquals(sorted, rank, "order by level: " + data);
        assertTrue(data.get(0).get(3).contains("ACT NOW"), data.get(0).toString());
    }

    @Test
    @DisplayName("--no-identifiers leaves labels out of the summary and the PDFs")
    void noIdentifiers() throws IOException {
        run("triage", in.toString(), "-o", outDir.toString(), "--no-identifiers");
        String csv = Files.readString(outDir.resolve("summary.csv"));
        assertFalse(csv.contains("Demo patient"), csv);
    }

    @Test
    @DisplayName("a missing referral folder is invalid input: exit 2 and nothing written")
    void missingFolder() {
        assertEquals(ExitCode.INVALID_INPUT, run("triage", root.resolve("nope").toString(), "-o",
                outDir.toString()));
        assertTrue(err.toString().contains("not a folder"), err.toString());
        assertFalse(Files.exists(outDir));
    }

    private static List<String> row(List<List<String>> rows, String file) {
        return rows.stream().filter(r -> r.get(0).equals(file)).findFirst()
                .orElseThrow(() -> new AssertionError("no row for " + file + " in " + rows));
    }
}
