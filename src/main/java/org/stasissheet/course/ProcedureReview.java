package org.stasissheet.course;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One procedure in the course report. For an exchange or a leukapheresis, {@code checks} holds one entry per analyte
 * measured before it (paraprotein and serum viscosity, or the white count); other procedures have none.
 *
 * @param plasmaVolumes the plasma volumes exchanged, given or worked out from the volume removed, or why not known
 * @param notes         plain sentences for the reader (why a projection is missing, what else acted on the values)
 */
public record ProcedureReview(Procedure procedure, Optional<Double> plasmaVolumes, List<AnalyteCheck> checks,
                             List<String> notes) {
    public ProcedureReview {
        Objects.requireNonNull(procedure, "procedure");
        Objects.requireNonNull(plasmaVolumes, "plasmaVolumes");
        checks = List.copyOf(checks);
        notes = List.copyOf(notes);
    }

    public boolean needsReview() {
        return checks.stream().anyMatch(c -> c.next().map(AnalyteCheck.Comparison::review).orElse(false));
    }
}
