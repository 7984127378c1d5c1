package org.stasissheet.derived;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Sex;

@DisplayName("blood and plasma volume formulas")
class BloodVolumeTest {

    @Test
    @DisplayName("Nadler, man 180 cm 80 kg = 5.319 L (worked by hand)")
    void nadlerMan() {
        // by hand, Nadler 1962 male coefficients (DOMAIN.md §4):
        // 0.3669 × 1.8³ (5.832) = 2.13976; 0.03219 × 80 = 2.5752; + 0.6041 → 5.31906 L
        assertEquals(5.31906, BloodVolume.nadlerLitres(Sex.MALE, 180, 80), 1e-5);
    }

    @Test
    @DisplayName("Nadler, woman 162 cm 58 kg = 3.616 L (worked by hand)")
    void nadlerWoman() {
        // by hand, Nadler 1962 female coefficients (DOMAIN.md §4):
        // 0.3561 × 1.62³ (4.251528) = 1.51397; 0.03308 × 58 = 1.91864; + 0.1833 → 3.61591 L
        assertEquals(3.61591, BloodVolume.nadlerLitres(Sex.FEMALE, 162, 58), 1e-5);
    }

    @Test
    @DisplayName("Kaplan plasma volume, 58 kg at Hct 0.29 = 2.677 L (worked by hand)")
    void kaplan() {
        // by hand, Kaplan 1990 (DOMAIN.md §4): 0.065 × 58 × (1 − 0.29) = 3.77 × 0.71 = 2.6767 L
        assertEquals(2.6767, BloodVolume.kaplanPlasmaLitres(58, 0.29), 1e-9);
    }

    @Test
    @DisplayName("plasma volume from blood volume, 3.61591 L at Hct 0.29 = 2.5673 L (worked by hand)")
    void fromBloodVolume() {
        // by hand, TBV × (1 − Hct) (DOMAIN.md §4): 3.61591 × 0.71 = 2.567296 L
        assertEquals(2.567296, BloodVolume.plasmaFromBloodVolumeLitres(3.61591, 0.29), 1e-6);
    }

    @Test
    @DisplayName("bad inputs are rejected, naming the field")
    void rejectsBadInputs() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> BloodVolume.nadlerLitres(Sex.MALE, 0, 80));
        assertEquals("height must be a positive number of cm, was 0.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> BloodVolume.kaplanPlasmaLitres(58, 1.0));
        assertThrows(IllegalArgumentException.class, () -> BloodVolume.kaplanPlasmaLitres(-1, 0.3));
        assertThrows(NullPointerException.class, () -> BloodVolume.nadlerLitres(null, 170, 70));
    }
}
