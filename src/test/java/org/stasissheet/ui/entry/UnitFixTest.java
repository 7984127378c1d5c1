package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The fix buttons offer the units the reader's "did you mean" names. Expected values follow from the unit
 * definitions (1 µL = 10⁻⁶ L; 1 g/dL = 10 g/L) and the analyte catalogue's plausible ranges.
 */
class UnitFixTest {
    private static List<String> fixes(String path, String value, String unit) {
        FieldModel m = new FieldModel(FormFields.byPath(path).orElseThrow());
        m.textProperty().set(value);
        m.unitProperty().set(unit);
        return m.unitFixes().stream().map(UnitFix::ucum).toList();
    }

    @ParameterizedTest(name = "{0} {1} {2} -> {3}")
    @CsvSource(delimiter = ';', value = {
        // 150000 ×10⁹/L is implausible; in /µL (or /mm³, the same factor) it is 150 ×10⁹/L
        "labs.wbc; 150000; 10*9/L; /uL",
        // a plausible value needs no fix
        "labs.wbc; 150; 10*9/L; ''",
        // 4800 g/L IgM is implausible; 4800 mg/dL = 48 g/L
        "labs.igm; 4800; g/L; mg/dL",
        // not a number: nothing to offer
        "labs.wbc; lots; 10*9/L; ''",
    })
    @DisplayName("fixes for implausible values, one per distinct conversion factor")
    void fixesOffered(String path, String value, String unit, String expected) {
        List<String> want = expected.isEmpty() ? List.of() : List.of(expected.split(","));
        assertEquals(want, fixes(path, value, unit));
    }
}
