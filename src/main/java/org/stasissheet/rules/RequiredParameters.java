package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.measure.Analyte;

/**
 * The parameters the code reads by id (verdicts, flow and apheresis estimates). The loader refuses a rule set that
 * lacks one of them or gives one in a unit of the wrong kind. Their values and sources live in the rule files only.
 */
public final class RequiredParameters {
    private RequiredParameters() {
    }

    /**
     * One required id; the unit must be accepted by {@code analyte} when given, else belong to {@code dimension};
     * the value must lie in {@code allowed} so that a set that passes the check can always be used.
     */
    public record Required(String id, Optional<Analyte> analyte, Dimension dimension, Allowed allowed) {
        public Required {
            Objects.requireNonNull(id, "id");
            Objects.requireNonNull(analyte, "analyte");
            Objects.requireNonNull(dimension, "dimension");
            Objects.requireNonNull(allowed, "allowed");
        }

        /** The value in the unit {@link Allowed#unit()} (a threshold goes through the analyte's conversion). */
        double valueIn(Parameter p) {
            return analyte.map(a -> Threshold.of(p).canonical(a))
                    .orElseGet(() -> dimension.convert(p.value().value(), p.value().unit(), allowed.unit()));
        }

        boolean accepts(String unit) {
            return analyte.map(a -> a.unitOption(unit).isPresent()).orElse(dimension.accepts(unit));
        }

        String expected() {
            return analyte.map(a -> "a unit of " + a.label() + " ("
                            + String.join(", ", a.units().stream().map(u -> u.ucum()).toList()) + ")")
                    .orElse("a " + dimension.label() + " unit (" + dimension.allowed() + ")");
        }
    }

    public static final String SV_SYMPTOMATIC = "hyperviscosity.serumViscosity.symptomatic";
    public static final String SV_LOWER = "hyperviscosity.serumViscosity.lower";
    public static final String SV_NORMAL_UPPER = "hyperviscosity.serumViscosity.normalUpper";
    public static final String SV_WARM_SAMPLE = "hyperviscosity.serumViscosity.warmSample";
    public static final String LEVEL_PREFIX = "hyperviscosity.level.";
    public static final String LEUKOSTASIS_ASSESS_FROM = "leukostasis.assessFrom";
    public static final String LEUKOSTASIS_GRADE_FROM_PREFIX = "leukostasis.gradeFrom.";
    public static final String HYPERLEUKOCYTOSIS_PREFIX = "hyperleukocytosis.wbc.";
    public static final String PSEUDOHYPERKALAEMIA_WBC_CLL = "artefact.pseudohyperkalaemia.wbc.CLL";
    public static final String PSEUDOHYPERKALAEMIA_WBC_ANY = "artefact.pseudohyperkalaemia.wbc";
    public static final String SPURIOUS_HYPOXAEMIA_WBC = "artefact.spuriousHypoxaemia.wbc";
    public static final String SUGGEST_SPO2_TARGET_LOW = "pulmonarySuggestion.spo2.targetLow";
    public static final String SUGGEST_PAO2_FAILURE = "pulmonarySuggestion.pao2.respiratoryFailure";
    public static final String TLS_URIC_ACID = "tumorLysis.uricAcid";
    public static final String TLS_POTASSIUM = "tumorLysis.potassium";
    public static final String TLS_PHOSPHATE_ADULT = "tumorLysis.phosphate.adult";
    public static final String TLS_PHOSPHATE_CHILD = "tumorLysis.phosphate.child";
    public static final String TLS_CALCIUM = "tumorLysis.calcium";
    public static final String TLS_CHANGE = "tumorLysis.changeFromBaseline";
    public static final String TLS_CREATININE_RATIO = "tumorLysis.creatinineTimesUpperLimit";
    public static final String TLS_CHILD_BELOW_AGE = "tumorLysis.childBelowAge";
    public static final String TLS_WINDOW_BEFORE = "tumorLysis.window.daysBefore";
    public static final String TLS_WINDOW_AFTER = "tumorLysis.window.daysAfter";

    /**
     * The values a parameter may take, in {@code unit}; {@code why} says where the limits come from.
     * Outside them an estimate would divide by zero, take the logarithm of a non-positive number or claim a
     * fraction above one, so the set is refused instead.
     */
    public record Allowed(double low, boolean lowIncluded, double high, boolean highIncluded, String unit,
                          String why) {
        public Allowed {
            Objects.requireNonNull(unit, "unit");
            Objects.requireNonNull(why, "why");
        }

        boolean contains(double v) {
            return (lowIncluded ? v >= low : v > low) && (highIncluded ? v <= high : v < high);
        }

        String describe() {
            return (lowIncluded ? "at least " : "above ") + org.stasissheet.measure.Numbers.plain(low)
                    + (highIncluded ? " and at most " : " and below ") + org.stasissheet.measure.Numbers.plain(high)
                    + " " + unit + " (" + why + ")";
        }
    }

    /** Two parameters whose values must not cross: {@code lower} ≤ {@code upper} in the same unit. */
    public record Ordered(String lower, String upper, String unit) {
    }

    // Limits of the estimate constants: "common practice" (physical sense: fractions between 0 and 1, volumes
    // and viscosities positive); the upper ends are generous sanity limits (from memory), far above the sourced
    // values in the shipped set.
    private static final Allowed OPEN_FRACTION = new Allowed(0, false, 1, false, "1",
            "a fraction strictly between 0 and 1; common practice");
    private static final Allowed SHARE = new Allowed(0, false, 1, true, "1",
            "a share above 0 and at most 1; common practice");
    private static final Allowed CELL_VOLUME = new Allowed(0, false, 10_000, true, "fL",
            "a cell volume is positive; 10,000 fL is far above any blood cell (from memory)");
    private static final Allowed UNIT_VOLUME = new Allowed(0, false, 2, true, "L",
            "a transfusion unit holds a positive volume, well under 2 L (from memory)");
    private static final Allowed VISCOSITY = new Allowed(0, false, 30, true, "cP",
            "a positive viscosity within the case reader's plausible serum-viscosity range");
    private static final Allowed BLOOD_VOLUMES = new Allowed(0, false, 10, true, "1",
            "a positive number of blood volumes, at most 10 (common practice is 1.5-2)");
    private static final Allowed MULTIPLE = new Allowed(0, false, 100, true, "1",
            "a positive multiple of the upper limit of normal, at most 100 (common practice)");
    private static final Allowed AGE = new Allowed(0, false, 130, true, "a",
            "a positive age, at most the case reader's oldest plausible age");
    private static final Allowed MEASURING_TEMPERATURE = new Allowed(0, true, 45, true, "Cel",
            "a measuring temperature within the case reader's plausible 0-45 °C");
    private static final Allowed DAYS = new Allowed(0, true, 365, true, "d",
            "0 to 365 days (common practice)");

    public static final List<Required> ALL = List.of(
            analyte(SV_SYMPTOMATIC, Analyte.SERUM_VISCOSITY),
            analyte(SV_LOWER, Analyte.SERUM_VISCOSITY),
            analyte(SV_NORMAL_UPPER, Analyte.SERUM_VISCOSITY),
            of(SV_WARM_SAMPLE, Dimension.TEMPERATURE, MEASURING_TEMPERATURE),
            analyte(LEVEL_PREFIX + "IgM", Analyte.IGM),
            analyte(LEVEL_PREFIX + "IgG", Analyte.IGG),
            analyte(LEVEL_PREFIX + "IgG3", Analyte.IGG),
            analyte(LEVEL_PREFIX + "IgA", Analyte.IGA),
            analyte(LEUKOSTASIS_ASSESS_FROM, Analyte.WBC),
            analyte(LEUKOSTASIS_GRADE_FROM_PREFIX + "ALL", Analyte.WBC),
            analyte(LEUKOSTASIS_GRADE_FROM_PREFIX + "CML", Analyte.WBC),
            analyte(LEUKOSTASIS_GRADE_FROM_PREFIX + "CLL", Analyte.WBC),
            analyte(HYPERLEUKOCYTOSIS_PREFIX + "acute-untyped", Analyte.WBC),
            analyte(PSEUDOHYPERKALAEMIA_WBC_CLL, Analyte.WBC),
            analyte(PSEUDOHYPERKALAEMIA_WBC_ANY, Analyte.WBC),
            analyte(HYPERLEUKOCYTOSIS_PREFIX + "AML", Analyte.WBC),
            analyte(HYPERLEUKOCYTOSIS_PREFIX + "AMLMonocytic", Analyte.WBC),
            analyte(HYPERLEUKOCYTOSIS_PREFIX + "APL", Analyte.WBC),
            analyte(HYPERLEUKOCYTOSIS_PREFIX + "ALL", Analyte.WBC),
            analyte(HYPERLEUKOCYTOSIS_PREFIX + "CML", Analyte.WBC),
            analyte(HYPERLEUKOCYTOSIS_PREFIX + "CLL", Analyte.WBC),
            analyte(SPURIOUS_HYPOXAEMIA_WBC, Analyte.WBC),
            analyte(SUGGEST_SPO2_TARGET_LOW, Analyte.SPO2),
            analyte(SUGGEST_PAO2_FAILURE, Analyte.PAO2),
            analyte(TLS_URIC_ACID, Analyte.URIC_ACID),
            analyte(TLS_POTASSIUM, Analyte.POTASSIUM),
            analyte(TLS_PHOSPHATE_ADULT, Analyte.PHOSPHATE),
            analyte(TLS_PHOSPHATE_CHILD, Analyte.PHOSPHATE),
            analyte(TLS_CALCIUM, Analyte.CALCIUM),
            of(TLS_CHANGE, Dimension.FRACTION, SHARE),
            of(TLS_CREATININE_RATIO, Dimension.FRACTION, MULTIPLE),
            of(TLS_CHILD_BELOW_AGE, Dimension.AGE, AGE),
            of(TLS_WINDOW_BEFORE, Dimension.DURATION, DAYS),
            of(TLS_WINDOW_AFTER, Dimension.DURATION, DAYS),
            // read by the flow and apheresis estimates (ids in EstimateParameters)
            of(EstimateParameters.REFERENCE_HEMATOCRIT, Dimension.FRACTION, OPEN_FRACTION),
            of(EstimateParameters.REFERENCE_SERUM_VISCOSITY, Dimension.VISCOSITY, VISCOSITY),
            of(EstimateParameters.VOLUME_MYELOBLAST_LOW, Dimension.VOLUME, CELL_VOLUME),
            of(EstimateParameters.VOLUME_MYELOBLAST_HIGH, Dimension.VOLUME, CELL_VOLUME),
            of(EstimateParameters.VOLUME_LYMPHOBLAST_LOW, Dimension.VOLUME, CELL_VOLUME),
            of(EstimateParameters.VOLUME_LYMPHOBLAST_HIGH, Dimension.VOLUME, CELL_VOLUME),
            of(EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_LOW, Dimension.VOLUME, CELL_VOLUME),
            of(EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_HIGH, Dimension.VOLUME, CELL_VOLUME),
            of(EstimateParameters.TRANSFUSION_UNIT_VOLUME, Dimension.VOLUME, UNIT_VOLUME),
            of(EstimateParameters.TRANSFUSION_UNIT_RED_CELL_VOLUME, Dimension.VOLUME, UNIT_VOLUME),
            of(EstimateParameters.INTRAVASCULAR_FRACTION_IGM, Dimension.FRACTION, SHARE),
            of(EstimateParameters.INTRAVASCULAR_FRACTION_IGG, Dimension.FRACTION, SHARE),
            of(EstimateParameters.INTRAVASCULAR_FRACTION_IGA, Dimension.FRACTION, SHARE),
            of(EstimateParameters.PROCESS_BLOOD_VOLUMES_LOW, Dimension.FRACTION, BLOOD_VOLUMES),
            of(EstimateParameters.PROCESS_BLOOD_VOLUMES_HIGH, Dimension.FRACTION, BLOOD_VOLUMES),
            of(EstimateParameters.WBC_REDUCTION_LOW, Dimension.FRACTION, OPEN_FRACTION),
            of(EstimateParameters.WBC_REDUCTION_HIGH, Dimension.FRACTION, OPEN_FRACTION));

    /** Pairs the estimates assume in order (a red-cell volume larger than its unit would be nonsense). */
    public static final List<Ordered> ORDERED = List.of(
            new Ordered(EstimateParameters.TRANSFUSION_UNIT_RED_CELL_VOLUME,
                    EstimateParameters.TRANSFUSION_UNIT_VOLUME, "L"),
            new Ordered(EstimateParameters.PROCESS_BLOOD_VOLUMES_LOW,
                    EstimateParameters.PROCESS_BLOOD_VOLUMES_HIGH, "1"),
            new Ordered(EstimateParameters.WBC_REDUCTION_LOW, EstimateParameters.WBC_REDUCTION_HIGH, "1"),
            new Ordered(SV_LOWER, SV_SYMPTOMATIC, "cP"),
            new Ordered(SV_NORMAL_UPPER, SV_LOWER, "cP"),
            new Ordered(EstimateParameters.VOLUME_MYELOBLAST_LOW, EstimateParameters.VOLUME_MYELOBLAST_HIGH, "fL"),
            new Ordered(EstimateParameters.VOLUME_LYMPHOBLAST_LOW, EstimateParameters.VOLUME_LYMPHOBLAST_HIGH, "fL"),
            new Ordered(EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_LOW,
                    EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_HIGH, "fL"));

    /** A lab threshold: positive and no higher than the highest value the case reader accepts, or it never fires. */
    private static Required analyte(String id, Analyte a) {
        return new Required(id, Optional.of(a), Dimension.of(a.canonicalUnit()).orElse(Dimension.FRACTION),
                new Allowed(0, false, a.plausibleMax(), true, a.canonicalUnit(),
                        "positive and within the plausible range of " + a.label() + "; common practice"));
    }

    private static Required of(String id, Dimension d, Allowed allowed) {
        return new Required(id, Optional.empty(), d, allowed);
    }
}
