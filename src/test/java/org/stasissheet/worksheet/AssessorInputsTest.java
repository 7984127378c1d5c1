package org.stasissheet.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Labs;
import org.stasissheet.intake.Measurement;
import org.stasissheet.intake.Patient;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;

/** The worksheet's input lines: every entered value, where it came from, and its canonical form. */
class AssessorInputsTest {
    private static final double TOLERANCE = 1e-9;

    @Test
    @DisplayName("body measures, labs and baseline each give one line, under their case-file path")
    void everyEnteredValue_givesOneLineUnderItsPath() {
        Patient patient = new Patient("Invented patient, St. Alder Infirmary", Optional.of(Sex.FEMALE),
                Optional.of(71), Optional.of(Measurement.of(Analyte.HEIGHT, 64, "[in_i]")),
                Optional.of(Measurement.of(Analyte.WEIGHT, 58, "kg")));
        Labs labs = new Labs(Map.of(
                Analyte.IGM, Measurement.of(Analyte.IGM, 5.9, "g/dL"),
                Analyte.HEMATOCRIT, Measurement.of(Analyte.HEMATOCRIT, 29, "%")));
        Labs baseline = new Labs(Map.of(Analyte.POTASSIUM, Measurement.of(Analyte.POTASSIUM, 4.1, "mmol/L")));
        Case c = new Case(patient, Case.EMPTY.condition(), labs, baseline, Case.EMPTY.findings(), Case.EMPTY.plan(),
                Optional.empty(), "", "{}");

        List<InputLine> lines = Assessor.inputs(c);

        assertEquals(List.of("patient.height", "patient.weight", "labs.igm", "labs.hematocrit", "baseline.potassium"),
                lines.stream().map(InputLine::path).toList());
        // international inch = 2.54 cm exactly (UCUM 2.2, [in_i]): 64 in = 162.56 cm
        assertEquals(162.56, lines.get(0).canonical().value(), TOLERANCE);
        assertEquals("cm", lines.get(0).canonical().unit());
        assertEquals(64, lines.get(0).entered().value(), TOLERANCE);
        assertEquals("[in_i]", lines.get(0).entered().unit());
        // 1 dL = 0.1 L (SI), so 5.9 g/dL = 59 g/L
        assertEquals(59, lines.get(2).canonical().value(), TOLERANCE);
        assertEquals("g/L", lines.get(2).canonical().unit());
        // 1 % = 0.01 (UCUM 2.2), so 29 % = 0.29
        assertEquals(0.29, lines.get(3).canonical().value(), TOLERANCE);
        assertEquals("IgM", lines.get(2).label());
    }

    @Test
    @DisplayName("a case with nothing measured has no input lines")
    void emptyCase_hasNoLines() {
        assertTrue(Assessor.inputs(Case.EMPTY).isEmpty());
    }
}
