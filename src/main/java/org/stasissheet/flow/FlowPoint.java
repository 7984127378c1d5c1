package org.stasissheet.flow;

/**
 * Flow through a vessel of one diameter, patient ÷ reference at the same pressure and geometry.
 *
 * @param diameterUm   vessel diameter, µm, 4–1000
 * @param relativeFlow positive and finite; 1 means as in the reference blood, 0.5 half of it
 */
public record FlowPoint(double diameterUm, double relativeFlow) {
    public FlowPoint {
        if (!(diameterUm >= PriesViscosity.MIN_DIAMETER_UM && diameterUm <= PriesViscosity.MAX_DIAMETER_UM)) {
            throw new IllegalArgumentException("diameterUm must be 4–1000, was " + diameterUm);
        }
        if (!(relativeFlow > 0) || !Double.isFinite(relativeFlow)) {
            throw new IllegalArgumentException("relativeFlow must be positive and finite, was " + relativeFlow);
        }
    }
}
