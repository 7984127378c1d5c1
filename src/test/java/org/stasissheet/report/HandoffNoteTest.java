package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.rules.Basis;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.worksheet.Cautions;
import org.stasissheet.worksheet.Worksheet;

class HandoffNoteTest {
    private static final String LABEL = "Invented patient, bed 4";

    private static Worksheet sheet() {
        return Fixtures.sheet(Fixtures.igmCase(LABEL), Fixtures.SHIPPED);
    }

    private static List<String> lines(String note) {
        return note.lines().toList();
    }

    @Test
    @DisplayName("SBAR order in 3-20 lines: the patient and signs, the background and values, the verdicts and act-now items")
    void content() {
        Worksheet sheet = sheet();
        List<String> lines = lines(HandoffNote.render(sheet, false));
        assertTrue(lines.size() >= 3 && lines.size() <= 20, "lines: " + lines.size());
        assertTrue(lines.get(0).startsWith("Situation: "), lines.get(0));
        assertTrue(lines.get(1).startsWith("Background: "), lines.get(1));
        assertTrue(lines.get(2).startsWith("Assessment: "), lines.get(2));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("Recommendation: ")), lines.toString());
        String note = String.join("\n", lines);
        assertTrue(lines.get(2).contains(VerdictWords.hyperviscosity(sheet.hyperviscosity())), note);
        assertTrue(lines.get(2).contains(VerdictWords.leukostasis(sheet.leukostasis())), note);
        List<Flag> actNow = sheet.flags().stream().filter(f -> f.level() == Level.ACT_NOW).toList();
        assertFalse(actNow.isEmpty(), "the invented IgM case with bleeding and SV 5.6 cP fires an act-now rule");
        actNow.forEach(f -> assertTrue(note.contains(Level.ACT_NOW.badge() + " " + f.title()), f.id()));
        assertTrue(lines.get(1).contains("serum viscosity 5.6 cP"), "key value with its unit: " + note);
        assertTrue(lines.get(1).contains("IgM 5.9 g/dL"), "as the lab reported it: " + note);
        assertTrue(note.contains("Rule set stasis-core 1.0.0"), note);
        assertTrue(note.contains(Cautions.SHORT), "the standing caution, in its own words");
        assertFalse(note.contains("venous-dilation"), "coded values are written as words: " + note);
    }

    @Test
    @DisplayName("the verdicts are the Assessment and read like a clinician's: 'hyperviscosity syndrome likely'")
    void verdictWords() {
        // the invented IgM case: SV 5.6 cP is above the 4 cP symptomatic threshold (Crawford 1985) with bleeding
        String note = HandoffNote.render(sheet(), false);
        assertTrue(note.lines().anyMatch(l -> l.startsWith("Assessment: hyperviscosity syndrome likely;")), note);
        assertFalse(note.lines().findFirst().orElseThrow().contains("likely"), "verdicts are not the Situation");
    }

    @Test
    @DisplayName("organ grades of 1 or more are signs: a breathless patient is never 'no sign recorded'")
    void organGradesAreSigns() {
        // the invented demo case samples/aml-breathless.json: pulmonary grade 2, PaO2 6.9 kPa
        org.stasissheet.intake.Case aml = ((org.stasissheet.intake.CaseReader.Accepted) org.stasissheet.files.CaseFiles
                .read(java.nio.file.Path.of("samples/aml-breathless.json"))).c();
        Worksheet breathless = Fixtures.sheet(aml, Fixtures.SHIPPED);
        String situation = HandoffNote.render(breathless, false).lines().findFirst().orElseThrow();
        assertTrue(situation.contains("pulmonary grade 2 of 3"), situation);
        assertFalse(situation.contains("no sign recorded"), situation);
    }

    @Test
    @DisplayName("no patient label unless asked")
    void identifiers() {
        assertFalse(HandoffNote.render(sheet(), false).contains("bed 4"));
        assertTrue(HandoffNote.render(sheet(), true).startsWith("Situation: " + LABEL + ": "));
    }

    @ParameterizedTest
    @ValueSource(ints = {0, 1, 8, 9, 30})
    @DisplayName("any number of act-now flags keeps the note within 3-20 lines")
    void manyFlags_stayWithinTwentyLines(int count) {
        Worksheet s = sheet();
        List<Flag> flags = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            flags.add(new Flag("test.flag" + i, Level.ACT_NOW, "Invented act-now flag " + i, "demo only",
                    "common practice", Basis.COMMON_PRACTICE));
        }
        Worksheet many = new Worksheet(s.source(), s.ruleSet(), s.inputs(), s.cautions(), s.flow(), s.apheresis(),
                s.hyperviscosity(), s.leukostasis(), s.tumorLysis(), flags, s.pulmonarySuggestion());
        List<String> lines = lines(HandoffNote.render(many, true));
        assertTrue(lines.size() >= 3 && lines.size() <= HandoffNote.MAX_LINES, "lines: " + lines.size());
        if (count > HandoffNote.MAX_ACT_NOW_LINES) {
            assertTrue(String.join("\n", lines).contains("and " + (count - HandoffNote.MAX_ACT_NOW_LINES)
                    + " more act-now items"));
        }
        if (count == 0) {
            assertEquals(5, lines.size(), "S, B, A, R and the rule-set line");
        }
    }
}
