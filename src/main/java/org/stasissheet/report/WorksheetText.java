package org.stasissheet.report;

import java.util.List;
import java.util.Optional;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.HyperviscosityVerdict;
import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.TumorLysisVerdict;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.Provenance;
import org.stasissheet.worksheet.InputLine;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.Worksheet;

/** Renders a worksheet as plain text for the terminal: the same content as the JSON, for people. */
public final class WorksheetText {
    private static final String NL = System.lineSeparator();

    private WorksheetText() {
    }

    public static String render(Worksheet sheet) {
        StringBuilder sb = new StringBuilder();
        sb.append("STASIS SHEET WORKSHEET").append(NL);
        sheet.cautions().forEach(c -> sb.append("  * ").append(c).append(NL));
        sb.append(NL);
        ruleSet(sb, sheet.ruleSet());
        verdicts(sb, sheet);
        flags(sb, sheet);
        inputs(sb, sheet);
        EstimatesText.apheresis(sb, sheet.apheresis());
        EstimatesText.flow(sb, sheet.flow());
        return sb.toString();
    }

    static void ruleSet(StringBuilder sb, Provenance p) {
        sb.append("Rule set: ").append(p.name()).append(' ').append(p.version())
                .append(" (sha256 ").append(p.shortHash()).append("…)").append(NL);
        if (p.local()) {
            sb.append("  LOCAL PROTOCOL: this rule set differs from the shipped one.").append(NL);
        }
        sb.append(NL);
    }

    static void verdicts(StringBuilder sb, Worksheet sheet) {
        sb.append("VERDICTS").append(NL);
        HyperviscosityVerdict hv = sheet.hyperviscosity();
        sb.append("  Hyperviscosity: ").append(hv.assessment().code()).append(NL);
        sb.append("    ").append(hv.reason()).append(NL);
        LeukostasisVerdict lk = sheet.leukostasis();
        sb.append("  Leukostasis: ").append(lk.probability().code())
                .append(lk.score().map(s -> " (score " + s + " of 3)").orElse("")).append(NL);
        sb.append("    ").append(lk.reason()).append(NL);
        sb.append("    ! ").append(Cautions.GRADING_UNVERIFIED).append(NL);
        TumorLysisVerdict tl = sheet.tumorLysis();
        sb.append("  Tumor lysis (Cairo-Bishop): laboratory ").append(yesNo(tl.laboratory()))
                .append(", clinical ").append(yesNo(tl.clinical())).append(NL);
        sb.append("    ").append(tl.reason()).append(NL);
        for (TumorLysisVerdict.Criterion c : tl.criteria()) {
            sb.append("    - ").append(pad(c.analyte().label(), 11)).append(c.met() ? "met      " : "not met  ")
                    .append(c.value().map(WorksheetText::format).orElse("-")).append("  ").append(c.how()).append(NL);
        }
        sb.append("    ").append(tl.window()).append(NL);
        sb.append(NL);
    }

    /** Flags grouped by level, most urgent first; each group and line carries the level's word and symbol. */
    static void flags(StringBuilder sb, Worksheet sheet) {
        sb.append("FLAGS").append(NL);
        if (sheet.flags().isEmpty()) {
            sb.append("  (no rule fired; this does not rule anything out)").append(NL);
        }
        for (Level level : Level.values()) {
            List<Flag> group = sheet.flags().stream().filter(f -> f.level() == level).toList();
            if (group.isEmpty()) {
                continue;
            }
            sb.append("  ").append(level.badge()).append(NL);
            for (Flag f : group) {
                sb.append("    [").append(level.symbol()).append("] ").append(f.title()).append(NL);
                sb.append("        ").append(f.explanation()).append(NL);
                sb.append("        source: ").append(f.source()).append(" (").append(f.basis().code()).append(")")
                        .append("  id: ").append(f.id()).append(NL);
            }
        }
        sb.append(NL);
    }

    private static String yesNo(Optional<Boolean> b) {
        return b.map(v -> v ? "yes" : "no").orElse("undecided (too few values)");
    }

    static void inputs(StringBuilder sb, Worksheet sheet) {
        sb.append("INPUTS (as entered -> canonical)").append(NL);
        if (sheet.inputs().isEmpty()) {
            sb.append("  (no measured values)").append(NL);
        }
        for (InputLine line : sheet.inputs()) {
            sb.append("  ").append(pad(line.path(), 28)).append(format(line.entered()));
            if (!line.entered().equals(line.canonical())) {
                sb.append("  ->  ").append(format(line.canonical()));
            }
            sb.append(NL);
        }
        sb.append(NL);
    }

    /**
     * A value with its UCUM unit code, as the inputs tables print it. UCUM's dimensionless unit "1" (a hematocrit
     * as a fraction) is written in words: "0.22 1" reads like a second number.
     */
    static String format(Quantity q) {
        return Numbers.rounded(q.value(), 4) + ("1".equals(q.unit()) ? " (fraction)" : " " + q.unit());
    }

    static String pad(String s, int width) {
        return s.length() >= width ? s + " " : s + " ".repeat(width - s.length());
    }
}
