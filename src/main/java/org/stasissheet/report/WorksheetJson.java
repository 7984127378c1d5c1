package org.stasissheet.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.stasissheet.intake.JsonText;
import java.util.List;
import java.util.Optional;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.HyperviscosityVerdict;
import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.rules.TumorLysisVerdict;
import org.stasissheet.rules.Provenance;
import org.stasissheet.worksheet.InputLine;
import org.stasissheet.worksheet.Worksheet;

/**
 * Renders a worksheet as the {@code stasis-worksheet/1} JSON object of CASE-FORMAT.md. Keys are written in a
 * fixed order; each section has its own method so the mapping from record to key stays visible.
 */
public final class WorksheetJson {
    /** Nodes only: the text is written by {@link JsonText}, without an object mapper (a cold start saves its start-up). */
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private WorksheetJson() {
    }

    public static String render(Worksheet sheet) {
        return JsonText.pretty(tree(sheet)) + System.lineSeparator();
    }

    public static ObjectNode tree(Worksheet sheet) {
        ObjectNode root = NODES.objectNode();
        root.put("format", Worksheet.FORMAT);
        root.set("ruleSet", ruleSet(sheet.ruleSet()));
        root.set("inputs", inputs(sheet));
        root.set("hyperviscosity", hyperviscosity(sheet.hyperviscosity()));
        root.set("leukostasis", leukostasis(sheet.leukostasis()));
        root.set("tumorLysis", tumorLysis(sheet.tumorLysis()));
        root.set("flags", flags(sheet.flags()));
        root.set("apheresis", EstimatesJson.apheresis(sheet.apheresis()));
        root.set("flow", EstimatesJson.flow(sheet.flow()));
        ArrayNode cautions = root.putArray("cautions");
        sheet.cautions().forEach(cautions::add);
        return root;
    }

    static ObjectNode ruleSet(Provenance p) {
        ObjectNode n = NODES.objectNode();
        n.put("name", p.name());
        n.put("version", p.version());
        n.put("sha256", p.sha256());
        n.put("local", p.local());
        return n;
    }

    static ObjectNode hyperviscosity(HyperviscosityVerdict v) {
        ObjectNode n = NODES.objectNode();
        n.put("assessment", v.assessment().code());
        n.put("route", v.route().code());
        n.put("signs", v.signs());
        ArrayNode unassessed = n.putArray("signsNotAssessed");
        v.unassessed().forEach(unassessed::add);
        n.put("viscosityTrust", v.viscosity().code());
        ArrayNode toExamine = n.putArray("toExamine");
        v.toExamine().forEach(toExamine::add);
        n.put("reason", v.reason());
        return n;
    }

    static ObjectNode leukostasis(LeukostasisVerdict v) {
        ObjectNode n = NODES.objectNode();
        n.put("assessed", v.assessed());
        n.put("gate", v.gate().code());
        ArrayNode toExamine = n.putArray("toExamine");
        v.toExamine().forEach(toExamine::add);
        if (v.score().isPresent()) {
            n.put("score", v.score().get());
        } else {
            n.putNull("score");
        }
        n.put("probability", v.probability().code());
        n.put("reason", v.reason());
        n.put("descriptorsBasis", LeukostasisVerdict.DESCRIPTOR_BASIS.code());
        return n;
    }

    static ObjectNode tumorLysis(TumorLysisVerdict v) {
        ObjectNode n = NODES.objectNode();
        optionalBoolean(n, "laboratory", v.laboratory());
        optionalBoolean(n, "clinical", v.clinical());
        n.put("dependsOnUnconfirmed", v.dependsOnUnconfirmed());
        ArrayNode criteria = n.putArray("criteria");
        for (TumorLysisVerdict.Criterion c : v.criteria()) {
            ObjectNode k = criteria.addObject();
            k.put("analyte", c.analyte().key());
            if (c.value().isPresent()) {
                k.set("value", quantity(c.value().get()));
            } else {
                k.putNull("value");
            }
            k.put("met", c.met());
            k.put("unconfirmed", c.unconfirmed());
            k.put("how", c.how());
        }
        n.put("windowConfirmed", v.windowConfirmed());
        n.put("window", v.window());
        n.put("reason", v.reason());
        return n;
    }

    static ArrayNode flags(List<Flag> flags) {
        ArrayNode list = NODES.arrayNode();
        for (Flag f : flags) {
            ObjectNode n = list.addObject();
            n.put("id", f.id());
            n.put("level", f.level().code());
            n.put("levelWord", f.level().word());
            n.put("symbol", f.level().symbol());
            n.put("title", f.title());
            n.put("explanation", f.explanation());
            n.put("source", f.source());
            n.put("basis", f.basis().code());
        }
        return list;
    }

    private static void optionalBoolean(ObjectNode n, String key, Optional<Boolean> value) {
        if (value.isPresent()) {
            n.put(key, value.get());
        } else {
            n.putNull(key);
        }
    }

    static ArrayNode inputs(Worksheet sheet) {
        ArrayNode list = NODES.arrayNode();
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
        ObjectNode n = NODES.objectNode();
        n.put("value", q.value());
        n.put("unit", q.unit());
        return n;
    }
}
