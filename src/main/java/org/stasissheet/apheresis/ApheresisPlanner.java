package org.stasissheet.apheresis;

import org.stasissheet.rules.EstimateParameters;

import static org.stasissheet.rules.EstimateParameters.INTRAVASCULAR_FRACTION_IGA;
import static org.stasissheet.rules.EstimateParameters.INTRAVASCULAR_FRACTION_IGG;
import static org.stasissheet.rules.EstimateParameters.INTRAVASCULAR_FRACTION_IGM;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Patient;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.RuleSet;

/** Turns a case and a rule set into {@link ApheresisPlan} numbers. Pure: no I/O, no clock. */
public final class ApheresisPlanner {
    private ApheresisPlanner() {
    }

    /** Exchange sizes shown on every worksheet (CASE-FORMAT asks for 1.0 and 1.5 at least). */
    public static final List<Double> EXCHANGE_PLASMA_VOLUMES = List.of(1.0, 1.5, 2.0);

    public static final List<String> NOTES = List.of(
            "Exchange rows use a one-compartment model: they ignore the paraprotein that flows back from outside "
                    + "the vessels during and after the procedure.",
            "The serum viscosity after an exchange is a log-linear projection, an approximation that tends to "
                    + "under-predict the fall; measure it again after the procedure.",
            "Blood and plasma volumes are formula estimates for adults, not measurements.");

    public static ApheresisPlan plan(Case c, RuleSet rules) {
        Estimate<Double> bloodVolume = bloodVolume(c.patient());
        Estimate<Double> hematocrit = hematocrit(c);
        Estimate<Double> plasmaVolume = plasmaVolume(c.patient(), hematocrit);
        Estimate<Double> plasmaFromBlood = bloodVolume.flatMap(tbv -> hematocrit.map(
                h -> BloodVolume.plasmaFromBloodVolumeLitres(tbv, h)));
        Estimate<Double> fraction = intravascularFraction(c.condition().paraprotein(), rules);
        Estimate<Double> paraprotein = paraproteinValue(c);
        Estimate<Double> serumViscosity = serumViscosity(c);
        double referenceSv = rules.value(EstimateParameters.REFERENCE_SERUM_VISCOSITY, "cP");

        List<ExchangeRow> rows = new ArrayList<>();
        for (double v : EXCHANGE_PLASMA_VOLUMES) {
            Estimate<Double> remaining = fraction.map(f -> ExchangeKinetics.paraproteinRemaining(f, v));
            rows.add(new ExchangeRow(v,
                    plasmaVolume.map(pv -> v * pv),
                    ExchangeKinetics.intravascularRemaining(v),
                    paraprotein.flatMap(p -> remaining.map(r -> p * r)),
                    serumViscosity.flatMap(sv -> remaining.map(
                            r -> ExchangeKinetics.projectedSerumViscosity(sv, referenceSv, r)))));
        }
        return new ApheresisPlan(bloodVolume, plasmaVolume, plasmaFromBlood, paraprotein, fraction, rows,
                leukapheresis(c, bloodVolume, rules), NOTES);
    }

    /** Nadler total blood volume, or why not. */
    public static Estimate<Double> bloodVolume(Patient p) {
        List<String> missing = new ArrayList<>();
        if (p.sex().isEmpty()) {
            missing.add("sex");
        }
        if (p.height().isEmpty()) {
            missing.add("height");
        }
        if (p.weight().isEmpty()) {
            missing.add("weight");
        }
        if (!missing.isEmpty()) {
            return Estimate.unknown("blood volume not estimated: Nadler's formula needs sex, height and weight "
                    + "(missing: " + String.join(", ", missing) + ")");
        }
        if (p.isChild()) {
            return Estimate.unknown("blood volume not estimated: Nadler's formula comes from adults and the "
                    + "patient is under 18");
        }
        double heightCm = p.height().orElseThrow().canonical();
        double weightKg = p.weight().orElseThrow().canonical();
        if (!(heightCm > 0 && weightKg > 0)) {
            return Estimate.unknown("blood volume not estimated: height " + Numbers.plain(heightCm)
                    + " cm and weight " + Numbers.plain(weightKg) + " kg must both be above 0");
        }
        return Estimate.known(BloodVolume.nadlerLitres(p.sex().orElseThrow(), heightCm, weightKg));
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

    /** The hematocrit as a fraction, or why it cannot be used. */
    public static Estimate<Double> hematocrit(Case c) {
        OptionalDouble h = c.labs().canonical(Analyte.HEMATOCRIT);
        if (h.isEmpty()) {
            return Estimate.unknown("hematocrit not measured: no value is assumed");
        }
        double value = h.getAsDouble();
        if (!(value > 0 && value < 1)) {
            return Estimate.unknown("labs.hematocrit: " + Numbers.plain(value)
                    + " (fraction) is outside 0 < H < 1, so no estimate uses it");
        }
        return Estimate.known(value);
    }

    /** The serum viscosity on the lab's scale, or why it cannot be used. */
    public static Estimate<Double> serumViscosity(Case c) {
        OptionalDouble sv = c.labs().canonical(Analyte.SERUM_VISCOSITY);
        if (sv.isEmpty()) {
            return Estimate.unknown("serum viscosity not measured");
        }
        if (!(sv.getAsDouble() > 0)) {
            return Estimate.unknown("labs.serumViscosity: " + Numbers.plain(sv.getAsDouble())
                    + " cP must be above 0");
        }
        return Estimate.known(sv.getAsDouble());
    }

    /** The isotype's intravascular fraction f; IgG3 uses IgG's (no separate published value in our reference). */
    public static Estimate<Double> intravascularFraction(Paraprotein isotype, RuleSet rules) {
        return switch (isotype) {
            case NONE -> Estimate.unknown(noIsotype());
            case IGM -> Estimate.known(rules.value(INTRAVASCULAR_FRACTION_IGM, "1"));
            case IGG, IGG3 -> Estimate.known(rules.value(INTRAVASCULAR_FRACTION_IGG, "1"));
            case IGA -> Estimate.known(rules.value(INTRAVASCULAR_FRACTION_IGA, "1"));
        };
    }

    private static Estimate<Double> paraproteinValue(Case c) {
        Analyte lab = switch (c.condition().paraprotein()) {
            case NONE -> null;
            case IGM -> Analyte.IGM;
            case IGG, IGG3 -> Analyte.IGG;
            case IGA -> Analyte.IGA;
        };
        if (lab == null) {
            return Estimate.unknown(noIsotype());
        }
        OptionalDouble v = c.labs().canonical(lab);
        if (v.isEmpty()) {
            return Estimate.unknown("paraprotein not estimated after exchange: no labs." + lab.key()
                    + " value for the " + c.condition().paraprotein().code() + " paraprotein");
        }
        return Estimate.known(v.getAsDouble());
    }

    private static String noIsotype() {
        return "no paraprotein isotype recorded (condition.paraprotein is none)";
    }

    private static LeukapheresisPlan leukapheresis(Case c, Estimate<Double> bloodVolume, RuleSet rules) {
        if (c.condition().leukemia() == Leukemia.NONE) {
            String reason = "no leukemia recorded: leukapheresis numbers are not offered";
            return new LeukapheresisPlan(Estimate.unknown(reason), Estimate.unknown(reason));
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
