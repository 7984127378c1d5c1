package org.stasissheet.rules;


/**
 * Every rule-set parameter the flow and apheresis estimates read, with the unit the code computes in. One place,
 * so that the rule-set validator can check that a rule set carries them all (see {@link RequiredParameters}).
 * Values, sources and basis tags live in the rule files, never here.
 */
public final class EstimateParameters {
    private EstimateParameters() {
    }

    /** Reference hematocrit of the flow comparison (CASE-FORMAT). */
    public static final String REFERENCE_HEMATOCRIT = "flow.referenceHematocrit";
    /** Reference serum viscosity, the middle of the normal range (Mehta &amp; Singhal 2003). */
    public static final String REFERENCE_SERUM_VISCOSITY = "flow.referenceSerumViscosity";

    /** Mean cell volume ranges for the leukocrit, low and high ends (DOMAIN.md §6: a range, not one number). */
    public static final String VOLUME_MYELOBLAST_LOW = "leukocrit.volume.myeloblast.low";
    public static final String VOLUME_MYELOBLAST_HIGH = "leukocrit.volume.myeloblast.high";
    public static final String VOLUME_LYMPHOBLAST_LOW = "leukocrit.volume.lymphoblast.low";
    public static final String VOLUME_LYMPHOBLAST_HIGH = "leukocrit.volume.lymphoblast.high";
    public static final String VOLUME_MATURE_LYMPHOCYTE_LOW = "leukocrit.volume.matureLymphocyte.low";
    public static final String VOLUME_MATURE_LYMPHOCYTE_HIGH = "leukocrit.volume.matureLymphocyte.high";

    public static final String TRANSFUSION_UNIT_VOLUME = "transfusion.unitVolume";
    public static final String TRANSFUSION_UNIT_RED_CELL_VOLUME = "transfusion.unitRedCellVolume";

    public static final String INTRAVASCULAR_FRACTION_IGM = "exchange.intravascularFraction.IgM";
    public static final String INTRAVASCULAR_FRACTION_IGG = "exchange.intravascularFraction.IgG";
    public static final String INTRAVASCULAR_FRACTION_IGA = "exchange.intravascularFraction.IgA";

    public static final String PROCESS_BLOOD_VOLUMES_LOW = "leukapheresis.processBloodVolumesLow";
    public static final String PROCESS_BLOOD_VOLUMES_HIGH = "leukapheresis.processBloodVolumesHigh";
    public static final String WBC_REDUCTION_LOW = "leukapheresis.reductionLow";
    public static final String WBC_REDUCTION_HIGH = "leukapheresis.reductionHigh";
}
