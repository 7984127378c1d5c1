package org.stasissheet.fuzz;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.stasissheet.cli.StasisCommand;

/**
 * The PDF mutation run, as a program of its own so that a test can start it in a JVM with a small heap: it mutates
 * worksheet PDFs with a fixed seed, runs {@code assess} on each and prints one line per exit 1 and a last line
 * {@code RESULT total=… exit0=… exit1=… exit2=… sumOfPoolPeaksMiB=…}. Started with {@code -XX:+ExitOnOutOfMemoryError},
 * any allocation beyond the heap ends the process at once, so a finished run is a run within the bound.
 *
 * <p>Arguments: count, seed, a work folder, then the seed PDFs.
 */
public final class PdfMutationRun {
    /** {@code -Dstasis.fuzz.trace=true} prints each mutant before it is read. */
    private static final boolean TRACE = Boolean.getBoolean("stasis.fuzz.trace");
    /** {@code -Dstasis.fuzz.from=N} replays from mutant N on (the ones before are generated, not read). */
    private static final int FROM = Integer.getInteger("stasis.fuzz.from", 0);

    private PdfMutationRun() {
    }

    public static void main(String[] args) throws IOException {
        int count = Integer.parseInt(args[0]);
        long seed = Long.parseLong(args[1]);
        Path work = Path.of(args[2]);
        List<byte[]> seeds = new ArrayList<>();
        for (int i = 3; i < args.length; i++) {
            seeds.add(Files.readAllBytes(Path.of(args[i])));
        }
        PdfMutations mutations = new PdfMutations(seeds, seed);
        Path file = work.resolve("mutant.pdf");
        int[] exits = new int[3];
        for (int i = 0; i < count; i++) {
            PdfMutations.Mutant m = mutations.next();
            if (i < FROM) {
                continue;
            }
            if (TRACE) {
                // which mutant is being read, before it is read: the last line names the one that broke the run
                System.out.println("TRY " + i + " (" + m.what() + ")");
                System.out.flush();
            }
            Files.write(file, m.bytes());
            StringWriter err = new StringWriter();
            int code = StasisCommand.run(new String[] {"assess", file.toString()},
                    new PrintWriter(Writer.nullWriter()), new PrintWriter(err));
            exits[Math.min(code, 2)]++;
            if (code == 1 || err.toString().contains("ran out of memory")) {
                System.out.println("FAIL " + i + " (" + m.what() + "): " + err.toString().strip().replace('\n', ' '));
            }
        }
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.println("RESULT total=" + count + " exit0=" + exits[0] + " exit1=" + exits[1] + " exit2="
                + exits[2] + " sumOfPoolPeaksMiB=" + (peak >> 20));
        System.out.flush();
        System.exit(0);
    }
}
