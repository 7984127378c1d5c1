package org.stasissheet.intake;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.BooleanNode;
import com.fasterxml.jackson.databind.node.DecimalNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Optional;
import org.stasissheet.measure.Numbers;

/**
 * Step 1 of reading: bytes to a generic JSON tree, refusing early anything that could exhaust memory or stack.
 *
 * <p>Checks, in order: byte length ({@link CaseReader#MAX_BYTES}) before anything else; strict UTF-8 (the first
 * bad byte's offset is reported); then a streaming parse under Jackson {@link StreamReadConstraints} (nesting
 * depth, string and key length), during which duplicate keys and NaN/Infinity are reported with their path.
 * Jackson is deliberately allowed to read NaN/Infinity tokens so that this class can name the field; they are
 * always reported as problems, never accepted.
 *
 * <p>Numbers are kept exactly as written (as {@link BigDecimal}), so {@code extra} survives verbatim.
 */
final class JsonTree {
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder()
                    .maxNestingDepth(CaseReader.MAX_DEPTH)
                    .maxStringLength(CaseReader.MAX_STRING_CHARS)
                    .maxNameLength(CaseReader.MAX_STRING_CHARS)
                    .maxDocumentLength(CaseReader.MAX_BYTES)
                    .build())
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .build();

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /** Stands for a number already reported as refused; later steps skip it as they skip NaN. */
    private static final JsonNode REFUSED_NUMBER = DoubleNode.valueOf(Double.NaN);

    private final JsonParser parser;
    private final Problems problems;

    private JsonTree(JsonParser parser, Problems problems) {
        this.parser = parser;
        this.problems = problems;
    }

    /** The root object, or empty when the file could not be read as one JSON object (problems say why). */
    static Optional<ObjectNode> parse(byte[] bytes, Problems problems) {
        if (bytes.length > CaseReader.MAX_BYTES) {
            problems.add("", "the file is " + bytes.length + " bytes; a case file may be at most "
                    + CaseReader.MAX_BYTES + " bytes (1 MiB)");
            return Optional.empty();
        }
        Optional<String> text = decodeStrictUtf8(bytes, problems);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        try (JsonParser parser = FACTORY.createParser(text.get())) {
            try {
                return new JsonTree(parser, problems).root();
            } catch (JsonProcessingException e) {
                problems.add("", describe(e, parser));
                return Optional.empty();
            }
        } catch (IOException e) {
            // reading from a String cannot fail with plain I/O; keep the cause if it somehow does
            throw new UncheckedIOException(e);
        }
    }

    private static Optional<String> decodeStrictUtf8(byte[] bytes, Problems problems) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            int offset = in.position();
            problems.add("", "the file is not valid UTF-8: byte 0x" + hex(bytes[offset]) + " at byte offset "
                    + offset + " cannot start or continue a character; save the file as UTF-8");
            return Optional.empty();
        }
        decoder.flush(out);
        out.flip();
        String text = out.toString();
        // a UTF-8 byte order mark carries no data; tolerate it
        return Optional.of(text.startsWith("\uFEFF") ? text.substring(1) : text);
    }

    private static String hex(byte b) {
        String h = Integer.toHexString(b & 0xFF).toUpperCase(java.util.Locale.ROOT);
        return h.length() == 1 ? "0" + h : h;
    }

    private Optional<ObjectNode> root() throws IOException {
        JsonToken first = parser.nextToken();
        if (first == null) {
            problems.add("", "the file is empty; a case file is one JSON object, starting with {");
            return Optional.empty();
        }
        if (first != JsonToken.START_OBJECT) {
            problems.add("", "a case file is one JSON object ({ ... }); this file starts with "
                    + describeToken(first) + " at line " + parser.currentTokenLocation().getLineNr());
            return Optional.empty();
        }
        ObjectNode root = object("");
        JsonToken after = parser.nextToken();
        if (after != null) {
            JsonLocation at = parser.currentTokenLocation();
            problems.add("", "unexpected content after the end of the case object, at line " + at.getLineNr()
                    + ", column " + at.getColumnNr() + "; a case file holds exactly one object");
            return Optional.empty();
        }
        return Optional.of(root);
    }

    /** Reads the object whose START_OBJECT is the current token. */
    private ObjectNode object(String path) throws IOException {
        ObjectNode node = NODES.objectNode();
        for (JsonToken t = parser.nextToken(); t != JsonToken.END_OBJECT; t = parser.nextToken()) {
            String key = parser.currentName();
            String childPath = Problems.child(path, key);
            int line = parser.currentTokenLocation().getLineNr();
            parser.nextToken();
            JsonNode value = value(childPath);
            if (node.has(key)) {
                problems.add(childPath, "the key \"" + key + "\" appears more than once" + where(path)
                        + " (again at line " + line + "); each key may appear only once, so keep one");
            } else {
                node.set(key, value);
            }
        }
        return node;
    }

    private ArrayNode array(String path) throws IOException {
        ArrayNode node = NODES.arrayNode();
        int index = 0;
        for (JsonToken t = parser.nextToken(); t != JsonToken.END_ARRAY; t = parser.nextToken()) {
            node.add(value(Problems.element(path, index++)));
        }
        return node;
    }

    private JsonNode value(String path) throws IOException {
        JsonToken token = parser.currentToken();
        switch (token) {
            case START_OBJECT:
                return object(path);
            case START_ARRAY:
                return array(path);
            case VALUE_STRING:
                return TextNode.valueOf(parser.getText());
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return number(path);
            case VALUE_TRUE:
                return BooleanNode.TRUE;
            case VALUE_FALSE:
                return BooleanNode.FALSE;
            case VALUE_NULL:
                return NullNode.getInstance();
            default:
                throw new IllegalStateException("unexpected token " + token);
        }
    }

    /**
     * A number within the bounds of {@link CaseReader#MAX_NUMBER_CHARS} and {@link CaseReader#MAX_NUMBER_EXPONENT},
     * checked on the text as written before any conversion; a refused number becomes null after its problem is
     * recorded, so no later step ever expands it.
     */
    private JsonNode number(String path) throws IOException {
        String written = parser.getText();
        if (parser.currentToken() == JsonToken.VALUE_NUMBER_FLOAT && parser.isNaN()) {
            problems.add(path, written + " is not a number JSON allows (no NaN or Infinity);"
                    + " enter a finite number, or leave the key out if there is no value");
            return DoubleNode.valueOf(Double.NaN);
        }
        if (written.length() > CaseReader.MAX_NUMBER_CHARS) {
            problems.add(path, "a number written with " + written.length() + " characters ("
                    + written.substring(0, 12) + "…); at most " + CaseReader.MAX_NUMBER_CHARS + " are accepted");
            return REFUSED_NUMBER;
        }
        BigDecimal value = parser.getDecimalValue();
        // an integer's size is already bounded by its digits; an exponent is what lets 12 characters mean 1e999999999
        if (parser.currentToken() == JsonToken.VALUE_NUMBER_FLOAT && value.signum() != 0) {
            long exponent = (long) value.precision() - value.scale() - 1;
            if (Math.abs(exponent) > CaseReader.MAX_NUMBER_EXPONENT) {
                problems.add(path, written + " is " + (exponent > 0 ? "too large" : "too small")
                        + " for a case file: non-zero numbers must lie between 1e-" + CaseReader.MAX_NUMBER_EXPONENT
                        + " and 1e" + CaseReader.MAX_NUMBER_EXPONENT + " in size; check the value and its unit");
                return REFUSED_NUMBER;
            }
        }
        return DecimalNode.valueOf(value);
    }

    private static String where(String parentPath) {
        return parentPath.isEmpty() ? " at the top level" : " in " + parentPath;
    }

    private static String describeToken(JsonToken token) {
        switch (token) {
            case START_ARRAY:
                return "an array [";
            case VALUE_STRING:
                return "a text";
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return "a number";
            case VALUE_TRUE:
            case VALUE_FALSE:
                return "true/false";
            case VALUE_NULL:
                return "null";
            default:
                return token.asString() == null ? token.name() : token.asString();
        }
    }

    /** A one-line message for a syntax error or a refused size, with line, column and the nearest key. */
    private static String describe(JsonProcessingException e, JsonParser parser) {
        // size-limit exceptions carry no location; the parser knows where it stopped
        JsonLocation at = e.getLocation() != null ? e.getLocation() : parser.currentLocation();
        String position = " at line " + at.getLineNr() + ", column " + at.getColumnNr();
        String near = near(parser);
        if (e instanceof StreamConstraintsException) {
            String original = String.valueOf(e.getOriginalMessage());
            if (original.startsWith("Document nesting depth")) {
                return "the JSON is nested deeper than " + CaseReader.MAX_DEPTH + " levels" + position + near
                        + "; a case file needs only a few levels";
            }
            if (original.startsWith("String value length") || original.startsWith("Name length")) {
                return "a text is longer than " + Numbers.plain(CaseReader.MAX_STRING_CHARS) + " characters"
                        + position + near + "; shorten it";
            }
            return "the file exceeds a size limit" + position + near + ": " + firstLine(original);
        }
        return "not valid JSON" + position + near + ": " + firstLine(e.getOriginalMessage());
    }

    private static String near(JsonParser parser) {
        JsonPointer pointer = parser.getParsingContext().pathAsPointer();
        String dotted = dotted(pointer);
        return dotted.isEmpty() ? "" : " (in " + dotted + ")";
    }

    private static String dotted(JsonPointer pointer) {
        StringBuilder sb = new StringBuilder();
        for (JsonPointer p = pointer; p != null && !p.matches(); p = p.tail()) {
            if (p.mayMatchElement() && !p.mayMatchProperty()) {
                sb.append('[').append(p.getMatchingIndex()).append(']');
            } else {
                if (sb.length() > 0) {
                    sb.append('.');
                }
                sb.append(p.getMatchingProperty());
            }
        }
        return sb.toString();
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "unreadable";
        }
        String line = message.split("\\R", 2)[0];
        int source = line.indexOf(" (start marker at");
        if (source >= 0) {
            line = line.substring(0, source);
        }
        return line.length() > 200 ? line.substring(0, 200) + "…" : line;
    }
}
