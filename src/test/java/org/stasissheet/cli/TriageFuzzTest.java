package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.fuzz.HostileInputs;
import org.stasissheet.intake.CaseReader;

/**
 * A referral folder full of hostile files: about a hundred mutated demo cases, plus files named .pdf that are not
 * worksheets (broken, truncated or empty). Triage must finish, give every file a row, and never mark one
 * internal-error: a bad file is the user's problem to fix, and the row must say what it is.
 */
class TriageFuzzTest {
    static final long SEED = 0x5_7A515L + 2;

    @Test
    @DisplayName("triage over a folder of hostile files: every file a row, none internal-error")
    void triage_ofHostileFolder_givesEveryFileARow(@TempDir Path tmp) throws IOException {
        Path in = Files.createDirectory(tmp.resolve("referrals"));
        Path out = tmp.resolve("out");
        HostileInputs inputs = new HostileInputs(samples(), new ObjectMapper(), SEED, CaseReader.MAX_BYTES + 4_096);
        List<String> names = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            String name = String.format(java.util.Locale.ROOT, "case-%03d.json", i);
            Files.write(in.resolve(name), inputs.next().bytes());
            names.add(name);
        }
        // files that claim to be worksheet PDFs and are not, or are cut short
        SplittableRandom random = new SplittableRandom(SEED);
        byte[] noise = new byte[4_096];
        for (int i = 0; i < noise.length; i++) {
            noise[i] = (byte) random.nextInt(256);
        }
        byte[] pdfHeaderOnly = "%PDF-1.7\n%\u00e2\u00e3\n1 0 obj\n<<".getBytes(StandardCharsets.ISO_8859_1);
        byte[][] fakes = {new byte[0], noise, pdfHeaderOnly, samples().get(0), "%PDF-".getBytes(StandardCharsets.US_ASCII)};
        for (int i = 0; i < fakes.length; i++) {
            String name = "fake-" + i + ".pdf";
            Files.write(in.resolve(name), fakes[i]);
            names.add(name);
        }

        StringWriter stdout = new StringWriter();
        StringWriter stderr = new StringWriter();
        int code = StasisCommand.run(new String[] {"triage", in.toString(), "-o", out.toString()},
                new PrintWriter(stdout, true), new PrintWriter(stderr, true));

        assertEquals(ExitCode.DONE, code, stderr.toString());
        assertFalse(stderr.toString().contains("\tat "), "no stack trace");
        String summary = Files.readString(out.resolve(TriageCommand.SUMMARY), StandardCharsets.UTF_8);
        assertFalse(summary.contains("internal-error"), summary);
        for (String name : names) {
            assertTrue(summary.contains(name), name + " has a row");
        }
        // the progress lines name every file once, with its status
        long progress = stderr.toString().lines().filter(l -> l.startsWith("[")).count();
        assertEquals(names.size(), progress, stderr.toString());
        assertFalse(stderr.toString().contains("internal-error"), stderr.toString());
    }

    static List<byte[]> samples() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("samples"))) {
            List<byte[]> seeds = new ArrayList<>();
            for (Path p : files.filter(f -> f.toString().endsWith(".json")).sorted().toList()) {
                seeds.add(Files.readAllBytes(p));
            }
            return seeds;
        }
    }
}
