package org.stasissheet.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Enums;
import org.stasissheet.intake.Findings;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.measure.Numbers;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.PulmonarySuggestion;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.InputLine;
import org.stasissheet.worksheet.Worksheet;

/**
 * A plain-text handoff in SBAR order (situation, background, assessment, recommendation), 3–20 lines, ready to
 * paste into a clinical note. It names no patient unless asked: the label is the only identifier a case holds.
 */
public final class HandoffNote {
    /** Most act-now flags listed one per line; the rest are counted, so the note stays within 20 lines. */
    static final int MAX_ACT_NOW_LINES = 8;
    public static final int MAX_LINES = 20;
    private static final String NL = "\n";

    private HandoffNote() {
    }

    public static String render(Worksheet sheet, boolean withIdentifiers) {
        List<String> lines = new ArrayList<>();
        Case c = sheet.source();
        String who = withIdentifiers && !c.patient().label().isBlank() ? c.patient().label() + ": " : "";
        lines.add("Situation: " + who + situation(c) + ".");
        lines.add("Background: " + background(c) + "; " + keyValues(sheet) + ".");
        List<Flag> actNow = sheet.flags().stream().filter(f -> f.level() == Level.ACT_NOW).toList();
        long review = sheet.flags().stream().filter(f -> f.level() == Level.REVIEW).count();
        lines.add("Assessment: " + VerdictWords.hyperviscosity(sheet.hyperviscosity()) + "; "
                + VerdictWords.leukostasis(sheet.leukostasis()) + "; "
                + VerdictWords.tumorLysis(sheet.tumorLysis()) + "."
                + (actNow.isEmpty() ? "" : " Act now:"));
        actNow.stream().limit(MAX_ACT_NOW_LINES).forEach(f -> lines.add("  " + f.level().badge() + " " + f.title()));
        if (actNow.size() > MAX_ACT_NOW_LINES) {
            lines.add("  ... and " + (actNow.size() - MAX_ACT_NOW_LINES) + " more act-now items on the worksheet");
        }
        oxygen(sheet.pulmonarySuggestion()).ifPresent(lines::add);
        lines.add("Recommendation: " + (actNow.isEmpty() ? "nothing flagged to act on now" : "the act-now items above")
                + (review > 0 ? "; " + review + " item" + (review == 1 ? "" : "s") + " to review on the worksheet" : "")
                + "; act on the clinical picture and reassess when it changes.");
        lines.add("Rule set " + sheet.ruleSet().name() + " " + sheet.ruleSet().version()
                + (sheet.ruleSet().local() ? ", LOCAL PROTOCOL" : "")
                + ", assessed " + c.assessedAt().map(ReportTime.FORMAT::format).orElse("at an unrecorded time")
                + ". " + Cautions.SHORT);
        return String.join(NL, lines) + NL;
    }

    /**
     * When the oxygen values call for a higher pulmonary grade than the one set, one line says so: the grade in the
     * situation line alone would hand over a patient who needs oxygen as a milder one.
     */
    private static Optional<String> oxygen(PulmonarySuggestion s) {
        return s.suggested().map(g -> s.oxygenNeed() + " The values suggest pulmonary grade " + g
                + " (not applied; grade set: " + s.gradeSet().map(String::valueOf).orElse("not assessed")
                + "): check it against the patient"
                + (s.cautions().isEmpty() ? "." : "; at this white count the value may be spurious (see the worksheet)."));
    }

    /** Who the patient is, the disease, and the signs now: organ grades of 1 or more are signs. */
    private static String situation(Case c) {
        List<String> parts = new ArrayList<>();
        parts.add(c.patient().sex().map(Enums.Coded::code).orElse("sex not given")
                + c.patient().ageYears().map(a -> ", " + a + " years").orElse(", age not given"));
        if (c.condition().paraprotein() != Paraprotein.NONE) {
            parts.add(c.condition().paraprotein().code() + " paraprotein");
        }
        if (c.condition().leukemia() != Leukemia.NONE) {
            parts.add(c.condition().leukemia().words() + (c.condition().monocytic() ? " (monocytic)" : ""));
        }
        Findings f = c.findings();
        List<String> signs = new ArrayList<>();
        sign(signs, f.mucosalBleeding(), "mucosal bleeding");
        sign(signs, f.visualDisturbance(), "visual disturbance");
        sign(signs, f.heartFailure(), "heart failure");
        sign(signs, f.arrhythmia(), "arrhythmia");
        sign(signs, f.seizure(), "seizure");
        if (f.retinopathy().compareTo(Retinopathy.VENOUS_DILATION) >= 0) {
            signs.add(f.retinopathy().words());
        }
        grade(signs, "pulmonary", f.pulmonaryGrade());
        grade(signs, "neurological", f.neurologicalGrade());
        grade(signs, "other organ", f.otherOrganGrade());
        parts.add(signs.isEmpty() ? "no sign recorded as present" : "signs: " + String.join(", ", signs));
        return String.join("; ", parts);
    }

    private static String background(Case c) {
        List<String> parts = new ArrayList<>();
        parts.add(c.condition().therapyStarted().map(d -> "therapy started " + d).orElse("no therapy start recorded"));
        if (c.plan().rituximabPlanned()) {
            parts.add("rituximab planned");
        }
        if (c.plan().transfusionPlanned()) {
            parts.add("red-cell transfusion planned");
        }
        return String.join("; ", parts);
    }

    private static void sign(List<String> signs, Observation o, String name) {
        if (o == Observation.YES) {
            signs.add(name);
        }
    }

    private static void grade(List<String> signs, String organ, Optional<Integer> g) {
        g.filter(v -> v >= 1).ifPresent(v -> signs.add(organ + " grade " + v + " of 3"));
    }

    /** The lab values as the laboratory reported them, with their units. */
    private static String keyValues(Worksheet sheet) {
        List<InputLine> labs = sheet.inputs().stream().filter(l -> l.path().startsWith("labs.")).toList();
        if (labs.isEmpty()) {
            return "no lab values entered";
        }
        return labs.stream().map(l -> l.label() + " " + WorksheetText.format(l.entered()))
                .collect(Collectors.joining(", "));
    }
}
