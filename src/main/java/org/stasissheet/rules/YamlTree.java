package org.stasissheet.rules;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A YAML document as a small tree in which every node remembers its line and column, so the validator can point
 * at the exact spot of an unknown key or a bad value. Built from Jackson's YAML token stream (bytes in, no file
 * access). Duplicate keys in one mapping are reported here rather than silently overwritten.
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

    private static final YAMLFactory FACTORY = new YAMLFactory();

    /** Parses one document; an empty file gives an empty mapping at 1:1. */
    static Node parse(byte[] bytes) throws Malformed {
        Objects.requireNonNull(bytes, "bytes");
        try (JsonParser p = FACTORY.createParser(bytes)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                return new Mapping(Map.of(), Map.of(), new Where(1, 1));
            }
            return read(p, t);
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            Where where = at == null ? new Where(1, 1) : new Where(Math.max(1, at.getLineNr()),
                    Math.max(1, at.getColumnNr()));
            throw new Malformed("YAML syntax error: " + firstLine(e.getOriginalMessage()), where);
        } catch (IOException e) {
            throw new Malformed("cannot read YAML: " + firstLine(e.getMessage()), new Where(1, 1));
        }
    }

    private static Node read(JsonParser p, JsonToken t) throws IOException, Malformed {
        Where where = where(p.currentTokenLocation());
        switch (t) {
            case START_OBJECT -> {
                Map<String, Node> entries = new LinkedHashMap<>();
                Map<String, Where> keys = new LinkedHashMap<>();
                for (JsonToken k = p.nextToken(); k != JsonToken.END_OBJECT; k = p.nextToken()) {
                    String name = p.currentName();
                    Where keyWhere = where(p.currentTokenLocation());
                    if (entries.containsKey(name)) {
                        throw new Malformed("duplicate key \"" + name + "\" (first at line "
                                + keys.get(name).line() + ")", keyWhere);
                    }
                    Node value = read(p, p.nextToken());
                    entries.put(name, value);
                    keys.put(name, keyWhere);
                }
                return new Mapping(entries, keys, where);
            }
            case START_ARRAY -> {
                List<Node> items = new ArrayList<>();
                for (JsonToken i = p.nextToken(); i != JsonToken.END_ARRAY; i = p.nextToken()) {
                    items.add(read(p, i));
                }
                return new Sequence(items, where);
            }
            case VALUE_NULL -> {
                return new Scalar("", true, where);
            }
            default -> {
                return new Scalar(p.getText(), false, where);
            }
        }
    }

    private static Where where(JsonLocation at) {
        return new Where(Math.max(1, at.getLineNr()), Math.max(1, at.getColumnNr()));
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "unreadable";
        }
        int nl = message.indexOf('\n');
        return nl < 0 ? message : message.substring(0, nl);
    }
}
