package org.stasissheet.labs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.stasissheet.measure.Analyte;

/**
 * Real-looking result lines in the layouts of result screens and printed reports (English, German, French,
 * Spanish, Italian, Dutch and Nordic spellings; tabs, bars, semicolons; decimal point and comma; flags; ranges).
 * Each line either lands on the analyte, value and unit the line itself prints, or is asked, or is listed as not
 * understood. The expected value is read off the printed line; unit conversions are by definition (1 nL = 10⁻⁹ L,
 * 1 mg = 10⁻³ g, 1 µL = 10⁻⁶ L) as the UCUM specification defines the prefixes. Nothing may land on another
 * analyte.
 */
class PastedLinesTableTest {

    /** line ⟶ expected: "KEY VALUE UCUM" taken, "ASK KEY" asked, "BAD KEY" named but unreadable, "SKIP" not ours. */
    private static final String TABLE = """
            WBC 182.4 x10^9/L H                      ⟶ wbc 182.4 10*9/L
            K+  6,8 mmol/l                           ⟶ potassium 6.8 mmol/L
            IgM 48 g/L *                             ⟶ igm 48 g/L
            Hb 7.9 g/dL                              ⟶ hemoglobin 7.9 g/dL
            Plt 12 x10E9/L                           ⟶ platelets 12 10*9/L
            WBC\t182.4\tx10^9/L\tH\t[4.0-10.0]       ⟶ wbc 182.4 10*9/L
            Leukocytes (WBC)  182.4  ×10⁹/L  H       ⟶ wbc 182.4 10*9/L
            Leukozyten: 182,4 /nl H                  ⟶ wbc 182.4 10*9/L
            Leucocytes 182,4 G/L (4,0-10,0)          ⟶ wbc 182.4 10*9/L
            White cell count | 182.4 | 10*9/L | H    ⟶ wbc 182.4 10*9/L
            WBC 182.4 K/uL H                         ⟶ wbc 182.4 10*3/uL
            WBC 12400 /uL                            ⟶ wbc 12400 /uL
            B-Leukocyter 182,4 x10(9)/L              ⟶ SKIP-OR-BAD
            Blasts 78 %                              ⟶ blasts 78 %
            Blasten 78 %                             ⟶ blasts 78 %
            Blasts 12.3 x10^9/L                      ⟶ BAD blasts
            Absolute blasts 12.3 x10^9/L             ⟶ SKIP
            Hct 22 %                                 ⟶ hematocrit 22 %
            Hkt 0,22 l/l                             ⟶ hematocrit 0.22 L/L
            Haematocrit 0.22 L/L L [0.40-0.52]       ⟶ hematocrit 0.22 L/L
            Hct 0.22 %                               ⟶ ASK hematocrit
            Hämoglobin 74 g/l L                      ⟶ hemoglobin 74 g/L
            Hémoglobine 7,4 g/dL (13,0-17,0)         ⟶ hemoglobin 7.4 g/dL
            Hgb 7.4 g/dL L                           ⟶ hemoglobin 7.4 g/dL
            HbA1c 6.1 %                              ⟶ SKIP
            Hb A1c 43 mmol/mol                       ⟶ SKIP
            MCH 29 pg                                ⟶ SKIP
            Thrombozyten 38 G/l L                    ⟶ platelets 38 10*9/L
            Plaquettes 38 G/L                        ⟶ platelets 38 10*9/L
            Platelets 38000 /uL                      ⟶ platelets 38 10*9/L
            PLT 38 10^3/uL                           ⟶ platelets 38 10*3/uL
            Kalium 6,8 mmol/l H                      ⟶ potassium 6.8 mmol/L
            P-Kalium 6,8 mmol/L                      ⟶ potassium 6.8 mmol/L
            Potassium, serum 6.8 mEq/L HH            ⟶ potassium 6.8 meq/L
            K 6.8                                    ⟶ ASK potassium
            Natrium 128 mmol/l L                     ⟶ sodium 128 mmol/L
            Na+ 128 mval/l                           ⟶ sodium 128 meq/L
            Sodium 14 mmol/L                         ⟶ BAD sodium
            Uric acid 9.1 mg/dL H                    ⟶ uricAcid 9.1 mg/dL
            Harnsäure 541 µmol/l                     ⟶ uricAcid 541 umol/L
            Acide urique 541 umol/L                  ⟶ uricAcid 541 umol/L
            Phosphate 1.6 mmol/L H                   ⟶ phosphate 1.6 mmol/L
            Phosphat 4,9 mg/dl                       ⟶ phosphate 4.9 mg/dL
            Calcium 1.95 mmol/L L                    ⟶ calcium 1.95 mmol/L
            Ca 7.8 mg/dL                             ⟶ calcium 7.8 mg/dL
            Calcium (ionised) 1.02 mmol/L            ⟶ SKIP
            Ionized calcium 1.02 mmol/L              ⟶ SKIP
            Corrected calcium 2.10 mmol/L            ⟶ SKIP
            Creatinine 1.9 mg/dL H                   ⟶ creatinine 1.9 mg/dL
            Kreatinin 168 µmol/l [59-104]            ⟶ creatinine 168 umol/L
            Créatinine 168 umol/L                    ⟶ creatinine 168 umol/L
            Creatinine 0.168 mmol/L                  ⟶ creatinine 168 umol/L
            Urine creatinine 8.2 mmol/L              ⟶ SKIP
            Fibrinogen 1.6 g/L L                     ⟶ fibrinogen 1.6 g/L
            Fibrinogène 160 mg/dL                    ⟶ fibrinogen 160 mg/dL
            Fibrinogen (Clauss) 1,6 g/l              ⟶ fibrinogen 1.6 g/L
            PaO2 6.9 kPa L                           ⟶ pao2 6.9 kPa
            pO2 52 mmHg                              ⟶ SKIP
            pO2 (venous) 5.1 kPa                     ⟶ SKIP
            SpO2 96 %                                ⟶ spo2 96 %
            SaO2 88 %                                ⟶ SKIP
            Serum viscosity 5.6 cP H                 ⟶ serumViscosity 5.6 cP
            Viskosität 5,6 mPa·s                     ⟶ serumViscosity 5.6 mPa.s
            Plasma viscosity 2.1 mPa.s               ⟶ SKIP
            IgG 62 g/L H                             ⟶ igg 62 g/L
            IgA 4800 mg/dL                           ⟶ iga 4800 mg/dL
            IgA 48000 mg/L                           ⟶ iga 48 g/L
            Immunglobulin M 4,8 g/dl                 ⟶ igm 4.8 g/dL
            IgG3 4.1 g/L                             ⟶ SKIP
            M-protein 38 g/L                         ⟶ SKIP
            Total protein 112 g/L H                  ⟶ totalProtein 112 g/L
            Gesamteiweiß 11,2 g/dl                   ⟶ totalProtein 11.2 g/dL
            Protein C 80 %                           ⟶ SKIP
            Lymphocytes 92 %                         ⟶ SKIP
            LDH 1890 U/L H                           ⟶ SKIP
            Sodium pending                           ⟶ SKIP
            Hematology report 05.03.2026 23:10       ⟶ SKIP
            Hb <5 g/dL                               ⟶ BAD hemoglobin
            Platelets 1,234 x10^9/L                  ⟶ ASK platelets
            WBC 182.4 mmol/L                         ⟶ BAD wbc
            Hb 7.9 g/dL 8.1 g/dL                     ⟶ BAD hemoglobin
            """;

    record Row(String line, String expected) {
        @Override
        public String toString() {
            return line + " ⟶ " + expected;
        }
    }

    static Stream<Row> rows() {
        List<Row> rows = new ArrayList<>();
        for (String raw : TABLE.split("\n")) {
            if (raw.isBlank()) {
                continue;
            }
            String[] parts = raw.split("⟶");
            rows.add(new Row(parts[0].strip().replace("\\t", "\t"), parts[1].strip()));
        }
        return rows.stream();
    }

    @Test
    @DisplayName("the table holds at least 60 lines")
    void tableIsLargeEnough() {
        assertTrue(rows().count() >= 60, "rows: " + rows().count());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void eachLine_landsRightOrIsListed(Row row) {
        LabLine line = ReportText.readLine("line 1", row.line());
        String[] e = row.expected().split(" ");
        switch (e[0]) {
            case "SKIP" -> {
                LabLine.Left left = assertInstanceOf(LabLine.Left.class, line);
                assertTrue(left.named().isEmpty(), left.toString());
                assertTrue(!left.reason().isBlank());
            }
            case "SKIP-OR-BAD" -> assertInstanceOf(LabLine.Left.class, line);
            case "BAD" -> {
                LabLine.Left left = assertInstanceOf(LabLine.Left.class, line);
                assertEquals(Analyte.byKey(e[1]), left.named(), left.reason());
            }
            case "ASK" -> {
                LabLine.Asked asked = assertInstanceOf(LabLine.Asked.class, line);
                assertEquals(e[1], asked.analyte().key());
                assertTrue(asked.options().stream().allMatch(o -> o.reading().analyte().key().equals(e[1])));
            }
            default -> {
                LabLine.Taken taken = assertInstanceOf(LabLine.Taken.class, line, line::toString);
                assertEquals(e[0], taken.analyte().key(), "analyte");
                // tolerance: the values are decimal literals read back through double
                assertEquals(Double.parseDouble(e[1]), taken.value().entered().value(), 1e-9, "value");
                assertEquals(e[2], taken.value().entered().unit(), "unit");
            }
        }
    }

    @Test
    @DisplayName("the whole table pasted at once: nothing lands on an analyte its line does not name")
    void wholeTable_nothingOnTheWrongAnalyte() {
        List<Row> rows = rows().toList();
        StringBuilder text = new StringBuilder();
        rows.forEach(r -> text.append(r.line()).append('\n'));
        LabImport read = ReportText.read(text.toString());
        for (LabLine line : read.lines()) {
            int n = Integer.parseInt(line.where().replace("line ", "")) - 1;
            String expected = rows.get(n).expected().split(" ")[0];
            if (line instanceof LabLine.Taken t) {
                boolean derivedLimit = t.analyte() == Analyte.CREATININE_UPPER_LIMIT && expected.equals("creatinine");
                assertTrue(expected.equals(t.analyte().key()) || derivedLimit, rows.get(n) + " gave " + t);
            }
            if (line instanceof LabLine.Asked a) {
                assertTrue(a.options().stream().allMatch(o -> rowNames(rows, o.reading().where(), o.reading())),
                        a.toString());
            }
        }
    }

    private static boolean rowNames(List<Row> rows, String where, LabLine.Taken reading) {
        int n = Integer.parseInt(where.replace("line ", "")) - 1;
        String[] e = rows.get(n).expected().split(" ");
        String key = e[0].equals("ASK") || e[0].equals("BAD") ? e[1] : e[0];
        return key.equals(reading.analyte().key());
    }
}
