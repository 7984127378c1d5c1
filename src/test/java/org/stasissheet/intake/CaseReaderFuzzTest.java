package org.stasissheet.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.cli.ExitCode;
import org.stasissheet.cli.StasisCommand;
import org.stasissheet.fuzz.HostileInputs;
import org.stasissheet.fuzz.HostileInputs.Input;

/**
 * Hostile case files: the demo cases mutated by a fixed-seed generator (5,000 inputs; 100,000 with
 * {@code -Pfuzz}, through {@code -Dstasis.fuzz.count}). Every input must be read or rejected with problems that
 * name a path and say what is wrong in words, never by an exception, and never by running out of stack or memory
 * (the reader refuses deep and huge input early). A failing input is replayed from its number with the same seed.
 */
class CaseReaderFuzzTest {
    static final int COUNT = Integer.getInteger("stasis.fuzz.count", 5_000);
    static final long SEED = 0x5_7A515L;
    /** Huge inputs go past the reader's whole-file limit; a fortieth of it is past the string-length limit. */
    static final int HUGE = CaseReader.MAX_BYTES + 4_096;

    static List<byte[]> samples() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("samples"))) {
            List<byte[]> seeds = new ArrayList<>();
            for (Path p : files.filter(f -> f.toString().endsWith(".json")).sorted().toList()) {
                seeds.add(Files.readAllBytes(p));
            }
            assertTrue(seeds.size() >= 2, "the demo cases are the seeds: " + seeds.size());
            return seeds;
        }
    }

    static HostileInputs generator() throws IOException {
        return new HostileInputs(samples(), new ObjectMapper(), SEED, HUGE);
    }

    @Test
    @DisplayName("every mutated case is accepted or rejected with located, worded problems; nothing throws")
    void everyInput_isAcceptedOrRejectedWithPaths() throws IOException {
        HostileInputs inputs = generator();
        List<String> failures = new ArrayList<>();
        int accepted = 0;
        int rejected = 0;
        for (int i = 0; i < COUNT; i++) {
            Input input = inputs.next();
            CaseReader.Result result;
            try {
                result = CaseReader.read(input.bytes());
            } catch (RuntimeException | StackOverflowError | OutOfMemoryError e) {
                failures.add(input + " threw " + e);
                continue;
            }
            if (result instanceof CaseReader.Rejected r) {
                rejected++;
                r.problems().forEach(p -> checkProblem(input, p, failures));
            } else if (result instanceof CaseReader.Accepted) {
                accepted++;
            } else {
                failures.add(input + " gave neither outcome: " + result);
            }
        }
        assertEquals(List.of(), failures.stream().limit(20).toList(), failures.size() + " of " + COUNT + " inputs failed");
        // the generator is worth something only if it produces both outcomes
        assertTrue(rejected > COUNT / 2, "rejected " + rejected + " of " + COUNT);
        assertTrue(accepted > 0, "accepted " + accepted + " of " + COUNT);
    }

    static void checkProblem(Input input, CaseReader.Problem p, List<String> failures) {
        if (p.path().isBlank() || p.message().isBlank()) {
            failures.add(input + " gave a problem without path or message: " + p);
        }
        // a message is for a person: no Java internals, no parser class names, no stack frames
        if (p.message().contains("Exception") || p.message().contains("com.fasterxml")
                || p.message().contains("\tat ") || p.message().contains(".java:")) {
            failures.add(input + " gave a message with Java internals: " + p);
        }
        if (p.message().length() > 2_000) {
            failures.add(input + " gave a " + p.message().length() + "-character message (echoes the input?)");
        }
    }

    @Test
    @DisplayName("assess on mutated case files exits 0 or 2 and never prints a stack trace")
    void assess_onMutatedFiles_exitsCleanly(@TempDir Path dir) throws IOException {
        HostileInputs inputs = generator();
        int runs = Math.max(100, COUNT / 50);
        List<String> failures = new ArrayList<>();
        for (int i = 0; i < runs; i++) {
            Input input = inputs.next();
            Path file = dir.resolve("case-" + input.index() + ".json");
            Files.write(file, input.bytes());
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            int code = StasisCommand.run(new String[] {"assess", file.toString()},
                    new PrintWriter(out, true), new PrintWriter(err, true));
            if (code != ExitCode.DONE && code != ExitCode.INVALID_INPUT) {
                failures.add(input + " exited " + code + ": " + err);
            }
            if (err.toString().contains("\tat ") || out.toString().contains("\tat ")) {
                failures.add(input + " printed a stack trace: " + err);
            }
            if (code == ExitCode.INVALID_INPUT && err.toString().isBlank()) {
                failures.add(input + " was refused without a word");
            }
            Files.delete(file);
        }
        assertEquals(List.of(), failures.stream().limit(20).toList(), failures.size() + " of " + runs + " runs failed");
    }
}
