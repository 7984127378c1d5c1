package org.stasissheet.measure;

/** Molar masses used to convert mass concentrations to molar ones. Source: IUPAC standard atomic weights. */
public enum MolarMass {
    URIC_ACID("uric acid", 168.11),
    CREATININE("creatinine", 113.12),
    PHOSPHORUS("phosphorus", 30.974),
    CALCIUM("calcium", 40.078);

    private final String substance;
    private final double gramsPerMole;

    MolarMass(String substance, double gramsPerMole) {
        this.substance = substance;
        this.gramsPerMole = gramsPerMole;
    }

    public double gramsPerMole() {
        return gramsPerMole;
    }

    public String citation() {
        return "molar mass of " + substance + " " + Numbers.plain(gramsPerMole)
                + " g/mol (IUPAC standard atomic weights)";
    }
}
