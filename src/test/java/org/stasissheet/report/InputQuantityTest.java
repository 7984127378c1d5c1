package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.InputStream;
import org.fhir.ucum.Decimal;
import org.fhir.ucum.UcumEssenceService;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.measure.Quantity;

class InputQuantityTest {
    @Test
    @DisplayName("the inputs tables print UCUM codes, but UCUM's dimensionless unit 1 in words; text and PDF agree")
    void dimensionlessInWords() throws Exception {
        // reference: org.fhir:ucum 1.0.10 (UCUM 2.2): "1" is the dimensionless unit, and 22 % is 0.22 of it
        try (InputStream essence = UcumEssenceService.class.getResourceAsStream("/ucum-essence.xml")) {
            UcumEssenceService ucum = new UcumEssenceService(essence);
            assertEquals(0.22, Double.parseDouble(ucum.convert(new Decimal("22"), "%", "1").asDecimal()), 1e-12);
        }
        assertEquals("0.22 (fraction)", WorksheetText.format(new Quantity(0.22, "1")));
        assertEquals("182 ×10⁹/L", WorksheetText.format(new Quantity(182, "10*9/L")));
        assertEquals("541.3 µmol/L", WorksheetText.format(new Quantity(541.3, "umol/L")));
        assertEquals("22 %", WorksheetText.format(new Quantity(22, "%")));
        assertEquals(WorksheetText.format(new Quantity(0.22, "1")), WorksheetPdf.quantity(new Quantity(0.22, "1")));
    }
}
