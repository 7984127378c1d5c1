package org.stasissheet.report;

import java.util.List;
import java.util.Optional;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.UnitSymbols;
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
        sb.append("  ").append(VerdictWords.upperFirst(VerdictWords.hyperviscosity(hv))).append(NL);
        sb.append("    ").append(hv.reason()).append(NL);
        LeukostasisVerdict lk = sheet.leukostasis();
        sb.append("  ").append(VerdictWords.upperFirst(VerdictWords.leukostasis(lk))).append(NL);
        sb.append("    ").append(lk.reason()).append(NL);
        sb.append("    ! ").append(Cautions.GRADING_UNVERIFIED).append(NL);
        VerdictWords.pulmonarySuggestion(sheet).forEach(l -> sb.append("    ").append(l).append(NL));
        TumorLysisVerdict tl = sheet.tumorLysis();
        if (!tl.applies()) {
            sb.append("  Tumor lysis: ").append(TumorLysisVerdict.NOT_CHECKED).append('.').append(NL).append(NL);
            return;
        }
        sb.append("  Tumor lysis (Cairo-Bishop): laboratory ").append(VerdictWords.laboratory(tl))
                .append(", clinical ").append(VerdictWords.clinical(tl)).append(NL);
        sb.append("    ").append(tl.reason()).append(NL);
        for (TumorLysisVerdict.Criterion c : tl.criteria()) {
            sb.append("    - ").append(pad(c.analyte().label(), 11)).append(pad(VerdictWords.criterion(c), 17))
                    .append(c.value().map(WorksheetText::format).orElse("")).append(c.value().isPresent()
                            ? "  " + c.how() : "").append(NL);
        }
        sb.append("    ").append(tl.window()).append(NL);
        sb.append(NL);
    }

    /** Flags grouped by level, most urgent first; each group and line carries the level's word and symbol. */
    static void flags(StringBuilder sb, Worksheet sheet) {
        sb.append("FLAGS").append(NL);
        if (sheet.flags().isEmpty()) {
            sb.append("  (no flag raised; this rules nothing out)").append(NL);
        }
        for (Level level : Level.values()) {
            List<Flag> group = sheet.flags().stream().filter(f -> f.level() == level).toList();
            if (group.isEmpty()) {
                continue;
            }
            sb.append("  ").append(level.badge()).append(NL);
            for (Flag f : group) {
                sb.append("    ").append(level.symbol()).append(' ').append(f.title()).append(NL);
                sb.append("        ").append(f.explanation()).append(NL);
                sb.append("        source and basis: ").append(f.source()).append(" (").append(f.basis().words())
                        .append(")  rule ").append(f.id()).append(NL);
            }
        }
        sb.append(NL);
    }


    static void inputs(StringBuilder sb, Worksheet sheet) {
        sb.append("INPUTS (as entered -> in standard units)").append(NL);
        if (sheet.inputs().isEmpty()) {
            sb.append("  (no measured values)").append(NL);
        }
        for (InputLine line : sheet.inputs()) {
            sb.append("  ").append(pad(label(line), 32)).append(format(line.entered()));
            if (!line.entered().equals(line.canonical())) {
                sb.append("  ->  ").append(format(line.canonical()));
            }
            sb.append(NL);
        }
        sb.append(NL);
    }

    /** The input's name for people; a baseline value says so. */
    public static String label(InputLine line) {
        return line.path().startsWith("baseline.") ? line.label() + " (baseline)" : line.label();
    }

    /**
     * A value with its unit symbol, as the inputs tables print it. UCUM's dimensionless unit "1" (a hematocrit as a
     * fraction) is written in words: "0.22 1" reads like a second number.
     */
    public static String format(Quantity q) {
        String number = Numbers.rounded(q.value(), 4);
        return "1".equals(q.unit()) ? number + " (fraction)" : UnitSymbols.format(number, q.unit());
    }

    static String pad(String s, int width) {
        return s.length() >= width ? s + " " : s + " ".repeat(width - s.length());
    }
}
