package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.measure.Analyte;

class FormFieldsTest {
    @ParameterizedTest(name = "{0} belongs to {1}")
    @CsvSource({
        "labs.wbc, labs.wbc",
        "labs.wbc.unit, labs.wbc",
        "labs.serumViscosity.temperature.value, labs.serumViscosity.temperature",
        "labs.serumViscosity.value, labs.serumViscosity",
        "patient.height.value, patient.height",
        "findings.seizure, findings.seizure",
    })
    @DisplayName("a reader message goes to the field with the longest matching path")
    void owning(String problemPath, String fieldPath) {
        assertEquals(fieldPath, FormFields.owning(problemPath).orElseThrow().path());
    }

    @Test
    @DisplayName("whole-file problems and unknown keys belong to no field")
    void unowned() {
        assertTrue(FormFields.owning("$").isEmpty());
        assertTrue(FormFields.owning("labs.wbcc").isEmpty());
        assertTrue(FormFields.owning("labs").isEmpty());
    }

    @Test
    @DisplayName("every lab analyte has a field under labs and under baseline, and paths are unique")
    void everyAnalyte() {
        for (Analyte a : Analyte.labs()) {
            assertTrue(FormFields.byPath("labs." + a.key()).isPresent(), a.key());
            assertTrue(FormFields.byPath("baseline." + a.key()).isPresent(), a.key());
        }
        Set<String> paths = new HashSet<>();
        FormFields.all().forEach(f -> assertTrue(paths.add(f.path()), f.path()));
    }
}
