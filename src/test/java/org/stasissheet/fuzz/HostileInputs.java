package org.stasissheet.fuzz;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.SplittableRandom;
import java.util.function.Consumer;

/**
 * A fixed-seed generator of hostile inputs made by mutating valid documents (JSON cases or YAML rule files):
 * wrong types, absurd numbers, broken and truncated text, deep nesting, invalid UTF-8, huge strings and odd
 * Unicode. The same seed gives the same inputs, so a failure can be replayed from its index.
 *
 * <p>Structured mutations go through the document's own tree (read and written with the given mapper); the
 * rest work on the bytes. A placeholder string stands where a raw token (a number JSON cannot hold, a nest of
 * arrays) must be spliced into the written text.
 */
public final class HostileInputs {
    /** One generated input: its number, the seed document it came from, what was done to it, and the bytes. */
    public record Input(int index, int seedIndex, String what, byte[] bytes) {
        public Input {
            Objects.requireNonNull(what, "what");
            Objects.requireNonNull(bytes, "bytes");
        }

        public String text() {
            return new String(bytes, StandardCharsets.UTF_8);
        }

        @Override
        public String toString() {
            return "#" + index + " " + what + " (" + bytes.length + " bytes)";
        }
    }

    private static final String PLACEHOLDER = "QQPLACEHOLDERQQ";
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /** Numbers no lab or rule has: beyond double, below its smallest step, negative, not numbers at all. */
    private static final List<String> ABSURD_NUMBERS = List.of(
            "1e999", "-1e999", "1e-999", "4.9e-324", "1.7976931348623157e308", "-1.7976931348623157e308",
            "123456789012345678901234567890123456789", "-0", "0", "-1", "-273.15", "2147483648", "-2147483649",
            "9223372036854775808", "0.000000000000000000000000000001", "1e308", "NaN", "Infinity", "-Infinity",
            "0x1F", "01", "1.", ".5", "+1", "1e", "--1", "1_000");

    /** Text a person might paste, or an attacker might send. */
    private static final List<String> ODD_TEXT = List.of(
            "\u202Eevil\u202C", "zero\u200Bwidth", "e\u0301\u0301\u0301", "\uD83D\uDE00\uD83E\uDDEC", "\uFEFFbom",
            "nul\u0000char", "tab\there", "line\nbreak\r\n", "\u0007bell", "\uFFFF\uFFFE", "\\u0000",
            "\u0130\u0131 dotted", "\u00DF\u1E9E", "\u0663\u0664\u0665", "１２３", "∞", "−5", "5,6", " 5.6 ",
            "female ", "FEMALE", "Female", "igm", "IGM", "g/dl", "G/DL", "10^9/L", "10*9/l", "\u00B5mol/L",
            "'; DROP TABLE", "${jndi:x}", "%s%s%n", "<script>", "../../etc/passwd", "C:\\CON", "");

    /** Byte sequences that are not UTF-8: stray continuation bytes, overlong forms, surrogates, cut sequences. */
    private static final List<byte[]> INVALID_UTF8 = List.of(
            new byte[] {(byte) 0x80}, new byte[] {(byte) 0xBF}, new byte[] {(byte) 0xC0, (byte) 0xAF},
            new byte[] {(byte) 0xC3, 0x28}, new byte[] {(byte) 0xE2, (byte) 0x82}, new byte[] {(byte) 0xED,
                (byte) 0xA0, (byte) 0x80}, new byte[] {(byte) 0xF4, (byte) 0x90, (byte) 0x80, (byte) 0x80},
            new byte[] {(byte) 0xF8, (byte) 0x88, (byte) 0x80, (byte) 0x80, (byte) 0x80},
            new byte[] {(byte) 0xFE}, new byte[] {(byte) 0xFF}, new byte[] {(byte) 0xFF, (byte) 0xFE},
            new byte[] {(byte) 0xF0, (byte) 0x9F, (byte) 0x98});

    private final List<byte[]> seeds;
    private final ObjectMapper mapper;
    private final SplittableRandom random;
    private final int hugeBytes;
    private int index;

    /**
     * @param seeds     valid documents to mutate
     * @param mapper    reads and writes the seeds' format (JSON or YAML)
     * @param seed      the random seed; fixed in every test so a run can be replayed
     * @param hugeBytes the size of a "huge" string or document: make it larger than the reader's limit
     */
    public HostileInputs(List<byte[]> seeds, ObjectMapper mapper, long seed, int hugeBytes) {
        if (seeds.isEmpty()) {
            throw new IllegalArgumentException("no seed documents");
        }
        this.seeds = List.copyOf(seeds);
        this.mapper = Objects.requireNonNull(mapper, "mapper");
        this.random = new SplittableRandom(seed);
        this.hugeBytes = hugeBytes;
    }

    public Input next() {
        int seedIndex = random.nextInt(seeds.size());
        byte[] seed = seeds.get(seedIndex);
        int mutations = random.nextInt(10) < 8 ? 1 : 2 + random.nextInt(2);
        StringBuilder what = new StringBuilder("seed ").append(seedIndex).append(':');
        byte[] bytes = seed;
        for (int i = 0; i < mutations; i++) {
            Mutated m = mutate(bytes);
            what.append(' ').append(m.what);
            bytes = m.bytes;
        }
        return new Input(index++, seedIndex, what.toString(), bytes);
    }

    private record Mutated(String what, byte[] bytes) {
    }

    private Mutated mutate(byte[] doc) {
        int pick = random.nextInt(100);
        if (pick < 14) {
            return tree(doc, "wrong-type", this::otherTypeThan);
        } else if (pick < 26) {
            return raw(doc, "absurd-number", ABSURD_NUMBERS.get(random.nextInt(ABSURD_NUMBERS.size())));
        } else if (pick < 34) {
            return tree(doc, "odd-unicode", n -> TextNode.valueOf(ODD_TEXT.get(random.nextInt(ODD_TEXT.size()))));
        } else if (pick < 42) {
            return keys(doc);
        } else if (pick < 52) {
            return truncate(doc);
        } else if (pick < 60) {
            return flipBytes(doc);
        } else if (pick < 68) {
            return invalidUtf8(doc);
        } else if (pick < 74) {
            return deepNesting(doc);
        } else if (pick < 77) {
            return huge(doc);
        } else if (pick < 90) {
            return brokenText(doc);
        }
        return whole();
    }

    // ---- structured mutations -------------------------------------------------------------------------------

    private interface Replacement {
        JsonNode replace(JsonNode old);
    }

    /** Replaces one node of the document's tree, chosen at random; falls back to a byte mutation if unparsable. */
    private Mutated tree(byte[] doc, String what, Replacement replacement) {
        JsonNode root = parse(doc);
        if (root == null || !root.isContainerNode() || root.isEmpty()) {
            return flipBytes(doc);
        }
        List<Slot> slots = new ArrayList<>();
        collect(root, "", slots);
        Slot slot = slots.get(random.nextInt(slots.size()));
        JsonNode replacementNode = replacement.replace(slot.node());
        slot.set(replacementNode);
        return new Mutated(what + "@" + slot.path(), write(root));
    }

    /** Puts a raw token (written as is, not as a string) in place of one node. */
    private Mutated raw(byte[] doc, String what, String token) {
        Mutated placed = tree(doc, what, n -> TextNode.valueOf(PLACEHOLDER));
        String text = new String(placed.bytes, StandardCharsets.UTF_8);
        if (!text.contains(PLACEHOLDER)) {
            return placed;
        }
        text = text.replace("\"" + PLACEHOLDER + "\"", token).replace("'" + PLACEHOLDER + "'", token)
                .replace(PLACEHOLDER, token);
        return new Mutated(placed.what + "=" + abbreviate(token), text.getBytes(StandardCharsets.UTF_8));
    }

    private JsonNode otherTypeThan(JsonNode old) {
        List<JsonNode> options = new ArrayList<>(List.of(
                NODES.nullNode(), NODES.booleanNode(random.nextBoolean()), NODES.numberNode(random.nextInt(2000) - 1000),
                NODES.numberNode(random.nextDouble() * 1e6), TextNode.valueOf("5.6"), TextNode.valueOf("yes"),
                NODES.arrayNode().add(1).add("two"), NODES.objectNode().put("value", "5").put("unit", 7),
                NODES.objectNode(), NODES.arrayNode()));
        options.removeIf(o -> o.getNodeType() == old.getNodeType());
        return options.get(random.nextInt(options.size()));
    }

    private Mutated keys(byte[] doc) {
        int pick = random.nextInt(4);
        if (pick == 3) {
            // a key given twice: JSON allows the text, a clinical record must not
            String text = new String(doc, StandardCharsets.UTF_8);
            int brace = text.indexOf('{');
            if (brace >= 0) {
                return new Mutated("duplicate-key", (text.substring(0, brace + 1) + "\"format\": \"x\", "
                        + text.substring(brace + 1)).getBytes(StandardCharsets.UTF_8));
            }
            return brokenText(doc);
        }
        JsonNode root = parse(doc);
        if (root == null) {
            return flipBytes(doc);
        }
        List<Slot> objects = new ArrayList<>();
        collect(root, "", objects);
        objects.removeIf(s -> !s.node().isObject());
        if (root.isObject()) {
            objects.add(new Slot("", root, v -> { }));
        }
        if (objects.isEmpty()) {
            return flipBytes(doc);
        }
        Slot slot = objects.get(random.nextInt(objects.size()));
        ObjectNode object = (ObjectNode) slot.node();
        if (pick == 0 && !object.isEmpty()) {
            List<String> names = new ArrayList<>();
            object.fieldNames().forEachRemaining(names::add);
            String name = names.get(random.nextInt(names.size()));
            object.remove(name);
            return new Mutated("remove-key@" + slot.path() + "/" + name, write(root));
        }
        String name = pick == 1 ? ODD_TEXT.get(random.nextInt(ODD_TEXT.size())) : "unexpected" + random.nextInt(99);
        object.put(name, random.nextInt(100));
        return new Mutated("unknown-key@" + slot.path() + "/" + abbreviate(name), write(root));
    }

    private Mutated deepNesting(byte[] doc) {
        int[] depths = {40, 300, 1_500, 20_000, 200_000};
        int depth = depths[random.nextInt(depths.length)];
        boolean arrays = random.nextBoolean();
        StringBuilder nest = new StringBuilder(depth * 6 + 4);
        for (int i = 0; i < depth; i++) {
            nest.append(arrays ? "[" : "{\"a\":");
        }
        nest.append('1');
        for (int i = 0; i < depth; i++) {
            nest.append(arrays ? ']' : '}');
        }
        if (random.nextInt(4) == 0) {
            return new Mutated("deep-document-" + depth, nest.toString().getBytes(StandardCharsets.UTF_8));
        }
        return raw(doc, "deep-" + (arrays ? "arrays" : "objects") + "-" + depth, nest.toString());
    }

    private Mutated huge(byte[] doc) {
        int pick = random.nextInt(3);
        if (pick == 0) {
            // one just past a string-length limit, or as large as the whole-document limit
            int length = random.nextBoolean() ? hugeBytes / 40 : hugeBytes;
            return tree(doc, "huge-string-" + length, n -> TextNode.valueOf("x".repeat(length)));
        } else if (pick == 1) {
            return raw(doc, "huge-number", "9".repeat(1 + random.nextInt(hugeBytes / 10)));
        }
        byte[] padded = new byte[doc.length + hugeBytes];
        System.arraycopy(doc, 0, padded, 0, doc.length);
        java.util.Arrays.fill(padded, doc.length, padded.length, (byte) ' ');
        return new Mutated("huge-padding", padded);
    }

    // ---- byte and text mutations ----------------------------------------------------------------------------

    private Mutated truncate(byte[] doc) {
        int at = doc.length == 0 ? 0 : random.nextInt(doc.length);
        return new Mutated("truncate@" + at, java.util.Arrays.copyOf(doc, at));
    }

    private Mutated flipBytes(byte[] doc) {
        byte[] copy = doc.clone();
        int n = 1 + random.nextInt(8);
        for (int i = 0; i < n && copy.length > 0; i++) {
            copy[random.nextInt(copy.length)] = (byte) random.nextInt(256);
        }
        return new Mutated("flip-bytes-" + n, copy);
    }

    private Mutated invalidUtf8(byte[] doc) {
        byte[] bad = INVALID_UTF8.get(random.nextInt(INVALID_UTF8.size()));
        // inside a string value most of the time: just after an opening quote
        int at = doc.length == 0 ? 0 : random.nextInt(doc.length);
        if (random.nextInt(3) > 0) {
            for (int i = at; i < doc.length; i++) {
                if (doc[i] == '"') {
                    at = i + 1;
                    break;
                }
            }
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream(doc.length + bad.length);
        out.write(doc, 0, at);
        out.write(bad, 0, bad.length);
        out.write(doc, at, doc.length - at);
        return new Mutated("invalid-utf8@" + at, out.toByteArray());
    }

    private Mutated brokenText(byte[] doc) {
        String text = new String(doc, StandardCharsets.UTF_8);
        if (text.isEmpty()) {
            return whole();
        }
        int at = random.nextInt(text.length());
        String broken;
        String what;
        switch (random.nextInt(7)) {
            case 0 -> {
                broken = text.substring(0, at) + text.substring(Math.min(text.length(), at + 1 + random.nextInt(20)));
                what = "delete@" + at;
            }
            case 1 -> {
                String junk = List.of("{", "}", "[", "]", ",", ":", "\"", "\\", "'", "#", "&a", "*a", "!!binary", "\t",
                        "- ", "---", "\\u", "\\ud800").get(random.nextInt(18));
                broken = text.substring(0, at) + junk + text.substring(at);
                what = "insert-" + junk.strip() + "@" + at;
            }
            case 2 -> {
                broken = text.replace('{', '[');
                what = "braces-to-brackets";
            }
            case 3 -> {
                broken = text + text;
                what = "two-documents";
            }
            case 4 -> {
                broken = text + "\u0000garbage";
                what = "trailing-garbage";
            }
            case 5 -> {
                int end = Math.min(text.length(), at + random.nextInt(200));
                broken = text.substring(0, end) + text.substring(at);
                what = "repeat-slice@" + at;
            }
            default -> {
                broken = "\uFEFF" + text;
                what = "byte-order-mark";
            }
        }
        return new Mutated(what, broken.getBytes(StandardCharsets.UTF_8));
    }

    /** A whole document that is not one at all, or the wrong kind of one. */
    private Mutated whole() {
        List<String> docs = List.of("", " ", "\n\n", "null", "true", "0", "-1e999", "\"text\"", "[]", "{}", "[{}]",
                "{\"format\": null}", "{\"format\": \"stasis-case/2\"}", "{\"format\": \"stasis-case/1\"}",
                "{\"format\": \"stasis-case/1\", \"patient\": []}", "key: value", "- a\n- b", "--- !!set\n? a",
                "a: &x [*x]", "a: !!java.io.File /tmp", "\u0000", "\uFEFF");
        String doc = docs.get(random.nextInt(docs.size()));
        return new Mutated("whole:" + abbreviate(doc), doc.getBytes(StandardCharsets.UTF_8));
    }

    // ---- tree helpers ---------------------------------------------------------------------------------------

    /** A place in the tree that can take a new node: a field of an object or an element of an array. */
    private record Slot(String path, JsonNode node, Consumer<JsonNode> setter) {
        void set(JsonNode value) {
            setter.accept(value);
        }
    }

    private static void collect(JsonNode node, String path, List<Slot> into) {
        if (node.isObject()) {
            ObjectNode object = (ObjectNode) node;
            List<String> names = new ArrayList<>();
            object.fieldNames().forEachRemaining(names::add);
            for (String name : names) {
                String p = path + "/" + name;
                JsonNode child = object.get(name);
                into.add(new Slot(p, child, v -> object.set(name, v)));
                collect(child, p, into);
            }
        } else if (node.isArray()) {
            ArrayNode array = (ArrayNode) node;
            for (int i = 0; i < array.size(); i++) {
                String p = path + "/" + i;
                int element = i;
                into.add(new Slot(p, array.get(i), v -> array.set(element, v)));
                collect(array.get(i), p, into);
            }
        }
    }

    private JsonNode parse(byte[] doc) {
        try {
            return mapper.readTree(doc);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    private byte[] write(JsonNode root) {
        try {
            return mapper.writeValueAsBytes(root);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String abbreviate(String s) {
        String visible = s.length() > 24 ? s.substring(0, 24) + "...(" + s.length() + ")" : s;
        StringBuilder out = new StringBuilder();
        visible.codePoints().forEach(c -> {
            if (c < 0x20 || c > 0x7E) {
                out.append(String.format(java.util.Locale.ROOT, "\\u%04X", c));
            } else {
                out.append((char) c);
            }
        });
        return out.toString();
    }
}
