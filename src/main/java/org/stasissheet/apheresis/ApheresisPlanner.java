package org.stasissheet.apheresis;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.stasissheet.derived.BloodVolume;
import org.stasissheet.derived.CaseQuantities;
import org.stasissheet.derived.ExchangeKinetics;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Patient;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.EstimateParameters;
import org.stasissheet.rules.RuleSet;

/** Turns a case and a rule set into {@link ApheresisPlan} numbers. Pure: no I/O, no clock. */
public final class ApheresisPlanner {
    private ApheresisPlanner() {
    }

    /** Exchange sizes shown on every worksheet (CASE-FORMAT asks for 1.0 and 1.5 at least). */
    public static final List<Double> EXCHANGE_PLASMA_VOLUMES = List.of(1.0, 1.5, 2.0);

    public static final List<String> NOTES = List.of(
            "Each exchange row gives two projections: " + ExchangeProjection.IMMEDIATE_LABEL + " (level × e^−V: "
                    + "only the plasma was exchanged) and " + ExchangeProjection.AFTER_REDISTRIBUTION_SHORT
                    + " (level × (1 − f·(1 − e^−V)), f the intravascular fraction: "
                    + ExchangeProjection.AFTER_REDISTRIBUTION_MEANING + "). The true level lies between them; new "
                    + "synthesis is ignored.",
            "The serum viscosity after an exchange is a log-linear projection, an approximation; measure it again "
                    + "after the procedure and act on the patient, not on the projection.",
            "Blood and plasma volumes are formula estimates for adults, not measurements.");

    public static ApheresisPlan plan(Case c, RuleSet rules) {
        Estimate<Double> bloodVolume = CaseQuantities.bloodVolume(c.patient());
        Estimate<Double> hematocrit = CaseQuantities.hematocrit(c);
        Estimate<Double> plasmaVolume = plasmaVolume(c.patient(), hematocrit);
        Estimate<Double> plasmaFromBlood = bloodVolume.flatMap(tbv -> hematocrit.map(
                h -> BloodVolume.plasmaFromBloodVolumeLitres(tbv, h)));
        Estimate<Double> fraction = CaseQuantities.intravascularFraction(c.condition().paraprotein(), rules);
        Estimate<Double> paraprotein = CaseQuantities.paraprotein(c);
        Estimate<Double> serumViscosity = CaseQuantities.serumViscosity(c);
        double referenceSv = rules.value(EstimateParameters.REFERENCE_SERUM_VISCOSITY, "cP");

        List<ExchangeRow> rows = new ArrayList<>();
        for (double v : EXCHANGE_PLASMA_VOLUMES) {
            Estimate<ExchangeProjection> paraproteinAfter = paraprotein.flatMap(
                    p -> fraction.map(f -> ExchangeKinetics.project(p, f, v)));
            Estimate<ExchangeProjection> viscosityAfter = serumViscosity.flatMap(
                    sv -> fraction.map(f -> ExchangeKinetics.projectSerumViscosity(sv, referenceSv, f, v)));
            rows.add(new ExchangeRow(v, plasmaVolume.map(pv -> v * pv), ExchangeKinetics.intravascularRemaining(v),
                    paraproteinAfter, viscosityAfter));
        }
        LeukapheresisPlan leukapheresis = leukapheresis(c, bloodVolume, rules);
        return new ApheresisPlan(bloodVolume, plasmaVolume, plasmaFromBlood, paraprotein, fraction, rows,
                leukapheresis, NOTES, missing(c, bloodVolume, plasmaVolume, plasmaFromBlood,
                        leukapheresisOffered(c)));
    }

    private static boolean leukapheresisOffered(Case c) {
        return c.condition().leukemia() != Leukemia.NONE && c.condition().leukemia() != Leukemia.APL;
    }

    /**
     * One sentence naming what to enter, and where, for the volumes that a missing height, weight, sex or hematocrit
     * leaves out. Nothing for a child: entering values would not give the adult formulas' numbers.
     */
    static MissingInputs missing(Case c, Estimate<Double> bloodVolume, Estimate<Double> plasmaVolume,
                                 Estimate<Double> plasmaFromBlood, boolean leukapheresis) {
        Patient p = c.patient();
        if (p.isChild()) {
            return MissingInputs.NONE;
        }
        List<String> patient = new ArrayList<>();
        p.sex().ifPresentOrElse(s -> { }, () -> patient.add("sex"));
        p.height().ifPresentOrElse(h -> { }, () -> patient.add("height"));
        p.weight().ifPresentOrElse(w -> { }, () -> patient.add("weight"));
        boolean hematocrit = c.labs().get(Analyte.HEMATOCRIT).isEmpty();
        if (patient.isEmpty() && !hematocrit) {
            return MissingInputs.NONE;
        }
        java.util.Set<String> covered = new java.util.HashSet<>();
        List<String> gives = new ArrayList<>();
        if (!patient.isEmpty()) {
            bloodVolume.whyUnknown().ifPresent(covered::add);
            gives.add("the blood volume");
        }
        if (p.weight().isEmpty() || hematocrit) {
            plasmaVolume.whyUnknown().ifPresent(covered::add);
            gives.add("the plasma volume");
            gives.add("the exchange volumes");
        }
        plasmaFromBlood.whyUnknown().ifPresent(covered::add);
        if (!patient.isEmpty() && leukapheresis) {
            gives.add("the blood to process by leukapheresis");
        }
        List<String> enter = new ArrayList<>();
        if (!patient.isEmpty()) {
            enter.add(and(patient) + " (Patient)");
        }
        if (hematocrit) {
            enter.add("the hematocrit (Laboratory values)");
        }
        return new MissingInputs(java.util.Optional.of("Enter " + and(enter) + " to estimate " + and(gives) + "."),
                covered);
    }

    private static String and(List<String> parts) {
        if (parts.size() == 1) {
            return parts.get(0);
        }
        return String.join(", ", parts.subList(0, parts.size() - 1)) + " and " + parts.get(parts.size() - 1);
    }

    private static Estimate<Double> plasmaVolume(Patient p, Estimate<Double> hematocrit) {
        if (p.weight().isEmpty()) {
            return Estimate.unknown("plasma volume not estimated: Kaplan's formula needs weight and hematocrit "
                    + "(missing: weight" + (hematocrit.isKnown() ? "" : ", hematocrit") + ")");
        }
        if (p.isChild()) {
            return Estimate.unknown("plasma volume not estimated: Kaplan's formula is for adults and the patient "
                    + "is under 18");
        }
        double weightKg = p.weight().orElseThrow().canonical();
        if (!(weightKg > 0)) {
            return Estimate.unknown("plasma volume not estimated: weight " + Numbers.plain(weightKg)
                    + " kg must be above 0");
        }
        if (!hematocrit.isKnown()) {
            return Estimate.unknown("plasma volume not estimated: Kaplan's formula needs weight and hematocrit "
                    + "(" + hematocrit.whyUnknown().orElseThrow() + ")");
        }
        return hematocrit.map(h -> BloodVolume.kaplanPlasmaLitres(weightKg, h));
    }

    /**
     * Why APL gets no leukapheresis numbers: it can precipitate fatal bleeding in the APL coagulopathy (Blum &amp;
     * Porcu 2007; Sanz et al. 2009, III-B).
     */
    public static final String APL_NO_LEUKAPHERESIS = "APL: leukapheresis is discouraged because it can precipitate"
            + " fatal bleeding in the coagulopathy (Blum & Porcu 2007; European LeukemiaNet, Sanz et al. 2009), so no"
            + " leukapheresis numbers are offered; cytoreduce with drugs";

    private static LeukapheresisPlan leukapheresis(Case c, Estimate<Double> bloodVolume, RuleSet rules) {
        if (c.condition().leukemia() == Leukemia.NONE) {
            String reason = "no leukemia recorded: leukapheresis numbers are not offered";
            return new LeukapheresisPlan(Estimate.unknown(reason), Estimate.unknown(reason));
        }
        if (c.condition().leukemia() == Leukemia.APL) {
            return new LeukapheresisPlan(Estimate.unknown(APL_NO_LEUKAPHERESIS), Estimate.unknown(APL_NO_LEUKAPHERESIS));
        }
        double low = rules.value(EstimateParameters.PROCESS_BLOOD_VOLUMES_LOW, "1");
        double high = rules.value(EstimateParameters.PROCESS_BLOOD_VOLUMES_HIGH, "1");
        double cutLow = rules.value(EstimateParameters.WBC_REDUCTION_LOW, "1");
        double cutHigh = rules.value(EstimateParameters.WBC_REDUCTION_HIGH, "1");
        Estimate<ValueRange> process = bloodVolume.map(tbv -> new ValueRange(low * tbv, high * tbv));
        OptionalDouble wbc = c.labs().canonical(Analyte.WBC);
        Estimate<ValueRange> after = wbc.isEmpty()
                ? Estimate.unknown("white cell count not measured")
                : Estimate.known(new ValueRange(wbc.getAsDouble() * (1 - cutHigh), wbc.getAsDouble() * (1 - cutLow)));
        return new LeukapheresisPlan(process, after);
    }
}
