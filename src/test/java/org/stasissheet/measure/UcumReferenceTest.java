package org.stasissheet.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.InputStream;
import java.util.Arrays;
import java.util.Map;
import java.util.stream.Stream;
import org.fhir.ucum.Decimal;
import org.fhir.ucum.Pair;
import org.fhir.ucum.UcumEssenceService;
import org.fhir.ucum.UcumException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every unit code and every conversion factor of the analyte catalogue, checked against the UCUM reference
 * library org.fhir:ucum 1.0.10 (its bundled ucum-essence.xml, UCUM version 2.2).
 *
 * <p>Where UCUM alone cannot convert (mass ↔ amount of substance needs a molar mass), the check goes through
 * UCUM's own mol/g arithmetic with the published molar masses (IUPAC standard atomic weights): uric acid 168.11,
 * creatinine 113.12, phosphorus 30.974, calcium 40.078 g/mol. The one unit UCUM cannot relate at all,
 * {@code {rel}} (a viscosity ratio to water), is a project convention and is tested as such.
 */
class UcumReferenceTest {
    /** Relative tolerance: the factors are exact decimals or quotients of them; 1e-9 leaves room for double rounding only. */
    private static final double RELATIVE_TOLERANCE = 1e-9;

    /** Published molar masses, g/mol (IUPAC standard atomic weights), by the analytes converted with them. */
    private static final Map<Analyte, String> PUBLISHED_MOLAR_MASS = Map.of(
            Analyte.URIC_ACID, "168.11",
            Analyte.CREATININE, "113.12",
            Analyte.CREATININE_UPPER_LIMIT, "113.12",
            Analyte.PHOSPHATE, "30.974",
            Analyte.CALCIUM, "40.078");

    private static UcumEssenceService ucum;

    @BeforeAll
    static void loadUcum() throws Exception {
        try (InputStream essence = UcumEssenceService.class.getResourceAsStream("/ucum-essence.xml")) {
            assertNotNull(essence, "ucum-essence.xml ships inside org.fhir:ucum 1.0.10");
            ucum = new UcumEssenceService(essence);
        }
    }

    static Stream<Arguments> everyUnit() {
        return Arrays.stream(Analyte.values())
                .flatMap(a -> a.units().stream().map(u -> Arguments.of(a, u.ucum())));
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("everyUnit")
    @DisplayName("every accepted unit code is valid UCUM (UCUM reference library org.fhir:ucum 1.0.10)")
    void unitCodeIsValidUcum(Analyte analyte, String code) {
        assertNull(ucum.validate(code), () -> analyte + ": " + code + " rejected by UCUM: " + ucum.validate(code));
    }

    @Test
    @DisplayName("the serum-viscosity temperature unit Cel is valid UCUM (UCUM reference library org.fhir:ucum 1.0.10)")
    void celsiusIsValidUcum() {
        assertNull(ucum.validate("Cel"));
    }

    @Test
    @DisplayName("the reference library rejects a common non-UCUM spelling, so the validity check has teeth")
    void referenceRejectsNonUcumSpelling() {
        // UCUM reference library org.fhir:ucum 1.0.10: "x10^9/L" is how people type it, not a UCUM code
        assertNotNull(ucum.validate("x10^9/L"));
        assertNotNull(ucum.validate("mmHg"));
    }

    @ParameterizedTest(name = "{0}: 1 {1} → canonical")
    @MethodSource("everyUnit")
    @DisplayName("every conversion factor matches the UCUM reference library org.fhir:ucum 1.0.10")
    void factorMatchesUcum(Analyte analyte, String code) throws UcumException {
        double factor = analyte.unitOption(code).orElseThrow().toCanonical();
        String canonical = analyte.canonicalUnit();
        double expected;
        if (ucum.isComparable(code, canonical)) {
            // UCUM reference library org.fhir:ucum 1.0.10: direct conversion
            expected = ucumConvert(one(), code, canonical);
        } else if (PUBLISHED_MOLAR_MASS.containsKey(analyte)) {
            // mass ↔ amount: UCUM multiplies by 1/M in mol/g, then converts; M from IUPAC standard atomic weights
            expected = viaMolarMass(code, canonical, PUBLISHED_MOLAR_MASS.get(analyte));
        } else if (code.equals("{rel}")) {
            // not a conversion: a ratio to water is compared as reported (CASE-FORMAT.md); see the test below
            expected = 1;
        } else {
            fail(analyte + ": UCUM cannot relate " + code + " to " + canonical + " and no reference covers it");
            return;
        }
        assertEquals(expected, factor, Math.abs(expected) * RELATIVE_TOLERANCE,
                () -> analyte + ": 1 " + code + " in " + canonical);
    }

    @Test
    @DisplayName("{rel} is not convertible to cP in UCUM, so its factor 1 is the documented 'compared as reported' convention")
    void relativeViscosityIsAConventionNotAConversion() throws UcumException {
        // UCUM reference library org.fhir:ucum 1.0.10: an annotation is dimensionless, cP is g.m-1.s-1
        assertFalse(ucum.isComparable("{rel}", "cP"));
        UnitOption rel = Analyte.SERUM_VISCOSITY.unitOption("{rel}").orElseThrow();
        assertEquals(1.0, rel.toCanonical(), 0.0, "convention from CASE-FORMAT.md: compared as reported");
        assertTrue(rel.source().contains("compared as reported"));
    }

    @Test
    @DisplayName("mass and molar units really are incomparable in UCUM, so the molar-mass route is needed")
    void massAndMolarAreIncomparable() throws UcumException {
        // UCUM reference library org.fhir:ucum 1.0.10
        assertFalse(ucum.isComparable("mg/dL", "umol/L"));
        assertFalse(ucum.isComparable("mg/dL", "mmol/L"));
    }

    @ParameterizedTest(name = "{0} = {1} g/mol")
    @CsvSource({
        // IUPAC standard atomic weights (molar masses as given in the task's published list)
        "URIC_ACID, 168.11",
        "CREATININE, 113.12",
        "PHOSPHORUS, 30.974",
        "CALCIUM, 40.078",
    })
    @DisplayName("molar masses equal the published IUPAC values")
    void molarMassesArePublished(MolarMass mass, double gramsPerMole) {
        // exact: the constant is the published decimal itself
        assertEquals(gramsPerMole, mass.gramsPerMole(), 0.0);
    }

    @ParameterizedTest(name = "1 mg/dL {0} = {1} {2}")
    @CsvSource({
        // handbook factors (common clinical conversion tables): uric acid 59.48, creatinine 88.4,
        // phosphate 0.3229, calcium 0.2495; they agree with the IUPAC molar masses to 4 significant digits
        "URIC_ACID, 59.48, umol/L",
        "CREATININE, 88.4, umol/L",
        "PHOSPHATE, 0.3229, mmol/L",
        "CALCIUM, 0.2495, mmol/L",
    })
    @DisplayName("mg/dL factors agree with the usual clinical conversion table to 4 digits")
    void mgPerDlFactorsMatchHandbook(Analyte analyte, double handbook, String canonical) {
        assertEquals(canonical, analyte.canonicalUnit());
        double factor = analyte.unitOption("mg/dL").orElseThrow().toCanonical();
        assertEquals(handbook, factor, handbook * 5e-4, "clinical conversion table, 4 significant digits");
    }

    @Test
    @DisplayName("every canonical unit is itself one of the analyte's units, with factor 1")
    void canonicalUnitHasFactorOne() {
        for (Analyte a : Analyte.values()) {
            assertEquals(1.0, a.canonicalOption().toCanonical(), 0.0, a.key());
        }
    }

    private static Decimal one() throws UcumException {
        return new Decimal("1.00000000000000000000");
    }

    private static double ucumConvert(Decimal value, String from, String to) throws UcumException {
        return Double.parseDouble(ucum.convert(value, from, to).asDecimal());
    }

    private static double viaMolarMass(String from, String to, String gramsPerMole) throws UcumException {
        Decimal molesPerGram = one().divide(new Decimal(gramsPerMole + "000000000000000000"));
        Pair product;
        if (ucum.isComparable(from, "g/L")) {
            product = ucum.multiply(new Pair(one(), from), new Pair(molesPerGram, "mol/g"));
        } else {
            // from a molar unit to a mass unit: multiply by M in g/mol
            product = ucum.multiply(new Pair(one(), from), new Pair(new Decimal(gramsPerMole + "000000000000000000"), "g/mol"));
        }
        return ucumConvert(product.getValue(), product.getCode(), to);
    }
}
