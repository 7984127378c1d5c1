package org.stasissheet.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.cli.StasisCommand;
import org.stasissheet.files.WorksheetPdfs;

/**
 * Mutated worksheet PDFs read back by {@code assess} in a separate JVM whose heap is capped at
 * {@value #HEAP_MIB} MiB and which ends at the first allocation beyond it: none may exit 1 and the run must
 * finish. 300 mutants in every build; {@code -Pfuzz} runs 10,000 ({@code -Dstasis.fuzz.pdfCount}).
 */
class PdfMutationFuzzTest {
    /** The memory bound of reading back a worksheet PDF, set here and stated in README, Limits. */
    static final int HEAP_MIB = 128;
    static final int COUNT = Integer.getInteger("stasis.fuzz.pdfCount", 300);
    static final long SEED = 20261202L;
    private static final Pattern RESULT =
            Pattern.compile("RESULT total=(\\d+) exit0=(\\d+) exit1=(\\d+) exit2=(\\d+) sumOfPoolPeaksMiB=(\\d+)");

    @TempDir
    Path tmp;

    @Test
    @DisplayName("mutated worksheet PDFs: none exits 1, none needs more than the heap bound (forked JVM, small -Xmx)")
    void mutatedPdfs() throws IOException, InterruptedException {
        List<String> seeds = new ArrayList<>();
        for (String sample : List.of("igm-symptomatic", "aml-breathless")) {
            Path pdf = tmp.resolve(sample + ".pdf");
            int code = StasisCommand.run(new String[] {"pdf", "samples/" + sample + ".json", "-o", pdf.toString()},
                    new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
            assertEquals(0, code);
            seeds.add(pdf.toString());
        }
        // a hand-made worksheet-shaped PDF without object streams, so mutations reach plain structure too
        byte[] json = Files.readAllBytes(Path.of("samples", "cll-extreme.json"));
        Path plain = Files.write(tmp.resolve("plain.pdf"), TinyPdf.withAttachment(WorksheetPdfs.ATTACHMENT_NAME, json,
                "/" + WorksheetPdfs.CASE_DIGEST_KEY + "(" + WorksheetPdfs.sha256(json) + ")"));
        seeds.add(plain.toString());

        Path work = Files.createDirectories(tmp.resolve("work"));
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx" + HEAP_MIB + "m", "-XX:+ExitOnOutOfMemoryError", "-Djava.awt.headless=true",
                "-cp", System.getProperty("java.class.path"), PdfMutationRun.class.getName(),
                Integer.toString(COUNT), Long.toString(SEED), work.toString()));
        command.addAll(seeds);
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        byte[] output = p.getInputStream().readAllBytes();
        assertTrue(p.waitFor(30, TimeUnit.MINUTES), "the run finishes");
        String text = new String(output, StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), "the forked JVM ended normally (not by running out of memory): " + tail(text));
        Matcher m = RESULT.matcher(text);
        assertTrue(m.find(), tail(text));
        assertEquals(COUNT, Integer.parseInt(m.group(1)));
        assertEquals(0, Integer.parseInt(m.group(3)), "mutants that exited 1: " + tail(text));
        assertTrue(text.lines().noneMatch(l -> l.startsWith("FAIL")), tail(text));
        assertEquals(COUNT, Integer.parseInt(m.group(2)) + Integer.parseInt(m.group(4)), "every mutant read or refused");
        System.out.println("PDF mutation: " + m.group());
    }

    private static String tail(String text) {
        return text.length() <= 4_000 ? text : "…" + text.substring(text.length() - 4_000);
    }
}
