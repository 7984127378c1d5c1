package org.stasissheet.labs;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.measure.Analyte;

/**
 * Coded results (FHIR, HL7 v2) to lines of an import. The analyte comes from the LOINC code when there is one,
 * and only then from the local name: a LOINC code the catalogue does not list is never matched by its name
 * (ionised calcium has its own code and is called "Calcium" on many screens).
 */
public final class CodedResults {
    private CodedResults() {
    }

    public static LabImport read(LabImport.Source source, List<CodedResult> results) {
        List<LabLine> lines = new ArrayList<>();
        Map<Integer, Instant> times = new HashMap<>();
        for (CodedResult r : results) {
            LabLine line = line(r);
            if (line instanceof LabLine.Taken && r.measuredAt().isPresent()) {
                times.put(lines.size(), r.measuredAt().get());
            }
            lines.add(line);
        }
        return new LabImport(source, ReferenceLimits.withCreatinineUpperLimit(Duplicates.latestOrAsk(lines, times)));
    }

    private static LabLine line(CodedResult r) {
        if (!r.refused().isEmpty()) {
            return new LabLine.Left(r.where(), r.text(), Optional.empty(), r.refused());
        }
        Optional<Analyte> analyte;
        if (r.loinc().isPresent()) {
            analyte = Analyte.byLoinc(r.loinc().get());
            if (analyte.isEmpty()) {
                return new LabLine.Left(r.where(), r.text(), Optional.empty(), "LOINC " + r.loinc().get()
                        + " is not one of the worksheet's codes (see the LOINC list in README)");
            }
        } else {
            Labels.Naming naming = Labels.resolve(r.label());
            if (naming instanceof Labels.Refused refused) {
                return new LabLine.Left(r.where(), r.text(), Optional.empty(), "'" + r.label() + "': "
                        + refused.reason());
            }
            if (!(naming instanceof Labels.Names n)) {
                return new LabLine.Left(r.where(), r.text(), Optional.empty(), "no LOINC code, and '" + r.label()
                        + "' is not a name this reader knows for a worksheet value");
            }
            analyte = Optional.of(n.analyte());
        }
        Analyte a = analyte.get();
        if (!r.comparator().isEmpty()) {
            return new LabLine.Left(r.where(), r.text(), Optional.of(a), "'" + r.comparator() + "' makes the "
                    + a.label() + " a limit, not a measured value; enter a value by hand if appropriate");
        }
        if (r.value().isEmpty()) {
            return new LabLine.Left(r.where(), r.text(), Optional.empty(), "no numeric value for " + a.label());
        }
        LabLine line = ReportText.asLine(ValueText.readCoded(a, r.value().get(), r.unitCode(), r.unitText(),
                r.flag(), r.range(), r.where(), r.text()), a, r.where(), r.text());
        if (line instanceof LabLine.Taken t) {
            return new LabLine.Taken(t.where(), t.text(), t.value(), t.flag(), t.range(), t.note(), r.time());
        }
        if (line instanceof LabLine.Asked q) {
            List<LabLine.Option> timed = q.options().stream().map(o -> new LabLine.Option(new LabLine.Taken(
                    o.reading().where(), o.reading().text(), o.reading().value(), o.reading().flag(),
                    o.reading().range(), o.reading().note(), r.time()))).toList();
            return new LabLine.Asked(q.where(), q.text(), q.analyte(), q.question(), timed);
        }
        return line;
    }
}
