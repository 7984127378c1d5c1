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
        lines.add("Situation: " + who + VerdictWords.hyperviscosity(sheet.hyperviscosity()) + "; "
                + VerdictWords.leukostasis(sheet.leukostasis()) + "; "
                + VerdictWords.tumorLysis(sheet.tumorLysis()) + ".");
        lines.add("Background: " + background(c) + ".");
        lines.add("Assessment: " + keyValues(sheet) + ".");
        List<Flag> actNow = sheet.flags().stream().filter(f -> f.level() == Level.ACT_NOW).toList();
        long review = sheet.flags().stream().filter(f -> f.level() == Level.REVIEW).count();
        if (actNow.isEmpty()) {
            lines.add("Recommendation: no act-now flag" + (review > 0 ? "; " + review + " to review on the worksheet"
                    : "") + "; act on the clinical picture.");
        } else {
            lines.add("Recommendation (" + actNow.size() + " act-now flag" + (actNow.size() == 1 ? "" : "s")
                    + (review > 0 ? ", " + review + " more to review on the worksheet" : "") + "):");
            actNow.stream().limit(MAX_ACT_NOW_LINES)
                    .forEach(f -> lines.add("  " + f.level().badge() + " " + f.title()));
            if (actNow.size() > MAX_ACT_NOW_LINES) {
                lines.add("  ... and " + (actNow.size() - MAX_ACT_NOW_LINES) + " more act-now flags on the worksheet");
            }
        }
        lines.add("Rule set " + sheet.ruleSet().name() + " " + sheet.ruleSet().version() + " (sha256 "
                + sheet.ruleSet().shortHash() + ")" + (sheet.ruleSet().local() ? ", LOCAL PROTOCOL" : "")
                + ", assessed " + c.assessedAt().map(WorksheetPdf.TIME::format).orElse("at an unrecorded time")
                + ". " + Cautions.SHORT);
        return String.join(NL, lines) + NL;
    }

    private static String background(Case c) {
        List<String> parts = new ArrayList<>();
        String person = c.patient().sex().map(Enums.Coded::code).orElse("sex not given")
                + c.patient().ageYears().map(a -> ", " + a + " years").orElse(", age not given");
        parts.add(person);
        if (c.condition().paraprotein() != Paraprotein.NONE) {
            parts.add(c.condition().paraprotein().code() + " paraprotein");
        }
        if (c.condition().leukemia() != Leukemia.NONE) {
            parts.add(c.condition().leukemia().code() + (c.condition().monocytic() ? " (monocytic)" : ""));
        }
        c.condition().therapyStarted().ifPresent(d -> parts.add("therapy started " + d));
        Findings f = c.findings();
        List<String> signs = new ArrayList<>();
        sign(signs, f.mucosalBleeding(), "mucosal bleeding");
        sign(signs, f.visualDisturbance(), "visual disturbance");
        sign(signs, f.heartFailure(), "heart failure");
        sign(signs, f.arrhythmia(), "arrhythmia");
        sign(signs, f.seizure(), "seizure");
        if (f.retinopathy() != Retinopathy.NOT_EXAMINED && f.retinopathy() != Retinopathy.NONE) {
            signs.add("fundus " + f.retinopathy().code());
        }
        parts.add(signs.isEmpty() ? "no sign recorded as present" : "signs: " + String.join(", ", signs));
        parts.add("organ grades pulmonary " + grade(f.pulmonaryGrade()) + ", neurological "
                + grade(f.neurologicalGrade()) + ", other " + grade(f.otherOrganGrade()));
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

    private static String grade(Optional<Integer> g) {
        return g.map(String::valueOf).orElse("n/a");
    }

    /** The lab values as the laboratory reported them, with their units. */
    private static String keyValues(Worksheet sheet) {
        List<InputLine> labs = sheet.inputs().stream().filter(l -> l.path().startsWith("labs.")).toList();
        if (labs.isEmpty()) {
            return "no lab values entered";
        }
        return labs.stream().map(l -> l.label() + " " + Numbers.rounded(l.entered().value(), 4) + " "
                + l.entered().unit()).collect(Collectors.joining(", "));
    }
}
