package org.stasissheet.labs;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;

/**
 * Cairo–Bishop's clinical tumor lysis criterion compares creatinine with the laboratory's own upper limit of
 * normal; a report usually prints it as the creatinine's reference range. When no separate upper-limit line
 * exists, that printed upper end becomes {@code creatinineUpperLimit}, marked as derived.
 */
final class ReferenceLimits {
    private ReferenceLimits() {
    }

    static List<LabLine> withCreatinineUpperLimit(List<LabLine> lines) {
        boolean hasLimit = lines.stream().anyMatch(l -> l instanceof LabLine.Taken t
                && t.analyte() == Analyte.CREATININE_UPPER_LIMIT
                || l instanceof LabLine.Asked a && a.analyte() == Analyte.CREATININE_UPPER_LIMIT);
        if (hasLimit) {
            return lines;
        }
        List<LabLine> out = new ArrayList<>();
        for (LabLine line : lines) {
            out.add(line);
            if (line instanceof LabLine.Taken t && t.analyte() == Analyte.CREATININE && !t.range().isEmpty()) {
                derived(t).ifPresent(out::add);
            }
        }
        return out;
    }

    private static Optional<LabLine.Taken> derived(LabLine.Taken creatinine) {
        Optional<BigDecimal> upper = ValueText.upperLimit(creatinine.range());
        if (upper.isEmpty()) {
            return Optional.empty();
        }
        String unit = creatinine.value().entered().unit();
        if (Analyte.CREATININE_UPPER_LIMIT.unitOption(unit).isEmpty()) {
            return Optional.empty();
        }
        // the range is printed in the unit of the value as printed; a converted value has lost that unit
        if (!creatinine.note().isEmpty()) {
            return Optional.empty();
        }
        Measurement limit = ValueText.measurement(Analyte.CREATININE_UPPER_LIMIT, upper.get(), unit);
        if (!Analyte.CREATININE_UPPER_LIMIT.isPlausible(limit.canonical())) {
            return Optional.empty();
        }
        return Optional.of(new LabLine.Taken(creatinine.where(), creatinine.text(), limit, "", creatinine.range(),
                "upper end of the reference range printed with creatinine", creatinine.time()));
    }
}
