package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentNameDictionary;
import org.apache.pdfbox.pdmodel.PDEmbeddedFilesNameTreeNode;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.files.AtomicFiles;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.fuzz.TinyPdf;

/**
 * The reliability suite: one nested group per numbered finding of the robustness review (issue 13) and the
 * triage re-run finding (issue 18, item 10), each held with small files made here. Invented data only: the
 * demo cases of {@code samples/} and values typed below.
 */
class ReliabilityTest {
    private static final Path IGM = Path.of("samples", "igm-symptomatic.json");
    private static final Path AML = Path.of("samples", "aml-breathless.json");

    @TempDir
    Path tmp;
    private StringWriter out;
    private StringWriter err;

    @BeforeEach
    void streams() {
        out = new StringWriter();
        err = new StringWriter();
    }

    private int run(String... args) {
        out.getBuffer().setLength(0);
        err.getBuffer().setLength(0);
        return StasisCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    private static String read(Path p) throws IOException {
        return Files.readString(p, StandardCharsets.UTF_8);
    }

    /** summary.csv's rows without the header, as cell lists (RFC 4180, parsed as TriageCommandTest does). */
    private static List<List<String>> rows(Path summary) throws IOException {
        List<List<String>> rows = TriageCommandTest.parse(read(summary));
        return rows.subList(1, rows.size());
    }

    private static Map<String, List<String>> byFile(List<List<String>> rows) {
        return rows.stream().collect(Collectors.toMap(r -> r.get(0), r -> r));
    }

    private static boolean mkfifo(Path p) throws InterruptedException {
        try {
            return new ProcessBuilder("mkfifo", p.toString()).start().waitFor() == 0;
        } catch (IOException e) {
            return false;
        }
    }

    private Path referrals() throws IOException {
        Path dir = Files.createDirectories(tmp.resolve("referrals"));
        Files.copy(IGM, dir.resolve("igm.json"));
        Files.copy(AML, dir.resolve("aml.json"));
        return dir;
    }

    @Nested
    @DisplayName("1. one bad entry never stops a triage batch, and every entry gets a row")
    class BatchIsolation {
        @Test
        @DisplayName("a FIFO, a folder named x.json, a link loop, a dangling link, an encrypted PDF and a nested "
                + "file each get a row; the valid referrals after them are assessed; exit 0")
        void everyEntryGetsARow() throws Exception {
            Path dir = referrals();
            boolean fifo = mkfifo(dir.resolve("a-pipe.json"));
            Files.createDirectory(dir.resolve("b-folder.json"));
            Files.createSymbolicLink(dir.resolve("c-loop.json"), dir.resolve("c-loop.json"));
            Files.createSymbolicLink(dir.resolve("d-dangling.pdf"), dir.resolve("nowhere.pdf"));
            byte[] encrypted = new TinyPdf().object("<</Type/Catalog>>").trailer("/Encrypt<</Filter/Standard>>").build();
            Files.write(dir.resolve("e-encrypted.pdf"), encrypted);
            Files.writeString(dir.resolve("f-deep.json"), "[".repeat(5_000) + "]".repeat(5_000));
            Path outDir = tmp.resolve("out");

            assertEquals(ExitCode.DONE, run("triage", dir.toString(), "-o", outDir.toString()), err.toString());
            Map<String, List<String>> rows = byFile(rows(outDir.resolve(TriageCommand.SUMMARY)));
            if (fifo) {
                assertEquals("error", rows.get("a-pipe.json").get(2));
                assertTrue(rows.get("a-pipe.json").get(9).contains("not a regular file"));
            }
            assertEquals("error", rows.get("b-folder.json").get(2));
            assertTrue(rows.get("c-loop.json").get(9).contains("loop"), rows.get("c-loop.json").toString());
            assertEquals("error", rows.get("d-dangling.pdf").get(2));
            assertTrue(rows.get("e-encrypted.pdf").get(9).contains("/Encrypt"), rows.get("e-encrypted.pdf").toString());
            assertEquals("error", rows.get("f-deep.json").get(2));
            assertEquals("ok", rows.get("igm.json").get(2));
            assertEquals("ok", rows.get("aml.json").get(2));
            assertFalse(err.toString().contains("Nothing was written"), err.toString());
            assertTrue(rows.values().stream().noneMatch(r -> r.get(2).equals("internal-error")), rows.toString());
        }
    }

    @Nested
    @DisplayName("2. nothing is silently lost")
    class NoSilentLoss {
        @Test
        @DisplayName("triage DIR -o DIR is refused before anything is written; the referrals stay as they were")
        void outDirEqualsDir() throws IOException {
            Path dir = referrals();
            Path pdf = dir.resolve("other-patient.pdf");
            assertEquals(ExitCode.DONE, run("pdf", AML.toString(), "-o", pdf.toString()));
            byte[] before = Files.readAllBytes(pdf);

            assertEquals(ExitCode.INVALID_INPUT, run("triage", dir.toString(), "-o", dir.toString()));
            assertTrue(err.toString().contains("referral folder itself"), err.toString());
            assertArrayEquals(before, Files.readAllBytes(pdf));
            try (var list = Files.list(dir)) {
                assertEquals(3, list.count(), "no summary, no PDF, no lock written into the referral folder");
            }
        }

        @Test
        @DisplayName("issue 18.10: a re-run with OUTDIR inside DIR never reads its own outputs; the counts stay")
        void rerunIntoSubfolder() throws IOException {
            Path dir = referrals();
            Path outDir = dir.resolve("worksheets");
            assertEquals(ExitCode.DONE, run("triage", dir.toString(), "-o", outDir.toString()), err.toString());
            List<List<String>> first = rows(outDir.resolve(TriageCommand.SUMMARY));
            assertEquals(ExitCode.DONE, run("triage", dir.toString(), "-o", outDir.toString()), err.toString());
            List<List<String>> second = rows(outDir.resolve(TriageCommand.SUMMARY));
            assertEquals(2, first.stream().filter(r -> r.get(2).equals("ok")).count());
            assertEquals(2, second.stream().filter(r -> r.get(2).equals("ok")).count(), second.toString());
            assertTrue(byFile(second).get("worksheets").get(9).contains("output folder"));
        }

        @Test
        @DisplayName("issue 18.10: a case present as JSON and as its worksheet PDF counts once")
        void caseAndItsPdfCountOnce() throws IOException {
            Path dir = referrals();
            assertEquals(ExitCode.DONE, run("pdf", dir.resolve("igm.json").toString(), "-o",
                    dir.resolve("igm-sheet.pdf").toString()));
            Path outDir = tmp.resolve("out");
            assertEquals(ExitCode.DONE, run("triage", dir.toString(), "-o", outDir.toString()), err.toString());
            Map<String, List<String>> rows = byFile(rows(outDir.resolve(TriageCommand.SUMMARY)));
            assertEquals("ok", rows.get("igm.json").get(2));
            assertEquals("skipped", rows.get("igm-sheet.pdf").get(2));
            assertTrue(rows.get("igm-sheet.pdf").get(9).contains("same case as igm.json"));
        }

        @Test
        @DisplayName("a second run into a locked OUTDIR is refused before writing; the first run's files stay")
        void secondRunRefused() throws IOException {
            Path dir = referrals();
            Path outDir = Files.createDirectories(tmp.resolve("out"));
            Files.writeString(outDir.resolve(TriageCommand.SUMMARY), "the first run's summary");
            try (FileChannel ch = FileChannel.open(outDir.resolve(TriageCommand.LOCK), StandardOpenOption.CREATE,
                    StandardOpenOption.WRITE); FileLock held = ch.lock()) {
                assertTrue(held.isValid());
                assertEquals(ExitCode.INVALID_INPUT, run("triage", dir.toString(), "-o", outDir.toString()));
            }
            assertTrue(err.toString().contains("another triage is writing"), err.toString());
            assertEquals("the first run's summary", read(outDir.resolve(TriageCommand.SUMMARY)));
            assertFalse(Files.exists(outDir.resolve("igm.pdf")));
        }

        @Test
        @DisplayName("a PDF that cannot be written: its verdicts stay in a fresh summary, exit 2 with the count "
                + "written; the old summary is gone")
        void writeFailure() throws IOException {
            Path dir = referrals();
            Path outDir = Files.createDirectories(tmp.resolve("out"));
            Files.writeString(outDir.resolve(TriageCommand.SUMMARY), "stale,verdicts\r\n");
            Files.createDirectories(outDir.resolve("igm.pdf").resolve("in-the-way"));

            assertEquals(ExitCode.INVALID_INPUT, run("triage", dir.toString(), "-o", outDir.toString()));
            assertTrue(err.toString().contains("1 worksheet PDF could not be written"), err.toString());
            assertTrue(err.toString().contains("1 of 2 were written"), err.toString());
            Map<String, List<String>> rows = byFile(rows(outDir.resolve(TriageCommand.SUMMARY)));
            List<String> igm = rows.get("igm.json");
            assertEquals("ok", igm.get(2), "the verdicts are not turned into errors");
            assertFalse(igm.get(4).isBlank(), "the hyperviscosity verdict is kept");
            assertEquals("", igm.get(8), "no PDF named");
            assertTrue(igm.get(9).contains("was not written"), igm.toString());
            assertFalse(read(outDir.resolve(TriageCommand.SUMMARY)).contains("stale"));
        }

        @Test
        @DisplayName("pdf x.json -o x.json is refused, however the path is spelled; the case file is untouched")
        void pdfOverItsInput() throws IOException {
            Path json = Files.copy(IGM, tmp.resolve("x.json"));
            byte[] before = Files.readAllBytes(json);
            assertEquals(ExitCode.INVALID_INPUT, run("pdf", json.toString(), "-o", json.toString(),
                    "--no-identifiers"));
            assertEquals(ExitCode.INVALID_INPUT, run("pdf", json.toString(), "-o",
                    tmp.resolve(".").resolve("x.json").toString()));
            assertTrue(err.toString().contains("this is the input file"), err.toString());
            assertArrayEquals(before, Files.readAllBytes(json));
        }
    }

    @Nested
    @DisplayName("3. bounded work from tiny inputs")
    class Bounds {
        private Path caseWith(String from, String to) throws IOException {
            String json = read(IGM);
            assertTrue(json.contains(from), from);
            return Files.writeString(tmp.resolve("case-" + Math.abs(to.hashCode()) + ".json"), json.replace(from, to));
        }

        @Test
        @DisplayName("ageYears 1e999999999 is refused as written, at once, with a short message; exit 2")
        void hugeExponent() throws IOException {
            Path c = Files.writeString(tmp.resolve("age.json"), "{\"format\":\"stasis-case/1\",\"patient\":{\"ageYears\":1e999999999}}");
            assertTrue(Files.size(c) < 70);
            assertEquals(ExitCode.INVALID_INPUT, run("assess", c.toString()));
            assertTrue(err.toString().contains("1e999999999 is too large"), err.toString());
            assertTrue(err.toString().length() < 2_000, "a short message: " + err.toString().length());
        }

        @Test
        @DisplayName("a WBC of 1e-999999999 is refused, never read as 0")
        void tinyExponent() throws IOException {
            Path c = caseWith("\"wbc\": {\"value\": 6.1", "\"wbc\": {\"value\": 1e-999999999");
            assertEquals(ExitCode.INVALID_INPUT, run("assess", c.toString()));
            assertTrue(err.toString().contains("labs.wbc.value: 1e-999999999 is too small"), err.toString());
        }

        @Test
        @DisplayName("magnitude bound: 1e15 is read (and found implausible), 1e16 is refused before conversion")
        void magnitudeAtAndBeyond() throws IOException {
            assertEquals(ExitCode.INVALID_INPUT, run("assess",
                    caseWith("\"wbc\": {\"value\": 6.1", "\"wbc\": {\"value\": 1e15").toString()));
            assertTrue(err.toString().contains("not plausible"), err.toString());
            assertEquals(ExitCode.INVALID_INPUT, run("assess",
                    caseWith("\"wbc\": {\"value\": 6.1", "\"wbc\": {\"value\": 1e16").toString()));
            assertTrue(err.toString().contains("1e16 is too large"), err.toString());
        }

        @Test
        @DisplayName("a bogus unit with a huge value gives a message of bounded size")
        void bogusUnitMessage() throws IOException {
            Path c = caseWith("\"wbc\": {\"value\": 6.1, \"unit\": \"10*9/L\"}",
                    "\"wbc\": {\"value\": 9" + "9".repeat(38) + ", \"unit\": \"" + "x".repeat(9_000) + "\"}");
            assertEquals(ExitCode.INVALID_INPUT, run("assess", c.toString()));
            assertTrue(err.toString().length() < 4_000, "bounded: " + err.toString().length());
        }

        @Test
        @DisplayName("100,000 duplicate keys give at most 120 short lines ending '… and N more', not 17 x the input")
        void manyProblems() throws IOException {
            StringBuilder sb = new StringBuilder("{\"format\":\"stasis-case/1\",\"extra\":{\"k\":1");
            for (int i = 0; i < 100_000; i++) {
                sb.append(",\"k\":1");
            }
            Path c = Files.writeString(tmp.resolve("dups.json"), sb.append("}}").toString());
            assertEquals(ExitCode.INVALID_INPUT, run("assess", c.toString()));
            List<String> lines = err.toString().lines().toList();
            assertTrue(lines.size() <= Terminal.MAX_LINES, "lines: " + lines.size());
            assertTrue(lines.get(lines.size() - 1).contains("… and 99900 more problems"), lines.get(lines.size() - 1));
            assertTrue(err.toString().length() < Files.size(c), "output smaller than the input");
        }

        @Test
        @DisplayName("a FIFO given as a case is refused at once by assess, pdf and note (never opened, never hangs)")
        void fifoCase() throws Exception {
            Path fifo = tmp.resolve("pipe.json");
            assumeTrue(mkfifo(fifo), "mkfifo is available on this system");
            assertEquals(ExitCode.INVALID_INPUT, run("assess", fifo.toString()));
            assertTrue(err.toString().contains("not a regular file"), err.toString());
            assertEquals(ExitCode.INVALID_INPUT, run("pdf", fifo.toString(), "-o", tmp.resolve("o.pdf").toString()));
            assertEquals(ExitCode.INVALID_INPUT, run("note", fifo.toString()));
        }

        @Test
        @DisplayName("a rule folder with a FIFO or an oversized file is refused without blocking or reading it whole")
        void ruleFolderFiles() throws Exception {
            Path rules = copyRules();
            Files.write(rules.resolve("huge.yaml"), new byte[org.stasissheet.rules.RuleSetLoader.MAX_FILE_BYTES + 1]);
            boolean fifo = mkfifo(rules.resolve("pipe.yaml"));
            assertEquals(ExitCode.INVALID_INPUT, run("rules", "check", rules.toString()));
            assertTrue(err.toString().contains("huge.yaml: larger than 1048576 bytes"), err.toString());
            if (fifo) {
                assertTrue(err.toString().contains("pipe.yaml: not a regular file"), err.toString());
            }
        }
    }

    private Path copyRules() throws IOException {
        Path to = Files.createDirectories(tmp.resolve("rules"));
        try (var files = Files.list(Path.of("rules"))) {
            for (Path f : files.toList()) {
                Files.copy(f, to.resolve(f.getFileName().toString()));
            }
        }
        return to;
    }

    @Nested
    @DisplayName("4. a read-back PDF is trusted only if intact")
    class ReadBack {
        private Path worksheet(Path json) throws IOException {
            Path pdf = tmp.resolve(json.getFileName() + ".pdf");
            assertEquals(ExitCode.DONE, run("pdf", json.toString(), "-o", pdf.toString()), err.toString());
            return pdf;
        }

        /** Replaces the embedded case with other bytes, as a PDF editor would, keeping everything else. */
        private Path withEmbedded(Path pdf, byte[] json, boolean second) throws IOException {
            Path edited = tmp.resolve("edited-" + pdf.getFileName());
            try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
                PDEmbeddedFilesNameTreeNode tree = doc.getDocumentCatalog().getNames().getEmbeddedFiles();
                Map<String, PDComplexFileSpecification> names = new java.util.HashMap<>(tree.getNames());
                PDComplexFileSpecification spec = new PDComplexFileSpecification();
                spec.setFile(WorksheetPdfs.ATTACHMENT_NAME);
                spec.setFileUnicode(WorksheetPdfs.ATTACHMENT_NAME);
                spec.setEmbeddedFile(new PDEmbeddedFile(doc, new ByteArrayInputStream(json)));
                names.put(second ? "copy" : names.keySet().iterator().next(), spec);
                tree.setNames(names);
                PDDocumentNameDictionary dict = doc.getDocumentCatalog().getNames();
                dict.setEmbeddedFiles(tree);
                doc.save(edited.toFile());
            }
            return edited;
        }

        @Test
        @DisplayName("an embedded case edited from act-now to harmless is refused, naming the digest; exit 2")
        void editedCaseRefused() throws IOException {
            Path pdf = worksheet(IGM);
            byte[] calmer = read(IGM).replace("\"value\": 5.6, \"unit\": \"cP\"", "\"value\": 1.6, \"unit\": \"cP\"")
                    .getBytes(StandardCharsets.UTF_8);
            Path edited = withEmbedded(pdf, calmer, false);
            assertEquals(ExitCode.INVALID_INPUT, run("assess", edited.toString()));
            assertTrue(err.toString().contains("does not match the SHA-256"), err.toString());
            assertEquals(1, err.toString().lines().count(), "one line: " + err);
            assertEquals("", out.toString(), "no worksheet printed");
        }

        @Test
        @DisplayName("two embedded case files: refused, none of them is picked; exit 2")
        void twoCasesRefused() throws IOException {
            Path edited = withEmbedded(worksheet(IGM), read(AML).getBytes(StandardCharsets.UTF_8), true);
            assertEquals(ExitCode.INVALID_INPUT, run("assess", edited.toString()));
            assertTrue(err.toString().contains("2 embedded case files"), err.toString());
        }

        @Test
        @DisplayName("an intact worksheet reads back without warning; one without a digest reads back with a warning")
        void digestPresentOrMissing() throws IOException {
            Path pdf = worksheet(IGM);
            assertEquals(ExitCode.DONE, run("assess", pdf.toString()));
            assertFalse(err.toString().contains("warning"), err.toString());
            byte[] caseJson = Files.readAllBytes(IGM);
            Path old = Files.write(tmp.resolve("old.pdf"), TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME,
                    caseJson, ""));
            assertEquals(ExitCode.DONE, run("assess", old.toString()), err.toString());
            assertTrue(err.toString().contains("warning: ") && err.toString().contains("records no SHA-256"),
                    err.toString());
        }

        @Test
        @DisplayName("every command that reads a case from a PDF without a digest says so before its output")
        void missingDigestWarnedByEveryReader() throws IOException {
            byte[] caseJson = Files.readAllBytes(IGM);
            Path old = Files.write(tmp.resolve("old.pdf"), TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME,
                    caseJson, ""));
            String db = "jdbc:sqlite:" + tmp.resolve("register.sqlite");
            List<String[]> commands = List.of(
                    new String[] {"assess", old.toString()},
                    new String[] {"note", old.toString()},
                    new String[] {"pdf", old.toString(), "-o", tmp.resolve("again.pdf").toString()},
                    new String[] {"export", "fhir", old.toString(), "-o", tmp.resolve("bundle.json").toString()},
                    new String[] {"register", "add", old.toString(), "--db", db});
            for (String[] command : commands) {
                assertEquals(ExitCode.DONE, run(command), String.join(" ", command) + ": " + err);
                assertTrue(err.toString().contains("warning: ") && err.toString().contains("records no SHA-256"),
                        String.join(" ", command) + ": " + err);
            }
        }

        @Test
        @DisplayName("malformed PDFs (encrypted, reference loops, bad decode parameters, bombs, truncated, deep) are"
                + " exit 2 with one line each, never exit 1")
        void malformedPdfs() throws IOException {
            byte[] sheet = Files.readAllBytes(worksheet(IGM));
            Map<String, byte[]> bad = new java.util.LinkedHashMap<>();
            bad.put("encrypted", new TinyPdf().object("<</Type/Catalog>>").trailer("/Encrypt 1 0 R").build());
            bad.put("self-reference", new TinyPdf().object("1 0 R").build());
            bad.put("root-loop", new TinyPdf().object("<</Type/Catalog/Pages 1 0 R/Names 1 0 R>>").build());
            bad.put("decode-parameters", new TinyPdf().object("<</Type/Catalog>>")
                    .stream("/Filter/FlateDecode/DecodeParms<</Predictor 12/Columns 999999999>>",
                            TinyPdf.deflate(new byte[10])).build());
            bad.put("bomb", new TinyPdf().object("<</Type/Catalog>>")
                    .stream("/Filter[/FlateDecode/FlateDecode]", TinyPdf.deflate(TinyPdf.deflate(new byte[40 << 20])))
                    .build());
            bad.put("truncated", java.util.Arrays.copyOf(sheet, sheet.length / 2));
            bad.put("deep", new TinyPdf().object("[".repeat(100_000)).build());
            bad.put("not-a-pdf", "%PDF-1.7 nothing more".getBytes(StandardCharsets.US_ASCII));
            for (Map.Entry<String, byte[]> e : bad.entrySet()) {
                Path p = Files.write(tmp.resolve(e.getKey() + ".pdf"), e.getValue());
                assertEquals(ExitCode.INVALID_INPUT, run("assess", p.toString()), e.getKey() + ": " + err);
                assertEquals(1, err.toString().lines().count(), e.getKey() + ": one line: " + err);
            }
        }
    }

    @Nested
    @DisplayName("5. a rule set that passes the check can always assess")
    class RuleSets {
        private void setParameter(Path rules, String file, String id, String value) throws IOException {
            Path f = rules.resolve(file);
            String text = read(f);
            String marker = "id: " + id + "\n    value: ";
            int at = text.indexOf(marker);
            assertTrue(at >= 0, id);
            int end = text.indexOf('\n', at + marker.length());
            Files.writeString(f, text.substring(0, at + marker.length()) + value + text.substring(end));
        }

        @Test
        @DisplayName("reference hematocrit 0, 1 or 5, reference viscosity 0 or -1, unit volume 0 and cell volume 0"
                + " are refused by rules check, each naming the parameter and its allowed range")
        void unusableParametersRefused() throws IOException {
            String[][] cases = {
                {"flow.referenceHematocrit", "0"}, {"flow.referenceHematocrit", "1"},
                {"flow.referenceHematocrit", "5"}, {"flow.referenceSerumViscosity", "0"},
                {"flow.referenceSerumViscosity", "-1"}, {"transfusion.unitVolume", "0"},
                {"leukocrit.volume.myeloblast.low", "0"},
            };
            for (String[] c : cases) {
                Path rules = copyRules();
                setParameter(rules, "estimates.yaml", c[0], c[1]);
                assertEquals(ExitCode.INVALID_INPUT, run("rules", "check", rules.toString()), c[0] + " " + c[1]);
                assertTrue(err.toString().contains("\"" + c[0] + "\" is " + c[1]) && err.toString().contains("must be"),
                        err.toString());
                deleteTree(rules);
            }
        }

        @Test
        @DisplayName("the shipped values at the edge of their ranges pass and assess (0.45 hematocrit, 1.6 cP)")
        void usableParametersPass() throws IOException {
            Path rules = copyRules();
            setParameter(rules, "estimates.yaml", "flow.referenceHematocrit", "0.99");
            assertEquals(ExitCode.DONE, run("rules", "check", rules.toString()), err.toString());
            assertEquals(ExitCode.DONE, run("assess", IGM.toString(), "--rules", rules.toString()), err.toString());
        }

        @Test
        @DisplayName("a second YAML document (---) in a rule file is refused, not ignored")
        void multiDocumentRefused() throws IOException {
            Path rules = copyRules();
            Files.writeString(rules.resolve("estimates.yaml"), read(rules.resolve("estimates.yaml"))
                    + "\n---\nparameters: []\n");
            assertEquals(ExitCode.INVALID_INPUT, run("rules", "check", rules.toString()));
            assertTrue(err.toString().contains("second YAML document"), err.toString());
        }

        @Test
        @DisplayName("a rule file linked to a file outside the folder is refused without being read or echoed")
        void linkOutsideRefused() throws IOException {
            Path rules = copyRules();
            Path secret = Files.writeString(tmp.resolve("outside.yaml"), "SECRET-LINE: do not echo\n");
            Files.delete(rules.resolve("artefacts.yaml"));
            Files.createSymbolicLink(rules.resolve("artefacts.yaml"), secret);
            assertEquals(ExitCode.INVALID_INPUT, run("rules", "check", rules.toString()));
            assertTrue(err.toString().contains("artefacts.yaml: a link leading outside the rule folder"), err.toString());
            assertFalse(err.toString().contains("SECRET-LINE"), err.toString());
        }

        private void deleteTree(Path p) throws IOException {
            try (var walk = Files.walk(p)) {
                for (Path f : walk.sorted(java.util.Comparator.reverseOrder()).toList()) {
                    Files.delete(f);
                }
            }
        }
    }

    @Nested
    @DisplayName("6. leftovers and terminal safety")
    class Leftovers {
        @Test
        @DisplayName("triage removes its own stale temporary files (older than two minutes) and keeps fresh ones "
                + "and every other file")
        void triageCleansStaleTemps() throws IOException {
            Path dir = referrals();
            Path outDir = Files.createDirectories(tmp.resolve("out"));
            Path stale = Files.writeString(outDir.resolve(".igm.pdf.1a2b3c4d5e6f7081.tmp"), "half a PDF");
            Files.setLastModifiedTime(stale, FileTime.from(Instant.now().minus(AtomicFiles.STALE_AFTER).minusSeconds(5)));
            Path fresh = Files.writeString(outDir.resolve(".aml.pdf.0123456789abcdef.tmp"), "being written now");
            Path mine = Files.writeString(outDir.resolve(".notes.tmp"), "someone else's file");
            Files.setLastModifiedTime(mine, FileTime.from(Instant.now().minusSeconds(3_600)));

            assertEquals(ExitCode.DONE, run("triage", dir.toString(), "-o", outDir.toString()), err.toString());
            assertFalse(Files.exists(stale));
            assertTrue(Files.exists(fresh));
            assertTrue(Files.exists(mine), "not a name this tool gives its temporary files");
        }

        @Test
        @DisplayName("control characters from a case are escaped on the terminal: no raw ESC, no fake problem line")
        void controlCharactersEscaped() throws IOException {
            String json = read(IGM).replace("Demo patient A, ward 7", "Demo \\u001b[2J\\u202e patient");
            Path c = Files.writeString(tmp.resolve("ctl.json"), json);
            assertEquals(ExitCode.DONE, run("note", c.toString(), "--with-identifiers"), err.toString());
            assertFalse(out.toString().contains("\u001b"), "no raw escape character");
            assertFalse(out.toString().contains("\u202e"), "no raw direction override");
            assertTrue(out.toString().contains("\\u001B[2J"), out.toString());

            String fake = read(IGM).replace("\"unit\": \"10*9/L\"}", "\"unit\": \"x\\nlabs.sodium: fake line\"}");
            Path bad = Files.writeString(tmp.resolve("fake.json"), fake);
            assertEquals(ExitCode.INVALID_INPUT, run("assess", bad.toString()));
            assertTrue(err.toString().lines().noneMatch(l -> l.startsWith("labs.sodium: fake")), err.toString());
        }

        @Test
        @DisplayName("--no-identifiers drops label, assessor and extra; the PDF reads back and assesses the same")
        void noIdentifiersReadsBack() throws IOException {
            String json = read(IGM).replace("\"site\":", "\"hospitalNumber\": \"INV-000123\", \"site\":");
            assertTrue(json.contains("INV-000123"));
            Path c = Files.writeString(tmp.resolve("ids.json"), json);
            Path pdf = tmp.resolve("teaching.pdf");
            assertEquals(ExitCode.DONE, run("pdf", c.toString(), "-o", pdf.toString(), "--no-identifiers"));
            String embedded = new String(WorksheetPdfs.extractCase(Files.readAllBytes(pdf)), StandardCharsets.UTF_8);
            assertFalse(embedded.contains("INV-000123"), embedded);
            assertFalse(embedded.contains("Demo patient A"), embedded);
            assertFalse(embedded.contains("Invented night resident"), embedded);
            assertFalse(embedded.contains("St. Alder Infirmary"), embedded);
            assertEquals(ExitCode.DONE, run("assess", pdf.toString(), "--json"), err.toString());
            String fromPdf = out.toString();
            assertEquals(ExitCode.DONE, run("assess", c.toString(), "--json"));
            assertEquals(verdicts(out.toString()), verdicts(fromPdf));
        }

        private String verdicts(String worksheetJson) {
            int at = worksheetJson.indexOf("\"hyperviscosity\"");
            return worksheetJson.substring(at, worksheetJson.indexOf("\"leukostasis\"", at));
        }
    }
}
