package org.stasissheet.rules;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.stasissheet.intake.Cryoglobulin;
import org.stasissheet.intake.Enums;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;

/**
 * The vocabulary of fields a rule condition may name: the case paths of {@code stasis-case/1} and the values the
 * verdict code derives from them. The one place that says which fields exist and what kind each is.
 */
public final class Fields {
    private Fields() {
    }

    /** What kind of value a field holds, and so which tests apply to it. */
    public sealed interface Kind {
        String describe();
    }

    /** A lab value; thresholds must be in a unit the analyte accepts. */
    public record Amount(Analyte analyte) implements Kind {
        @Override
        public String describe() {
            return analyte.label() + " (units: " + String.join(", ",
                    analyte.units().stream().map(u -> u.ucum()).toList()) + ")";
        }
    }

    /** A plain number measured in {@code unit}; a threshold without a unit is taken to be in it. */
    public record Number(Dimension dimension, String unit) implements Kind {
        @Override
        public String describe() {
            return "number in " + unit;
        }
    }

    public record Bool() implements Kind {
        @Override
        public String describe() {
            return "true | false";
        }
    }

    public record Word(List<String> words) implements Kind {
        public Word {
            words = List.copyOf(words);
        }

        @Override
        public String describe() {
            return String.join(" | ", words);
        }
    }

    /** Present or absent only (a date). */
    public record Presence() implements Kind {
        @Override
        public String describe() {
            return "present | absent only";
        }
    }

    public static final String HYPERVISCOSITY_ASSESSMENT = "hyperviscosity.assessment";
    public static final String HYPERVISCOSITY_ROUTE = "hyperviscosity.route";
    public static final String HYPERVISCOSITY_SIGNS = "hyperviscosity.signs";
    public static final String HYPERVISCOSITY_VISCOSITY = "hyperviscosity.viscosity";
    public static final String HYPERVISCOSITY_TO_EXAMINE = "hyperviscosity.toExamine";
    public static final String LEUKOSTASIS_ASSESSED = "leukostasis.assessed";
    public static final String LEUKOSTASIS_GATE = "leukostasis.gate";
    public static final String LEUKOSTASIS_TO_EXAMINE = "leukostasis.toExamine";
    public static final String ORGAN_SIGNS = "findings.organSigns";
    public static final String POTASSIUM_DOUBTED = "potassium.doubted";
    public static final String TUMOR_LYSIS_UNCONFIRMED = "tumorLysis.dependsOnUnconfirmed";
    public static final String LEUKOSTASIS_SCORE = "leukostasis.score";
    public static final String LEUKOSTASIS_PROBABILITY = "leukostasis.probability";
    public static final String HYPERLEUKOCYTOSIS = "hyperleukocytosis";
    public static final String TUMOR_LYSIS_LABORATORY = "tumorLysis.laboratory";
    public static final String TUMOR_LYSIS_CLINICAL = "tumorLysis.clinical";
    public static final String TUMOR_LYSIS_WINDOW_CONFIRMED = "tumorLysis.windowConfirmed";

    private static final Map<String, Kind> KINDS = build();

    private static Map<String, Kind> build() {
        Map<String, Kind> k = new LinkedHashMap<>();
        k.put("patient.sex", words(Sex.class));
        k.put("patient.ageYears", new Number(Dimension.AGE, "a"));
        k.put("patient.height", new Amount(Analyte.HEIGHT));
        k.put("patient.weight", new Amount(Analyte.WEIGHT));
        k.put("condition.paraprotein", words(Paraprotein.class));
        k.put("condition.leukemia", words(Leukemia.class));
        k.put("condition.monocytic", new Bool());
        k.put("condition.cryoglobulin", words(Cryoglobulin.class));
        k.put("condition.therapyStarted", new Presence());
        for (Analyte a : Analyte.labs()) {
            k.put("labs." + a.key(), new Amount(a));
            k.put("baseline." + a.key(), new Amount(a));
        }
        for (String grade : List.of("pulmonaryGrade", "neurologicalGrade", "otherOrganGrade")) {
            k.put("findings." + grade, new Number(Dimension.FRACTION, "1"));
        }
        for (String sign : List.of("mucosalBleeding", "visualDisturbance", "heartFailure", "arrhythmia", "seizure")) {
            k.put("findings." + sign, words(Observation.class));
        }
        k.put("findings.retinopathy", words(Retinopathy.class));
        k.put("plan.rituximabPlanned", new Bool());
        k.put("plan.transfusionPlanned", new Bool());
        k.put(HYPERVISCOSITY_ASSESSMENT, words(HyperviscosityVerdict.Assessment.class));
        k.put(HYPERVISCOSITY_ROUTE, words(HyperviscosityVerdict.Route.class));
        k.put(HYPERVISCOSITY_SIGNS, new Bool());
        k.put(HYPERVISCOSITY_VISCOSITY, words(HyperviscosityVerdict.ViscosityTrust.class));
        k.put(HYPERVISCOSITY_TO_EXAMINE, new Bool());
        k.put(LEUKOSTASIS_ASSESSED, new Bool());
        k.put(LEUKOSTASIS_GATE, words(LeukostasisVerdict.Gate.class));
        k.put(LEUKOSTASIS_TO_EXAMINE, new Bool());
        k.put(ORGAN_SIGNS, new Bool());
        k.put(POTASSIUM_DOUBTED, new Bool());
        k.put(LEUKOSTASIS_SCORE, new Number(Dimension.FRACTION, "1"));
        k.put(LEUKOSTASIS_PROBABILITY, words(LeukostasisVerdict.Probability.class));
        k.put(HYPERLEUKOCYTOSIS, new Bool());
        k.put(TUMOR_LYSIS_LABORATORY, new Bool());
        k.put(TUMOR_LYSIS_CLINICAL, new Bool());
        k.put(TUMOR_LYSIS_WINDOW_CONFIRMED, new Bool());
        k.put(TUMOR_LYSIS_UNCONFIRMED, new Bool());
        return Collections.unmodifiableMap(k);
    }

    private static <E extends Enum<E> & Enums.Coded> Word words(Class<E> type) {
        return new Word(Arrays.stream(type.getEnumConstants()).map(Enums.Coded::code).toList());
    }

    public static Optional<Kind> kind(String field) {
        return Optional.ofNullable(KINDS.get(field));
    }

    /** Every field in documentation order. */
    public static Map<String, Kind> all() {
        return KINDS;
    }
}
