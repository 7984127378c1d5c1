package org.stasissheet.files;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.Set;
import java.util.zip.DataFormatException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.Inflater;

/**
 * A bounded look at a PDF's bytes before the PDF library parses them: the library decompresses and allocates
 * whatever the file asks for, so anything that could make it use unbounded memory or stack is refused here first.
 *
 * <p>Checked, each against a named limit: the total size of every compressed stream once inflated (every layer of
 * Flate counted, at most {@link #MAX_LAYERS} layers), the nesting of arrays and dictionaries
 * within one object (also inside object streams), object numbers and the counts a reader allocates arrays for
 * ({@code /Size}, {@code /N}, {@code /Count}, cross-reference subsections), predictor parameters, and filters a
 * worksheet never uses (LZW, run-length, image codecs, encryption). Worksheets written by this tool pass with a
 * wide margin; the scan is deliberately conservative with anything else.
 */
final class PdfScan {
    /** Most bytes all compressed streams of one PDF may inflate to, together: 16 MiB (a worksheet needs ~1 MiB). */
    static final long MAX_INFLATED_BYTES = 16L << 20;
    /** Most layers of Flate on one stream; a worksheet uses one. */
    static final int MAX_LAYERS = 3;
    /** Deepest nesting of arrays and dictionaries within one object; a worksheet needs four. */
    static final int MAX_NESTING = 32;
    /** Highest object number and largest count a reader would allocate for; a worksheet has a few hundred objects. */
    static final long MAX_OBJECTS = 100_000;
    /** Largest predictor row (/Columns) and colour count accepted; a worksheet's cross-reference uses 5 columns. */
    static final long MAX_COLUMNS = 10_000;
    static final long MAX_COLORS = 32;
    static final long MAX_BITS_PER_COMPONENT = 16;

    /** Filters a worksheet never uses; several expand without bound in the PDF library. */
    private static final Set<String> REFUSED_NAMES = Set.of("LZWDecode", "LZW", "RunLengthDecode", "RL",
            "CCITTFaxDecode", "CCF", "JBIG2Decode", "DCTDecode", "DCT", "JPXDecode", "Crypt", "Encrypt");
    /** Names whose integer value sizes an allocation in the reader, with the largest value accepted. */
    private static final Map<String, Long> BOUNDED_NUMBERS = Map.of("Size", MAX_OBJECTS, "N", MAX_OBJECTS,
            "Count", MAX_OBJECTS, "Columns", MAX_COLUMNS, "Colors", MAX_COLORS,
            "BitsPerComponent", MAX_BITS_PER_COMPONENT);
    private static final byte[] END_STREAM = "endstream".getBytes(StandardCharsets.US_ASCII);

    private long inflated;

    private PdfScan() {
    }

    /** A reason the PDF must not be handed to the library. */
    static final class Refused extends IOException {
        private static final long serialVersionUID = 1L;

        Refused(String message) {
            super(message);
        }
    }

    static void check(byte[] pdf) throws Refused {
        checkAnywhere(pdf);
        new PdfScan().scan(pdf, 0, pdf.length, true);
    }

    /** "N G obj" wherever it stands: a reader rebuilding a broken cross-reference finds objects by this pattern. */
    private static final Pattern OBJECT_HEADER = Pattern.compile("(\\d+)[ \\t\\r\\n\\f\\x00]+\\d+[ \\t\\r\\n\\f\\x00]*obj");
    private static final Pattern XREF_SECTION = Pattern.compile("xref[ \\t\\r\\n]+(\\d+)[ \\t]+(\\d+)");
    private static final Pattern BOUNDED_ENTRY = Pattern.compile("/(Size|N|Count|Columns|Colors|BitsPerComponent)"
            + "[ \\t\\r\\n\\f\\x00]*(\\d+)");

    /**
     * The same bounds on the bytes as a plain text, ignoring structure: the tokenizer below follows the file as
     * written, but a reader that finds the file broken searches it line by line, and may then meet what the
     * tokenizer took for string or stream data.
     */
    private static void checkAnywhere(byte[] pdf) throws Refused {
        String text = new String(pdf, StandardCharsets.ISO_8859_1);
        Matcher m = OBJECT_HEADER.matcher(text);
        while (m.find()) {
            if (saturated(m.group(1)) > MAX_OBJECTS) {
                throw new Refused("object number " + abbreviated(m.group(1)) + " is beyond " + MAX_OBJECTS);
            }
        }
        m = XREF_SECTION.matcher(text);
        while (m.find()) {
            long start = saturated(m.group(1));
            long count = saturated(m.group(2));
            if (start + count > MAX_OBJECTS) {
                throw new Refused("a cross-reference section of objects " + abbreviated(m.group(1)) + " to "
                        + (start + count) + " goes beyond " + MAX_OBJECTS);
            }
        }
        m = BOUNDED_ENTRY.matcher(text);
        while (m.find()) {
            long value = saturated(m.group(2));
            long limit = BOUNDED_NUMBERS.get(m.group(1));
            if (value > limit) {
                throw new Refused("/" + m.group(1) + " " + abbreviated(m.group(2)) + " is larger than " + limit
                        + ", the most accepted");
            }
        }
    }

    private static long saturated(String digits) {
        return digits.length() > 15 ? Long.MAX_VALUE / 2 : Long.parseLong(digits);
    }

    private static String abbreviated(String digits) {
        return digits.length() > 20 ? digits.substring(0, 20) + "…" : digits;
    }

    /**
     * Tokenizes {@code b[from, to)}. In the file itself ({@code raw}) stream data is skipped and inflated; inside
     * an inflated object stream there are no streams.
     */
    private void scan(byte[] b, int from, int to, boolean raw) throws Refused {
        int depth = 0;
        String lastName = null;
        long[] numbers = new long[4];
        int numberCount = 0;
        boolean objectStream = false;
        boolean inXrefTable = false;
        int i = from;
        while (i < to) {
            int c = b[i] & 0xFF;
            if (c == '%') {
                while (i < to && b[i] != '\n' && b[i] != '\r') {
                    i++;
                }
                continue;
            }
            if (c == '(') {
                i = skipLiteral(b, i, to);
                lastName = null;
                continue;
            }
            if (c == '<' && i + 1 < to && b[i + 1] == '<' || c == '[') {
                depth++;
                if (depth > MAX_NESTING) {
                    throw new Refused("arrays or dictionaries nested more than " + MAX_NESTING + " deep");
                }
                i += c == '[' ? 1 : 2;
                lastName = null;
                continue;
            }
            if (c == '>' && i + 1 < to && b[i + 1] == '>' || c == ']') {
                depth = Math.max(0, depth - 1);
                i += c == ']' ? 1 : 2;
                lastName = null;
                continue;
            }
            if (c == '<') {
                while (i < to && b[i] != '>') {
                    i++;
                }
                i++;
                continue;
            }
            if (c == '/') {
                int start = ++i;
                while (i < to && isRegular(b[i] & 0xFF)) {
                    i++;
                }
                String name = new String(b, start, i - start, StandardCharsets.ISO_8859_1);
                if (REFUSED_NAMES.contains(name)) {
                    throw new Refused("it uses /" + name + ", which a worksheet never does");
                }
                if (name.equals("ObjStm")) {
                    objectStream = true;
                }
                lastName = name;
                continue;
            }
            if (c >= '0' && c <= '9' || c == '-' || c == '+' || c == '.') {
                int start = i;
                while (i < to && isRegular(b[i] & 0xFF)) {
                    i++;
                }
                long value = integer(b, start, i);
                if (lastName != null && BOUNDED_NUMBERS.containsKey(lastName) && value > BOUNDED_NUMBERS.get(lastName)) {
                    throw new Refused("/" + lastName + " " + value + " is larger than "
                            + BOUNDED_NUMBERS.get(lastName) + ", the most accepted");
                }
                lastName = null;
                System.arraycopy(numbers, 1, numbers, 0, 3);
                numbers[3] = value;
                numberCount++;
                continue;
            }
            if (isRegular(c)) {
                int start = i;
                while (i < to && isRegular(b[i] & 0xFF)) {
                    i++;
                }
                String word = new String(b, start, i - start, StandardCharsets.ISO_8859_1);
                lastName = null;
                switch (word) {
                    case "obj", "R" -> {
                        if (numberCount >= 2 && (numbers[2] > MAX_OBJECTS || numbers[2] < 0)) {
                            throw new Refused("object number " + numbers[2] + " is beyond " + MAX_OBJECTS);
                        }
                        if (word.equals("obj")) {
                            depth = 0;
                            objectStream = false;
                        }
                    }
                    case "endobj" -> depth = 0;
                    case "xref" -> {
                        inXrefTable = true;
                        numberCount = 0;
                    }
                    case "trailer" -> inXrefTable = false;
                    case "n", "f" -> {
                        // a table entry "offset generation n"; four numbers mean a subsection header came first
                        if (inXrefTable && numberCount == 4 && (numbers[0] < 0 || numbers[1] < 0
                                || numbers[0] + numbers[1] > MAX_OBJECTS)) {
                            throw new Refused("a cross-reference section of objects " + numbers[0] + " to "
                                    + (numbers[0] + numbers[1]) + " goes beyond " + MAX_OBJECTS);
                        }
                        numberCount = 0;
                    }
                    case "stream" -> {
                        if (raw) {
                            i = stream(b, i, to, objectStream);
                        }
                    }
                    default -> {
                        // other keywords (true, false, null, n, f, startxref, operators) need no check
                    }
                }
                if (!word.equals("obj") && !word.equals("R") && !inXrefTable) {
                    numberCount = 0;
                }
                continue;
            }
            i++;
        }
    }

    /** Inflates the stream's data, if compressed, within the budget; returns where scanning goes on. */
    private int stream(byte[] b, int afterKeyword, int to, boolean objectStream) throws Refused {
        int data = afterKeyword;
        if (data < to && b[data] == '\r') {
            data++;
        }
        if (data < to && b[data] == '\n') {
            data++;
        }
        int end = indexOf(b, END_STREAM, data, to);
        int stop = end < 0 ? to : end;
        if (looksZlib(b, data, to)) {
            byte[] out = inflate(b, data, to);
            // a filter chain may inflate the result again: every layer counts against the same budget
            for (int layer = 2; looksZlib(out, 0, out.length); layer++) {
                byte[] inner = inflate(out, 0, out.length);
                if (inner.length == 0) {
                    break; // only looked like a header; not compressed data
                }
                if (layer > MAX_LAYERS) {
                    throw new Refused("a stream is compressed more than " + MAX_LAYERS + " times over");
                }
                out = inner;
            }
            if (objectStream) {
                scan(out, 0, out.length, false);
            }
        }
        return end < 0 ? to : stop + END_STREAM.length;
    }

    private byte[] inflate(byte[] b, int from, int to) throws Refused {
        Inflater inflater = new Inflater();
        try {
            inflater.setInput(b, from, to - from);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            byte[] buffer = new byte[16 * 1024];
            while (!inflater.finished()) {
                int n;
                try {
                    n = inflater.inflate(buffer);
                } catch (DataFormatException e) {
                    break; // the library will find the data broken too and say so; nothing more to measure
                }
                if (n == 0 && (inflater.needsInput() || inflater.needsDictionary())) {
                    break;
                }
                inflated += n;
                if (inflated > MAX_INFLATED_BYTES) {
                    throw new Refused("its compressed streams inflate to more than " + (MAX_INFLATED_BYTES >> 20)
                            + " MiB");
                }
                out.write(buffer, 0, n);
            }
            return out.toByteArray();
        } finally {
            inflater.end();
        }
    }

    /** A zlib header: compression method 8 and a check value the header's two bytes satisfy. */
    private static boolean looksZlib(byte[] b, int at, int to) {
        if (at + 1 >= to) {
            return false;
        }
        int cmf = b[at] & 0xFF;
        int flg = b[at + 1] & 0xFF;
        return (cmf & 0x0F) == 8 && (cmf >> 4) <= 7 && (cmf * 256 + flg) % 31 == 0;
    }

    private static int skipLiteral(byte[] b, int i, int to) {
        int level = 0;
        while (i < to) {
            int c = b[i] & 0xFF;
            if (c == '\\') {
                i += 2;
                continue;
            }
            if (c == '(') {
                level++;
            } else if (c == ')') {
                level--;
                if (level == 0) {
                    return i + 1;
                }
            }
            i++;
        }
        return to;
    }

    /** The integer part of a number token, saturating instead of overflowing; fractions count as their floor. */
    private static long integer(byte[] b, int from, int to) {
        long v = 0;
        boolean negative = false;
        for (int i = from; i < to; i++) {
            int c = b[i] & 0xFF;
            if (c == '-' && i == from) {
                negative = true;
            } else if (c >= '0' && c <= '9') {
                v = v > Long.MAX_VALUE / 20 ? Long.MAX_VALUE / 2 : v * 10 + (c - '0');
            } else {
                break;
            }
        }
        return negative ? -v : v;
    }

    private static boolean isRegular(int c) {
        return !(c == 0 || c == 9 || c == 10 || c == 12 || c == 13 || c == 32 || c == '(' || c == ')' || c == '<'
                || c == '>' || c == '[' || c == ']' || c == '{' || c == '}' || c == '/' || c == '%');
    }

    private static int indexOf(byte[] b, byte[] what, int from, int to) {
        outer:
        for (int i = from; i + what.length <= to; i++) {
            for (int j = 0; j < what.length; j++) {
                if (b[i + j] != what[j]) {
                    continue outer;
                }
            }
            return i;
        }
        return -1;
    }
}
