package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Enums;

/**
 * The leukostasis grading (Novotny et al., Eur J Haematol 2005), as decided by {@link Verdicts#leukostasis}.
 *
 * <p>Guarantees: a score is given only when the grading applies ({@code gate} is {@code GRADED}); a score of 0
 * ("none") only when every organ system was examined; otherwise {@code toExamine} names what to examine.
 *
 * @param assessed  the grading applies to this count and leukemia type
 * @param gate      why the grading does or does not apply
 * @param score     empty when not graded or undecided; else 0–3, the highest assessed organ grade
 * @param toExamine organ systems (case paths) to examine before the sheet may call leukostasis absent
 */
public record LeukostasisVerdict(boolean assessed, Gate gate, Optional<Integer> score, Probability probability,
                                 List<String> toExamine, String reason) {
    public LeukostasisVerdict {
        Objects.requireNonNull(gate, "gate");
        Objects.requireNonNull(score, "score");
        Objects.requireNonNull(probability, "probability");
        toExamine = List.copyOf(toExamine);
        Objects.requireNonNull(reason, "reason");
        if (assessed != (gate == Gate.GRADED)) {
            throw new IllegalArgumentException("assessed goes with the graded gate only");
        }
        if (score.isPresent() && gate != Gate.GRADED) {
            throw new IllegalArgumentException("a score needs the graded gate");
        }
        if (score.map(s -> s == 0).orElse(false) && !toExamine.isEmpty()) {
            throw new IllegalArgumentException("score 0 needs every organ system examined");
        }
        score.ifPresent(s -> {
            if (s < 0 || s > 3) {
                throw new IllegalArgumentException("score must be 0–3, was " + s);
            }
        });
        if (score.isPresent() == (probability == Probability.NOT_ASSESSABLE)) {
            throw new IllegalArgumentException("a score goes with a probability, and no score with not-assessable");
        }
    }

    /**
     * The output word of {@code leukostasis.probability}. Meaning of 0–3: Novotny 2005 as quoted by Piccirillo et
     * al., Am J Hematol 2009 [published, secondary].
     */
    public enum Probability implements Enums.Coded {
        NONE("none"),
        POSSIBLE("possible"),
        PROBABLE("probable"),
        HIGHLY_PROBABLE("highly-probable"),
        NOT_ASSESSABLE("not-assessable");

        private final String code;

        Probability(String code) {
            this.code = code;
        }

        @Override
        public String code() {
            return code;
        }

        /** How much action the verdict calls for: 3 highly probable down to 0 for none or not graded. */
        public int alarm() {
            return this == NOT_ASSESSABLE ? 0 : ordinal();
        }

        public static Probability ofScore(int score) {
            return values()[score];
        }
    }

    /** Whether the grading applies; the output word of {@code leukostasis.gate}. */
    public enum Gate implements Enums.Coded {
        /** No white cell count. */
        NO_COUNT("no-count"),
        /** Below the general entry count: organ signs more likely have another cause. */
        BELOW_ENTRY("below-entry"),
        /** No leukemia recorded and no blasts reported at a high count: a film and a diagnosis come first. */
        NEEDS_DIAGNOSIS("needs-diagnosis"),
        /** Lymphoid or mature cells below the count from which this leukemia type plugs vessels. */
        BELOW_TYPE_LEVEL("below-type-level"),
        GRADED("graded");

        private final String code;

        Gate(String code) {
            this.code = code;
        }

        @Override
        public String code() {
            return code;
        }
    }

    /** The organ systems that are graded, with their case path. */
    public enum Organ {
        PULMONARY("findings.pulmonaryGrade", "pulmonary"),
        NEUROLOGICAL("findings.neurologicalGrade", "neurological"),
        OTHER("findings.otherOrganGrade", "other organs");

        private final String path;
        private final String label;

        Organ(String path, String label) {
            this.path = path;
            this.label = label;
        }

        public String path() {
            return path;
        }

        public String label() {
            return label;
        }
    }

    /** A short descriptor of one grade, in our own words, to show beside the grade picker and in the PDF. */
    public record GradeDescriptor(Organ organ, int grade, String text) {
        public GradeDescriptor {
            Objects.requireNonNull(organ, "organ");
            Objects.requireNonNull(text, "text");
        }
    }

    /**
     * Basis: from memory. Novotny 2005 grades each system 0–3 by how far symptoms limit the patient (0 none,
     * 1 slight, 2 marked, 3 severe); the per-system wording below is ours and was not checked against the paper,
     * nor was the rule that the overall score is the highest organ grade.
     */
    public static final Basis DESCRIPTOR_BASIS = Basis.FROM_MEMORY;

    public static final String COMBINATION_RULE = "overall score = the highest assessed organ grade";

    public static final List<GradeDescriptor> DESCRIPTORS = List.of(
            new GradeDescriptor(Organ.PULMONARY, 0, "breathing not affected"),
            new GradeDescriptor(Organ.PULMONARY, 1, "slightly breathless on exertion, daily life not limited"),
            new GradeDescriptor(Organ.PULMONARY, 2, "breathless enough to limit activity"),
            new GradeDescriptor(Organ.PULMONARY, 3, "breathless at rest or needing oxygen or ventilation"),
            new GradeDescriptor(Organ.NEUROLOGICAL, 0, "no neurological complaint"),
            new GradeDescriptor(Organ.NEUROLOGICAL, 1, "mild tinnitus, headache or dizziness"),
            new GradeDescriptor(Organ.NEUROLOGICAL, 2, "marked headache, dizziness or visual blurring, limiting"),
            new GradeDescriptor(Organ.NEUROLOGICAL, 3, "confusion, somnolence, focal signs or intracranial bleeding"),
            new GradeDescriptor(Organ.OTHER, 0, "no other organ involved"),
            new GradeDescriptor(Organ.OTHER, 1, "slight symptoms in another organ, not limiting"),
            new GradeDescriptor(Organ.OTHER, 2, "marked symptoms in another organ, limiting"),
            new GradeDescriptor(Organ.OTHER, 3, "severe organ failure (e.g. priapism, limb or bowel ischaemia)"));

    public static String descriptor(Organ organ, int grade) {
        return DESCRIPTORS.stream().filter(d -> d.organ() == organ && d.grade() == grade)
                .findFirst().orElseThrow().text();
    }
}
