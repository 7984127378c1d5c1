package org.stasissheet.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.Provenance;
import org.stasissheet.worksheet.InputLine;
import org.stasissheet.worksheet.Worksheet;

/**
 * Renders a worksheet as the {@code stasis-worksheet/1} JSON object of CASE-FORMAT.md. Keys are written in a
 * fixed order; each section has its own method so the mapping from record to key stays visible.
 */
public final class WorksheetJson {
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private WorksheetJson() {
    }

    public static String render(Worksheet sheet) {
        try {
            return MAPPER.writeValueAsString(tree(sheet)) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("worksheet could not be written as JSON", e);
        }
    }

    public static ObjectNode tree(Worksheet sheet) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", Worksheet.FORMAT);
        root.set("ruleSet", ruleSet(sheet.ruleSet()));
        root.set("inputs", inputs(sheet));
        // verdicts, flags: rules work
        root.set("apheresis", EstimatesJson.apheresis(sheet.apheresis()));
        root.set("flow", EstimatesJson.flow(sheet.flow()));
        ArrayNode cautions = root.putArray("cautions");
        sheet.cautions().forEach(cautions::add);
        return root;
    }

    static ObjectNode ruleSet(Provenance p) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("name", p.name());
        n.put("version", p.version());
        n.put("sha256", p.sha256());
        n.put("local", p.local());
        return n;
    }

    static ArrayNode inputs(Worksheet sheet) {
        ArrayNode list = MAPPER.createArrayNode();
        for (InputLine line : sheet.inputs()) {
            ObjectNode n = list.addObject();
            n.put("path", line.path());
            n.put("label", line.label());
            n.set("entered", quantity(line.entered()));
            n.set("canonical", quantity(line.canonical()));
        }
        return list;
    }

    static ObjectNode quantity(Quantity q) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("value", q.value());
        n.put("unit", q.unit());
        return n;
    }
}
