package org.stasissheet.apheresis;

import java.util.Objects;
import org.stasissheet.measure.Estimate;

/**
 * Planning numbers for one leukapheresis (common practice, DOMAIN.md §4).
 *
 * @param processVolumeL blood volume to process, litres (1.5–2 × total blood volume by default)
 * @param wbcAfter       expected white count after one procedure, 10*9/L (20–50 % lower by default)
 */
public record LeukapheresisPlan(Estimate<ValueRange> processVolumeL, Estimate<ValueRange> wbcAfter) {
    public LeukapheresisPlan {
        Objects.requireNonNull(processVolumeL, "processVolumeL");
        Objects.requireNonNull(wbcAfter, "wbcAfter");
    }
}
