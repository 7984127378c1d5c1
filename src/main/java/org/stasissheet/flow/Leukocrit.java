package org.stasissheet.flow;

import java.util.List;
import java.util.Objects;

/**
 * The leukocrit estimate: white cells added to the red cells as one cell fraction, an approximation (DOMAIN.md
 * §5: leukocytes are not in the Pries laws). Its flow can only be at or below the plain estimate.
 *
 * @param cellType         the cell whose mean volume was used, e.g. "myeloblast"
 * @param meanCellVolumeFl that volume, fL (from memory; see the rule set)
 * @param wbc              the white count used, 10*9/L
 * @param leukocrit        WBC × volume × 10⁻⁶, a fraction
 * @param combinedFraction hematocrit + leukocrit, the fraction fed to the law (&lt; 1)
 * @param byDiameter       relative flow at each series diameter, never above the plain estimate
 */
public record Leukocrit(String cellType, double meanCellVolumeFl, double wbc, double leukocrit,
                        double combinedFraction, List<FlowPoint> byDiameter) {
    public Leukocrit {
        Objects.requireNonNull(cellType, "cellType");
        if (!(meanCellVolumeFl > 0) || !(wbc >= 0) || !(leukocrit >= 0) || !(combinedFraction < 1)) {
            throw new IllegalArgumentException("leukocrit inputs out of range: volume " + meanCellVolumeFl
                    + " fL, wbc " + wbc + ", leukocrit " + leukocrit + ", combined " + combinedFraction);
        }
        byDiameter = List.copyOf(byDiameter);
    }
}
