package org.stasissheet.report;

import java.util.List;
import org.stasissheet.apheresis.ApheresisPlan;
import org.stasissheet.apheresis.ExchangeRow;
import org.stasissheet.apheresis.ValueRange;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.flow.FlowEstimates;
import org.stasissheet.flow.FlowEstimator;
import org.stasissheet.flow.FlowPoint;
import org.stasissheet.flow.Leukocrit;
import org.stasissheet.flow.WhatIf;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;

/** The flow and apheresis sections of the text worksheet: the same content as the JSON, caveats included. */
final class EstimatesText {
    private static final String NL = System.lineSeparator();

    private EstimatesText() {
    }

    static void apheresis(StringBuilder sb, ApheresisPlan plan) {
        sb.append("APHERESIS PLANNING NUMBERS (estimates)").append(NL);
        plan.missing().sentence().ifPresent(m -> sb.append("  ").append(m).append(NL));
        line(sb, "Blood volume (Nadler)", litres(plan.bloodVolumeL()));
        line(sb, "Plasma volume (Kaplan)", litres(plan.plasmaVolumeL()));
        line(sb, "Plasma volume, TBV x (1 - Hct)", litres(plan.plasmaVolumeFromBloodVolumeL()));
        line(sb, "Paraprotein", value(plan.paraproteinGPerL(), " g/L"));
        line(sb, "Intravascular fraction", value(plan.intravascularFraction(), ""));
        sb.append("  Plasma exchange:").append(NL);
        for (ExchangeRow row : plan.exchanges()) {
            sb.append("    ").append(FlowEstimator.plasmaVolumes(row.plasmaVolumes())).append(": ")
                    .append(litres(row.volumeL())).append("; intravascular left ")
                    .append(Numbers.rounded(100 * row.intravascularRemaining(), 3)).append(" %").append(NL)
                    .append("      paraprotein ").append(projection(row.paraproteinGPerL(), " g/L")).append(NL)
                    .append("      serum viscosity (projection, on the scale the laboratory reported) ")
                    .append(projection(row.serumViscosity(), "")).append(NL);
        }
        line(sb, "Leukapheresis, blood to process", range(plan.leukapheresis().processVolumeL(), " L"));
        line(sb, "Leukapheresis, WBC after one", range(plan.leukapheresis().wbcAfter(), " ×10⁹/L"));
        plan.notes().forEach(n -> sb.append("  * ").append(n).append(NL));
        sb.append(NL);
    }

    static void flow(StringBuilder sb, FlowEstimates f) {
        sb.append("MICROVASCULAR FLOW (illustration, not a measurement)").append(NL);
        f.caveats().forEach(c -> sb.append("  ! ").append(c).append(NL));
        sb.append("  ").append(f.meaning()).append(NL);
        f.aboveReference().ifPresent(n -> sb.append("  ").append(n).append(NL));
        sb.append("  Plasma ratio: ").append(f.plasmaRatioBasis()).append(NL);
        if (!(f.byDiameter() instanceof Estimate.Known<List<FlowPoint>> known)) {
            sb.append("  ").append(f.byDiameter().whyUnknown().orElseThrow()).append(NL).append(NL);
            return;
        }
        List<FlowPoint> inVitro = known.value();
        List<FlowPoint> inVivo = f.inVivo().known().orElse(List.of());
        List<FlowPoint> leuko = f.leukocrit().known().map(Leukocrit::byDiameter).orElse(List.of());
        sb.append("  ").append(pad("diameter µm", 13)).append(pad("in vitro", 11)).append(pad("in vivo", 11))
                .append(leuko.isEmpty() ? "" : "with leukocrit").append(NL);
        for (int i = 0; i < inVitro.size(); i++) {
            sb.append("  ").append(pad(Numbers.plain(inVitro.get(i).diameterUm()), 13))
                    .append(pad(flowNumber(inVitro.get(i)), 11))
                    .append(pad(i < inVivo.size() ? flowNumber(inVivo.get(i)) : "-", 11))
                    .append(i < leuko.size() ? flowNumber(leuko.get(i)) : "").append(NL);
        }
        if (f.leukocrit() instanceof Estimate.Known<Leukocrit> lk) {
            Leukocrit l = lk.value();
            sb.append("  Leukocrit (approximation, never raises flow): ").append(Numbers.rounded(l.wbc(), 3))
                    .append(" ×10⁹/L × ").append(Numbers.plain(l.volumeLowFl())).append("–")
                    .append(Numbers.plain(l.volumeHighFl())).append(" fL (").append(l.cellType())
                    .append(", range from the rule set) = ").append(Numbers.rounded(l.leukocritLow(), 3)).append("–")
                    .append(Numbers.rounded(l.leukocritHigh(), 3)).append("; the column uses the high end: ")
                    .append(Numbers.rounded(l.combinedFraction(), 3)).append(" with the hematocrit").append(NL);
        } else {
            sb.append("  Leukocrit: ").append(f.leukocrit().whyUnknown().orElseThrow()).append(NL);
        }
        for (WhatIf w : f.whatIf()) {
            sb.append("  What if: ").append(w.name()).append(NL);
            w.assumptions().forEach(a -> sb.append("    - ").append(a).append(NL));
            seriesLine(sb, "relative flow", w.byDiameter());
            seriesLine(sb, "with leukocrit", w.leukocrit());
        }
        sb.append(NL);
    }

    private static void seriesLine(StringBuilder sb, String label, Estimate<List<FlowPoint>> e) {
        sb.append("    ").append(label).append(": ");
        if (e instanceof Estimate.Known<List<FlowPoint>> known) {
            StringBuilder parts = new StringBuilder();
            for (FlowPoint p : known.value()) {
                if (parts.length() > 0) {
                    parts.append(", ");
                }
                parts.append(Numbers.plain(p.diameterUm())).append(" µm ").append(flowNumber(p));
            }
            sb.append(parts);
        } else {
            sb.append(VerdictWords.notEstimated(e.whyUnknown().orElseThrow()));
        }
        sb.append(NL);
    }

    private static String flowNumber(FlowPoint p) {
        return Numbers.rounded(p.relativeFlow(), 3);
    }

    /** Both moments of one projection, each with its plain label. */
    private static String projection(Estimate<ExchangeProjection> e, String unit) {
        return e.known().map(p -> ExchangeProjection.IMMEDIATE_LABEL + ": " + Numbers.rounded(p.immediate(), 3) + unit
                        + "; " + ExchangeProjection.AFTER_REDISTRIBUTION_LABEL + ": "
                        + Numbers.rounded(p.afterRedistribution(), 3) + unit)
                .orElseGet(() -> VerdictWords.notEstimated(e.whyUnknown().orElseThrow()));
    }

    private static String litres(Estimate<Double> e) {
        return value(e, " L");
    }

    private static String value(Estimate<Double> e, String unit) {
        return e.known().map(v -> Numbers.rounded(v, 3) + unit)
                .orElseGet(() -> VerdictWords.notEstimated(e.whyUnknown().orElseThrow()));
    }

    private static String range(Estimate<ValueRange> e, String unit) {
        return e.known().map(r -> Numbers.rounded(r.low(), 3) + "–" + Numbers.rounded(r.high(), 3) + unit)
                .orElseGet(() -> VerdictWords.notEstimated(e.whyUnknown().orElseThrow()));
    }


    private static void line(StringBuilder sb, String label, String text) {
        sb.append("  ").append(pad(label + ":", 34)).append(text).append(NL);
    }

    private static String pad(String s, int width) {
        return s.length() >= width ? s + " " : s + " ".repeat(width - s.length());
    }
}
