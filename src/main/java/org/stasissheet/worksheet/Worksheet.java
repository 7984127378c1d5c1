package org.stasissheet.worksheet;

import java.util.List;
import java.util.Comparator;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.apheresis.ApheresisPlan;
import org.stasissheet.flow.FlowEstimates;
import org.stasissheet.intake.Case;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.HyperviscosityVerdict;
import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.Provenance;
import org.stasissheet.rules.PulmonarySuggestion;
import org.stasissheet.rules.TumorLysisVerdict;

/**
 * Everything one assessment concluded, ready for any renderer: immutable and complete. Renderers present it
 * and never recompute.
 *
 * @param flags               every rule that fired, most urgent level first, then by id
 * @param pulmonarySuggestion the pulmonary grade the oxygen values suggest, offered and never applied
 */
public record Worksheet(Case source, Provenance ruleSet, List<InputLine> inputs, List<String> cautions,
                        FlowEstimates flow, ApheresisPlan apheresis,
                        HyperviscosityVerdict hyperviscosity, LeukostasisVerdict leukostasis,
                        TumorLysisVerdict tumorLysis, List<Flag> flags,
                        PulmonarySuggestion pulmonarySuggestion) {
    public static final String FORMAT = "stasis-worksheet/1";

    public Worksheet {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(ruleSet, "ruleSet");
        Objects.requireNonNull(flow, "flow");
        Objects.requireNonNull(apheresis, "apheresis");
        inputs = List.copyOf(inputs);
        cautions = List.copyOf(cautions);
        Objects.requireNonNull(hyperviscosity, "hyperviscosity");
        Objects.requireNonNull(leukostasis, "leukostasis");
        Objects.requireNonNull(tumorLysis, "tumorLysis");
        flags = List.copyOf(flags);
        Objects.requireNonNull(pulmonarySuggestion, "pulmonarySuggestion");
    }

    /** The most urgent level among the flags; empty when nothing was flagged. */
    public Optional<Level> highestLevel() {
        return flags.stream().map(Flag::level).min(Comparator.naturalOrder());
    }
}
