package org.stasissheet.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.stasissheet.rules.Level;

/**
 * The {@code summary.csv} of a triage run: one row per referral, most urgent first, written as RFC 4180 CSV
 * (CRLF line ends, fields with a comma, quote or line break quoted, quotes doubled) and safe to open in a
 * spreadsheet (a cell starting with =, +, -, @, tab or CR gets a leading apostrophe so it is never a formula).
 */
public final class TriageSummary {
    public static final List<String> COLUMNS = List.of("file", "patient", "status", "highest_level",
            "hyperviscosity", "leukostasis", "tumor_lysis", "top_flag", "pdf", "message");

    /**
     * Most urgent first: by highest level (act now first); a file that could not be assessed comes right after
     * the act-now rows, because an unread referral may hide an emergency and needs a person; then by leukostasis
     * score (higher first), then hyperviscosity (likely first), then by file name so the order is stable. Entries
     * deliberately not read (folders, other files, duplicates) come last, each with its reason.
     */
    public static final Comparator<TriageRow> MOST_URGENT_FIRST = Comparator
            .comparingInt(TriageSummary::levelRank)
            .thenComparing(Comparator.comparingInt((TriageRow r) -> r.leukostasisScore().orElse(-1)).reversed())
            .thenComparingInt(TriageRow::hyperviscosityRank)
            .thenComparing(TriageRow::file);

    private TriageSummary() {
    }

    static int levelRank(TriageRow r) {
        if (r.status() == TriageRow.Status.SKIPPED) {
            return 5;
        }
        if (r.status() != TriageRow.Status.OK) {
            return 1;
        }
        return r.highestLevel().map(l -> switch (l) {
            case ACT_NOW -> 0;
            case REVIEW -> 2;
            case NOTE -> 3;
        }).orElse(4);
    }

    public static List<TriageRow> ranked(List<TriageRow> rows) {
        List<TriageRow> sorted = new ArrayList<>(rows);
        sorted.sort(MOST_URGENT_FIRST);
        return sorted;
    }

    public static String csv(List<TriageRow> rows) {
        StringBuilder sb = new StringBuilder();
        line(sb, COLUMNS);
        for (TriageRow r : ranked(rows)) {
            line(sb, List.of(r.file(), r.patient(), r.status().code(),
                    r.highestLevel().map(Level::word).orElse(r.status() == TriageRow.Status.OK ? "none" : "unknown"),
                    r.hyperviscosity(), r.leukostasis(), r.tumorLysis(), r.topFlag(), r.pdf(), r.message()));
        }
        return sb.toString();
    }

    private static void line(StringBuilder sb, List<String> cells) {
        Csv.line(sb, cells);
    }
}
