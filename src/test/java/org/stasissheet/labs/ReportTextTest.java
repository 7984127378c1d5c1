package org.stasissheet.labs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;

/** A whole pasted report: duplicates asked, questions answered, values applied to a case. */
class ReportTextTest {

    @Test
    @DisplayName("two different values for one analyte are one question offering both; the second line points to it")
    void twoValues_oneQuestion() {
        LabImport read = ReportText.read("WBC 182.4 x10^9/L\nHb 7.4 g/dL\nLeukocytes 150 G/L\n");
        LabLine.Asked q = assertInstanceOf(LabLine.Asked.class, read.lines().get(0));
        assertEquals(Analyte.WBC, q.analyte());
        assertEquals(List.of(182.4, 150.0), q.options().stream().map(o -> o.reading().value().entered().value()).toList());
        LabLine.Left second = assertInstanceOf(LabLine.Left.class, read.lines().get(2));
        assertTrue(second.reason().contains("asked at line 1"), second.reason());
        assertTrue(read.needsAttention());
        assertThrows(IllegalStateException.class, () -> read.applyTo(Case.EMPTY));
    }

    @Test
    @DisplayName("the same value printed twice is taken once, the repeat listed")
    void sameValueTwice_takenOnce() {
        LabImport read = ReportText.read("K 5.6 mmol/L\nPotassium 5.6 mmol/L\n");
        assertEquals(1, read.taken().size());
        assertFalse(read.needsAttention());
    }

    @Test
    @DisplayName("an answered question lands; leaving it out lands nothing; the case reads back")
    void answer_thenApply() {
        LabImport read = ReportText.read("WBC 182.4 x10^9/L\nK 6.8\nPlt 38 G/L\n");
        LabLine.Asked q = read.questions().get(0);
        int index = read.lines().indexOf(q);
        LabImport answered = read.answer(index, Optional.of(q.options().get(0)));
        assertFalse(answered.needsAttention());
        Case c = answered.applyTo(Case.EMPTY);
        assertEquals(Optional.of(Measurement.of(Analyte.POTASSIUM, 6.8, "mmol/L")), c.labs().get(Analyte.POTASSIUM));
        assertTrue(CaseReader.read(CaseWriter.write(c).getBytes(java.nio.charset.StandardCharsets.UTF_8))
                instanceof CaseReader.Accepted);
        Case without = read.answer(index, Optional.empty()).applyTo(Case.EMPTY);
        assertFalse(without.labs().has(Analyte.POTASSIUM));
        assertEquals(2, without.labs().values().size());
    }

    @Test
    @DisplayName("creatinine's printed upper reference limit becomes creatinineUpperLimit, marked as derived")
    void creatinineRange_givesUpperLimit() {
        LabImport read = ReportText.read("Kreatinin 168 µmol/l H [59-104]\n");
        assertEquals(List.of(Measurement.of(Analyte.CREATININE, 168, "umol/L"),
                Measurement.of(Analyte.CREATININE_UPPER_LIMIT, 104, "umol/L")),
                read.taken().stream().map(LabLine.Taken::value).toList());
        assertTrue(read.taken().get(1).note().contains("reference range"));
    }

    @Test
    @DisplayName("where each value came from is kept under extra.labImport; earlier extra keys stay")
    void applyTo_recordsOrigins() {
        Case base = new Case(Case.EMPTY.patient(), Case.EMPTY.condition(), Case.EMPTY.labs(), Case.EMPTY.baseline(),
                Case.EMPTY.findings(), Case.EMPTY.plan(), Optional.empty(), "", "{\"site\":\"invented\"}");
        Case c = ReportText.read("IgM 48 g/L *\n").applyTo(base);
        assertTrue(c.extraJson().contains("\"site\":\"invented\""), c.extraJson());
        assertTrue(c.extraJson().contains("\"igm\":{\"from\":\"pasted-text\",\"where\":\"line 1\",\"flag\":\"*\"}"),
                c.extraJson());
    }

    @Test
    @DisplayName("blank and ruling lines are skipped; every other line comes back, in order")
    void everyLineAccountedFor() {
        LabImport read = ReportText.read("Results\n-----\n\nWBC 182.4 x10^9/L\nLDH 1890 U/L\n");
        assertEquals(List.of("line 1", "line 4", "line 5"), read.lines().stream().map(LabLine::where).toList());
    }
}
