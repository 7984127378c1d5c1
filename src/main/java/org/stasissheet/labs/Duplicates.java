package org.stasissheet.labs;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.measure.Analyte;

/**
 * Two values for one analyte. From pasted text both are offered and the clinician picks (a report pasted twice,
 * a repeat sample: only the clinician knows). From coded results the latest measurement is taken, as a result
 * system shows it; values without a time, or several at the same latest time, are asked.
 */
final class Duplicates {
    private Duplicates() {
    }

    static List<LabLine> askAll(List<LabLine> lines) {
        return resolve(lines, Map.of());
    }

    /** @param times when each taken line was measured, by its position in {@code lines} */
    static List<LabLine> latestOrAsk(List<LabLine> lines, Map<Integer, Instant> times) {
        return resolve(lines, times);
    }

    private static List<LabLine> resolve(List<LabLine> lines, Map<Integer, Instant> times) {
        Map<Analyte, List<Integer>> byAnalyte = new LinkedHashMap<>();
        for (int i = 0; i < lines.size(); i++) {
            final int index = i;
            analyteOf(lines.get(i)).ifPresent(a -> byAnalyte.computeIfAbsent(a, k -> new ArrayList<>()).add(index));
        }
        List<LabLine> out = new ArrayList<>(lines);
        byAnalyte.forEach((analyte, indexes) -> {
            if (indexes.size() < 2) {
                return;
            }
            List<Integer> candidates = indexes;
            if (!times.isEmpty()) {
                candidates = latest(indexes, lines, times);
                int keep = candidates.get(0);
                for (int i : indexes) {
                    if (!candidates.contains(i)) {
                        out.set(i, new LabLine.Left(lines.get(i).where(), lines.get(i).text(), Optional.empty(),
                                "an earlier " + analyte.label() + " result; the latest (" + lines.get(keep).where()
                                        + ") is taken"));
                    }
                }
                if (candidates.size() == 1) {
                    return;
                }
            }
            int first = candidates.get(0);
            if (candidates.stream().allMatch(i -> lines.get(i) instanceof LabLine.Taken t
                    && ((LabLine.Taken) lines.get(first)).value().canonical() == t.value().canonical())) {
                for (int i : candidates.subList(1, candidates.size())) {
                    out.set(i, new LabLine.Left(lines.get(i).where(), lines.get(i).text(), Optional.empty(),
                            "repeats the " + analyte.label() + " of " + lines.get(first).where()));
                }
                return;
            }
            List<LabLine.Option> options = new ArrayList<>();
            List<String> where = new ArrayList<>();
            for (int i : candidates) {
                where.add(lines.get(i).where());
                LabLine line = lines.get(i);
                if (line instanceof LabLine.Taken t) {
                    options.add(new LabLine.Option(t));
                } else if (line instanceof LabLine.Asked a) {
                    options.addAll(a.options());
                }
            }
            LabLine firstLine = lines.get(first);
            out.set(first, new LabLine.Asked(firstLine.where(), firstLine.text(), analyte,
                    "more than one " + analyte.label() + " (" + String.join(", ", where) + "): which one?", options));
            for (int i : candidates.subList(1, candidates.size())) {
                out.set(i, new LabLine.Left(lines.get(i).where(), lines.get(i).text(), Optional.empty(),
                        "another " + analyte.label() + ": asked at " + firstLine.where()));
            }
        });
        return out;
    }

    /** The positions measured at the latest time; all of them when any has no time. */
    private static List<Integer> latest(List<Integer> indexes, List<LabLine> lines, Map<Integer, Instant> times) {
        if (indexes.stream().anyMatch(i -> !times.containsKey(i) || !(lines.get(i) instanceof LabLine.Taken))) {
            return indexes;
        }
        Instant max = indexes.stream().map(times::get).max(Instant::compareTo).orElseThrow();
        return indexes.stream().filter(i -> times.get(i).equals(max)).toList();
    }

    private static Optional<Analyte> analyteOf(LabLine line) {
        if (line instanceof LabLine.Taken t) {
            return Optional.of(t.analyte());
        }
        if (line instanceof LabLine.Asked a) {
            return Optional.of(a.analyte());
        }
        return Optional.empty();
    }
}
