package org.stasissheet.rules;

import static org.stasissheet.rules.RequiredParameters.SPURIOUS_HYPOXAEMIA_WBC;
import static org.stasissheet.rules.RequiredParameters.SUGGEST_PAO2_FAILURE;
import static org.stasissheet.rules.RequiredParameters.SUGGEST_SPO2_TARGET_LOW;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;
import org.stasissheet.rules.LeukostasisVerdict.Organ;
import org.stasissheet.rules.Threshold.Comparison;

/**
 * A pulmonary leukostasis grade suggested from the oxygen values (SpO2, PaO2), shown beside the grade the clinician
 * sets and never set for them: the clinician accepts it or ignores it.
 *
 * <p>Guarantees: a grade is suggested only when it is higher than the grade set (a suggestion never lowers a grade);
 * {@code oxygenNeed} always says what the values show or what to check; {@code cautions} say when the values
 * themselves may mislead; {@code basis} names the cut-offs and where they come from.
 *
 * @param suggested  the grade offered, empty when the values call for none above the grade set
 * @param calledFor  the grade the oxygen values call for on their own, empty when they call for none
 * @param gradeSet   the pulmonary grade the clinician set, empty when not assessed
 * @param oxygenNeed one sentence on the oxygen need the values show, or what to check
 * @param cautions   why the values may mislead (artefacts at very high counts), empty when none applies
 * @param basis      the cut-offs with their source and basis, in words
 */
public record PulmonarySuggestion(Optional<Integer> suggested, Optional<Integer> calledFor,
                                  Optional<Integer> gradeSet, String oxygenNeed, List<String> cautions,
                                  String basis) {
    /**
     * The grade whose descriptor is "breathless at rest or needing oxygen or ventilation" (our own words, from
     * memory: {@link LeukostasisVerdict#DESCRIPTORS}); a saturation or tension below the cut-offs means oxygen is
     * needed.
     */
    public static final int OXYGEN_GRADE = 3;

    /** Van de Louw A et al., Respir Care 2016;61(1):8-14 [published]: the artefacts of blood gas and oximetry. */
    static final String ARTEFACT_SOURCE = "Van de Louw et al., Respir Care 2016";

    public PulmonarySuggestion {
        Objects.requireNonNull(suggested, "suggested");
        Objects.requireNonNull(calledFor, "calledFor");
        Objects.requireNonNull(gradeSet, "gradeSet");
        Objects.requireNonNull(oxygenNeed, "oxygenNeed");
        cautions = List.copyOf(cautions);
        Objects.requireNonNull(basis, "basis");
        if (suggested.isPresent() && gradeSet.isPresent() && suggested.get() <= gradeSet.get()) {
            throw new IllegalArgumentException("a suggestion never lowers or repeats the grade set");
        }
        if (suggested.isPresent() && !suggested.equals(calledFor)) {
            throw new IllegalArgumentException("only the grade the values call for is suggested");
        }
    }

    /** True when a grade is offered for the clinician to accept. */
    public boolean offered() {
        return suggested.isPresent();
    }

    /** "Suggested pulmonary grade 3 (breathless at rest or needing oxygen or ventilation)", or empty. */
    public Optional<String> headline() {
        return suggested.map(g -> "Suggested pulmonary grade " + g + " (" + LeukostasisVerdict.descriptor(
                Organ.PULMONARY, g) + "), from the oxygen values; accept it only if it fits the patient");
    }

    /** The suggestion for this case under this rule set. Pure. */
    public static PulmonarySuggestion of(Case c, RuleSet rules) {
        Optional<Measurement> spo2 = c.labs().get(Analyte.SPO2);
        Optional<Measurement> pao2 = c.labs().get(Analyte.PAO2);
        Threshold target = rules.threshold(SUGGEST_SPO2_TARGET_LOW);
        Threshold failure = rules.threshold(SUGGEST_PAO2_FAILURE);

        List<String> low = new ArrayList<>();
        spo2.filter(m -> target.test(m, Comparison.BELOW)).ifPresent(m -> low.add("SpO2 " + m.entered()
                + " is below " + limitFor(target, m) + ", the lower end of the usual target range"));
        pao2.filter(m -> failure.test(m, Comparison.BELOW)).ifPresent(m -> low.add("PaO2 " + m.entered()
                + " is below " + limitFor(failure, m) + " (hypoxaemic respiratory failure)"));
        Optional<Integer> calledFor = low.isEmpty() ? Optional.empty() : Optional.of(OXYGEN_GRADE);

        String need;
        if (!low.isEmpty()) {
            need = "Oxygen needed: " + String.join("; ", low) + ".";
        } else if (spo2.isEmpty() && pao2.isEmpty()) {
            need = "Oxygen need not known: no SpO2 or PaO2 entered. Measure the saturation and note whether the"
                    + " patient breathes room air or oxygen.";
        } else {
            List<String> values = new ArrayList<>();
            spo2.ifPresent(m -> values.add("SpO2 " + m.entered()));
            pao2.ifPresent(m -> values.add("PaO2 " + m.entered()));
            need = String.join(" and ", values) + " show no oxygen need on their own. If they were measured on"
                    + " oxygen, the patient needs oxygen (grade " + OXYGEN_GRADE + "); check breathing at rest.";
        }

        Optional<Integer> set = c.findings().pulmonaryGrade();
        Optional<Integer> suggested = calledFor.filter(g -> set.map(s -> g > s).orElse(true));

        List<String> cautions = new ArrayList<>();
        Optional<Measurement> wbc = c.labs().get(Analyte.WBC);
        Threshold veryHigh = rules.threshold(SPURIOUS_HYPOXAEMIA_WBC);
        boolean high = wbc.map(m -> veryHigh.test(m, Comparison.ABOVE)).orElse(false);
        if (high && pao2.isPresent()) {
            cautions.add("At a white count above " + veryHigh.describe() + " a low PaO2 may be spurious (leukocytes"
                    + " consume oxygen in the syringe), yet true hypoxaemia also occurs: repeat an arterial sample on"
                    + " ice, analysed at once, with co-oximetry, and judge the breathing (" + ARTEFACT_SOURCE + ").");
        }
        if (high && spo2.isPresent()) {
            cautions.add("At a white count above " + veryHigh.describe() + " pulse oximetry agrees poorly with the"
                    + " measured saturation and can mislead either way (" + ARTEFACT_SOURCE + ").");
        }
        if (wbc.isEmpty() && (spo2.isPresent() || pao2.isPresent())) {
            cautions.add("White count not entered: above " + veryHigh.describe() + " a low PaO2 may be spurious and"
                    + " pulse oximetry can mislead either way (" + ARTEFACT_SOURCE + ").");
        }

        Parameter t = rules.parameter(SUGGEST_SPO2_TARGET_LOW);
        Parameter f = rules.parameter(SUGGEST_PAO2_FAILURE);
        String basis = "Suggestion rule: SpO2 below " + target.describe() + " or PaO2 below " + failure.describe()
                + equivalents(failure) + " means oxygen is needed, which is pulmonary grade " + OXYGEN_GRADE + " (\""
                + LeukostasisVerdict.descriptor(Organ.PULMONARY, OXYGEN_GRADE) + "\"). SpO2 cut-off: " + t.source()
                + " [" + t.basis().words() + "]. PaO2 cut-off: " + f.source() + " [" + f.basis().words() + "]."
                + " A suggestion never lowers the grade set.";
        return new PulmonarySuggestion(suggested, calledFor, set, need, cautions, basis);
    }

    /** The limit in the unit the value was entered in when the source gives that figure ("8 kPa" for a kPa value). */
    private static String limitFor(Threshold t, Measurement m) {
        return t.figures().stream().filter(q -> q.unit().equals(m.entered().unit())).findFirst()
                .map(Object::toString).orElseGet(t::describe);
    }

    private static String equivalents(Threshold t) {
        return t.equivalents().stream().map(q -> " / " + q).reduce("", String::concat);
    }
}
