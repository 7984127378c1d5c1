package org.stasissheet.worksheet;

import java.util.ArrayList;
import java.util.List;
import org.stasissheet.apheresis.ApheresisPlan;
import org.stasissheet.apheresis.ApheresisPlanner;
import org.stasissheet.flow.FlowEstimator;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Measurement;
import org.stasissheet.rules.PulmonarySuggestion;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.rules.Verdicts;

/** The one entry point of the core: a case and a rule set in, a worksheet out. Pure and deterministic. */
public final class Assessor {
    private Assessor() {
    }

    public static Worksheet assess(Case c, RuleSet rules) {
        ApheresisPlan apheresis = ApheresisPlanner.plan(c, rules);
        Verdicts.Outcome outcome = Verdicts.assess(c, rules);
        return new Worksheet(c, rules.provenance(), inputs(c), Cautions.STANDING,
                FlowEstimator.estimate(c, rules), apheresis, outcome.hyperviscosity(),
                outcome.leukostasis(), outcome.tumorLysis(), outcome.flags(),
                PulmonarySuggestion.of(c, rules));
    }

    static List<InputLine> inputs(Case c) {
        List<InputLine> lines = new ArrayList<>();
        c.patient().height().ifPresent(m -> lines.add(line("patient.", m)));
        c.patient().weight().ifPresent(m -> lines.add(line("patient.", m)));
        c.labs().values().values().forEach(m -> lines.add(line("labs.", m)));
        c.baseline().values().values().forEach(m -> lines.add(line("baseline.", m)));
        return lines;
    }

    private static InputLine line(String prefix, Measurement m) {
        return new InputLine(prefix + m.analyte().key(), m.analyte().label(), m.entered(), m.canonicalQuantity());
    }
}
