package org.stasissheet.report;

import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.Provenance;
import org.stasissheet.worksheet.InputLine;
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
        // verdicts and flags grouped by level: rules work
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

    static String format(Quantity q) {
        return Numbers.rounded(q.value(), 4) + " " + q.unit();
    }

    static String pad(String s, int width) {
        return s.length() >= width ? s + " " : s + " ".repeat(width - s.length());
    }
}
