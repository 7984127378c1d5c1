package org.stasissheet.rules;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * A YAML document as a small tree in which every node remembers its line and column, so the validator can point
 * at the exact spot of an unknown key or a bad value. Built from Jackson's YAML token stream (bytes in, no file
 * access). Duplicate keys in one mapping are reported here rather than silently overwritten.
 *
 * <p>Hostile files are refused early, before they can exhaust memory or stack: the size first, then strict UTF-8
 * (naming the first bad byte), then, while reading, the nesting depth and the length of every key and value.
 */
final class YamlTree {
    private YamlTree() {
    }

    /** A position in a file, 1-based. */
    record Where(int line, int column) {
    }

    sealed interface Node {
        Where where();
    }

    record Scalar(String text, boolean isNull, Where where) implements Node {
    }

    record Sequence(List<Node> items, Where where) implements Node {
    }

    /** A mapping in file order; {@code keyWhere} holds where each key was written. */
    record Mapping(Map<String, Node> entries, Map<String, Where> keyWhere, Where where) implements Node {
    }

    /** Thrown for a syntax error or a duplicate key, carrying the place. */
    static final class Malformed extends Exception {
        private static final long serialVersionUID = 1L;
        final Where where;

        Malformed(String message, Where where) {
            super(message);
            this.where = where;
        }
    }

    /** Largest rule file read, in bytes: 1 MiB. The shipped files are a few kilobytes each. */
    public static final int MAX_BYTES = 1 << 20;
    /** Deepest nesting of mappings and lists accepted; the schema needs five levels. */
    static final int MAX_DEPTH = 32;
    /** Longest key or value accepted, in characters; the longest shipped explanation is under a thousand. */
    static final int MAX_SCALAR_CHARS = 10_000;
    /** Most keys, values and lists in one file; the shipped files have a few hundred each. */
    static final int MAX_NODES = 50_000;

    /** Built on first use only: a run that reads the shipped set from its JSON form never starts the YAML parser. */
    private static final class Yaml {
        static final YAMLFactory FACTORY = new YAMLFactory();
    }

    /** Parses one document; an empty file gives an empty mapping at 1:1. */
    static Node parse(byte[] bytes) throws Malformed {
        Objects.requireNonNull(bytes, "bytes");
        if (bytes.length > MAX_BYTES) {
            throw new Malformed("the file is " + bytes.length + " bytes; a rule file may be at most " + MAX_BYTES
                    + " bytes (1 MiB)", new Where(1, 1));
        }
        requireUtf8(bytes);
        try (JsonParser p = Yaml.FACTORY.createParser(bytes)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                return new Mapping(Map.of(), Map.of(), new Where(1, 1));
            }
            Node root = read(p, t, 1, new int[1]);
            if (p.nextToken() != null) {
                // a second document would be silently ignored by a one-document reader: refuse it instead
                throw new Malformed("a second YAML document starts here (after ---); a rule file holds exactly one",
                        where(p.currentTokenLocation()));
            }
            return root;
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            Where where = at == null ? new Where(1, 1) : new Where(Math.max(1, at.getLineNr()),
                    Math.max(1, at.getColumnNr()));
            throw new Malformed("YAML syntax error: " + plainWords(firstLine(e.getOriginalMessage())), where);
        } catch (IOException e) {
            throw new Malformed("cannot read YAML: " + firstLine(e.getMessage()), new Where(1, 1));
        }
    }

    /**
     * Writes a tree as plain JSON: mappings as objects in file order, lists as arrays, every value as a string of its
     * text (null stays null). {@link #readJson} gives back the same tree except the places, which point into the JSON.
     * The shipped set travels in this form (see {@link RuleSetLoader#compact}) because reading JSON starts far faster
     * than reading YAML.
     */
    static void writeJson(Node node, JsonGenerator g) throws IOException {
        if (node instanceof Mapping m) {
            g.writeStartObject();
            for (Map.Entry<String, Node> e : m.entries().entrySet()) {
                g.writeFieldName(e.getKey());
                writeJson(e.getValue(), g);
            }
            g.writeEndObject();
        } else if (node instanceof Sequence s) {
            g.writeStartArray();
            for (Node item : s.items()) {
                writeJson(item, g);
            }
            g.writeEndArray();
        } else if (((Scalar) node).isNull()) {
            g.writeNull();
        } else {
            g.writeString(((Scalar) node).text());
        }
    }

    /** Reads one tree written by {@link #writeJson}, starting at its first token, with the same limits as YAML. */
    static Node readJson(JsonParser p) throws IOException, Malformed {
        return read(p, p.currentToken(), 1, new int[1]);
    }

    /** Refuses bytes that are not UTF-8, naming the first bad byte and where it is. */
    private static void requireUtf8(byte[] bytes) throws Malformed {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        if (decoder.decode(in, CharBuffer.allocate(bytes.length), true).isError()) {
            int offset = in.position();
            int line = 1;
            int lineStart = 0;
            for (int i = 0; i < offset; i++) {
                if (bytes[i] == '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
            throw new Malformed(String.format(Locale.ROOT, "the file is not valid UTF-8: byte 0x%02X at byte offset "
                    + "%d cannot start or continue a character; save the file as UTF-8", bytes[offset] & 0xFF, offset),
                    new Where(line, offset - lineStart + 1));
        }
    }

    private static Node read(JsonParser p, JsonToken t, int depth, int[] count) throws IOException, Malformed {
        Where where = where(p.currentTokenLocation());
        if (++count[0] > MAX_NODES) {
            throw new Malformed("more than " + MAX_NODES + " keys, values and lists in one file; a rule file needs "
                    + "far fewer", where);
        }
        if ((t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) && depth > MAX_DEPTH) {
            throw new Malformed("nested more than " + MAX_DEPTH + " levels deep; a rule file needs far fewer", where);
        }
        switch (t) {
            case START_OBJECT -> {
                Map<String, Node> entries = new LinkedHashMap<>();
                Map<String, Where> keys = new LinkedHashMap<>();
                for (JsonToken k = p.nextToken(); k != JsonToken.END_OBJECT; k = p.nextToken()) {
                    String name = p.currentName();
                    Where keyWhere = where(p.currentTokenLocation());
                    requireShort(name, "key", keyWhere);
                    if (entries.containsKey(name)) {
                        throw new Malformed("duplicate key \"" + name + "\" (first at line "
                                + keys.get(name).line() + ")", keyWhere);
                    }
                    Node value = read(p, p.nextToken(), depth + 1, count);
                    entries.put(name, value);
                    keys.put(name, keyWhere);
                }
                return new Mapping(entries, keys, where);
            }
            case START_ARRAY -> {
                List<Node> items = new ArrayList<>();
                for (JsonToken i = p.nextToken(); i != JsonToken.END_ARRAY; i = p.nextToken()) {
                    items.add(read(p, i, depth + 1, count));
                }
                return new Sequence(items, where);
            }
            case VALUE_NULL -> {
                return new Scalar("", true, where);
            }
            default -> {
                String text = p.getText();
                requireShort(text, "value", where);
                return new Scalar(text, false, where);
            }
        }
    }

    private static void requireShort(String text, String what, Where where) throws Malformed {
        if (text != null && text.length() > MAX_SCALAR_CHARS) {
            throw new Malformed("a " + what + " of " + text.length() + " characters; at most " + MAX_SCALAR_CHARS
                    + " are accepted", where);
        }
    }

    private static Where where(JsonLocation at) {
        return new Where(Math.max(1, at.getLineNr()), Math.max(1, at.getColumnNr()));
    }

    private static final java.util.regex.Pattern PARSER_EVENT =
            java.util.regex.Pattern.compile("<org\\.yaml\\.snakeyaml\\.events\\.(\\w+?)Event\\([^>]*\\)>");

    /** The parser names what it found by its own class names; a person editing a rule file needs words. */
    static String plainWords(String message) {
        return PARSER_EVENT.matcher(message).replaceAll(m -> switch (m.group(1)) {
            case "MappingStart" -> "the start of a mapping";
            case "SequenceStart" -> "the start of a list";
            case "MappingEnd" -> "the end of a mapping";
            case "SequenceEnd" -> "the end of a list";
            case "Scalar" -> "a value";
            case "Alias" -> "an alias";
            default -> "something else";
        });
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "unreadable";
        }
        int nl = message.indexOf('\n');
        return nl < 0 ? message : message.substring(0, nl);
    }
}
