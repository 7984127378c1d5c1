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
            case NOT_ASSESSABLE -> v.toExamine().isEmpty() ? "hyperviscosity not assessable"
                    : "hyperviscosity undecided: examine the signs first";
        };
    }

    public static String leukostasis(LeukostasisVerdict v) {
        String score = v.score().map(s -> " (score " + s + ")").orElse("");
        return switch (v.probability()) {
            case NONE -> "no organ sign of leukostasis graded" + score;
            case POSSIBLE -> "leukostasis possible" + score;
            case PROBABLE -> "leukostasis probable" + score;
            case HIGHLY_PROBABLE -> "leukostasis highly probable" + score;
            case NOT_ASSESSABLE -> switch (v.gate()) {
                case BELOW_TYPE_LEVEL -> "leukostasis not graded: count below the level for this leukemia type";
                case NEEDS_DIAGNOSIS -> "leukostasis not graded until a blood film and diagnosis";
                case GRADED -> "leukostasis undecided: grade every organ system";
                default -> "leukostasis not assessable";
            };
        };
    }

    public static String tumorLysis(TumorLysisVerdict v) {
        return "tumor lysis (Cairo-Bishop): laboratory " + laboratory(v) + ", clinical " + clinical(v);
    }

    /** Laboratory tumor lysis in words; a result resting on an unconfirmed potassium says so. */
    public static String laboratory(TumorLysisVerdict v) {
        return yesNo(v.laboratory()) + (v.dependsOnUnconfirmed() ? ", if the potassium is confirmed" : "");
    }

    public static String clinical(TumorLysisVerdict v) {
        return yesNo(v.clinical()) + (v.dependsOnUnconfirmed() && v.clinical().orElse(false)
                ? ", if the potassium is confirmed" : "");
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
