package org.stasissheet.intake;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Iterator;
import java.util.Map;

/**
 * A JSON tree written as text through Jackson's streaming writer alone, exactly as its object mapper writes it
 * ({@code JsonTextTest} holds the two together). A cold command-line run that needs no mapper saves its start-up,
 * some 40 ms here, and the class-data archive stays small (src/bench/RESULTS.md).
 */
public final class JsonText {
    private static final JsonFactory FACTORY = new JsonFactory();

    private JsonText() {
    }

    /** On one line, as the mapper writes by default. */
    public static String compact(JsonNode node) {
        return text(node, false);
    }

    /** Indented, as the mapper writes with its indenting switched on. */
    public static String pretty(JsonNode node) {
        return text(node, true);
    }

    private static String text(JsonNode node, boolean indented) {
        StringWriter text = new StringWriter();
        try (JsonGenerator g = FACTORY.createGenerator(text)) {
            if (indented) {
                g.useDefaultPrettyPrinter();
            }
            write(node, g);
        } catch (IOException e) {
            throw new UncheckedIOException("writing to a string cannot fail", e);
        }
        return text.toString();
    }

    /** Writes {@code node} and everything under it to {@code g}. */
    static void write(JsonNode node, JsonGenerator g) throws IOException {
        if (node.isObject()) {
            g.writeStartObject();
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                g.writeFieldName(e.getKey());
                write(e.getValue(), g);
            }
            g.writeEndObject();
        } else if (node.isArray()) {
            g.writeStartArray();
            for (JsonNode item : node) {
                write(item, g);
            }
            g.writeEndArray();
        } else if (node.isTextual()) {
            g.writeString(node.textValue());
        } else if (node.isBoolean()) {
            g.writeBoolean(node.booleanValue());
        } else if (node.isBigDecimal()) {
            g.writeNumber(node.decimalValue());
        } else if (node.isInt()) {
            g.writeNumber(node.intValue());
        } else if (node.isLong()) {
            g.writeNumber(node.longValue());
        } else if (node.isIntegralNumber()) {
            g.writeNumber(node.bigIntegerValue());
        } else if (node.isFloat()) {
            g.writeNumber(node.floatValue());
        } else if (node.isNumber()) {
            g.writeNumber(node.doubleValue());
        } else if (node.isNull() || node.isMissingNode()) {
            g.writeNull();
        } else {
            throw new IllegalArgumentException("no JSON text for a " + node.getNodeType() + " node");
        }
    }
}
