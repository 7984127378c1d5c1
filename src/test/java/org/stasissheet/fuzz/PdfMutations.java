package org.stasissheet.fuzz;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Mutated copies of worksheet PDFs, reproducible from a seed: byte flips, random overwrites, deletions,
 * duplications, truncation, changed numbers, and hostile fragments spliced in (deep nesting, huge counts and object
 * numbers, filters worksheets never use, encryption, reference loops, a nested Flate bomb).
 */
final class PdfMutations {
    /** A mutated PDF and what was done to it, so a failure can be described and replayed. */
    record Mutant(byte[] bytes, String what) {
    }

    private static final List<String> FRAGMENTS = List.of("<<".repeat(300), "[".repeat(2_000),
            "/Filter/LZWDecode", "/Filter/RunLengthDecode", "/Encrypt 1 0 R", "/Size 999999999", "/N 2147483647",
            "/DecodeParms<</Predictor 12/Columns 999999999>>", "999999999 0 obj", "1 0 R", "/Length 999999999",
            "trailer\n<</Root 1 0 R/Prev 0/Size 3>>\n", "xref\n0 999999999\n", "/Kids[1 0 R 1 0 R]",
            "/Type/ObjStm/N 3/First 0", "(\\", "endstream endobj", "%%EOF");
    private static final byte[] BOMB = bomb();

    private final List<byte[]> seeds;
    private final SplittableRandom random;

    PdfMutations(List<byte[]> seeds, long seed) {
        this.seeds = List.copyOf(seeds);
        this.random = new SplittableRandom(seed);
    }

    private static byte[] bomb() {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes("\n99 0 obj\n<</Filter[/FlateDecode/FlateDecode]/Length 0>>\nstream\n"
                .getBytes(StandardCharsets.ISO_8859_1));
        b.writeBytes(TinyPdf.deflate(TinyPdf.deflate(new byte[64 << 20])));
        b.writeBytes("\nendstream\nendobj\n".getBytes(StandardCharsets.ISO_8859_1));
        return b.toByteArray();
    }

    Mutant next() {
        int seedIndex = random.nextInt(seeds.size());
        byte[] b = seeds.get(seedIndex);
        StringBuilder what = new StringBuilder("seed " + seedIndex);
        int steps = 1 + random.nextInt(3);
        for (int s = 0; s < steps; s++) {
            int op = random.nextInt(8);
            int at = random.nextInt(Math.max(1, b.length));
            switch (op) {
                case 0 -> {
                    b = b.clone();
                    int flips = 1 + random.nextInt(8);
                    for (int i = 0; i < flips; i++) {
                        b[random.nextInt(b.length)] ^= (byte) (1 << random.nextInt(8));
                    }
                    what.append(", flip ").append(flips);
                }
                case 1 -> {
                    b = b.clone();
                    int n = Math.min(b.length - at, 1 + random.nextInt(64));
                    for (int i = 0; i < n; i++) {
                        b[at + i] = (byte) random.nextInt(256);
                    }
                    what.append(", overwrite ").append(n).append(" at ").append(at);
                }
                case 2 -> {
                    int n = Math.min(b.length - at, 1 + random.nextInt(4_096));
                    b = join(slice(b, 0, at), slice(b, at + n, b.length));
                    what.append(", delete ").append(n).append(" at ").append(at);
                }
                case 3 -> {
                    int n = Math.min(b.length - at, 1 + random.nextInt(4_096));
                    int to = random.nextInt(b.length);
                    b = join(slice(b, 0, to), slice(b, at, at + n), slice(b, to, b.length));
                    what.append(", duplicate ").append(n).append(" to ").append(to);
                }
                case 4 -> {
                    b = slice(b, 0, at);
                    what.append(", truncate at ").append(at);
                }
                case 5 -> {
                    String f = FRAGMENTS.get(random.nextInt(FRAGMENTS.size()));
                    b = join(slice(b, 0, at), f.getBytes(StandardCharsets.ISO_8859_1), slice(b, at, b.length));
                    what.append(", splice fragment at ").append(at);
                }
                case 6 -> {
                    b = join(slice(b, 0, at), BOMB, slice(b, at, b.length));
                    what.append(", splice bomb at ").append(at);
                }
                default -> {
                    b = changeNumber(b, at);
                    what.append(", change a number near ").append(at);
                }
            }
            if (b.length == 0) {
                break;
            }
        }
        return new Mutant(b, what.toString());
    }

    private byte[] changeNumber(byte[] b, int from) {
        for (int i = from; i < b.length; i++) {
            if (b[i] >= '0' && b[i] <= '9') {
                int end = i;
                while (end < b.length && b[end] >= '0' && b[end] <= '9') {
                    end++;
                }
                String[] choices = {"0", "-1", "999999999", "2147483648", "99999999999999999999", "1"};
                byte[] n = choices[random.nextInt(choices.length)].getBytes(StandardCharsets.ISO_8859_1);
                return join(slice(b, 0, i), n, slice(b, end, b.length));
            }
        }
        return b;
    }

    private static byte[] slice(byte[] b, int from, int to) {
        return java.util.Arrays.copyOfRange(b, Math.min(from, b.length), Math.min(Math.max(from, to), b.length));
    }

    private static byte[] join(byte[]... parts) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (byte[] p : parts) {
            out.writeBytes(p);
        }
        return out.toByteArray();
    }
}
