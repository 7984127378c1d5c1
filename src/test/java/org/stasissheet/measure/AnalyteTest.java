package org.stasissheet.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class AnalyteTest {
    private static List<String> codes(List<UnitOption> units) {
        return units.stream().map(UnitOption::ucum).toList();
    }

    @Test
    @DisplayName("a white count of 150000 'x10^9/L' is plausible only per microlitre: /uL, once per factor")
    void wbcSlip_suggestsPerMicrolitre() {
        // /uL and /mm3 share the factor 0.001 (1 mm³ = 1 µL by definition): only the first is offered
        Analyte wbc = Analyte.WBC;
        assertEquals(List.of("/uL"), codes(wbc.unitsMakingPlausible(150000, wbc.unitOption("10*9/L").orElseThrow())));
    }

    @Test
    @DisplayName("a plausible value needs no other unit")
    void plausibleValue_noSuggestion() {
        assertTrue(Analyte.WBC.unitsMakingPlausible(150, Analyte.WBC.canonicalOption()).isEmpty());
    }

    @Test
    @DisplayName("a hematocrit of 29 entered as a fraction is plausible in %")
    void hematocritFraction_suggestsPercent() {
        Analyte h = Analyte.HEMATOCRIT;
        assertEquals(List.of("%"), codes(h.unitsMakingPlausible(29, h.unitOption("1").orElseThrow())));
    }

    @Test
    @DisplayName("a sodium of 14 fits no accepted unit")
    void noUnitFits_empty() {
        assertTrue(Analyte.SODIUM.unitsMakingPlausible(14, Analyte.SODIUM.canonicalOption()).isEmpty());
    }
}
