package org.stasissheet.derived;

import static org.stasissheet.rules.EstimateParameters.INTRAVASCULAR_FRACTION_IGA;
import static org.stasissheet.rules.EstimateParameters.INTRAVASCULAR_FRACTION_IGG;
import static org.stasissheet.rules.EstimateParameters.INTRAVASCULAR_FRACTION_IGM;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Patient;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.RuleSet;

/**
 * The quantities that both the flow estimates and the apheresis numbers derive from one case: hematocrit, serum
 * viscosity, blood volume, the paraprotein and its intravascular fraction. One home below both, so that neither
 * reaches into the other. Each is known or carries the reason it is not; nothing is assumed for a missing input.
 */
public final class CaseQuantities {
    private CaseQuantities() {
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

    /** Nadler total blood volume, litres, or why not. */
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

    /** The isotype's intravascular fraction f; IgG3 uses IgG's (no separate published value in our reference). */
    public static Estimate<Double> intravascularFraction(Paraprotein isotype, RuleSet rules) {
        return switch (isotype) {
            case NONE -> Estimate.unknown(noIsotype());
            case IGM -> Estimate.known(rules.value(INTRAVASCULAR_FRACTION_IGM, "1"));
            case IGG, IGG3 -> Estimate.known(rules.value(INTRAVASCULAR_FRACTION_IGG, "1"));
            case IGA -> Estimate.known(rules.value(INTRAVASCULAR_FRACTION_IGA, "1"));
        };
    }

    /** The lab that carries the case's paraprotein, empty without an isotype (an IgG3 value goes in IgG). */
    public static Optional<Analyte> paraproteinLab(Paraprotein isotype) {
        return switch (isotype) {
            case NONE -> Optional.empty();
            case IGM -> Optional.of(Analyte.IGM);
            case IGG, IGG3 -> Optional.of(Analyte.IGG);
            case IGA -> Optional.of(Analyte.IGA);
        };
    }

    /** The paraprotein value in g/L from the lab matching the isotype, or why there is none. */
    public static Estimate<Double> paraprotein(Case c) {
        Optional<Analyte> lab = paraproteinLab(c.condition().paraprotein());
        if (lab.isEmpty()) {
            return Estimate.unknown(noIsotype());
        }
        OptionalDouble v = c.labs().canonical(lab.get());
        if (v.isEmpty()) {
            return Estimate.unknown("paraprotein not estimated after exchange: no " + lab.get().label()
                    + " value for the " + c.condition().paraprotein().code() + " paraprotein");
        }
        return Estimate.known(v.getAsDouble());
    }

    private static String noIsotype() {
        return "no paraprotein isotype recorded";
    }
}
