package org.stasissheet.flow;

import java.util.List;
import java.util.Objects;

/**
 * The leukocrit estimate: white cells added to the red cells as one cell fraction, an approximation (DOMAIN.md
 * §5: leukocytes are not in the Pries laws). The mean cell volume is known only as a range (DOMAIN.md §6), so the
 * leukocrit is a range too, never one falsely precise number. Its flow can only be at or below the plain estimate.
 *
 * @param cellType             the cell whose volume range was used, e.g. "AML blast"
 * @param volumeLowFl          low end of the mean cell volume, fL (source and basis in the rule set)
 * @param volumeHighFl         high end, fL (≥ low)
 * @param wbc                  the white count used, 10*9/L
 * @param leukocritLow         WBC × low volume × 10⁻⁶, a fraction
 * @param leukocritHigh        WBC × high volume × 10⁻⁶, a fraction
 * @param combinedFraction     hematocrit + the high leukocrit, the fraction fed to the law for {@code byDiameter} (&lt; 1)
 * @param byDiameter           relative flow at the high end of the range (the cautious end), never above the plain
 *                             estimate
 * @param byDiameterLowVolume  relative flow at the low end of the range, never above the plain estimate
 */
public record Leukocrit(String cellType, double volumeLowFl, double volumeHighFl, double wbc, double leukocritLow,
                        double leukocritHigh, double combinedFraction, List<FlowPoint> byDiameter,
                        List<FlowPoint> byDiameterLowVolume) {
    public Leukocrit {
        Objects.requireNonNull(cellType, "cellType");
        if (!(volumeLowFl > 0) || !(volumeHighFl >= volumeLowFl) || !(wbc >= 0) || !(leukocritLow >= 0)
                || !(leukocritHigh >= leukocritLow) || !(combinedFraction < 1)) {
            throw new IllegalArgumentException("leukocrit inputs out of range: volume " + volumeLowFl + "–"
                    + volumeHighFl + " fL, wbc " + wbc + ", leukocrit " + leukocritLow + "–" + leukocritHigh
                    + ", combined " + combinedFraction);
        }
        byDiameter = List.copyOf(byDiameter);
        byDiameterLowVolume = List.copyOf(byDiameterLowVolume);
    }
}
