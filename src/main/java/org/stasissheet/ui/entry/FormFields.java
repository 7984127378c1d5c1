package org.stasissheet.ui.entry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.stasissheet.intake.Cryoglobulin;
import org.stasissheet.intake.Enums;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.UnitOption;
import org.stasissheet.rules.LeukostasisVerdict;

/**
 * Every field of the form, in screen and tab order: the one list that the entry view, the draft JSON and the
 * routing of reader messages to fields all share. Paths are those of the {@code stasis-case/1} format.
 */
public final class FormFields {
    /** The measuring temperature of a serum viscosity is always in degrees Celsius (UCUM {@code Cel}). */
    public static final UnitOption CELSIUS = new UnitOption("Cel", "°C", 1, "identity");

    public static final String NOT_ENTERED = "not entered";
    public static final String NOT_ASSESSED = "not assessed";

    private static final List<FieldSpec> ALL = build();

    private FormFields() {
    }

    public static List<FieldSpec> all() {
        return ALL;
    }

    public static List<FieldSpec> of(Section section) {
        return ALL.stream().filter(f -> f.section() == section).toList();
    }

    public static Optional<FieldSpec> byPath(String path) {
        return ALL.stream().filter(f -> f.path().equals(path)).findFirst();
    }

    /**
     * The field a reader message at {@code problemPath} belongs to: the field whose path is the problem's path
     * or its longest prefix ({@code labs.wbc.unit} belongs to {@code labs.wbc}). Empty for whole-file problems
     * and keys the form does not know.
     */
    public static Optional<FieldSpec> owning(String problemPath) {
        FieldSpec best = null;
        for (FieldSpec f : ALL) {
            boolean owns = problemPath.equals(f.path()) || problemPath.startsWith(f.path() + ".");
            if (owns && (best == null || f.path().length() > best.path().length())) {
                best = f;
            }
        }
        return Optional.ofNullable(best);
    }

    private static List<FieldSpec> build() {
        List<FieldSpec> list = new ArrayList<>();
        Section p = Section.PATIENT;
        list.add(simple(p, "patient.label", "Label (bed, initials; no full name needed)", FieldKind.TEXT, ""));
        list.add(choice(p, "patient.sex", "Sex (for the blood-volume estimate)", vocabulary(Sex.class, NOT_ENTERED)));
        list.add(simple(p, "patient.ageYears", "Age (whole years)", FieldKind.WHOLE, "decides adult or child limits"));
        list.add(quantity(p, "patient.height", Analyte.HEIGHT, "Height"));
        list.add(quantity(p, "patient.weight", Analyte.WEIGHT, "Weight"));

        Section c = Section.CONDITION;
        list.add(choice(c, "condition.paraprotein", "Paraprotein isotype", List.of(
                new Choice("", NOT_ENTERED), new Choice("none", "none"), new Choice("IgM", "IgM"),
                new Choice("IgG", "IgG"), new Choice("IgG3", "IgG3 (enter the value under IgG)"),
                new Choice("IgA", "IgA"))));
        List<Choice> leukemias = new ArrayList<>(List.of(new Choice("", NOT_ENTERED)));
        Arrays.stream(Leukemia.values()).forEach(l -> leukemias.add(new Choice(l.code(), l.words())));
        list.add(choice(c, "condition.leukemia", "Leukemia type", leukemias));
        list.add(simple(c, "condition.monocytic", "AML with monocytic differentiation", FieldKind.SWITCH, ""));
        list.add(choice(c, "condition.cryoglobulin", "Cryoglobulin", vocabulary(Cryoglobulin.class, NOT_ENTERED)));
        list.add(simple(c, "condition.therapyStarted", "Therapy started on", FieldKind.DATE,
                "YYYY-MM-DD; empty if not started (tumor lysis window)"));

        for (Analyte a : Analyte.labs()) {
            list.add(quantity(Section.LABS, "labs." + a.key(), a, capitalised(a.label())));
            if (a == Analyte.SERUM_VISCOSITY) {
                list.add(new FieldSpec(Section.LABS, "labs.serumViscosity.temperature",
                        "  measured at (temperature)", FieldKind.QUANTITY, List.of(), Optional.empty(),
                        List.of(CELSIUS), "kept for the record and for the cryoglobulin warning"));
            }
        }

        Section f = Section.FINDINGS;
        list.add(grade("findings.pulmonaryGrade", "Pulmonary grade", LeukostasisVerdict.Organ.PULMONARY));
        list.add(grade("findings.neurologicalGrade", "Neurological grade", LeukostasisVerdict.Organ.NEUROLOGICAL));
        list.add(grade("findings.otherOrganGrade", "Other organs grade", LeukostasisVerdict.Organ.OTHER));
        list.add(sign("findings.mucosalBleeding", "Mucosal bleeding (nose, gums)"));
        list.add(sign("findings.visualDisturbance", "Visual disturbance"));
        list.add(choice(f, "findings.retinopathy", "Fundoscopy", List.of(
                new Choice("", NOT_ENTERED),
                new Choice(Retinopathy.NOT_EXAMINED.code(), "not examined"),
                new Choice(Retinopathy.NONE.code(), "no retinopathy"),
                new Choice(Retinopathy.VENOUS_DILATION.code(), "venous dilation"),
                new Choice(Retinopathy.HAEMORRHAGES.code(), "haemorrhages"),
                new Choice(Retinopathy.PAPILLOEDEMA.code(), "papilloedema"))));
        list.add(sign("findings.heartFailure", "Heart failure"));
        list.add(sign("findings.arrhythmia", "Cardiac arrhythmia"));
        list.add(sign("findings.seizure", "Seizure"));

        list.add(simple(Section.PLAN, "plan.rituximabPlanned", "Rituximab planned", FieldKind.SWITCH, ""));
        list.add(simple(Section.PLAN, "plan.transfusionPlanned", "Red-cell transfusion planned", FieldKind.SWITCH, ""));

        for (Analyte a : Analyte.labs()) {
            list.add(quantity(Section.BASELINE, "baseline." + a.key(), a, capitalised(a.label())));
        }

        list.add(simple(Section.RECORD, "assessedAt", "Assessed at", FieldKind.DATE_TIME,
                "date (YYYY-MM-DD) and time of day (HH:mm, 24-hour); recorded with this computer's time zone"));
        list.add(simple(Section.RECORD, "assessor", "Assessed by", FieldKind.TEXT, ""));
        return List.copyOf(list);
    }

    private static FieldSpec grade(String path, String label, LeukostasisVerdict.Organ organ) {
        List<Choice> choices = new ArrayList<>();
        choices.add(new Choice("", NOT_ASSESSED));
        for (int g = 0; g <= 3; g++) {
            choices.add(new Choice(Integer.toString(g), g + " · " + GradeWords.descriptor(organ, g)));
        }
        return new FieldSpec(Section.FINDINGS, path, label, FieldKind.GRADE, choices, Optional.empty(), List.of(),
                GradeWords.HINT);
    }

    private static FieldSpec sign(String path, String label) {
        return new FieldSpec(Section.FINDINGS, path, label, FieldKind.SIGN,
                List.of(new Choice("", NOT_ASSESSED), new Choice("true", "yes"), new Choice("false", "no")),
                Optional.empty(), List.of(), "");
    }

    private static FieldSpec simple(Section s, String path, String label, FieldKind kind, String hint) {
        return new FieldSpec(s, path, label, kind, List.of(), Optional.empty(), List.of(), hint);
    }

    private static FieldSpec choice(Section s, String path, String label, List<Choice> choices) {
        return new FieldSpec(s, path, label, FieldKind.CHOICE, choices, Optional.empty(), List.of(), "");
    }

    private static FieldSpec quantity(Section s, String path, Analyte a, String label) {
        return new FieldSpec(s, path, label, FieldKind.QUANTITY, List.of(), Optional.of(a), a.units(), "");
    }

    private static <E extends Enum<E> & Enums.Coded> List<Choice> vocabulary(Class<E> type, String none) {
        List<Choice> list = new ArrayList<>();
        list.add(new Choice("", none));
        Arrays.stream(type.getEnumConstants()).forEach(e -> list.add(new Choice(e.code(), e.code())));
        return list;
    }

    private static String capitalised(String s) {
        // Labels such as "IgM" keep their own capitals; only a leading lower-case letter is raised.
        return s.isEmpty() || !Character.isLowerCase(s.charAt(0)) ? s
                : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
