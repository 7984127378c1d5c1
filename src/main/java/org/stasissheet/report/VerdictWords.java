package org.stasissheet.report;

import java.util.Optional;
import org.stasissheet.rules.HyperviscosityVerdict;
import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.rules.TumorLysisVerdict;

/**
 * The verdicts in words, the same on the PDF, in the handoff note and in the triage summary, e.g.
 * "leukostasis highly probable (score 3)".
 */
public final class VerdictWords {
    private VerdictWords() {
    }

    public static String hyperviscosity(HyperviscosityVerdict v) {
        return switch (v.assessment()) {
            case LIKELY -> "hyperviscosity syndrome likely";
            case POSSIBLE -> "hyperviscosity syndrome possible";
            case UNLIKELY -> "hyperviscosity syndrome unlikely";
            case NOT_ASSESSABLE -> "hyperviscosity not assessable";
        };
    }

    public static String leukostasis(LeukostasisVerdict v) {
        String score = v.score().map(s -> " (score " + s + ")").orElse("");
        return switch (v.probability()) {
            case NONE -> "no leukostasis" + score;
            case POSSIBLE -> "leukostasis possible" + score;
            case PROBABLE -> "leukostasis probable" + score;
            case HIGHLY_PROBABLE -> "leukostasis highly probable" + score;
            case NOT_ASSESSABLE -> "leukostasis not assessable";
        };
    }

    public static String tumorLysis(TumorLysisVerdict v) {
        return "tumor lysis (Cairo-Bishop): laboratory " + yesNo(v.laboratory()) + ", clinical "
                + yesNo(v.clinical());
    }

    static String yesNo(Optional<Boolean> b) {
        return b.map(v -> v ? "yes" : "no").orElse("undecided (too few values)");
    }

    /** Ranking key: 0 likely, 1 possible, 2 unlikely, 3 not assessable. */
    static int hyperviscosityRank(HyperviscosityVerdict v) {
        return switch (v.assessment()) {
            case LIKELY -> 0;
            case POSSIBLE -> 1;
            case UNLIKELY -> 2;
            case NOT_ASSESSABLE -> 3;
        };
    }
}
