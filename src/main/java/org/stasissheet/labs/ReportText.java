package org.stasissheet.labs;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads lab report text as a clinician copies it from a result screen or a printed report: one result per line,
 * the name first, then the value, the unit, a flag (H, L, *, !) and a reference range, separated by spaces, tabs,
 * bars or semicolons, with a decimal point or a decimal comma. Every non-blank line comes back as taken, asked or
 * left, in order; blank and ruling lines are skipped.
 */
public final class ReportText {
    private ReportText() {
    }

    /** The first place a value starts: a digit (or a limit sign before one) after a separator. */
    private static final Pattern VALUE = Pattern.compile("(?:^|[\\s:=|;])([<>≤≥]?\\s?\\d)");
    private static final Pattern DECORATION = Pattern.compile("^[\\s\\-=_*#~.|+]*$");

    public static LabImport read(String text) {
        List<LabLine> lines = new ArrayList<>();
        String[] raw = text.split("\\R", -1);
        for (int i = 0; i < raw.length; i++) {
            String line = raw[i].replace('\u00a0', ' ').strip();
            if (line.isEmpty() || DECORATION.matcher(line).matches()) {
                continue;
            }
            lines.add(readLine("line " + (i + 1), line));
        }
        return new LabImport(LabImport.Source.PASTED_TEXT,
                ReferenceLimits.withCreatinineUpperLimit(Duplicates.askAll(lines)));
    }

    static LabLine readLine(String where, String line) {
        String cells = line.replace('|', ' ').replace(';', ' ').replace('\t', ' ');
        Matcher value = VALUE.matcher(cells);
        if (!value.find()) {
            Optional<String> named = Labels.analyteNamed(cells).map(a -> a.label());
            return new LabLine.Left(where, line, Optional.empty(), named
                    .map(n -> "names " + n + " but gives no number (pending, or a comment?)")
                    .orElse("no value on this line"));
        }
        String label = cells.substring(0, value.start(1)).strip();
        String rest = cells.substring(value.start(1));
        if (label.isEmpty()) {
            return new LabLine.Left(where, line, Optional.empty(), "no name before the value");
        }
        Labels.Naming naming = Labels.resolve(label);
        if (naming instanceof Labels.Refused r) {
            return new LabLine.Left(where, line, Optional.empty(), "'" + label + "': " + r.reason());
        }
        if (!(naming instanceof Labels.Names n)) {
            return new LabLine.Left(where, line, Optional.empty(),
                    "'" + label + "' is not a name this reader knows for a worksheet value");
        }
        return asLine(ValueText.read(n.analyte(), rest, where, line), n.analyte(), where, line);
    }

    static LabLine asLine(ValueReading reading, org.stasissheet.measure.Analyte analyte, String where, String line) {
        if (reading instanceof ValueReading.Understood u) {
            return u.reading();
        }
        if (reading instanceof ValueReading.Choice c) {
            return new LabLine.Asked(where, line, analyte, c.question(), c.options());
        }
        return new LabLine.Left(where, line, Optional.of(analyte), ((ValueReading.NotUnderstood) reading).reason());
    }
}
