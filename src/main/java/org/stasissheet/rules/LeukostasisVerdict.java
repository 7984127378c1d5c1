package org.stasissheet.rules;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.intake.Enums;

/**
 * The leukostasis grading (Novotny et al., Eur J Haematol 2005), as decided by {@link Verdicts#leukostasis}.
 *
 * @param score empty when not assessable; else 0–3, the highest assessed organ grade
 */
public record LeukostasisVerdict(boolean assessed, Optional<Integer> score, Probability probability, String reason) {
    public LeukostasisVerdict {
        Objects.requireNonNull(score, "score");
        Objects.requireNonNull(probability, "probability");
        Objects.requireNonNull(reason, "reason");
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

        public static Probability ofScore(int score) {
            return values()[score];
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
