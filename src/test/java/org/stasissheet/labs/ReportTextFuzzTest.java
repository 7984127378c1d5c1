package org.stasissheet.labs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseWriter;

/**
 * Mangled report lines from a fixed-seed generator (5,000; 100,000 with {@code -Pfuzz}): the demo report's lines
 * cut, spliced, with characters swapped for separators, digits, units, flags and odd Unicode. Every non-blank line
 * comes back exactly once, no exception escapes, and whatever is taken makes a case the case reader accepts.
 */
class ReportTextFuzzTest {
    static final int COUNT = Integer.getInteger("stasis.fuzz.count", 5_000);
    static final long SEED = 0x1AB5L;
    private static final String[] PIECES = {" ", "\t", ",", ".", ";", "|", ":", "=", "-", "–", "(", ")", "[", "]",
        "<", ">", "*", "!", "H", "L", "x10^9/L", "10E9/l", "×10⁹/L", "mmol/l", "µmol/l", "g/dL", "%", "mg%", "G/L",
        "/nl", "0", "1", "9", "12,5", "1.234,5", "1,234", "99999999999999999999", "NaN", "Infinity", "\u00a0",
        "\u200b", "é", "ß", "𝔘", "Ca", "Hb", "K+", "ionised", "(venous)", "Serum"};

    @Test
    @DisplayName("every mangled report is read line for line without an exception, and what it takes is a valid case")
    void mangledReports_readWholly() throws Exception {
        List<String> lines = Files.readAllLines(Path.of("lab-reports", "aml-night.txt"), StandardCharsets.UTF_8);
        Random random = new Random(SEED);
        for (int i = 0; i < COUNT; i++) {
            List<String> report = new ArrayList<>();
            int n = 1 + random.nextInt(6);
            for (int k = 0; k < n; k++) {
                report.add(mangle(lines.get(random.nextInt(lines.size())), random));
            }
            String text = String.join(random.nextBoolean() ? "\n" : "\r\n", report);
            LabImport read = ReportText.read(text);
            long nonBlank = text.lines().map(l -> l.replace('\u00a0', ' ').strip())
                    .filter(l -> !l.isEmpty() && !l.matches("^[\\s\\-=_*#~.|+]*$")).count();
            long derived = read.taken().stream().filter(t -> t.note().contains("reference range printed")).count();
            assertEquals(nonBlank, read.lines().size() - derived, "input " + i + ": " + text);
            LabImport answered = read;
            for (int q = 0; q < answered.lines().size(); q++) {
                if (answered.lines().get(q) instanceof LabLine.Asked a) {
                    answered = answered.answer(q, java.util.Optional.of(a.options().get(0)));
                }
            }
            Case c = answered.applyTo(Case.EMPTY);
            CaseReader.Result back = CaseReader.read(CaseWriter.write(c).getBytes(StandardCharsets.UTF_8));
            int index = i;
            assertTrue(back instanceof CaseReader.Accepted, () -> "input " + index + ": " + text + " -> " + back);
        }
    }

    private static String mangle(String line, Random random) {
        StringBuilder b = new StringBuilder(line);
        int edits = random.nextInt(5);
        for (int e = 0; e < edits && b.length() > 0; e++) {
            int at = random.nextInt(b.length());
            switch (random.nextInt(3)) {
                case 0 -> b.insert(at, PIECES[random.nextInt(PIECES.length)]);
                case 1 -> b.deleteCharAt(at);
                default -> b.replace(at, Math.min(b.length(), at + 1 + random.nextInt(4)),
                        PIECES[random.nextInt(PIECES.length)]);
            }
        }
        return b.toString();
    }
}
