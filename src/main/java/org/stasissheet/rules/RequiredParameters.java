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

    /** One required id; the unit must be accepted by {@code analyte} when given, else belong to {@code dimension}. */
    public record Required(String id, Optional<Analyte> analyte, Dimension dimension) {
        public Required {
            Objects.requireNonNull(id, "id");
            Objects.requireNonNull(analyte, "analyte");
            Objects.requireNonNull(dimension, "dimension");
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

    public static final List<Required> ALL = List.of(
            analyte(SV_SYMPTOMATIC, Analyte.SERUM_VISCOSITY),
            analyte(SV_LOWER, Analyte.SERUM_VISCOSITY),
            analyte(SV_NORMAL_UPPER, Analyte.SERUM_VISCOSITY),
            of(SV_WARM_SAMPLE, Dimension.TEMPERATURE),
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
            analyte(TLS_URIC_ACID, Analyte.URIC_ACID),
            analyte(TLS_POTASSIUM, Analyte.POTASSIUM),
            analyte(TLS_PHOSPHATE_ADULT, Analyte.PHOSPHATE),
            analyte(TLS_PHOSPHATE_CHILD, Analyte.PHOSPHATE),
            analyte(TLS_CALCIUM, Analyte.CALCIUM),
            of(TLS_CHANGE, Dimension.FRACTION),
            of(TLS_CREATININE_RATIO, Dimension.FRACTION),
            of(TLS_CHILD_BELOW_AGE, Dimension.AGE),
            of(TLS_WINDOW_BEFORE, Dimension.DURATION),
            of(TLS_WINDOW_AFTER, Dimension.DURATION),
            // read by the flow and apheresis estimates (ids in EstimateParameters)
            of(EstimateParameters.REFERENCE_HEMATOCRIT, Dimension.FRACTION),
            of(EstimateParameters.REFERENCE_SERUM_VISCOSITY, Dimension.VISCOSITY),
            of(EstimateParameters.VOLUME_MYELOBLAST_LOW, Dimension.VOLUME),
            of(EstimateParameters.VOLUME_MYELOBLAST_HIGH, Dimension.VOLUME),
            of(EstimateParameters.VOLUME_LYMPHOBLAST_LOW, Dimension.VOLUME),
            of(EstimateParameters.VOLUME_LYMPHOBLAST_HIGH, Dimension.VOLUME),
            of(EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_LOW, Dimension.VOLUME),
            of(EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_HIGH, Dimension.VOLUME),
            of(EstimateParameters.TRANSFUSION_UNIT_VOLUME, Dimension.VOLUME),
            of(EstimateParameters.TRANSFUSION_UNIT_RED_CELL_VOLUME, Dimension.VOLUME),
            of(EstimateParameters.INTRAVASCULAR_FRACTION_IGM, Dimension.FRACTION),
            of(EstimateParameters.INTRAVASCULAR_FRACTION_IGG, Dimension.FRACTION),
            of(EstimateParameters.INTRAVASCULAR_FRACTION_IGA, Dimension.FRACTION),
            of(EstimateParameters.PROCESS_BLOOD_VOLUMES_LOW, Dimension.FRACTION),
            of(EstimateParameters.PROCESS_BLOOD_VOLUMES_HIGH, Dimension.FRACTION),
            of(EstimateParameters.WBC_REDUCTION_LOW, Dimension.FRACTION),
            of(EstimateParameters.WBC_REDUCTION_HIGH, Dimension.FRACTION));

    private static Required analyte(String id, Analyte a) {
        return new Required(id, Optional.of(a), Dimension.of(a.canonicalUnit()).orElse(Dimension.FRACTION));
    }

    private static Required of(String id, Dimension d) {
        return new Required(id, Optional.empty(), d);
    }
}
