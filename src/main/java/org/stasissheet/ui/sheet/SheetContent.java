package org.stasissheet.ui.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.apheresis.ApheresisPlan;
import org.stasissheet.apheresis.ExchangeRow;
import org.stasissheet.apheresis.MissingInputs;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.apheresis.ValueRange;
import org.stasissheet.flow.FlowEstimates;
import org.stasissheet.flow.FlowPoint;
import org.stasissheet.flow.Leukocrit;
import org.stasissheet.flow.WhatIf;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.UnitSymbols;
import org.stasissheet.report.VerdictWords;
import org.stasissheet.report.WorksheetText;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.HyperviscosityVerdict;
import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.Provenance;
import org.stasissheet.rules.TumorLysisVerdict;
import org.stasissheet.ui.chart.FlowChartModel;
import org.stasissheet.ui.chart.FlowSeries;
import org.stasissheet.worksheet.InputLine;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.Worksheet;

/**
 * What the worksheet side shows, ready to lay out: a pure, toolkit-free rendering of a {@link Worksheet} into
 * rows of text. It presents and never recomputes: every number comes from the worksheet.
 *
 * @param leftOut  the fields the worksheet was computed without (their messages are beside them)
 * @param blocking reader messages when not even a partial worksheet could be made
 */
public record SheetContent(Optional<Worksheet> worksheet, List<String> leftOut, List<String> blocking,
                           String ruleSetBadge, boolean localProtocol, List<VerdictCard> verdicts,
                           List<FlagGroup> flagGroups, FlowChartModel flow, List<Row> volumes,
                           List<ExchangeLine> exchanges, List<Row> leukapheresis, List<String> apheresisNotes,
                           List<Row> inputs) {
    public static final SheetContent EMPTY = new SheetContent(Optional.empty(), List.of(), List.of(), "", false,
            List.of(), List.of(), FlowChartModel.EMPTY, List.of(), List.of(), List.of(), List.of(), List.of());

    public SheetContent {
        Objects.requireNonNull(worksheet, "worksheet");
        leftOut = List.copyOf(leftOut);
        blocking = List.copyOf(blocking);
        Objects.requireNonNull(ruleSetBadge, "ruleSetBadge");
        verdicts = List.copyOf(verdicts);
        flagGroups = List.copyOf(flagGroups);
        Objects.requireNonNull(flow, "flow");
        volumes = List.copyOf(volumes);
        exchanges = List.copyOf(exchanges);
        leukapheresis = List.copyOf(leukapheresis);
        apheresisNotes = List.copyOf(apheresisNotes);
        inputs = List.copyOf(inputs);
    }

    /** A verdict as a card: its title, the verdict word in capitals, and the lines explaining it. */
    public record VerdictCard(String id, String title, String word, boolean raised, List<String> lines) {
        public VerdictCard {
            Objects.requireNonNull(id, "id");
            Objects.requireNonNull(title, "title");
            Objects.requireNonNull(word, "word");
            lines = List.copyOf(lines);
        }
    }

    /** The flags of one level, in worksheet order. */
    public record FlagGroup(Level level, List<Flag> flags) {
        public FlagGroup {
            Objects.requireNonNull(level, "level");
            flags = List.copyOf(flags);
        }

        /** "●●● ACT NOW · 2 flags". */
        public String heading() {
            return level.badge() + " · " + flags.size() + (flags.size() == 1 ? " flag" : " flags");
        }
    }

    /** A labelled value, or the reason there is none. */
    public record Row(String label, String value) {
        public Row {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(value, "value");
        }
    }

    /** One row of the exchange table: each projection right after the procedure and after redistribution. */
    public record ExchangeLine(String plasmaVolumes, String volume, String intravascularLeft,
                               String paraproteinImmediate, String paraproteinAfterRedistribution,
                               String viscosityImmediate, String viscosityAfterRedistribution) {
        public ExchangeLine {
            Objects.requireNonNull(plasmaVolumes, "plasmaVolumes");
            Objects.requireNonNull(volume, "volume");
            Objects.requireNonNull(intravascularLeft, "intravascularLeft");
            Objects.requireNonNull(paraproteinImmediate, "paraproteinImmediate");
            Objects.requireNonNull(paraproteinAfterRedistribution, "paraproteinAfterRedistribution");
            Objects.requireNonNull(viscosityImmediate, "viscosityImmediate");
            Objects.requireNonNull(viscosityAfterRedistribution, "viscosityAfterRedistribution");
        }
    }

    public static SheetContent nothing(List<String> blocking) {
        return new SheetContent(Optional.empty(), List.of(), blocking, "", false, List.of(), List.of(),
                FlowChartModel.EMPTY, List.of(), List.of(), List.of(), List.of(), List.of());
    }

    public static SheetContent of(Worksheet ws, List<String> leftOut) {
        Provenance p = ws.ruleSet();
        String badge = "Rule set " + p.name() + " " + p.version();
        ApheresisPlan plan = ws.apheresis();
        return new SheetContent(Optional.of(ws), leftOut, List.of(), badge, p.local(), verdicts(ws), flagGroups(ws),
                flow(ws.flow()), volumes(plan), exchanges(plan), leukapheresis(plan), plan.notes(), inputs(ws));
    }

    static List<VerdictCard> verdicts(Worksheet ws) {
        HyperviscosityVerdict hv = ws.hyperviscosity();
        List<String> hvLines = new ArrayList<>();
        hvLines.add(hv.reason());
        boolean hvRaised = hv.assessment().alarm() >= 1;

        LeukostasisVerdict lk = ws.leukostasis();
        boolean lkRaised = lk.probability().alarm() >= 1;

        TumorLysisVerdict tl = ws.tumorLysis();
        VerdictCard tlCard;
        if (tl.applies()) {
            String tlWord = "LABORATORY " + upper(VerdictWords.laboratory(tl)) + "\nCLINICAL "
                    + upper(VerdictWords.clinical(tl));
            List<String> tlLines = new ArrayList<>();
            tlLines.add(tl.reason());
            for (TumorLysisVerdict.Criterion c : tl.criteria()) {
                tlLines.add(VerdictWords.upperFirst(VerdictWords.criterion(c)) + ": " + c.analyte().label()
                        + c.value().map(q -> " " + Numbers.rounded(q.value(), 4) + " " + UnitSymbols.of(q.unit())
                        + " · " + c.how()).orElse(""));
            }
            tlLines.add(tl.window());
            tlCard = new VerdictCard("tumor-lysis", "Tumor lysis (Cairo–Bishop)", tlWord, tl.laboratory().orElse(false),
                    tlLines);
        } else {
            tlCard = new VerdictCard("tumor-lysis", "Tumor lysis (Cairo–Bishop)", "NOT CHECKED", false,
                    List.of(VerdictWords.upperFirst(TumorLysisVerdict.NOT_CHECKED) + "."));
        }
        return List.of(
                new VerdictCard("hyperviscosity", "Hyperviscosity syndrome", upper(VerdictWords.hyperviscosity(hv)),
                        hvRaised, hvLines),
                new VerdictCard("leukostasis", "Leukostasis (0–3 grading)", upper(VerdictWords.leukostasis(lk)),
                        lkRaised, leukostasisLines(ws)),
                tlCard);
    }


    private static List<String> leukostasisLines(Worksheet ws) {
        List<String> lines = new ArrayList<>(List.of(ws.leukostasis().reason(), Cautions.GRADING_UNVERIFIED));
        lines.addAll(VerdictWords.pulmonarySuggestion(ws));
        return lines;
    }

    static List<FlagGroup> flagGroups(Worksheet ws) {
        List<FlagGroup> groups = new ArrayList<>();
        for (Level level : Level.values()) {
            List<Flag> flags = ws.flags().stream().filter(f -> f.level() == level).toList();
            if (!flags.isEmpty()) {
                groups.add(new FlagGroup(level, flags));
            }
        }
        return groups;
    }

    static FlowChartModel flow(FlowEstimates f) {
        List<FlowSeries> series = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        add(series, missing, "in-vitro", "Patient, Pries 1992 in vitro law", true, f.byDiameter(), List.of());
        add(series, missing, "in-vivo", "Patient, Pries 1994 in vivo law", true, f.inVivo(), List.of());
        add(series, missing, "leukocrit", "Patient with leukocrit added (approximation)", true,
                f.leukocrit().map(Leukocrit::byDiameter), List.of());
        for (WhatIf w : f.whatIf()) {
            String suffix = w.changes() == WhatIf.Changes.LEUKOCRIT_ONLY ? " (with leukocrit)" : "";
            add(series, missing, "what-if-" + w.id(), "What if: " + w.name() + suffix, false, w.movedSeries(),
                    w.assumptions());
        }
        List<String> notes = new ArrayList<>();
        notes.add(f.meaning());
        f.aboveReference().ifPresent(notes::add);
        notes.add("Plasma ratio: " + f.plasmaRatioBasis());
        f.leukocrit().known().ifPresent(l -> notes.add("Leukocrit " + Numbers.rounded(l.leukocritLow(), 3) + "–"
                + Numbers.rounded(l.leukocritHigh(), 3) + " = WBC " + Numbers.rounded(l.wbc(), 3) + " ×10⁹/L × "
                + Numbers.plain(l.volumeLowFl()) + "–" + Numbers.plain(l.volumeHighFl()) + " fL (" + l.cellType()
                + ", a measured range, see the rule set); the curve is drawn at the high end and only ever lowers "
                + "the estimate."));
        return new FlowChartModel(series, missing, notes, f.caveats());
    }

    private static void add(List<FlowSeries> series, List<String> missing, String id, String name, boolean shown,
                            Estimate<List<FlowPoint>> points, List<String> assumptions) {
        points.known().ifPresentOrElse(p -> series.add(new FlowSeries(id, name, p, shown, assumptions)),
                () -> missing.add(name + ": " + points.whyUnknown().orElseThrow()));
    }

    static List<Row> volumes(ApheresisPlan plan) {
        MissingInputs m = plan.missing();
        return List.of(
                new Row("Total blood volume (Nadler)", value(plan.bloodVolumeL(), " L", m)),
                new Row("Plasma volume (Kaplan)", value(plan.plasmaVolumeL(), " L", m)),
                new Row("Plasma volume, blood volume × (1 − Hct)",
                        value(plan.plasmaVolumeFromBloodVolumeL(), " L", m)),
                new Row("Paraprotein", value(plan.paraproteinGPerL(), " g/L", m)),
                new Row("Intravascular fraction of the paraprotein",
                        plan.intravascularFraction().known().map(v -> Numbers.rounded(100 * v, 3) + " %")
                                .orElseGet(() -> plan.intravascularFraction().whyUnknown().orElseThrow())));
    }

    static List<ExchangeLine> exchanges(ApheresisPlan plan) {
        List<ExchangeLine> lines = new ArrayList<>();
        for (ExchangeRow r : plan.exchanges()) {
            // a bare dash in the narrow table cell: the sentence above the tables says what to enter
            String volume = plan.missing().covers(r.volumeL()) ? "—" : value(r.volumeL(), " L", plan.missing());
            lines.add(new ExchangeLine(Numbers.plain(r.plasmaVolumes()), volume,
                    Numbers.rounded(100 * r.intravascularRemaining(), 3) + " %",
                    value(r.paraproteinGPerL().map(ExchangeProjection::immediate), " g/L", plan.missing()),
                    value(r.paraproteinAfterGPerL(), " g/L", plan.missing()),
                    value(r.serumViscosity().map(ExchangeProjection::immediate), "", plan.missing()),
                    value(r.serumViscosity().map(ExchangeProjection::afterRedistribution), "", plan.missing())));
        }
        return lines;
    }

    static List<Row> leukapheresis(ApheresisPlan plan) {
        return List.of(
                new Row("Blood to process per leukapheresis",
                        range(plan.leukapheresis().processVolumeL(), " L", plan.missing())),
                new Row("White count after one procedure",
                        range(plan.leukapheresis().wbcAfter(), " ×10⁹/L", plan.missing())));
    }

    static List<Row> inputs(Worksheet ws) {
        List<Row> rows = new ArrayList<>();
        for (InputLine line : ws.inputs()) {
            String entered = WorksheetText.format(line.entered());
            rows.add(new Row(WorksheetText.label(line), line.entered().equals(line.canonical()) ? entered
                    : entered + "  =  " + WorksheetText.format(line.canonical())));
        }
        return rows;
    }

    /** A dash where the one "enter …" sentence above the table already says why. */
    static final String SEE_ABOVE = "— (see what to enter, above)";

    private static String value(Estimate<Double> e, String unit, MissingInputs missing) {
        return e.known().map(v -> Numbers.rounded(v, 3) + unit).orElseGet(() -> unknown(e, missing));
    }

    private static String range(Estimate<ValueRange> e, String unit, MissingInputs missing) {
        return e.known().map(r -> Numbers.rounded(r.low(), 3) + "–" + Numbers.rounded(r.high(), 3) + unit)
                .orElseGet(() -> unknown(e, missing));
    }

    /** The reason once: a reason that already says "not estimated" is not prefixed again. */
    private static String unknown(Estimate<?> e, MissingInputs missing) {
        if (missing.covers(e)) {
            return SEE_ABOVE;
        }
        return VerdictWords.notEstimated(e.whyUnknown().orElseThrow());
    }



    private static String upper(String s) {
        return s.toUpperCase(Locale.ROOT);
    }
}
