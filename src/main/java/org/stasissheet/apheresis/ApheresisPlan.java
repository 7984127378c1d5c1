package org.stasissheet.apheresis;

import java.util.List;
import java.util.Objects;
import org.stasissheet.measure.Estimate;

/**
 * The apheresis planning numbers of one worksheet. Every estimate is either known or carries the reason it is
 * not; nothing is assumed for a missing input.
 *
 * @param bloodVolumeL                 Nadler total blood volume, litres
 * @param plasmaVolumeL                Kaplan estimated plasma volume, litres (the basis of the exchange volumes)
 * @param plasmaVolumeFromBloodVolumeL TBV × (1 − Hct), litres, shown beside Kaplan's
 * @param paraproteinGPerL             the case's paraprotein value from the lab matching its isotype, g/L
 * @param intravascularFraction        f of the case's isotype, from the rule set
 * @param exchanges                    rows for 1.0, 1.5 and 2.0 plasma volumes
 * @param notes                        sentences shown with the numbers (approximations they rest on)
 * @param missing                      what to enter for the numbers that are missing, said once
 */
public record ApheresisPlan(Estimate<Double> bloodVolumeL, Estimate<Double> plasmaVolumeL,
                            Estimate<Double> plasmaVolumeFromBloodVolumeL, Estimate<Double> paraproteinGPerL,
                            Estimate<Double> intravascularFraction, List<ExchangeRow> exchanges,
                            LeukapheresisPlan leukapheresis, List<String> notes,
                            MissingInputs missing) {
    public ApheresisPlan {
        Objects.requireNonNull(bloodVolumeL, "bloodVolumeL");
        Objects.requireNonNull(plasmaVolumeL, "plasmaVolumeL");
        Objects.requireNonNull(plasmaVolumeFromBloodVolumeL, "plasmaVolumeFromBloodVolumeL");
        Objects.requireNonNull(paraproteinGPerL, "paraproteinGPerL");
        Objects.requireNonNull(intravascularFraction, "intravascularFraction");
        Objects.requireNonNull(leukapheresis, "leukapheresis");
        exchanges = List.copyOf(exchanges);
        notes = List.copyOf(notes);
        Objects.requireNonNull(missing, "missing");
    }
}
