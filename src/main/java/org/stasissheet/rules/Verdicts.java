package org.stasissheet.rules;

import static org.stasissheet.rules.RequiredParameters.*;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Findings;
import org.stasissheet.intake.Labs;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Measurement;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.HyperviscosityVerdict.Assessment;
import org.stasissheet.rules.HyperviscosityVerdict.Route;
import org.stasissheet.rules.LeukostasisVerdict.Organ;
import org.stasissheet.rules.LeukostasisVerdict.Probability;
import org.stasissheet.rules.Threshold.Comparison;
import org.stasissheet.rules.TumorLysisVerdict.Criterion;

/**
 * The three verdicts and the flags, computed from a case and a rule set. Pure: every threshold comes from the
 * rule set's parameters, whose sources are in the rule files.
 */
public final class Verdicts {
    private Verdicts() {
    }

    /** Everything the rules part of a worksheet holds. */
    public record Outcome(HyperviscosityVerdict hyperviscosity, LeukostasisVerdict leukostasis,
                          TumorLysisVerdict tumorLysis, List<Flag> flags) {
        public Outcome {
            java.util.Objects.requireNonNull(hyperviscosity, "hyperviscosity");
            java.util.Objects.requireNonNull(leukostasis, "leukostasis");
            java.util.Objects.requireNonNull(tumorLysis, "tumorLysis");
            flags = List.copyOf(flags);
        }
    }

    public static Outcome assess(Case c, RuleSet rules) {
        HyperviscosityVerdict hv = hyperviscosity(c, rules);
        LeukostasisVerdict lk = leukostasis(c, rules);
        TumorLysisVerdict tl = tumorLysis(c, rules);
        Facts facts = facts(c, rules, hv, lk, tl);
        return new Outcome(hv, lk, tl, flags(rules, facts));
    }

    /** The rules whose condition holds, as flags sorted by level (most urgent first) then id. */
    public static List<Flag> flags(RuleSet rules, Facts facts) {
        return rules.rules().stream().filter(r -> r.when().holds(facts)).map(Rule::flag)
                .sorted(Comparator.comparing(Flag::level).thenComparing(Flag::id)).toList();
    }

    // ---- hyperviscosity ----------------------------------------------------------------------------------------

    /** The analyte in which a paraprotein is measured; IgG3 is entered under igg (CASE-FORMAT). */
    static Optional<Analyte> analyteOf(Paraprotein p) {
        return switch (p) {
            case IGM -> Optional.of(Analyte.IGM);
            case IGG, IGG3 -> Optional.of(Analyte.IGG);
            case IGA -> Optional.of(Analyte.IGA);
            case NONE -> Optional.empty();
        };
    }

    public static HyperviscosityVerdict hyperviscosity(Case c, RuleSet rules) {
        Findings f = c.findings();
        List<String> present = new ArrayList<>();
        List<String> unassessed = new ArrayList<>();
        sign(f.mucosalBleeding(), "findings.mucosalBleeding", "mucosal bleeding", present, unassessed);
        sign(f.visualDisturbance(), "findings.visualDisturbance", "visual disturbance", present, unassessed);
        if (f.retinopathy() == Retinopathy.NOT_EXAMINED) {
            unassessed.add("findings.retinopathy");
        } else if (f.retinopathy().compareTo(Retinopathy.VENOUS_DILATION) >= 0) {
            present.add("retinopathy (" + f.retinopathy().code() + ")");
        }
        if (f.neurologicalGrade().isEmpty()) {
            unassessed.add("findings.neurologicalGrade");
        } else if (f.neurologicalGrade().get() >= 1) {
            present.add("neurological grade " + f.neurologicalGrade().get());
        }
        sign(f.heartFailure(), "findings.heartFailure", "heart failure", present, unassessed);
        boolean signs = !present.isEmpty();
        String signText = signs ? "signs: " + String.join(", ", present) : "no sign of hyperviscosity recorded";
        if (!unassessed.isEmpty()) {
            signText += "; not assessed, counted as absent: " + String.join(", ", unassessed);
        }

        Optional<Measurement> sv = c.labs().get(Analyte.SERUM_VISCOSITY);
        if (sv.isPresent()) {
            Measurement m = sv.get();
            Threshold high = rules.threshold(SV_SYMPTOMATIC);
            Threshold low = rules.threshold(SV_LOWER);
            boolean atHigh = high.test(m, Comparison.AT_LEAST);
            boolean atLow = low.test(m, Comparison.AT_LEAST);
            Assessment a;
            String why;
            if (atHigh) {
                a = signs ? Assessment.LIKELY : Assessment.POSSIBLE;
                why = "serum viscosity " + m.entered() + " ≥ " + high.describe();
            } else if (atLow && signs) {
                a = Assessment.POSSIBLE;
                why = "serum viscosity " + m.entered() + " between " + low.describe() + " and " + high.describe();
            } else {
                a = Assessment.UNLIKELY;
                why = "serum viscosity " + m.entered() + (atLow ? " below " + high.describe()
                        : " below " + low.describe());
            }
            return new HyperviscosityVerdict(a, Route.VISCOSITY, signs, unassessed, why + "; " + signText + ".");
        }

        Paraprotein type = c.condition().paraprotein();
        Optional<Measurement> level = analyteOf(type).flatMap(c.labs()::get);
        if (level.isPresent()) {
            Measurement m = level.get();
            Threshold limit = rules.threshold(LEVEL_PREFIX + type.code());
            boolean above = limit.test(m, Comparison.AT_LEAST);
            Assessment a = above ? (signs ? Assessment.LIKELY : Assessment.POSSIBLE) : Assessment.UNLIKELY;
            String why = "no serum viscosity; " + type.code() + " " + m.entered() + (above ? " ≥ " : " below ")
                    + limit.describe() + " (source: " + rules.parameter(LEVEL_PREFIX + type.code()).source() + ")";
            return new HyperviscosityVerdict(a, Route.PARAPROTEIN, signs, unassessed, why + "; " + signText + ".");
        }
        if (type != Paraprotein.NONE && signs) {
            return new HyperviscosityVerdict(Assessment.POSSIBLE, Route.CLINICAL_PICTURE, true, unassessed,
                    "known " + type.code() + " paraprotein with " + signText
                            + ", but neither a serum viscosity nor a paraprotein level: measure both now.");
        }
        String why = type == Paraprotein.NONE
                ? "no serum viscosity and no paraprotein recorded"
                : "no serum viscosity, no " + type.code() + " level and " + signText;
        return new HyperviscosityVerdict(Assessment.NOT_ASSESSABLE, Route.NONE, signs, unassessed, why + ".");
    }

    private static void sign(Observation o, String path, String label, List<String> present, List<String> unassessed) {
        if (o == Observation.YES) {
            present.add(label);
        } else if (o == Observation.NOT_ASSESSED) {
            unassessed.add(path);
        }
    }

    // ---- leukostasis -------------------------------------------------------------------------------------------

    public static LeukostasisVerdict leukostasis(Case c, RuleSet rules) {
        Optional<Measurement> wbc = c.labs().get(Analyte.WBC);
        Threshold from = rules.threshold(LEUKOSTASIS_ASSESS_FROM);
        if (wbc.isEmpty()) {
            return new LeukostasisVerdict(false, Optional.empty(), Probability.NOT_ASSESSABLE,
                    "no white cell count: the grading applies to hyperleukocytic leukemia (WBC ≥ "
                            + from.describe() + ").");
        }
        if (!from.test(wbc.get(), Comparison.AT_LEAST)) {
            return new LeukostasisVerdict(false, Optional.empty(), Probability.NOT_ASSESSABLE,
                    "WBC " + wbc.get().entered() + " is below " + from.describe()
                            + ": the grading was built for hyperleukocytic leukemia, and breathlessness or"
                            + " confusion at this count more likely has another cause.");
        }
        Findings f = c.findings();
        Map<Organ, Optional<Integer>> grades = new LinkedHashMap<>();
        grades.put(Organ.PULMONARY, f.pulmonaryGrade());
        grades.put(Organ.NEUROLOGICAL, f.neurologicalGrade());
        grades.put(Organ.OTHER, f.otherOrganGrade());
        List<String> parts = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        int max = -1;
        for (Map.Entry<Organ, Optional<Integer>> e : grades.entrySet()) {
            if (e.getValue().isPresent()) {
                max = Math.max(max, e.getValue().get());
                parts.add(e.getKey().label() + " " + e.getValue().get());
            } else {
                missing.add(e.getKey().label());
            }
        }
        if (max < 0) {
            return new LeukostasisVerdict(true, Optional.empty(), Probability.NOT_ASSESSABLE,
                    "WBC " + wbc.get().entered() + " ≥ " + from.describe() + " but no organ grade was assessed.");
        }
        String why = "highest organ grade " + max + " (" + String.join(", ", parts) + ")"
                + (missing.isEmpty() ? "" : "; not assessed: " + String.join(", ", missing))
                + "; combination rule from memory: " + LeukostasisVerdict.COMBINATION_RULE + ".";
        return new LeukostasisVerdict(true, Optional.of(max), Probability.ofScore(max), why);
    }

    /** WBC above the leukemia type's level; empty without a WBC or a leukemia type. */
    public static Optional<Boolean> hyperleukocytosis(Case c, RuleSet rules) {
        Leukemia type = c.condition().leukemia();
        Optional<Measurement> wbc = c.labs().get(Analyte.WBC);
        if (type == Leukemia.NONE) {
            return wbc.isPresent() ? Optional.of(false) : Optional.empty();
        }
        String key = type == Leukemia.AML && c.condition().monocytic() ? "AMLMonocytic" : type.code();
        Threshold level = rules.threshold(HYPERLEUKOCYTOSIS_PREFIX + key);
        // "WBC > 100 × 10^9/L" in the sources: the level itself is not yet hyperleukocytosis
        return wbc.map(m -> level.test(m, Comparison.ABOVE));
    }

    // ---- tumor lysis -------------------------------------------------------------------------------------------

    public static TumorLysisVerdict tumorLysis(Case c, RuleSet rules) {
        boolean child = c.patient().ageYears()
                .map(age -> age < rules.value(TLS_CHILD_BELOW_AGE, "a")).orElse(false);
        double change = rules.value(TLS_CHANGE, "1");
        List<Criterion> criteria = List.of(
                criterion(c, Analyte.URIC_ACID, rules.threshold(TLS_URIC_ACID), Comparison.AT_LEAST, change),
                criterion(c, Analyte.POTASSIUM, rules.threshold(TLS_POTASSIUM), Comparison.AT_LEAST, change),
                criterion(c, Analyte.PHOSPHATE,
                        rules.threshold(child ? TLS_PHOSPHATE_CHILD : TLS_PHOSPHATE_ADULT), Comparison.AT_LEAST, change),
                criterion(c, Analyte.CALCIUM, rules.threshold(TLS_CALCIUM), Comparison.AT_MOST, change));
        long present = criteria.stream().filter(k -> k.value().isPresent()).count();
        long met = criteria.stream().filter(Criterion::met).count();

        Optional<Boolean> laboratory = present < 2 ? Optional.empty() : Optional.of(met >= 2);
        Optional<Boolean> clinical = laboratory.map(lab -> lab && clinicalSign(c, rules));
        String phosphate = child ? "child phosphate limit (age below "
                + Numbers.plain(rules.value(TLS_CHILD_BELOW_AGE, "a")) + ")"
                : c.patient().ageYears().isPresent() ? "adult phosphate limit" : "adult phosphate limit (age unknown)";
        String reason = laboratory.isEmpty()
                ? "only " + present + " of the 4 laboratory values present; at least 2 are needed to decide."
                : met + " of 4 criteria met (" + present + " present, " + phosphate + ")"
                        + (present < 4 ? "; a missing value could still change this" : "") + ".";

        Optional<LocalDate> start = c.condition().therapyStarted();
        Optional<LocalDate> day = c.assessedAt().map(t -> t.toLocalDate());
        long before = Math.round(rules.value(TLS_WINDOW_BEFORE, "d"));
        long after = Math.round(rules.value(TLS_WINDOW_AFTER, "d"));
        boolean confirmed;
        String window;
        if (start.isEmpty()) {
            confirmed = false;
            window = "time window not confirmed: the start of therapy is not recorded (Cairo–Bishop counts values"
                    + " from " + before + " days before to " + after + " days after it).";
        } else if (day.isEmpty()) {
            confirmed = false;
            window = "time window not confirmed: the time of assessment is not recorded.";
        } else {
            long offset = ChronoUnit.DAYS.between(start.get(), day.get());
            confirmed = offset >= -before && offset <= after;
            window = confirmed
                    ? "within the window: day " + offset + " from the start of therapy (" + start.get() + ")."
                    : "time window not confirmed: day " + offset + " from the start of therapy (" + start.get()
                            + ") is outside " + before + " days before to " + after + " days after.";
        }
        return new TumorLysisVerdict(laboratory, clinical, criteria, confirmed, window, reason);
    }

    private static Criterion criterion(Case c, Analyte analyte, Threshold limit, Comparison op, double change) {
        Labs labs = c.labs();
        Optional<Measurement> value = labs.get(analyte);
        if (value.isEmpty()) {
            return new Criterion(analyte, Optional.empty(), false, "not measured");
        }
        Measurement m = value.get();
        if (limit.test(m, op)) {
            return new Criterion(analyte, Optional.of(m.entered()), true, op.symbol() + " " + limit.describe());
        }
        Optional<Measurement> base = c.baseline().get(analyte);
        if (base.isPresent()) {
            double factor = op == Comparison.AT_MOST ? 1 - change : 1 + change;
            double bound = base.get().canonical() * factor;
            if (op.test(m.canonical(), bound)) {
                String sign = op == Comparison.AT_MOST ? "-" : "+";
                return new Criterion(analyte, Optional.of(m.entered()), true,
                        sign + Numbers.plain(change * 100) + " % or more from baseline " + base.get().entered());
            }
        }
        return new Criterion(analyte, Optional.of(m.entered()), false,
                "not " + op.symbol() + " " + limit.describe() + (base.isPresent() ? ", nor " + Numbers.plain(change * 100) + " % change from baseline"
                        : ", no baseline"));
    }

    private static boolean clinicalSign(Case c, RuleSet rules) {
        if (c.findings().arrhythmia() == Observation.YES || c.findings().seizure() == Observation.YES) {
            return true;
        }
        double ratio = rules.value(TLS_CREATININE_RATIO, "1");
        return c.labs().get(Analyte.CREATININE).flatMap(cr -> c.labs().get(Analyte.CREATININE_UPPER_LIMIT)
                        .map(uln -> Comparison.AT_LEAST.test(cr.canonical(), ratio * uln.canonical())))
                .orElse(false);
    }

    // ---- facts for the rule conditions ---------------------------------------------------------------------

    public static Facts facts(Case c, RuleSet rules, HyperviscosityVerdict hv, LeukostasisVerdict lk,
                              TumorLysisVerdict tl) {
        Map<String, Fact> f = new LinkedHashMap<>();
        c.patient().sex().ifPresent(s -> f.put("patient.sex", new Fact.Word(s.code())));
        c.patient().ageYears().ifPresent(a -> f.put("patient.ageYears", new Fact.Number(a)));
        c.patient().height().ifPresent(m -> f.put("patient.height", new Fact.Amount(m)));
        c.patient().weight().ifPresent(m -> f.put("patient.weight", new Fact.Amount(m)));
        f.put("condition.paraprotein", new Fact.Word(c.condition().paraprotein().code()));
        f.put("condition.leukemia", new Fact.Word(c.condition().leukemia().code()));
        f.put("condition.monocytic", new Fact.Bool(c.condition().monocytic()));
        f.put("condition.cryoglobulin", new Fact.Word(c.condition().cryoglobulin().code()));
        c.condition().therapyStarted().ifPresent(d -> f.put("condition.therapyStarted", new Fact.Word(d.toString())));
        c.labs().values().forEach((a, m) -> f.put("labs." + a.key(), new Fact.Amount(m)));
        c.baseline().values().forEach((a, m) -> f.put("baseline." + a.key(), new Fact.Amount(m)));
        Findings fi = c.findings();
        fi.pulmonaryGrade().ifPresent(g -> f.put("findings.pulmonaryGrade", new Fact.Number(g)));
        fi.neurologicalGrade().ifPresent(g -> f.put("findings.neurologicalGrade", new Fact.Number(g)));
        fi.otherOrganGrade().ifPresent(g -> f.put("findings.otherOrganGrade", new Fact.Number(g)));
        f.put("findings.mucosalBleeding", new Fact.Word(fi.mucosalBleeding().code()));
        f.put("findings.visualDisturbance", new Fact.Word(fi.visualDisturbance().code()));
        f.put("findings.heartFailure", new Fact.Word(fi.heartFailure().code()));
        f.put("findings.arrhythmia", new Fact.Word(fi.arrhythmia().code()));
        f.put("findings.seizure", new Fact.Word(fi.seizure().code()));
        f.put("findings.retinopathy", new Fact.Word(fi.retinopathy().code()));
        f.put("plan.rituximabPlanned", new Fact.Bool(c.plan().rituximabPlanned()));
        f.put("plan.transfusionPlanned", new Fact.Bool(c.plan().transfusionPlanned()));
        f.put(Fields.HYPERVISCOSITY_ASSESSMENT, new Fact.Word(hv.assessment().code()));
        f.put(Fields.HYPERVISCOSITY_ROUTE, new Fact.Word(hv.route().code()));
        f.put(Fields.HYPERVISCOSITY_SIGNS, new Fact.Bool(hv.signs()));
        f.put(Fields.LEUKOSTASIS_ASSESSED, new Fact.Bool(lk.assessed()));
        lk.score().ifPresent(s -> f.put(Fields.LEUKOSTASIS_SCORE, new Fact.Number(s)));
        f.put(Fields.LEUKOSTASIS_PROBABILITY, new Fact.Word(lk.probability().code()));
        hyperleukocytosis(c, rules).ifPresent(h -> f.put(Fields.HYPERLEUKOCYTOSIS, new Fact.Bool(h)));
        tl.laboratory().ifPresent(b -> f.put(Fields.TUMOR_LYSIS_LABORATORY, new Fact.Bool(b)));
        tl.clinical().ifPresent(b -> f.put(Fields.TUMOR_LYSIS_CLINICAL, new Fact.Bool(b)));
        f.put(Fields.TUMOR_LYSIS_WINDOW_CONFIRMED, new Fact.Bool(tl.windowConfirmed()));
        return new Facts(f);
    }
}
