package org.stasissheet.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.stasissheet.apheresis.ApheresisPlan;
import org.stasissheet.apheresis.ExchangeRow;
import org.stasissheet.apheresis.ValueRange;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.flow.FlowEstimates;
import org.stasissheet.flow.FlowPoint;
import org.stasissheet.flow.Leukocrit;
import org.stasissheet.flow.WhatIf;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;

/**
 * The {@code flow} and {@code apheresis} sections of the worksheet JSON. Null policy of these sections: a number
 * or object that could not be estimated is {@code null}, a series that could not be made is {@code []}, and in
 * both cases the enclosing object's {@code reasons} holds the sentence saying why, under the same key.
 */
final class EstimatesJson {
    /** Nodes only: the text is written by {@link JsonText}, without an object mapper (a cold start saves its start-up). */
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private EstimatesJson() {
    }

    static ObjectNode apheresis(ApheresisPlan plan) {
        ObjectNode n = NODES.objectNode();
        ObjectNode reasons = NODES.objectNode();
        number(n, reasons, "bloodVolumeL", plan.bloodVolumeL());
        number(n, reasons, "plasmaVolumeL", plan.plasmaVolumeL());
        number(n, reasons, "plasmaVolumeFromBloodVolumeL", plan.plasmaVolumeFromBloodVolumeL());
        number(n, reasons, "paraproteinGPerL", plan.paraproteinGPerL());
        number(n, reasons, "intravascularFraction", plan.intravascularFraction());
        ArrayNode rows = n.putArray("exchanges");
        for (ExchangeRow row : plan.exchanges()) {
            ObjectNode r = rows.addObject();
            ObjectNode rowReasons = NODES.objectNode();
            r.put("plasmaVolumes", row.plasmaVolumes());
            number(r, rowReasons, "volumeL", row.volumeL());
            r.put("intravascularRemaining", row.intravascularRemaining());
            // CASE-FORMAT's key keeps its meaning: the level once the extravascular pool has flowed back
            number(r, rowReasons, "paraproteinAfterGPerL", row.paraproteinAfterGPerL());
            ObjectNode projected = r.putObject("projected");
            // units as the course report writes them (COURSE-FORMAT): the catalogue's canonical units
            projection(projected, rowReasons, "paraproteinGPerL", row.paraproteinGPerL(), Analyte.IGM.canonicalUnit());
            projection(projected, rowReasons, "serumViscosity", row.serumViscosity(),
                    Analyte.SERUM_VISCOSITY.canonicalUnit());
            r.set("reasons", rowReasons);
        }
        ObjectNode leuka = n.putObject("leukapheresis");
        ObjectNode leukaReasons = NODES.objectNode();
        range(leuka, leukaReasons, "processVolumeL", plan.leukapheresis().processVolumeL());
        range(leuka, leukaReasons, "wbcAfter", plan.leukapheresis().wbcAfter());
        leuka.set("reasons", leukaReasons);
        strings(n.putArray("notes"), plan.notes());
        n.set("reasons", reasons);
        return n;
    }

    static ObjectNode flow(FlowEstimates f) {
        ObjectNode n = NODES.objectNode();
        ObjectNode reasons = NODES.objectNode();
        n.put("referenceHematocrit", f.referenceHematocrit());
        n.put("referenceSerumViscosity", f.referenceSerumViscosity());
        number(n, reasons, "hematocrit", f.hematocrit());
        n.put("plasmaRatio", f.plasmaRatio());
        n.put("plasmaRatioBasis", f.plasmaRatioBasis());
        series(n, reasons, "byDiameter", f.byDiameter());
        series(n, reasons, "inVivo", f.inVivo());
        if (f.leukocrit() instanceof Estimate.Known<Leukocrit> known) {
            Leukocrit l = known.value();
            ObjectNode lk = n.putObject("leukocrit");
            lk.put("cellType", l.cellType());
            lowHigh(lk.putObject("cellVolumeFl"), l.volumeLowFl(), l.volumeHighFl());
            lk.put("wbc", l.wbc());
            lowHigh(lk.putObject("leukocrit"), l.leukocritLow(), l.leukocritHigh());
            lk.put("combinedFraction", l.combinedFraction());
            points(lk.putArray("byDiameter"), l.byDiameter());
            points(lk.putArray("byDiameterLowVolume"), l.byDiameterLowVolume());
        } else {
            n.putNull("leukocrit");
            reasons.put("leukocrit", f.leukocrit().whyUnknown().orElseThrow());
        }
        ArrayNode whatIfs = n.putArray("whatIf");
        for (WhatIf w : f.whatIf()) {
            ObjectNode x = whatIfs.addObject();
            ObjectNode whatReasons = NODES.objectNode();
            x.put("id", w.id());
            x.put("name", w.name());
            strings(x.putArray("assumptions"), w.assumptions());
            series(x, whatReasons, "byDiameter", w.byDiameter());
            series(x, whatReasons, "leukocrit", w.leukocrit());
            x.set("reasons", whatReasons);
        }
        strings(n.putArray("caveats"), f.caveats());
        n.set("reasons", reasons);
        return n;
    }

    private static void number(ObjectNode n, ObjectNode reasons, String key, Estimate<Double> e) {
        if (e instanceof Estimate.Known<Double> known) {
            n.put(key, known.value());
        } else {
            n.putNull(key);
            reasons.put(key, e.whyUnknown().orElseThrow());
        }
    }

    /**
     * {@code key: {immediate, afterRedistribution, unit}} (the shape the course report will reuse), or null with
     * the reason under {@code projected.key}.
     */
    private static void projection(ObjectNode n, ObjectNode reasons, String key, Estimate<ExchangeProjection> e,
                                   String unit) {
        if (e instanceof Estimate.Known<ExchangeProjection> known) {
            ObjectNode p = n.putObject(key);
            p.put("immediate", known.value().immediate());
            p.put("afterRedistribution", known.value().afterRedistribution());
            p.put("unit", unit);
        } else {
            n.putNull(key);
            reasons.put("projected." + key, e.whyUnknown().orElseThrow());
        }
    }

    private static void lowHigh(ObjectNode n, double low, double high) {
        n.put("low", low);
        n.put("high", high);
    }

    private static void range(ObjectNode n, ObjectNode reasons, String key, Estimate<ValueRange> e) {
        if (e instanceof Estimate.Known<ValueRange> known) {
            ObjectNode r = n.putObject(key);
            r.put("low", known.value().low());
            r.put("high", known.value().high());
        } else {
            n.putNull(key);
            reasons.put(key, e.whyUnknown().orElseThrow());
        }
    }

    private static void series(ObjectNode n, ObjectNode reasons, String key, Estimate<List<FlowPoint>> e) {
        ArrayNode list = n.putArray(key);
        if (e instanceof Estimate.Known<List<FlowPoint>> known) {
            points(list, known.value());
        } else {
            reasons.put(key, e.whyUnknown().orElseThrow());
        }
    }

    private static void points(ArrayNode list, List<FlowPoint> points) {
        for (FlowPoint p : points) {
            ObjectNode o = list.addObject();
            o.put("diameterUm", p.diameterUm());
            o.put("relativeFlow", p.relativeFlow());
        }
    }

    private static void strings(ArrayNode list, List<String> values) {
        values.forEach(list::add);
    }
}
