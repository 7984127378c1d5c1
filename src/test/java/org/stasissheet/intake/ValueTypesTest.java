package org.stasissheet.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.measure.Analyte;

/** The guarantees the intake records state in their comments, checked at their edges. */
class ValueTypesTest {

    private static Patient aged(int years) {
        return new Patient("", Optional.empty(), Optional.of(years), Optional.empty(), Optional.empty());
    }

    @ParameterizedTest(name = "age {0}: accepted {1}")
    @CsvSource({"-1, false", "0, true", "17, true", "18, true", "130, true", "131, false"})
    @DisplayName("age is whole years from 0 to 130 inclusive (Patient's contract)")
    void age_isBoundedInclusive(int years, boolean accepted) {
        if (accepted) {
            assertEquals(Optional.of(years), aged(years).ageYears());
        } else {
            assertThrows(IllegalArgumentException.class, () -> aged(years));
        }
    }

    // adulthood from 18 years for the tumor lysis limits: common practice (paediatric limits apply below)
    @ParameterizedTest(name = "age {0}: child {1}")
    @CsvSource({"0, true", "17, true", "18, false", "71, false"})
    void isChild_under18(int years, boolean child) {
        assertEquals(child, aged(years).isChild());
    }

    @Test
    @DisplayName("an unknown age is not a child")
    void unknownAge_isNotAChild() {
        assertFalse(Patient.UNKNOWN.isChild());
    }

    @Test
    @DisplayName("height and weight must be measurements of height and weight")
    void bodyMeasures_mustMatchTheirSlot() {
        Measurement weight = Measurement.of(Analyte.WEIGHT, 58, "kg");
        Measurement height = Measurement.of(Analyte.HEIGHT, 162, "cm");
        assertThrows(IllegalArgumentException.class,
                () -> new Patient("", Optional.empty(), Optional.empty(), Optional.of(weight), Optional.empty()));
        assertThrows(IllegalArgumentException.class,
                () -> new Patient("", Optional.empty(), Optional.empty(), Optional.empty(), Optional.of(height)));
        Patient ok = new Patient("", Optional.empty(), Optional.empty(), Optional.of(height), Optional.of(weight));
        assertEquals(Optional.of(height), ok.height());
    }

    @Test
    @DisplayName("labs: has, with and without add and remove exactly one analyte, leaving the original unchanged")
    void labs_withAndWithout() {
        Labs one = Labs.NONE.with(Measurement.of(Analyte.WBC, 7.2, "10*9/L"));
        Labs two = one.with(Measurement.of(Analyte.IGM, 5.9, "g/dL"));
        assertTrue(two.has(Analyte.WBC));
        assertTrue(two.has(Analyte.IGM));
        assertFalse(one.has(Analyte.IGM));
        Labs back = two.without(Analyte.IGM);
        assertEquals(one, back);
        assertTrue(back.has(Analyte.WBC));
        assertFalse(Labs.NONE.has(Analyte.WBC));
        // 5.9 g/dL = 59 g/L, since 1 dL = 0.1 L (SI)
        assertEquals(59, two.canonical(Analyte.IGM).orElseThrow(), 1e-9);
    }

    @Test
    @DisplayName("a lab filed under another analyte, or a body measure under labs, is refused")
    void labs_refuseMisfiledValues() {
        assertThrows(IllegalArgumentException.class,
                () -> new Labs(Map.of(Analyte.IGG, Measurement.of(Analyte.IGM, 5.9, "g/dL"))));
        assertThrows(IllegalArgumentException.class,
                () -> new Labs(Map.of(Analyte.HEIGHT, Measurement.of(Analyte.HEIGHT, 162, "cm"))));
    }
}
