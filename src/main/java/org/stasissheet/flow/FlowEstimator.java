package org.stasissheet.flow;

import static org.stasissheet.rules.EstimateParameters.REFERENCE_HEMATOCRIT;
import static org.stasissheet.rules.EstimateParameters.REFERENCE_SERUM_VISCOSITY;
import static org.stasissheet.rules.EstimateParameters.TRANSFUSION_UNIT_RED_CELL_VOLUME;
import static org.stasissheet.rules.EstimateParameters.TRANSFUSION_UNIT_VOLUME;
import static org.stasissheet.rules.EstimateParameters.VOLUME_LYMPHOBLAST_HIGH;
import static org.stasissheet.rules.EstimateParameters.VOLUME_LYMPHOBLAST_LOW;
import static org.stasissheet.rules.EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_HIGH;
import static org.stasissheet.rules.EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_LOW;
import static org.stasissheet.rules.EstimateParameters.VOLUME_MYELOBLAST_HIGH;
import static org.stasissheet.rules.EstimateParameters.VOLUME_MYELOBLAST_LOW;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.BiFunction;
import org.stasissheet.derived.CaseQuantities;
import org.stasissheet.derived.ExchangeKinetics;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.RuleSet;

/**
 * Microvascular flow estimates of one case: the patient's blood against reference blood, vessel by vessel.
 * Pure: everything comes from the case and the rule set, through the quantities of {@code derived}.
 */
public final class FlowEstimator {
    private FlowEstimator() {
    }

    /** Series diameters, µm: capillaries to small arteries (CASE-FORMAT asks for 5, 10, 20, 50, 100 at least). */
    public static final List<Double> DIAMETERS_UM = List.of(
            4.0, 5.0, 6.0, 7.0, 8.0, 10.0, 12.0, 15.0, 20.0, 30.0, 50.0, 75.0, 100.0, 200.0, 500.0, 1000.0);

    /** Red-cell units in the transfusion what-ifs. */
    public static final List<Integer> TRANSFUSION_UNITS = List.of(1, 2);

    /** Plasma volumes in the exchange what-ifs. */
    public static final List<Double> EXCHANGE_PLASMA_VOLUMES = List.of(1.0, 1.5);

    /**
     * WBC reductions in the leukapheresis what-ifs: common practice, inside the 20–50 % per procedure that
     * DOMAIN.md §4 gives (issue "Estimates").
     */
    public static final List<Double> LEUKAPHERESIS_REDUCTIONS = List.of(0.3, 0.5);

    /** The mean cell volume range used for the leukocrit, by leukemia type, fL (low ≤ high). */
    public record CellVolume(String cellType, double lowFl, double highFl) {
    }

    public static FlowEstimates estimate(Case c, RuleSet rules) {
        double referenceH = rules.value(REFERENCE_HEMATOCRIT, "1");
        double referenceSv = rules.value(REFERENCE_SERUM_VISCOSITY, "cP");
        Estimate<Double> sv = CaseQuantities.serumViscosity(c);
        double ratio = sv.known().map(v -> plasmaRatio(v, referenceSv)).orElse(1.0);
        String ratioBasis = sv.known()
                .map(v -> "serum viscosity " + Numbers.plain(v) + " ÷ reference " + Numbers.plain(referenceSv)
                        + " = " + Numbers.rounded(v / referenceSv, 3) + " (measured the same way)")
                .orElseGet(() -> sv.whyUnknown().orElseThrow() + ": plasma ratio taken as 1, only the hematocrit differs");
        Estimate<Double> hematocrit = CaseQuantities.hematocrit(c);
        if (!hematocrit.isKnown()) {
            String reason = "no flow estimate: " + hematocrit.whyUnknown().orElseThrow();
            return new FlowEstimates(referenceH, referenceSv, hematocrit, ratio, ratioBasis,
                    Estimate.unknown(reason), Estimate.unknown(reason), Estimate.unknown(reason), List.of(),
                    FlowCaveats.ALL);
        }
        double h = hematocrit.known().orElseThrow();
        Estimate<CellVolume> cell = cellVolume(c.condition().leukemia(), rules);
        OptionalDouble wbcMeasured = c.labs().canonical(Analyte.WBC);
        Estimate<Double> wbc = wbcMeasured.isPresent()
                ? Estimate.known(wbcMeasured.getAsDouble())
                : Estimate.unknown("no leukocrit estimate: white cell count not measured");

        List<FlowPoint> byDiameter = inVitroSeries(h, ratio, referenceH);
        List<FlowPoint> inVivo = inVivoSeries(h, ratio, referenceH);
        Estimate<Leukocrit> leukocrit = leukocrit(h, ratio, referenceH, cell, wbc);
        Estimate<Double> bloodVolume = CaseQuantities.bloodVolume(c.patient());
        Estimate<Double> fraction = CaseQuantities.intravascularFraction(c.condition().paraprotein(), rules);

        List<WhatIf> whatIfs = new ArrayList<>();
        for (int units : TRANSFUSION_UNITS) {
            whatIfs.add(transfusion(units, h, ratio, referenceH, cell, wbc, bloodVolume, rules));
        }
        for (double v : EXCHANGE_PLASMA_VOLUMES) {
            whatIfs.add(exchange(v, h, referenceH, referenceSv, sv, cell, wbc, fraction));
        }
        // no leukapheresis what-ifs without a leukemia, nor in APL, where leukapheresis is discouraged
        Leukemia type = c.condition().leukemia();
        if (type != Leukemia.NONE && type != Leukemia.APL) {
            for (double cut : LEUKAPHERESIS_REDUCTIONS) {
                whatIfs.add(leukapheresis(cut, h, ratio, referenceH, cell, wbc, byDiameter));
            }
        }
        return new FlowEstimates(referenceH, referenceSv, hematocrit, ratio, ratioBasis,
                Estimate.known(byDiameter), Estimate.known(inVivo), leukocrit, whatIfs, FlowCaveats.ALL);
    }

    /** Patient ÷ reference serum viscosity, both on the same scale (the water term cancels). */
    public static double plasmaRatio(double serumViscosity, double referenceSerumViscosity) {
        if (!(serumViscosity > 0) || !(referenceSerumViscosity > 0)) {
            throw new IllegalArgumentException("serum viscosities must be positive, were " + serumViscosity
                    + " and " + referenceSerumViscosity + " cP");
        }
        return serumViscosity / referenceSerumViscosity;
    }

    /**
     * Relative flow at one diameter by the Pries 1992 in vitro law:
     * η_rel(D, H_ref) ÷ (plasmaRatio × η_rel(D, H)).
     */
    public static double relativeFlow(double diameterUm, double hematocrit, double plasmaRatio,
                                      double referenceHematocrit) {
        return Poiseuille.relativeFlow(PriesViscosity.inVitroRelative(diameterUm, referenceHematocrit),
                plasmaRatio * PriesViscosity.inVitroRelative(diameterUm, hematocrit));
    }

    public static List<FlowPoint> inVitroSeries(double hematocrit, double plasmaRatio, double referenceHematocrit) {
        return series(hematocrit, plasmaRatio, referenceHematocrit, PriesViscosity::inVitroRelative);
    }

    /** The same comparison by the Pries 1994 in vivo law. */
    public static List<FlowPoint> inVivoSeries(double hematocrit, double plasmaRatio, double referenceHematocrit) {
        return series(hematocrit, plasmaRatio, referenceHematocrit, PriesViscosity::inVivoRelative);
    }

    private static List<FlowPoint> series(double h, double ratio, double referenceH,
                                          BiFunction<Double, Double, Double> law) {
        List<FlowPoint> points = new ArrayList<>(DIAMETERS_UM.size());
        for (double d : DIAMETERS_UM) {
            points.add(new FlowPoint(d, Poiseuille.relativeFlow(law.apply(d, referenceH), ratio * law.apply(d, h))));
        }
        return List.copyOf(points);
    }

    /**
     * The leukocrit series: the in vitro series at hematocrit + leukocrit, held at or below the plain series point
     * by point, so that the approximation can only make the estimate more cautious.
     */
    public static Estimate<List<FlowPoint>> leukocritSeries(double hematocrit, double leukocrit, double plasmaRatio,
                                                           double referenceHematocrit) {
        double combined = hematocrit + leukocrit;
        if (!(combined < 1)) {
            return Estimate.unknown("no leukocrit flow figure: hematocrit " + Numbers.rounded(hematocrit, 3)
                    + " + leukocrit " + Numbers.rounded(leukocrit, 3) + " = " + Numbers.rounded(combined, 3)
                    + " reaches the viscosity law's limit (needs < 1); the cell fraction is extreme");
        }
        return Estimate.known(neverAbove(inVitroSeries(combined, plasmaRatio, referenceHematocrit),
                inVitroSeries(hematocrit, plasmaRatio, referenceHematocrit)));
    }

    /** Point by point min(candidate, bound); both series must share their diameters. */
    static List<FlowPoint> neverAbove(List<FlowPoint> candidate, List<FlowPoint> bound) {
        if (candidate.size() != bound.size()) {
            throw new IllegalArgumentException("series differ in length: " + candidate.size() + " and " + bound.size());
        }
        List<FlowPoint> out = new ArrayList<>(candidate.size());
        for (int i = 0; i < candidate.size(); i++) {
            FlowPoint a = candidate.get(i);
            FlowPoint b = bound.get(i);
            if (a.diameterUm() != b.diameterUm()) {
                throw new IllegalArgumentException("series differ at point " + i + ": " + a.diameterUm() + " and "
                        + b.diameterUm() + " µm");
            }
            out.add(a.relativeFlow() <= b.relativeFlow() ? a : b);
        }
        return List.copyOf(out);
    }

    /**
     * Mean leukocyte volume range by leukemia type, from the rule set (DOMAIN.md §6: measured volumes vary widely,
     * so a range, not one number): AML blasts for AML and APL, lymphoblasts for ALL, mature lymphocytes for CLL.
     * CML has no volume in our reference.
     */
    public static Estimate<CellVolume> cellVolume(Leukemia leukemia, RuleSet rules) {
        return switch (leukemia) {
            case NONE -> Estimate.unknown("no leukocrit estimate: no leukemia recorded");
            // an acute leukemia not yet typed takes the AML blast range: the leukocrit then errs high, the safe side
            case AML, APL, ACUTE_UNTYPED -> range("AML blast", VOLUME_MYELOBLAST_LOW, VOLUME_MYELOBLAST_HIGH, rules);
            case ALL -> range("lymphoblast", VOLUME_LYMPHOBLAST_LOW, VOLUME_LYMPHOBLAST_HIGH, rules);
            case CLL -> range("mature lymphocyte", VOLUME_MATURE_LYMPHOCYTE_LOW, VOLUME_MATURE_LYMPHOCYTE_HIGH, rules);
            case CML -> Estimate.unknown("no leukocrit estimate: our reference gives no mean cell volume for the "
                    + "mixed myeloid cells of CML");
        };
    }

    private static Estimate<CellVolume> range(String cellType, String lowId, String highId, RuleSet rules) {
        double low = rules.value(lowId, "fL");
        double high = rules.value(highId, "fL");
        if (!(low > 0) || !(high >= low)) {
            return Estimate.unknown("no leukocrit estimate: the rule set's " + cellType + " volume range " + lowId
                    + " = " + Numbers.plain(low) + " fL to " + highId + " = " + Numbers.plain(high)
                    + " fL needs 0 < low ≤ high");
        }
        return Estimate.known(new CellVolume(cellType, low, high));
    }

    /** Leukocrit (fraction) = WBC (10⁹/L) × mean cell volume (fL) × 10⁻⁶ (Lichtman &amp; Rowe 1982, DOMAIN.md §2). */
    public static double leukocritFraction(double wbc, double meanCellVolumeFl) {
        if (!(wbc >= 0) || !(meanCellVolumeFl > 0)) {
            throw new IllegalArgumentException("leukocrit needs wbc ≥ 0 and a positive cell volume, were " + wbc
                    + " 10*9/L and " + meanCellVolumeFl + " fL");
        }
        return wbc * meanCellVolumeFl * 1e-6;
    }

    private static Estimate<Leukocrit> leukocrit(double h, double ratio, double referenceH, Estimate<CellVolume> cell,
                                                 Estimate<Double> wbc) {
        return cell.flatMap(cv -> wbc.flatMap(count -> {
            double low = leukocritFraction(count, cv.lowFl());
            double high = leukocritFraction(count, cv.highFl());
            Estimate<List<FlowPoint>> highSeries = leukocritSeries(h, high, ratio, referenceH);
            Estimate<List<FlowPoint>> lowSeries = leukocritSeries(h, low, ratio, referenceH);
            return highSeries.flatMap(hs -> lowSeries.map(ls -> new Leukocrit(cv.cellType(), cv.lowFl(),
                    cv.highFl(), count, low, high, h + high, hs, ls)));
        }));
    }

    private static Estimate<List<FlowPoint>> leukocritSeriesFor(double h, double ratio, double referenceH,
                                                               Estimate<CellVolume> cell, Estimate<Double> wbc) {
        return leukocrit(h, ratio, referenceH, cell, wbc).map(Leukocrit::byDiameter);
    }

    private static WhatIf transfusion(int units, double h, double ratio, double referenceH, Estimate<CellVolume> cell,
                                      Estimate<Double> wbc, Estimate<Double> bloodVolume, RuleSet rules) {
        String id = "transfusion-" + units + "-unit" + (units == 1 ? "" : "s");
        String name = "red-cell transfusion, " + units + " unit" + (units == 1 ? "" : "s");
        double unitVolume = rules.value(TRANSFUSION_UNIT_VOLUME, "L");
        double unitRedCells = rules.value(TRANSFUSION_UNIT_RED_CELL_VOLUME, "L");
        if (!bloodVolume.isKnown()) {
            String reason = "not estimated: the mixing needs the blood volume, and "
                    + bloodVolume.whyUnknown().orElseThrow();
            return new WhatIf(id, name, List.of(reason), Estimate.unknown(reason), Estimate.unknown(reason),
                    WhatIf.Changes.MAIN_SERIES);
        }
        double tbv = bloodVolume.known().orElseThrow();
        double after = transfusedHematocrit(h, tbv, units, unitVolume, unitRedCells);
        List<String> assumptions = List.of(
                units + " unit" + (units == 1 ? "" : "s") + " of " + Numbers.plain(unitVolume) + " L, each holding "
                        + Numbers.plain(unitRedCells) + " L of red cells (rule set; a middle figure for units in additive "
                        + "solution), mixed evenly into the "
                        + "estimated blood volume of " + Numbers.rounded(tbv, 3) + " L (Nadler).",
                "Hematocrit " + Numbers.rounded(h, 3) + " → " + Numbers.rounded(after, 3)
                        + ": (H × TBV + units × red-cell volume) ÷ (TBV + units × unit volume); an approximation "
                        + "that keeps the whole unit in the vessels, with no fluid shift, bleeding or loss.",
                "Serum viscosity and white count are kept as measured (the unit's plasma and additive are ignored, "
                        + "the cautious side).");
        return new WhatIf(id, name, assumptions,
                Estimate.known(inVitroSeries(after, ratio, referenceH)),
                leukocritSeriesFor(after, ratio, referenceH, cell, wbc), WhatIf.Changes.MAIN_SERIES);
    }

    /**
     * Hematocrit after transfusing red-cell units into a blood volume, all volumes in litres:
     * (H·TBV + n·redCells) / (TBV + n·unitVolume). An approximation: no fluid shifts, nothing lost.
     */
    public static double transfusedHematocrit(double hematocrit, double bloodVolumeL, int units, double unitVolumeL,
                                              double unitRedCellVolumeL) {
        if (!(hematocrit > 0 && hematocrit < 1) || !(bloodVolumeL > 0) || units < 0 || !(unitVolumeL > 0)
                || !(unitRedCellVolumeL > 0 && unitRedCellVolumeL < unitVolumeL)) {
            throw new IllegalArgumentException("transfusion inputs out of range: hematocrit " + hematocrit
                    + ", blood volume " + bloodVolumeL + " L, units " + units + ", unit " + unitVolumeL
                    + " L with " + unitRedCellVolumeL + " L red cells");
        }
        return (hematocrit * bloodVolumeL + units * unitRedCellVolumeL) / (bloodVolumeL + units * unitVolumeL);
    }

    /**
     * The flow after an exchange, drawn with the viscosity projected after redistribution: the smaller, cautious
     * gain. The larger gain right after the procedure is stated beside it.
     */
    private static WhatIf exchange(double v, double h, double referenceH, double referenceSv, Estimate<Double> sv,
                                   Estimate<CellVolume> cell, Estimate<Double> wbc, Estimate<Double> fraction) {
        String id = "plasma-exchange-" + Numbers.plain(v) + "-volumes";
        String name = "plasma exchange, " + plasmaVolumes(v);
        if (!sv.isKnown() || !fraction.isKnown()) {
            String reason = "not estimated: the projection needs a measured serum viscosity and a paraprotein "
                    + "isotype (" + sv.whyUnknown().or(fraction::whyUnknown).orElseThrow() + ")";
            return new WhatIf(id, name, List.of(reason), Estimate.unknown(reason), Estimate.unknown(reason),
                    WhatIf.Changes.MAIN_SERIES);
        }
        double f = fraction.known().orElseThrow();
        double before = sv.known().orElseThrow();
        ExchangeProjection projected = ExchangeKinetics.projectSerumViscosity(before, referenceSv, f, v);
        double after = projected.afterRedistribution();
        double ratio = plasmaRatio(after, referenceSv);
        List<String> assumptions = List.of(
                plasmaVolumes(v) + " exchanged; intravascular fraction of the paraprotein f = " + Numbers.plain(f)
                        + "; paraprotein left right after e^−V = " + Numbers.rounded(Math.exp(-v), 3)
                        + ", after redistribution 1 − f·(1 − e^−V) = "
                        + Numbers.rounded(ExchangeKinetics.paraproteinRemaining(f, v), 3) + ".",
                "Serum viscosity " + Numbers.rounded(before, 3) + " → " + Numbers.rounded(projected.immediate(), 3)
                        + " right after the procedure, " + Numbers.rounded(after, 3)
                        + " after redistribution (log-linear projection SV_ref × (SV/SV_ref)^r, an approximation); "
                        + "the series uses the after-redistribution value, the smaller gain.",
                "Hematocrit and white count are kept as measured (replacement fluid assumed to leave the cell "
                        + "fractions unchanged).");
        return new WhatIf(id, name, assumptions,
                Estimate.known(inVitroSeries(h, ratio, referenceH)),
                leukocritSeriesFor(h, ratio, referenceH, cell, wbc), WhatIf.Changes.MAIN_SERIES);
    }

    /** "1.0 plasma volume", "1.5 plasma volumes": the size of an exchange in words. */
    public static String plasmaVolumes(double v) {
        return (v == Math.rint(v) ? Numbers.plain(v) + ".0" : Numbers.plain(v)) + " plasma volume"
                + (v == 1.0 ? "" : "s");
    }

    private static WhatIf leukapheresis(double cut, double h, double ratio, double referenceH,
                                        Estimate<CellVolume> cell, Estimate<Double> wbc, List<FlowPoint> byDiameter) {
        String percent = Numbers.plain(Math.round(cut * 100));
        String id = "leukapheresis-" + percent + "-percent";
        String name = "leukapheresis, white count " + percent + " % lower";
        Estimate<Double> lowered = wbc.map(count -> count * (1 - cut));
        List<String> assumptions = new ArrayList<>();
        assumptions.add(lowered.known()
                .map(after -> "White count " + Numbers.rounded(wbc.known().orElseThrow(), 3) + " → "
                        + Numbers.rounded(after, 3) + " ×10⁹/L, " + percent + " % lower (common practice: one "
                        + "procedure lowers it by roughly 20–50 %).")
                .orElseGet(() -> "White count " + percent + " % lower (common practice: one procedure lowers it by roughly "
                        + "20–50 %)."));
        assumptions.add("Red cells and plasma are returned, so only the leukocrit series changes; the main "
                + "series is the same as now.");
        return new WhatIf(id, name, assumptions, Estimate.known(byDiameter),
                leukocritSeriesFor(h, ratio, referenceH, cell, lowered), WhatIf.Changes.LEUKOCRIT_ONLY);
    }
}
