package org.stasissheet.ui.entry;

import java.util.EnumMap;
import java.util.Map;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.UnitOption;

/**
 * Which unit a new entry starts with: SI units or the conventional (mass-based, per-microlitre) units many
 * laboratories still report. Only the starting unit changes; every accepted unit stays in the picker and
 * the case file always holds the UCUM code actually chosen. Basis: common practice (how laboratories in SI
 * and in conventional-unit countries usually report each analyte).
 */
public enum UnitSystem {
    SI("SI units"),
    CONVENTIONAL("conventional units");

    private static final Map<Analyte, String> CONVENTIONAL_UNITS = new EnumMap<>(Map.ofEntries(
            Map.entry(Analyte.IGM, "g/dL"),
            Map.entry(Analyte.IGG, "g/dL"),
            Map.entry(Analyte.IGA, "g/dL"),
            Map.entry(Analyte.TOTAL_PROTEIN, "g/dL"),
            Map.entry(Analyte.WBC, "10*3/uL"),
            Map.entry(Analyte.HEMATOCRIT, "%"),
            Map.entry(Analyte.HEMOGLOBIN, "g/dL"),
            Map.entry(Analyte.PLATELETS, "10*3/uL"),
            Map.entry(Analyte.POTASSIUM, "meq/L"),
            Map.entry(Analyte.SODIUM, "meq/L"),
            Map.entry(Analyte.URIC_ACID, "mg/dL"),
            Map.entry(Analyte.PHOSPHATE, "mg/dL"),
            Map.entry(Analyte.CALCIUM, "mg/dL"),
            Map.entry(Analyte.CREATININE, "mg/dL"),
            Map.entry(Analyte.CREATININE_UPPER_LIMIT, "mg/dL"),
            Map.entry(Analyte.FIBRINOGEN, "mg/dL"),
            Map.entry(Analyte.PAO2, "mm[Hg]")));

    /** Where SI practice differs from the catalogue's canonical unit. */
    private static final Map<Analyte, String> SI_UNITS = new EnumMap<>(Map.ofEntries(
            Map.entry(Analyte.HEMATOCRIT, "L/L"),
            Map.entry(Analyte.PAO2, "kPa")));

    private final String label;

    UnitSystem(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** The unit a new entry of this analyte starts with; always one the analyte accepts. */
    public UnitOption startingUnit(Analyte analyte) {
        String ucum = (this == SI ? SI_UNITS : CONVENTIONAL_UNITS).get(analyte);
        return ucum == null ? analyte.canonicalOption() : analyte.unitOption(ucum).orElseThrow();
    }
}
