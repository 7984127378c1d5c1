package org.stasissheet.ui.entry;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.intake.Case;

/**
 * Turns the form's raw text into {@code stasis-case/1} JSON and back. Writing never fails: a number that does not
 * read as one is written as the text typed, so that the case reader, not the form, decides what is wrong and says
 * it in the words the command line uses. Reading is lenient (it takes whatever it finds under the known keys as
 * text) so that a draft or a file with mistakes opens with every value in its field.
 */
public final class FormJson {
    /** Numbers keep their digits both ways: 5.60 is read and written as 5.60. */
    private static final JsonNodeFactory NODES = JsonNodeFactory.withExactBigDecimals(true);
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN)
            .nodeFactory(NODES)
            .build();
    private static final List<String> TOP_ORDER =
            List.of("patient", "condition", "labs", "baseline", "findings", "plan");

    private FormJson() {
    }

    /** The case JSON of this form state, UTF-8. */
    public static byte[] write(FormState state) {
        try {
            return MAPPER.writeValueAsBytes(tree(state));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a form state could not be written as JSON", e);
        }
    }

    static ObjectNode tree(FormState state) {
        ObjectNode root = NODES.objectNode();
        root.put("format", Case.FORMAT);
        TOP_ORDER.forEach(root::putObject);
        for (FieldSpec f : FormFields.all()) {
            if (f.path().equals("labs.serumViscosity.temperature")) {
                continue; // written inside the viscosity object
            }
            writeField(root, f, state);
        }
        merge(root, unmapped(state));
        if (!root.has("extra")) {
            root.putObject("extra");
        }
        return root;
    }

    private static void writeField(ObjectNode root, FieldSpec f, FormState state) {
        String text = state.get(f.valueKey()).strip();
        ObjectNode parent = parentOf(root, f.path());
        switch (f.kind()) {
            case TEXT, CHOICE, DATE_TIME -> {
                if (!text.isEmpty()) {
                    parent.put(f.key(), text);
                }
            }
            case DATE -> {
                if (text.isEmpty()) {
                    parent.putNull(f.key());
                } else {
                    parent.put(f.key(), text);
                }
            }
            case WHOLE, GRADE -> {
                if (!text.isEmpty()) {
                    parent.set(f.key(), number(text));
                }
            }
            case SIGN -> {
                if (!text.isEmpty()) {
                    parent.set(f.key(), bool(text));
                }
            }
            case SWITCH -> parent.set(f.key(), text.isEmpty() ? NODES.booleanNode(false) : bool(text));
            case QUANTITY -> quantity(f, state).ifPresent(q -> parent.set(f.key(), q));
        }
    }

    private static Optional<ObjectNode> quantity(FieldSpec f, FormState state) {
        String value = state.get(f.valueKey()).strip();
        Optional<ObjectNode> temperature = f.path().equals("labs.serumViscosity")
                ? FormFields.byPath("labs.serumViscosity.temperature").flatMap(t -> quantity(t, state))
                : Optional.empty();
        if (value.isEmpty() && temperature.isEmpty()) {
            return Optional.empty();
        }
        ObjectNode q = NODES.objectNode();
        if (!value.isEmpty()) {
            q.set("value", number(value));
        }
        String unit = state.get(f.unitKey()).strip();
        if (!unit.isEmpty()) {
            q.put("unit", unit);
        }
        temperature.ifPresent(t -> q.set("temperature", t));
        return Optional.of(q);
    }

    /** The number typed, exactly as typed ({@code 5.60} stays 5.60); the text itself when it is not a number. */
    private static JsonNode number(String text) {
        if (text.matches("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?")) {
            return NODES.numberNode(new BigDecimal(text));
        }
        return NODES.textNode(text);
    }

    private static JsonNode bool(String text) {
        return switch (text) {
            case "true" -> NODES.booleanNode(true);
            case "false" -> NODES.booleanNode(false);
            default -> NODES.textNode(text);
        };
    }

    private static ObjectNode parentOf(ObjectNode root, String path) {
        ObjectNode node = root;
        String[] parts = path.split("\\.");
        for (int i = 0; i < parts.length - 1; i++) {
            JsonNode child = node.get(parts[i]);
            node = child instanceof ObjectNode o ? o : node.putObject(parts[i]);
        }
        return node;
    }

    /** Adds what the form has no field for, without overwriting a field's value. */
    private static void merge(ObjectNode into, ObjectNode from) {
        Iterator<Map.Entry<String, JsonNode>> it = from.fields();
        while (it.hasNext()) {
            Map.Entry<String, JsonNode> e = it.next();
            JsonNode existing = into.get(e.getKey());
            if (existing instanceof ObjectNode target && e.getValue() instanceof ObjectNode source) {
                merge(target, source);
            } else if (existing == null) {
                into.set(e.getKey(), e.getValue().deepCopy());
            }
        }
    }

    private static ObjectNode unmapped(FormState state) {
        try {
            JsonNode node = MAPPER.readTree(state.unmappedJson());
            return node instanceof ObjectNode o ? o : NODES.objectNode();
        } catch (JsonProcessingException e) {
            return NODES.objectNode();
        }
    }

    /**
     * The form state of a case JSON, taking every known key's value as text and keeping the rest as unmapped
     * JSON. Empty when the bytes are not a JSON object at all (the case reader then says why).
     *
     * @param startingUnits the unit a quantity shows when the file does not give one
     */
    public static Optional<FormState> read(byte[] json, UnitSystem startingUnits) {
        JsonNode root;
        try {
            root = MAPPER.readTree(new String(json, StandardCharsets.UTF_8));
        } catch (IOException e) {
            return Optional.empty();
        }
        if (!(root instanceof ObjectNode rest)) {
            return Optional.empty();
        }
        rest = rest.deepCopy();
        Map<String, String> values = new LinkedHashMap<>(blank(startingUnits).values());
        for (FieldSpec f : FormFields.all()) {
            readField(rest, f, values);
        }
        rest.remove("format");
        pruneEmpty(rest);
        return Optional.of(new FormState(values, rest.toString()));
    }

    private static void readField(ObjectNode rest, FieldSpec f, Map<String, String> values) {
        Optional<ObjectNode> parent = existingParent(rest, f.path());
        if (parent.isEmpty()) {
            return;
        }
        JsonNode node = parent.get().get(f.key());
        if (node == null) {
            return;
        }
        if (f.kind() == FieldKind.QUANTITY) {
            if (!(node instanceof ObjectNode q)) {
                return; // left in place: the reader names it
            }
            takeScalar(q, "value").ifPresent(v -> values.put(f.valueKey(), v));
            takeScalar(q, "unit").ifPresent(u -> values.put(f.unitKey(), u));
            if (q.isEmpty()) {
                parent.get().remove(f.key());
            }
            return;
        }
        takeScalar(parent.get(), f.key()).ifPresent(v -> values.put(f.valueKey(), v));
    }

    /** Removes and returns a scalar as the text it reads as; objects and arrays stay for the reader to name. */
    private static Optional<String> takeScalar(ObjectNode parent, String key) {
        JsonNode n = parent.get(key);
        if (n == null || n.isContainerNode()) {
            return Optional.empty();
        }
        parent.remove(key);
        if (n.isNull()) {
            return Optional.of("");
        }
        if (n.isNumber()) {
            return Optional.of(n.isIntegralNumber() ? n.bigIntegerValue().toString()
                    : n.decimalValue().toPlainString());
        }
        return Optional.of(n.asText());
    }

    private static Optional<ObjectNode> existingParent(ObjectNode root, String path) {
        ObjectNode node = root;
        String[] parts = path.split("\\.");
        for (int i = 0; i < parts.length - 1; i++) {
            if (!(node.get(parts[i]) instanceof ObjectNode child)) {
                return Optional.empty();
            }
            node = child;
        }
        return Optional.of(node);
    }

    /** Drops the known group objects once every key in them has gone to a field ({@code extra} always stays). */
    private static void pruneEmpty(ObjectNode rest) {
        for (String key : TOP_ORDER) {
            JsonNode n = rest.get(key);
            if (n instanceof ObjectNode o) {
                Iterator<Map.Entry<String, JsonNode>> it = o.fields();
                while (it.hasNext()) {
                    JsonNode child = it.next().getValue();
                    if (child instanceof ObjectNode c && c.isEmpty()) {
                        it.remove();
                    }
                }
                if (o.isEmpty()) {
                    rest.remove(key);
                }
            }
        }
    }

    /** An empty form: every quantity shows the starting unit of the chosen unit system, switches are off. */
    public static FormState blank(UnitSystem units) {
        Map<String, String> values = new LinkedHashMap<>();
        for (FieldSpec f : FormFields.all()) {
            values.put(f.valueKey(), f.kind() == FieldKind.SWITCH ? "false" : "");
            if (f.kind() == FieldKind.QUANTITY) {
                values.put(f.unitKey(), startingUnit(f, units));
            }
        }
        return new FormState(values, "{}");
    }

    static String startingUnit(FieldSpec f, UnitSystem units) {
        return f.analyte().map(a -> units.startingUnit(a).ucum()).orElse(f.units().get(0).ucum());
    }
}
