package org.stasissheet.rules;

import static org.stasissheet.rules.RequiredParameters.*;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Cryoglobulin;
import org.stasissheet.intake.Findings;
import org.stasissheet.intake.Labs;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Measurement;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.HyperviscosityVerdict.Assessment;
import org.stasissheet.rules.HyperviscosityVerdict.Route;
import org.stasissheet.rules.HyperviscosityVerdict.ViscosityTrust;
import org.stasissheet.rules.LeukostasisVerdict.Gate;
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

    /**
     * The hyperviscosity verdict. Safety first: signs with a known paraprotein (or a cryoglobulin) make it at least
     * possible whatever the numbers say (Gertz 2018: treat on the clinical picture); the one exception is a trusted
     * serum viscosity within the normal range. A viscosity that may have lost a cryoprecipitate never lowers the
     * verdict. "Unlikely" is withheld while a sign that could change it is unexamined.
     */
    public static HyperviscosityVerdict hyperviscosity(Case c, RuleSet rules) {
        Findings f = c.findings();
        List<String> present = new ArrayList<>();
        List<String> unassessed = new ArrayList<>();
        sign(f.mucosalBleeding(), "findings.mucosalBleeding", "mucosal bleeding", present, unassessed);
        sign(f.visualDisturbance(), "findings.visualDisturbance", "visual disturbance", present, unassessed);
        if (f.retinopathy() == Retinopathy.NOT_EXAMINED) {
            unassessed.add("findings.retinopathy");
        } else if (f.retinopathy().compareTo(Retinopathy.VENOUS_DILATION) >= 0) {
            present.add(f.retinopathy().words());
        }
        if (f.neurologicalGrade().isEmpty()) {
            unassessed.add("findings.neurologicalGrade");
        } else if (f.neurologicalGrade().get() >= 1) {
            present.add("neurological grade " + f.neurologicalGrade().get());
        }
        sign(f.heartFailure(), "findings.heartFailure", "heart failure", present, unassessed);
        boolean signs = !present.isEmpty();
        String signText = signs ? "signs: " + String.join(", ", present) : "no sign of hyperviscosity recorded";

        Paraprotein type = c.condition().paraprotein();
        boolean cryoglobulin = c.condition().cryoglobulin() == Cryoglobulin.PRESENT;
        boolean known = type != Paraprotein.NONE || cryoglobulin;
        Optional<Measurement> sv = c.labs().get(Analyte.SERUM_VISCOSITY);
        Optional<Measurement> level = analyteOf(type).flatMap(c.labs()::get);
        ViscosityTrust trust = sv.map(m -> viscosityTrust(m, c.condition().cryoglobulin(), rules))
                .orElse(ViscosityTrust.NOT_MEASURED);
        String trustText = switch (trust) {
            case NOT_TRUSTED -> "; the viscosity is not trusted to lower the verdict: a cryoglobulin is "
                    + c.condition().cryoglobulin().code() + " and the sample was "
                    + sv.flatMap(Measurement::temperature).map(t -> "read at " + t)
                            .orElse("read at an unrecorded temperature")
                    + ", and a sample cooled below " + Numbers.plain(rules.value(SV_WARM_SAMPLE, "Cel"))
                    + " °C loses its cryoprecipitate and reads falsely low";
            case WARMTH_UNCONFIRMED -> "; confirm that the viscosity sample was kept at "
                    + Numbers.plain(rules.value(SV_WARM_SAMPLE, "Cel")) + " °C (cryoglobulin unknown)";
            default -> "";
        };

        // A trusted viscosity within the normal range settles it, signs or not.
        if (sv.isPresent() && trust != ViscosityTrust.NOT_TRUSTED
                && rules.threshold(SV_NORMAL_UPPER).test(sv.get(), Comparison.AT_MOST)) {
            String why = "serum viscosity " + sv.get().entered() + " is within the normal range (up to "
                    + rules.threshold(SV_NORMAL_UPPER).describe() + ")"
                    + (signs ? ", so hyperviscosity is unlikely and the " + signText + " need another explanation"
                    : "; " + signText) + trustText + ".";
            return new HyperviscosityVerdict(Assessment.UNLIKELY, Route.VISCOSITY, signs, unassessed, trust,
                    List.of(), why);
        }

        List<Candidate> candidates = new ArrayList<>();
        if (sv.isPresent()) {
            Measurement m = sv.get();
            Threshold high = rules.threshold(SV_SYMPTOMATIC);
            Threshold low = rules.threshold(SV_LOWER);
            Assessment a;
            String why;
            if (high.test(m, Comparison.AT_LEAST)) {
                a = signs ? Assessment.LIKELY : Assessment.POSSIBLE;
                why = "serum viscosity " + m.entered() + " ≥ " + high.describe();
            } else if (low.test(m, Comparison.AT_LEAST)) {
                a = signs ? Assessment.POSSIBLE : Assessment.UNLIKELY;
                why = "serum viscosity " + m.entered() + " between " + low.describe() + " and " + high.describe();
            } else {
                a = signs ? Assessment.POSSIBLE : Assessment.UNLIKELY;
                why = "serum viscosity " + m.entered() + " below " + low.describe()
                        + (signs ? ", where symptoms are uncommon but reported: the signs are not overruled; look"
                        + " for other causes too" : "");
            }
            if (trust != ViscosityTrust.NOT_TRUSTED || a != Assessment.UNLIKELY) {
                candidates.add(new Candidate(a, Route.VISCOSITY, why));
            }
        }
        if (level.isPresent()) {
            Measurement m = level.get();
            Threshold limit = rules.threshold(LEVEL_PREFIX + type.code());
            boolean above = limit.test(m, Comparison.AT_LEAST);
            Assessment a = above ? (signs ? Assessment.LIKELY : Assessment.POSSIBLE)
                    : (signs ? Assessment.POSSIBLE : Assessment.UNLIKELY);
            String why = type.code() + " " + m.entered() + (above ? " ≥ " : " below ") + limit.describe()
                    + (!above && signs ? ", but hyperviscosity is reported below the usual levels (IgG3 and"
                    + " polymerising IgA at lower levels than others): the signs decide" : "");
            candidates.add(new Candidate(a, Route.PARAPROTEIN, why));
        }
        if (known && signs) {
            candidates.add(new Candidate(Assessment.POSSIBLE, Route.CLINICAL_PICTURE, "known "
                    + (type != Paraprotein.NONE ? type.code() + " paraprotein" : "cryoglobulin")
                    + " with signs: treat on the clinical picture and measure (or repeat at 37 °C) the serum"
                    + " viscosity"));
        }

        // The most urgent route decides; on a tie a measured viscosity, then a paraprotein level, is named.
        Optional<Candidate> best = candidates.stream()
                .max(Comparator.comparingInt((Candidate k) -> k.assessment().alarm())
                        .thenComparing(k -> -k.route().ordinal()));
        String others = candidates.stream().filter(k -> best.map(b -> b != k).orElse(true))
                .map(Candidate::why).reduce((x, y) -> x + "; " + y).map(x -> "; also " + x).orElse("");
        if (best.isEmpty()) {
            String why = !known && sv.isEmpty()
                    ? "does not apply: no paraprotein, cryoglobulin or serum viscosity recorded"
                    : trust == ViscosityTrust.NOT_TRUSTED
                    ? "no trustworthy value: measure the " + (type == Paraprotein.NONE ? "paraprotein"
                    : type.code() + " level") + " and repeat the serum viscosity with the sample kept warm"
                    : "no serum viscosity and no " + (type == Paraprotein.NONE ? "paraprotein" : type.code())
                    + " level: measure both";
            return new HyperviscosityVerdict(Assessment.NOT_ASSESSABLE, !known && sv.isEmpty() ? Route.NONE
                    : Route.MISSING, signs, unassessed, trust, List.of(), why + "; " + signText + trustText + ".");
        }
        Candidate b = best.get();
        String why = b.why() + others + "; " + signText + trustText;
        String unexamined = String.join(", ", unassessed.stream().map(HyperviscosityVerdict::signName).toList());
        if (b.assessment() == Assessment.UNLIKELY && !unassessed.isEmpty()) {
            return new HyperviscosityVerdict(Assessment.NOT_ASSESSABLE, b.route(), signs, unassessed, trust,
                    unassessed, "not decided: the values alone would make it unlikely, but these were not examined"
                    + " and could change that: " + unexamined + ". " + upperFirst(why) + ".");
        }
        if (!unassessed.isEmpty()) {
            why += "; not examined: " + unexamined;
        }
        return new HyperviscosityVerdict(b.assessment(), b.route(), signs, unassessed, trust, List.of(), why + ".");
    }

    private static String upperFirst(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /** One way of reaching a hyperviscosity verdict, with its words. */
    private record Candidate(Assessment assessment, Route route, String why) {
    }

    /** Whether a serum viscosity may lower the verdict: see {@link ViscosityTrust}. */
    static ViscosityTrust viscosityTrust(Measurement sv, Cryoglobulin cryoglobulin, RuleSet rules) {
        if (cryoglobulin == Cryoglobulin.ABSENT) {
            return ViscosityTrust.TRUSTED;
        }
        double warm = rules.value(SV_WARM_SAMPLE, "Cel");
        Optional<Quantity> t = sv.temperature();
        if (t.isPresent()) {
            return Comparison.BELOW.test(t.get().value(), warm) ? ViscosityTrust.NOT_TRUSTED : ViscosityTrust.TRUSTED;
        }
        return cryoglobulin == Cryoglobulin.PRESENT ? ViscosityTrust.NOT_TRUSTED : ViscosityTrust.WARMTH_UNCONFIRMED;
    }

    private static void sign(Observation o, String path, String label, List<String> present, List<String> unassessed) {
        if (o == Observation.YES) {
            present.add(label);
        } else if (o == Observation.NOT_ASSESSED) {
            unassessed.add(path);
        }
    }

    // ---- leukostasis -------------------------------------------------------------------------------------------

    /**
     * The leukostasis grading, gated by leukemia type: acute leukemias (typed or not) and blasts with no diagnosis
     * recorded are graded from the general entry count; ALL, CML and CLL from their own, higher count, because
     * lymphoid and mature cells are smaller and more deformable (Lichtman & Rowe 1982). A score of 0 needs every
     * organ system examined.
     */
    public static LeukostasisVerdict leukostasis(Case c, RuleSet rules) {
        Optional<Measurement> wbc = c.labs().get(Analyte.WBC);
        Threshold entry = rules.threshold(LEUKOSTASIS_ASSESS_FROM);
        if (wbc.isEmpty()) {
            return notGraded(Gate.NO_COUNT, "no white cell count: the grading applies to hyperleukocytic leukemia"
                    + " (WBC ≥ " + entry.describe() + ").");
        }
        Measurement count = wbc.get();
        Leukemia type = c.condition().leukemia();
        if (!entry.test(count, Comparison.AT_LEAST)) {
            return notGraded(Gate.BELOW_ENTRY, "WBC " + count.entered() + " is below " + entry.describe()
                    + ": the grading was built for hyperleukocytic leukemia, and breathlessness or confusion at"
                    + " this count more likely has another cause.");
        }
        if (type == Leukemia.NONE && !blastsPresent(c)) {
            return notGraded(Gate.NEEDS_DIAGNOSIS, "WBC " + count.entered() + " ≥ " + entry.describe()
                    + " with no leukemia recorded and no blasts reported: leukostasis is not graded until a blood"
                    + " film and a diagnosis say what the cells are; grade it at once if blasts are seen.");
        }
        Optional<String> typeLevel = switch (type) {
            case ALL, CML, CLL -> Optional.of(LEUKOSTASIS_GRADE_FROM_PREFIX + type.code());
            default -> Optional.empty();
        };
        if (typeLevel.isPresent() && !rules.threshold(typeLevel.get()).test(count, Comparison.AT_LEAST)) {
            return notGraded(Gate.BELOW_TYPE_LEVEL, "WBC " + count.entered() + " is below "
                    + rules.threshold(typeLevel.get()).describe() + ", the count from which " + type.code()
                    + " cells are known to plug small vessels (they are smaller and more deformable than"
                    + " myeloblasts): organ signs are not put down to leukostasis; look for another cause"
                    + " (infection, bleeding, thrombosis) and grade again if the count rises.");
        }
        String from = typeLevel.map(id -> rules.threshold(id).describe()).orElse(entry.describe());
        Findings f = c.findings();
        Map<Organ, Optional<Integer>> grades = new LinkedHashMap<>();
        for (Organ o : Organ.values()) {
            grades.put(o, grade(f, o));
        }
        List<String> parts = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        List<String> missingPaths = new ArrayList<>();
        int max = -1;
        for (Map.Entry<Organ, Optional<Integer>> e : grades.entrySet()) {
            if (e.getValue().isPresent()) {
                max = Math.max(max, e.getValue().get());
                parts.add(e.getKey().label() + " " + e.getValue().get());
            } else {
                missing.add(e.getKey().label());
                missingPaths.add(e.getKey().path());
            }
        }
        String graded = "WBC " + count.entered() + " ≥ " + from + (blastsPresent(c) && type == Leukemia.NONE
                ? " with blasts and no leukemia recorded" : "") + "; ";
        if (max < 1 && !missing.isEmpty()) {
            return new LeukostasisVerdict(true, Gate.GRADED, Optional.empty(), Probability.NOT_ASSESSABLE,
                    missingPaths, graded + "not decided: " + (parts.isEmpty() ? "no organ system was graded"
                    : "no organ sign among those graded (" + String.join(", ", parts) + ")")
                    + ", but these were not examined: " + String.join(", ", missing) + ".");
        }
        String why = graded + "highest organ grade " + max + " (" + String.join(", ", parts) + ")"
                + (missing.isEmpty() ? "" : "; not examined, so the score can only rise: " + String.join(", ", missing))
                + "; combination rule from memory: " + LeukostasisVerdict.COMBINATION_RULE + ".";
        return new LeukostasisVerdict(true, Gate.GRADED, Optional.of(max), Probability.ofScore(max),
                max == 0 ? List.of() : missingPaths, why);
    }

    private static Optional<Integer> grade(Findings f, Organ organ) {
        return switch (organ) {
            case PULMONARY -> f.pulmonaryGrade();
            case NEUROLOGICAL -> f.neurologicalGrade();
            case OTHER -> f.otherOrganGrade();
        };
    }

    private static LeukostasisVerdict notGraded(Gate gate, String reason) {
        return new LeukostasisVerdict(false, gate, Optional.empty(), Probability.NOT_ASSESSABLE, List.of(), reason);
    }

    /** Circulating blasts reported above zero. */
    static boolean blastsPresent(Case c) {
        return c.labs().get(Analyte.BLASTS).map(b -> b.canonical() > 0).orElse(false);
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
        if (potassiumDoubted(c, rules)) {
            criteria = criteria.stream().map(k -> k.analyte() == Analyte.POTASSIUM && k.met()
                    ? new Criterion(k.analyte(), k.value(), true, k.how()
                    + " (met if confirmed: at this white count the potassium may leak from cells in the tube)",
                    true) : k).toList();
        }
        long present = criteria.stream().filter(k -> k.value().isPresent()).count();
        long met = criteria.stream().filter(Criterion::met).count();
        long confirmedMet = criteria.stream().filter(k -> k.met() && !k.unconfirmed()).count();

        Optional<Boolean> laboratory = present < 2 ? Optional.empty() : Optional.of(met >= 2);
        boolean dependsOnUnconfirmed = met >= 2 && confirmedMet < 2;
        Optional<Boolean> clinical = laboratory.map(lab -> lab && clinicalSign(c, rules));
        String phosphate = child ? "child phosphate limit (age below "
                + Numbers.plain(rules.value(TLS_CHILD_BELOW_AGE, "a")) + ")"
                : c.patient().ageYears().isPresent() ? "adult phosphate limit" : "adult phosphate limit (age unknown)";
        String reason = laboratory.isEmpty()
                ? (present == 0 ? "none of the four laboratory values (uric acid, potassium, phosphate, calcium) was"
                + " measured; at least two are needed to decide." : "only one of the four laboratory values was"
                + " measured; at least two are needed to decide.")
                : met + " of 4 criteria met (" + present + " present, " + phosphate + ")"
                        + (dependsOnUnconfirmed ? "; met only if the potassium is confirmed on a whole-blood sample"
                        : "")
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
        boolean applies = c.condition().leukemia() != Leukemia.NONE || start.isPresent() || present > 0;
        return new TumorLysisVerdict(applies, laboratory, clinical, criteria, confirmed, window, reason,
                dependsOnUnconfirmed);
    }

    /**
     * Whether a high potassium may be an artefact of fragile cells in the tube: CLL from its own count, any high
     * count from the general one (sources with the parameters in rules/artefacts.yaml).
     */
    public static boolean potassiumDoubted(Case c, RuleSet rules) {
        Optional<Measurement> wbc = c.labs().get(Analyte.WBC);
        if (wbc.isEmpty()) {
            return false;
        }
        boolean cll = c.condition().leukemia() == Leukemia.CLL
                && rules.threshold(PSEUDOHYPERKALAEMIA_WBC_CLL).test(wbc.get(), Comparison.AT_LEAST);
        return cll || rules.threshold(PSEUDOHYPERKALAEMIA_WBC_ANY).test(wbc.get(), Comparison.AT_LEAST);
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
        f.put(Fields.HYPERVISCOSITY_VISCOSITY, new Fact.Word(hv.viscosity().code()));
        f.put(Fields.HYPERVISCOSITY_TO_EXAMINE, new Fact.Bool(!hv.toExamine().isEmpty()));
        f.put(Fields.LEUKOSTASIS_ASSESSED, new Fact.Bool(lk.assessed()));
        f.put(Fields.LEUKOSTASIS_GATE, new Fact.Word(lk.gate().code()));
        f.put(Fields.LEUKOSTASIS_TO_EXAMINE, new Fact.Bool(!lk.toExamine().isEmpty()));
        f.put(Fields.ORGAN_SIGNS, new Fact.Bool(Arrays.stream(Organ.values())
                .anyMatch(o -> grade(fi, o).map(g -> g >= 1).orElse(false))));
        c.labs().get(Analyte.POTASSIUM).ifPresent(k ->
                f.put(Fields.POTASSIUM_DOUBTED, new Fact.Bool(potassiumDoubted(c, rules))));
        lk.score().ifPresent(s -> f.put(Fields.LEUKOSTASIS_SCORE, new Fact.Number(s)));
        f.put(Fields.LEUKOSTASIS_PROBABILITY, new Fact.Word(lk.probability().code()));
        hyperleukocytosis(c, rules).ifPresent(h -> f.put(Fields.HYPERLEUKOCYTOSIS, new Fact.Bool(h)));
        tl.laboratory().ifPresent(b -> f.put(Fields.TUMOR_LYSIS_LABORATORY, new Fact.Bool(b)));
        tl.clinical().ifPresent(b -> f.put(Fields.TUMOR_LYSIS_CLINICAL, new Fact.Bool(b)));
        f.put(Fields.TUMOR_LYSIS_WINDOW_CONFIRMED, new Fact.Bool(tl.windowConfirmed()));
        f.put(Fields.TUMOR_LYSIS_UNCONFIRMED, new Fact.Bool(tl.dependsOnUnconfirmed()));
        return new Facts(f);
    }
}
