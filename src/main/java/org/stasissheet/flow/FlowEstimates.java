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

    /** What relative flow means, in the one wording every output uses. */
    public String meaning() {
        return "Relative flow = flow of the patient's blood ÷ flow of reference blood (hematocrit "
                + org.stasissheet.measure.Numbers.plain(referenceHematocrit) + ", serum viscosity "
                + org.stasissheet.measure.Numbers.plain(referenceSerumViscosity)
                + ") at the same pressure and vessel size; 1 means as in the reference blood.";
    }

    /**
     * When the patient's blood flows more easily than the reference somewhere, why, and what that does not mean: a
     * low hematocrit (anaemia) lowers the viscosity, but white-cell plugging and red-cell aggregation are not in the
     * model, so it never says the microcirculation is safe.
     */
    public java.util.Optional<String> aboveReference() {
        java.util.OptionalDouble max = byDiameter.known().stream().flatMap(List::stream)
                .mapToDouble(FlowPoint::relativeFlow).max();
        if (max.isEmpty() || max.getAsDouble() <= 1) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of("Flow reaches " + org.stasissheet.measure.Numbers.rounded(max.getAsDouble(), 2)
                + " × the reference because the hematocrit is below the reference (anaemia lowers the blood's"
                + " viscosity); this does not mean the small vessels are safe: white-cell plugging and red-cell"
                + " aggregation are not modelled.");
    }
}
