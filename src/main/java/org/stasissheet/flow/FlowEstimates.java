package org.stasissheet.flow;

import java.util.List;
import java.util.Objects;
import org.stasissheet.measure.Estimate;

/**
 * Every flow figure of one worksheet. Relative flow is patient ÷ reference at the same pressure and geometry
 * (Poiseuille), apparent viscosity = plasma ratio × Pries 1992 in vitro relative viscosity (CASE-FORMAT).
 *
 * @param referenceHematocrit     the reference blood's hematocrit (rule set)
 * @param referenceSerumViscosity the reference serum viscosity (rule set), on the lab's scale
 * @param hematocrit              the patient's hematocrit used, or why there is no estimate at all
 * @param plasmaRatio             patient ÷ reference serum viscosity; 1 when not measured
 * @param plasmaRatioBasis        in words, where the plasma ratio came from
 * @param byDiameter              the in vitro series (the CASE-FORMAT {@code flow.byDiameter})
 * @param inVivo                  the same comparison by the Pries 1994 in vivo law
 * @param leukocrit               the separate, more cautious leukocrit estimate, or why none
 * @param whatIf                  scenarios (empty when there is no hematocrit)
 * @param caveats                 {@link FlowCaveats#ALL}
 */
public record FlowEstimates(double referenceHematocrit, double referenceSerumViscosity,
                            Estimate<Double> hematocrit, double plasmaRatio, String plasmaRatioBasis,
                            Estimate<List<FlowPoint>> byDiameter, Estimate<List<FlowPoint>> inVivo,
                            Estimate<Leukocrit> leukocrit, List<WhatIf> whatIf, List<String> caveats) {
    public FlowEstimates {
        Objects.requireNonNull(hematocrit, "hematocrit");
        Objects.requireNonNull(plasmaRatioBasis, "plasmaRatioBasis");
        Objects.requireNonNull(byDiameter, "byDiameter");
        Objects.requireNonNull(inVivo, "inVivo");
        Objects.requireNonNull(leukocrit, "leukocrit");
        if (!(plasmaRatio > 0) || !Double.isFinite(plasmaRatio)) {
            throw new IllegalArgumentException("plasmaRatio must be positive and finite, was " + plasmaRatio);
        }
        whatIf = List.copyOf(whatIf);
        caveats = List.copyOf(caveats);
    }
}
