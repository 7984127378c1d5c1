package org.stasissheet.measure;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The catalogue of every measured quantity a case may carry: lab values (the keys of {@code labs} in the case
 * format) and the two body measures of {@code patient}. Each has a canonical unit, the units accepted with their
 * conversion factor and source, and a plausible range in canonical units (inclusive at both ends).
 *
 * <p>Plausible ranges are deliberately wide: they catch unit slips (a WBC of 150000 entered as ×10⁹/L), not
 * abnormal results. Basis of every range: common practice (wide bounds around values seen in clinical
 * laboratories), not a published table.
 *
 * <p>Molar masses (g/mol), IUPAC standard atomic weights: uric acid C5H4N4O3 168.11, creatinine C4H7N3O 113.12,
 * phosphorus 30.974, calcium 40.078.
 */
public enum Analyte {
    SERUM_VISCOSITY("serumViscosity", "serum viscosity", "cP", 0.5, 30,
            unit("cP", "cP", 1, "definition: 1 cP = 1 mPa·s"),
            unit("mPa.s", "mPa·s", 1, "definition: 1 cP = 1 mPa·s"),
            unit("{rel}", "relative to water", 1,
                    "compared as reported: thresholds come from reports on the same scale (see CASE-FORMAT)")),
    IGM("igm", "IgM", "g/L", 0, 200, massConcentrationUnits()),
    IGG("igg", "IgG", "g/L", 0, 250, massConcentrationUnits()),
    IGA("iga", "IgA", "g/L", 0, 200, massConcentrationUnits()),
    TOTAL_PROTEIN("totalProtein", "total protein", "g/L", 10, 250,
            unit("g/L", "g/L", 1, "identity"),
            unit("g/dL", "g/dL", 10, "definition: 1 dL = 0.1 L")),
    WBC("wbc", "white cell count", "10*9/L", 0, 2000, countUnits(true)),
    BLASTS("blasts", "circulating blasts", "%", 0, 100,
            unit("%", "%", 1, "identity")),
    HEMATOCRIT("hematocrit", "hematocrit", "1", 0.05, 0.8,
            unit("%", "%", 0.01, "definition: 1 % = 0.01"),
            unit("L/L", "L/L", 1, "definition: L/L is dimensionless"),
            unit("1", "fraction", 1, "identity")),
    HEMOGLOBIN("hemoglobin", "hemoglobin", "g/L", 10, 250,
            unit("g/L", "g/L", 1, "identity"),
            unit("g/dL", "g/dL", 10, "definition: 1 dL = 0.1 L")),
    PLATELETS("platelets", "platelets", "10*9/L", 0, 5000, countUnits(false)),
    POTASSIUM("potassium", "potassium", "mmol/L", 1, 12, ionUnits()),
    SODIUM("sodium", "sodium", "mmol/L", 90, 200, ionUnits()),
    URIC_ACID("uricAcid", "uric acid", "umol/L", 0, 3000,
            unit("umol/L", "µmol/L", 1, "identity"),
            unit("mmol/L", "mmol/L", 1000, "definition: 1 mmol = 1000 µmol"),
            unit("mg/dL", "mg/dL", molarFromMgPerDl(MolarMass.URIC_ACID), MolarMass.URIC_ACID.citation())),
    PHOSPHATE("phosphate", "phosphate", "mmol/L", 0.1, 10,
            unit("mmol/L", "mmol/L", 1, "identity"),
            unit("mg/dL", "mg/dL", molarFromMgPerDl(MolarMass.PHOSPHORUS) / 1000, MolarMass.PHOSPHORUS.citation())),
    CALCIUM("calcium", "calcium", "mmol/L", 0.5, 6,
            unit("mmol/L", "mmol/L", 1, "identity"),
            unit("mg/dL", "mg/dL", molarFromMgPerDl(MolarMass.CALCIUM) / 1000, MolarMass.CALCIUM.citation())),
    CREATININE("creatinine", "creatinine", "umol/L", 5, 3000, creatinineUnits()),
    CREATININE_UPPER_LIMIT("creatinineUpperLimit", "creatinine upper limit of normal", "umol/L", 20, 300,
            creatinineUnits()),
    FIBRINOGEN("fibrinogen", "fibrinogen", "g/L", 0, 15,
            unit("g/L", "g/L", 1, "identity"),
            unit("mg/dL", "mg/dL", 0.01, "definition: 1 mg/dL = 0.01 g/L")),
    PAO2("pao2", "arterial O₂ tension", "mm[Hg]", 5, 700,
            unit("mm[Hg]", "mmHg", 1, "identity"),
            // UCUM defines m[Hg] as 133.3220 kPa, so 1 mm[Hg] = 133.322 Pa; the 133.322387415 Pa of the
            // conventional (BIPM) millimetre of mercury differs by 3 ppm, which the UCUM check showed.
            unit("kPa", "kPa", 1000 / 133.322, "UCUM 2.2: 1 m[Hg] = 133.3220 kPa, so 1 kPa = 1000/133.322 mm[Hg]")),
    SPO2("spo2", "pulse oximetry", "%", 30, 100,
            unit("%", "%", 1, "identity")),
    HEIGHT("height", "height", "cm", 30, 250,
            unit("cm", "cm", 1, "identity"),
            unit("m", "m", 100, "definition: 1 m = 100 cm"),
            unit("[in_i]", "in", 2.54, "definition: international inch = 2.54 cm")),
    WEIGHT("weight", "weight", "kg", 1, 400,
            unit("kg", "kg", 1, "identity"),
            unit("g", "g", 0.001, "definition: 1 g = 0.001 kg"),
            unit("[lb_av]", "lb", 0.45359237, "definition: avoirdupois pound = 0.45359237 kg"));

    private final String key;
    private final String label;
    private final String canonicalUnit;
    private final double plausibleMin;
    private final double plausibleMax;
    private final List<UnitOption> units;

    Analyte(String key, String label, String canonicalUnit, double plausibleMin, double plausibleMax,
            UnitOption... units) {
        this.key = key;
        this.label = label;
        this.canonicalUnit = canonicalUnit;
        this.plausibleMin = plausibleMin;
        this.plausibleMax = plausibleMax;
        this.units = List.of(units);
    }

    /** The JSON key in the case format, e.g. {@code wbc}. */
    public String key() {
        return key;
    }

    /** Short name for people, e.g. "white cell count". */
    public String label() {
        return label;
    }

    public String canonicalUnit() {
        return canonicalUnit;
    }

    public UnitOption canonicalOption() {
        return unitOption(canonicalUnit).orElseThrow();
    }

    /** Inclusive lower plausible bound, in the canonical unit. */
    public double plausibleMin() {
        return plausibleMin;
    }

    /** Inclusive upper plausible bound, in the canonical unit. */
    public double plausibleMax() {
        return plausibleMax;
    }

    /** The accepted units, in the order a unit picker shows them. */
    public List<UnitOption> units() {
        return units;
    }

    public Optional<UnitOption> unitOption(String ucum) {
        return units.stream().filter(u -> u.ucum().equals(ucum)).findFirst();
    }

    public boolean isPlausible(double canonicalValue) {
        return canonicalValue >= plausibleMin && canonicalValue <= plausibleMax;
    }

    /**
     * The other accepted units in which {@code value}, entered in {@code entered}, would be plausible: one per
     * distinct conversion factor, in picker order. Empty when the value is plausible as entered or no unit fits.
     * The case reader's "did you mean" and the form's one-click fixes both come from here.
     */
    public List<UnitOption> unitsMakingPlausible(double value, UnitOption entered) {
        if (isPlausible(value * entered.toCanonical())) {
            return List.of();
        }
        java.util.Set<Double> factors = new java.util.HashSet<>();
        factors.add(entered.toCanonical());
        return units.stream()
                .filter(u -> isPlausible(value * u.toCanonical()) && factors.add(u.toCanonical()))
                .toList();
    }

    /**
     * The LOINC codes that report this analyte (serum and plasma, mass and moles, automated and manual), first the
     * one written on export. Empty for a value LOINC has no code for (the lab's upper limit of normal).
     *
     * <p>Basis: {@value #MEMORY} unless the entry names a page that prints the code with its name. The check
     * digit of every code is verified in the tests (LOINC's mod-10 rule).
     */
    public List<LoincCode> loincCodes() {
        return switch (this) {
            case SERUM_VISCOSITY -> List.of(loinc("3128-6", "Viscosity of Serum", SECONDARY_MAP));
            case IGM -> List.of(loinc("2472-9", "IgM [Mass/volume] in Serum or Plasma", MEMORY));
            case IGG -> List.of(loinc("2465-3", "IgG [Mass/volume] in Serum or Plasma", MEMORY));
            case IGA -> List.of(loinc("2458-8", "IgA [Mass/volume] in Serum or Plasma", MEMORY));
            case TOTAL_PROTEIN -> List.of(loinc("2885-2", "Protein [Mass/volume] in Serum or Plasma", MEMORY));
            case WBC -> List.of(
                    loinc("6690-2", "Leukocytes [#/volume] in Blood by Automated count", MEMORY),
                    loinc("26464-8", "Leukocytes [#/volume] in Blood", MEMORY),
                    loinc("804-5", "Leukocytes [#/volume] in Blood by Manual count", MEMORY));
            case BLASTS -> List.of(
                    loinc("26446-5", "Blasts/100 leukocytes in Blood", MEMORY),
                    loinc("709-6", "Blasts/100 leukocytes in Blood by Manual count", MEMORY));
            case HEMATOCRIT -> List.of(
                    loinc("4544-3", "Hematocrit [Volume Fraction] of Blood by Automated count", MEMORY),
                    loinc("20570-8", "Hematocrit [Volume Fraction] of Blood", MEMORY));
            case HEMOGLOBIN -> List.of(loinc("718-7", "Hemoglobin [Mass/volume] in Blood", MEMORY));
            case PLATELETS -> List.of(
                    loinc("777-3", "Platelets [#/volume] in Blood by Automated count", MEMORY),
                    loinc("26515-7", "Platelets [#/volume] in Blood", MEMORY));
            case POTASSIUM -> List.of(
                    loinc("2823-3", "Potassium [Moles/volume] in Serum or Plasma", MEMORY),
                    loinc("6298-4", "Potassium [Moles/volume] in Blood", MEMORY));
            case SODIUM -> List.of(
                    loinc("2951-2", "Sodium [Moles/volume] in Serum or Plasma", MEMORY),
                    loinc("2947-0", "Sodium [Moles/volume] in Blood", MEMORY));
            case URIC_ACID -> List.of(
                    loinc("3084-1", "Urate [Mass/volume] in Serum or Plasma", MEMORY),
                    loinc("14933-6", "Urate [Moles/volume] in Serum or Plasma", MEMORY));
            case PHOSPHATE -> List.of(
                    loinc("2777-1", "Phosphate [Mass/volume] in Serum or Plasma", MEMORY),
                    loinc("14879-1", "Phosphate [Moles/volume] in Serum or Plasma", MEMORY));
            case CALCIUM -> List.of(
                    loinc("17861-6", "Calcium [Mass/volume] in Serum or Plasma", MEMORY),
                    loinc("2000-8", "Calcium [Moles/volume] in Serum or Plasma", MEMORY));
            case CREATININE -> List.of(
                    loinc("2160-0", "Creatinine [Mass/volume] in Serum or Plasma", SECONDARY_VALUE_SET),
                    loinc("14682-9", "Creatinine [Moles/volume] in Serum or Plasma", SECONDARY_VALUE_SET),
                    loinc("38483-4", "Creatinine [Mass/volume] in Blood", SECONDARY_VALUE_SET));
            case CREATININE_UPPER_LIMIT -> List.of();
            case FIBRINOGEN -> List.of(
                    loinc("3255-7", "Fibrinogen [Mass/volume] in Platelet poor plasma by Coagulation assay", MEMORY));
            case PAO2 -> List.of(loinc("2703-7", "Oxygen [Partial pressure] in Arterial blood", MEMORY));
            case SPO2 -> List.of(loinc("59408-5", "Oxygen saturation in Arterial blood by Pulse oximetry", MEMORY));
            case HEIGHT -> List.of(loinc("8302-2", "Body height", FHIR_VITALS));
            case WEIGHT -> List.of(loinc("29463-7", "Body weight", FHIR_VITALS));
        };
    }

    /** The analyte a LOINC code reports, if the catalogue knows the code. */
    public static Optional<Analyte> byLoinc(String code) {
        return Arrays.stream(values()).filter(a -> a.loincCodes().stream().anyMatch(l -> l.code().equals(code)))
                .findFirst();
    }

    static final String MEMORY = "from memory";
    private static final String SECONDARY_MAP =
            "published-secondary: printed with this name in a public laboratory-to-LOINC mapping table";
    private static final String SECONDARY_VALUE_SET =
            "published-secondary: printed with this name in a FHIR value set of serum creatinine codes "
                    + "(expansion based on LOINC 2.82)";
    private static final String FHIR_VITALS =
            "published: FHIR R4 vital-signs profiles (in the R4 validation resources the tests load)";

    private static LoincCode loinc(String code, String name, String basis) {
        return new LoincCode(code, name, basis);
    }

    /** The body measures under {@code patient}; every other analyte lives under {@code labs}. */
    public boolean isBodyMeasure() {
        return this == HEIGHT || this == WEIGHT;
    }

    public static Optional<Analyte> byKey(String key) {
        return Arrays.stream(values()).filter(a -> a.key.equals(key)).findFirst();
    }

    /** Lab analytes in catalogue order (everything but the body measures). */
    public static List<Analyte> labs() {
        return Arrays.stream(values()).filter(a -> !a.isBodyMeasure()).toList();
    }

    private static UnitOption unit(String ucum, String display, double toCanonical, String source) {
        return new UnitOption(ucum, display, toCanonical, source);
    }

    private static UnitOption[] massConcentrationUnits() {
        return new UnitOption[] {
            unit("g/L", "g/L", 1, "identity"),
            unit("g/dL", "g/dL", 10, "definition: 1 dL = 0.1 L"),
            unit("mg/dL", "mg/dL", 0.01, "definition: 1 mg/dL = 0.01 g/L"),
        };
    }

    private static UnitOption[] countUnits(boolean perMicrolitre) {
        UnitOption[] common = {
            unit("10*9/L", "×10⁹/L", 1, "identity"),
            unit("10*3/uL", "×10³/µL", 1, "definition: 1 µL = 10⁻⁶ L"),
        };
        if (!perMicrolitre) {
            return common;
        }
        return new UnitOption[] {
            common[0], common[1],
            unit("/uL", "/µL", 0.001, "definition: 1 µL = 10⁻⁶ L"),
            unit("/mm3", "/mm³", 0.001, "definition: 1 mm³ = 1 µL"),
        };
    }

    private static UnitOption[] ionUnits() {
        return new UnitOption[] {
            unit("mmol/L", "mmol/L", 1, "identity"),
            unit("meq/L", "mEq/L", 1, "monovalent ion: 1 mEq = 1 mmol (UCUM defines eq as mol)"),
        };
    }

    private static UnitOption[] creatinineUnits() {
        return new UnitOption[] {
            unit("umol/L", "µmol/L", 1, "identity"),
            unit("mg/dL", "mg/dL", molarFromMgPerDl(MolarMass.CREATININE), MolarMass.CREATININE.citation()),
        };
    }

    /** µmol/L per mg/dL for a substance of the given molar mass: 1 mg/dL = 10 mg/L = 10 000 / M µmol/L. */
    private static double molarFromMgPerDl(MolarMass mass) {
        return 10_000 / mass.gramsPerMole();
    }
}
