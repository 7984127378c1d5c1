package org.stasissheet.labs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.stasissheet.intake.Measurement;
import org.stasissheet.measure.Analyte;

/** One value with its unit, as typed into a single field: the small API a form field can use. */
class ValueTextTest {

    @ParameterizedTest(name = "{0}: \"{1}\"")
    @CsvSource(delimiter = ';', textBlock = """
            # analyte; typed; value; UCUM unit  (expected: the number and unit as typed; UCUM codes per UCUM 2.2)
            PLATELETS;  180 x10^9/L;   180;   10*9/L
            PLATELETS;  180 ×10⁹/L;    180;   10*9/L
            PLATELETS;  180 G/L;       180;   10*9/L
            WBC;        182,4 /nl;     182.4; 10*9/L
            WBC;        182.4 K/µL;    182.4; 10*3/uL
            POTASSIUM;  6,8 mmol/l;    6.8;   mmol/L
            POTASSIUM;  6.8 mEq/L H;   6.8;   meq/L
            HEMOGLOBIN; 7.9 g/dL;      7.9;   g/dL
            HEMOGLOBIN; 79 g/l;        79;    g/L
            IGM;        4800 mg/dl;    4800;  mg/dL
            SERUM_VISCOSITY; 5.6 cP;   5.6;   cP
            HEMATOCRIT; 0,22 l/l;      0.22;  L/L
            PAO2;       52 mmHg;       52;    mm[Hg]
            CREATININE; 1.234,5 µmol/l; 1234.5; umol/L
            """)
    void typedValue_understood(Analyte analyte, String typed, double value, String ucum) {
        ValueReading.Understood u = assertInstanceOf(ValueReading.Understood.class, ValueText.read(analyte, typed));
        Measurement m = u.reading().value();
        assertEquals(analyte, m.analyte());
        assertEquals(value, m.entered().value(), 1e-9); // decimal literals read back through double
        assertEquals(ucum, m.entered().unit());
        assertEquals("", u.reading().where());
    }

    @Test
    @DisplayName("a number without its unit is asked, offering only the units that make it plausible")
    void noUnit_asked() {
        ValueReading.Choice c = assertInstanceOf(ValueReading.Choice.class, ValueText.read(Analyte.HEMOGLOBIN, "79"));
        // 79 g/dL = 790 g/L is outside the catalogue's plausible 10-250 g/L; 79 g/L is inside
        assertEquals(List.of("g/L"), c.options().stream().map(o -> o.reading().value().entered().unit()).toList());
    }

    @Test
    @DisplayName("'1,234' reads as 1.234 or 1234: both offered where plausible, never picked")
    void groupingOrDecimal_asked() {
        ValueReading.Choice c = assertInstanceOf(ValueReading.Choice.class,
                ValueText.read(Analyte.PLATELETS, "1,234 x10^9/L"));
        assertEquals(List.of(1.234, 1234.0), c.options().stream().map(o -> o.reading().value().entered().value())
                .toList());
    }

    @Test
    @DisplayName("an implausible value offers the unit that makes it plausible (the catalogue's own fix)")
    void implausible_offersTheUnitFix() {
        ValueReading.Choice c = assertInstanceOf(ValueReading.Choice.class,
                ValueText.read(Analyte.WBC, "150000 x10^9/L"));
        assertTrue(c.question().contains("150000 ×10⁹/L is not plausible for white cell count"), c.question());
        assertEquals(List.of("/uL"), c.options().stream().map(o -> o.reading().value().entered().unit()).toList());
    }

    @Test
    @DisplayName("an unknown unit is refused with the value, the unit and the accepted units")
    void unknownUnit_refusedWithAcceptedUnits() {
        ValueReading.NotUnderstood n = assertInstanceOf(ValueReading.NotUnderstood.class,
                ValueText.read(Analyte.HEMOGLOBIN, "4.9 mmol/L"));
        assertEquals("'mmol/L' is not a unit this reader knows for hemoglobin; accepted (UCUM codes): g/L, g/dL",
                n.reason());
    }

    @Test
    @DisplayName("a limit such as '<5' is not a measured value")
    void limit_refused() {
        assertInstanceOf(ValueReading.NotUnderstood.class, ValueText.read(Analyte.IGM, "<0.2 g/L"));
    }

    @Test
    @DisplayName("a flag and a reference range are kept as printed")
    void flagAndRange_kept() {
        ValueReading.Understood u = assertInstanceOf(ValueReading.Understood.class,
                ValueText.read(Analyte.POTASSIUM, "6,8 mmol/l H (3,5-5,1)"));
        assertEquals("H", u.reading().flag());
        assertEquals("(3,5-5,1)", u.reading().range());
    }
}
