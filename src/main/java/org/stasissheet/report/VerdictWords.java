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

    /**
     * Three kinds of answer, never confused: the question does not apply (with the reason), it cannot be decided yet
     * (naming what is missing), or the verdict itself.
     */
    public static String hyperviscosity(HyperviscosityVerdict v) {
        return switch (v.assessment()) {
            case LIKELY -> "hyperviscosity syndrome likely";
            case POSSIBLE -> "hyperviscosity syndrome possible";
            case UNLIKELY -> "hyperviscosity syndrome unlikely";
            case NOT_ASSESSABLE -> !v.applies() ? "hyperviscosity: does not apply (no paraprotein recorded)"
                    : !v.toExamine().isEmpty() ? "hyperviscosity: cannot be decided until the signs are examined"
                    : "hyperviscosity: cannot be decided (no usable viscosity or paraprotein level)";
        };
    }

    public static String leukostasis(LeukostasisVerdict v) {
        String score = v.score().map(s -> " (score " + s + ")").orElse("");
        return switch (v.probability()) {
            case NONE -> "leukostasis: no organ sign graded" + score + "; re-examine";
            case POSSIBLE -> "leukostasis possible" + score;
            case PROBABLE -> "leukostasis probable" + score;
            case HIGHLY_PROBABLE -> "leukostasis highly probable" + score;
            case NOT_ASSESSABLE -> switch (v.gate()) {
                case NO_COUNT -> "leukostasis: cannot be decided (no white cell count)";
                case BELOW_ENTRY -> "leukostasis: does not apply at this white count";
                case BELOW_TYPE_LEVEL -> "leukostasis: does not apply at this count for this leukemia type";
                case NEEDS_DIAGNOSIS -> "leukostasis: cannot be decided until a blood film and a diagnosis";
                case GRADED -> "leukostasis: cannot be decided until every organ system is graded";
            };
        };
    }

    public static String tumorLysis(TumorLysisVerdict v) {
        return !v.applies() ? "tumor lysis " + TumorLysisVerdict.NOT_CHECKED
                : "tumor lysis (Cairo-Bishop): laboratory " + laboratory(v) + ", clinical " + clinical(v);
    }

    /** Laboratory tumor lysis in words; a result resting on an unconfirmed potassium says so. */
    public static String laboratory(TumorLysisVerdict v) {
        return yesNo(v.laboratory()) + (v.dependsOnUnconfirmed() ? ", if the potassium is confirmed" : "");
    }

    public static String clinical(TumorLysisVerdict v) {
        return yesNo(v.clinical()) + (v.dependsOnUnconfirmed() && v.clinical().orElse(false)
                ? ", if the potassium is confirmed" : "");
    }

    /**
     * The oxygen lines beside the leukostasis verdict: the suggested pulmonary grade (marked as a suggestion, never
     * applied), the oxygen need, the artefact cautions and the basis. Empty when the grading does not apply and no
     * oxygen value was entered, so that a paraprotein case is not cluttered.
     */
    public static java.util.List<String> pulmonarySuggestion(org.stasissheet.worksheet.Worksheet sheet) {
        org.stasissheet.rules.PulmonarySuggestion s = sheet.pulmonarySuggestion();
        boolean values = sheet.source().labs().get(org.stasissheet.measure.Analyte.SPO2).isPresent()
                || sheet.source().labs().get(org.stasissheet.measure.Analyte.PAO2).isPresent();
        if (!values && sheet.leukostasis().gate() != LeukostasisVerdict.Gate.GRADED) {
            return java.util.List.of();
        }
        java.util.List<String> lines = new java.util.ArrayList<>();
        s.headline().ifPresent(h -> lines.add("SUGGESTION, NOT APPLIED: " + h + ". The pulmonary grade set is "
                + s.gradeSet().map(String::valueOf).orElse("not assessed") + "."));
        if (!s.offered() && s.calledFor().isPresent()) {
            lines.add("The pulmonary grade set (" + s.gradeSet().orElseThrow() + ") already covers the oxygen need.");
        }
        lines.add(s.oxygenNeed());
        s.cautions().forEach(c -> lines.add("Caution: " + c));
        lines.add("Basis: " + s.basis());
        return lines;
    }

    /** An estimate's reason, said once: one that already says "not estimated" is not prefixed again. */
    public static String notEstimated(String why) {
        return why.contains("not estimated") ? why : "not estimated: " + why;
    }

    public static String upperFirst(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    static String yesNo(Optional<Boolean> b) {
        return b.map(v -> v ? "yes" : "no").orElse("cannot be decided (too few values)");
    }

    /** One criterion: "met", "not met", or "not measured", which is not the same as "not met". */
    public static String criterion(TumorLysisVerdict.Criterion c) {
        return c.value().isEmpty() ? "not measured" : c.met() ? (c.unconfirmed() ? "met if confirmed" : "met")
                : "not met";
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
