package org.stasissheet.apheresis;

import java.util.Objects;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.measure.Estimate;

/**
 * What one plasma exchange of a given size would do (kinetics in {@link org.stasissheet.derived.ExchangeKinetics}),
 * at two moments: right after the procedure and after the extravascular paraprotein has flowed back.
 *
 * @param plasmaVolumes          V, how many estimated plasma volumes are exchanged (&gt; 0)
 * @param volumeL                V × the Kaplan plasma volume, litres
 * @param intravascularRemaining e^−V, fraction of an intravascular solute left (0–1)
 * @param paraproteinGPerL       the paraprotein projected at both moments, g/L
 * @param serumViscosity         the log-linear viscosity projection at both moments, on the lab's scale
 */
public record ExchangeRow(double plasmaVolumes, Estimate<Double> volumeL, double intravascularRemaining,
                          Estimate<ExchangeProjection> paraproteinGPerL, Estimate<ExchangeProjection> serumViscosity) {
    public ExchangeRow {
        if (!(plasmaVolumes > 0)) {
            throw new IllegalArgumentException("plasmaVolumes must be > 0, was " + plasmaVolumes);
        }
        if (!(intravascularRemaining >= 0 && intravascularRemaining <= 1)) {
            throw new IllegalArgumentException("intravascularRemaining must be 0–1, was " + intravascularRemaining);
        }
        Objects.requireNonNull(volumeL, "volumeL");
        Objects.requireNonNull(paraproteinGPerL, "paraproteinGPerL");
        Objects.requireNonNull(serumViscosity, "serumViscosity");
    }

    /** The paraprotein once the extravascular pool has flowed back (CASE-FORMAT's {@code paraproteinAfterGPerL}). */
    public Estimate<Double> paraproteinAfterGPerL() {
        return paraproteinGPerL.map(ExchangeProjection::afterRedistribution);
    }
}
