package org.stasissheet.apheresis;

import java.util.Objects;
import org.stasissheet.measure.Estimate;

/**
 * What one plasma exchange of a given size would do, by the one-compartment model of {@link ExchangeKinetics}.
 *
 * @param plasmaVolumes          V, how many estimated plasma volumes are exchanged (&gt; 0)
 * @param volumeL                V × the Kaplan plasma volume, litres
 * @param intravascularRemaining e^−V, fraction of an intravascular solute left (0–1)
 * @param paraproteinAfterGPerL  paraprotein × (1 − f·(1 − e^−V)), g/L
 * @param serumViscosityAfter    the log-linear projection, on the lab's scale (an approximation)
 */
public record ExchangeRow(double plasmaVolumes, Estimate<Double> volumeL, double intravascularRemaining,
                          Estimate<Double> paraproteinAfterGPerL, Estimate<Double> serumViscosityAfter) {
    public ExchangeRow {
        if (!(plasmaVolumes > 0)) {
            throw new IllegalArgumentException("plasmaVolumes must be > 0, was " + plasmaVolumes);
        }
        if (!(intravascularRemaining >= 0 && intravascularRemaining <= 1)) {
            throw new IllegalArgumentException("intravascularRemaining must be 0–1, was " + intravascularRemaining);
        }
        Objects.requireNonNull(volumeL, "volumeL");
        Objects.requireNonNull(paraproteinAfterGPerL, "paraproteinAfterGPerL");
        Objects.requireNonNull(serumViscosityAfter, "serumViscosityAfter");
    }
}
