package org.stasissheet.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The LOINC codes of the analyte catalogue. */
class LoincCodesTest {

    /**
     * LOINC's check digit (mod 10, as LOINC's users' guide describes it): double the digits in odd positions from the
     * right, append the others in front, sum all digits, and the check digit brings the sum to a multiple of 10.
     */
    static int checkDigit(String number) {
        StringBuilder odd = new StringBuilder();
        StringBuilder even = new StringBuilder();
        for (int i = number.length() - 1, position = 1; i >= 0; i--, position++) {
            (position % 2 == 1 ? odd : even).insert(0, number.charAt(i));
        }
        String digits = even + Long.toString(Long.parseLong(odd.toString()) * 2);
        int sum = digits.chars().map(c -> c - '0').sum();
        return (10 - sum % 10) % 10;
    }

    @Test
    @DisplayName("the check digit rule reproduces LOINC's published examples")
    void checkDigit_publishedExamples() {
        // the worked example of LOINC's users' guide, from memory: 12345 → check digit 5
        assertEquals(5, checkDigit("12345"));
        // codes printed in the FHIR R4 vital-signs profile: 8302-2 body height, 29463-7 body weight
        assertEquals(2, checkDigit("8302"));
        assertEquals(7, checkDigit("29463"));
    }

    @Test
    @DisplayName("every catalogue code has a valid check digit, a name and a basis, and names one analyte only")
    void everyCode_wellFormedAndUnique() {
        Set<String> seen = new HashSet<>();
        for (Analyte a : Analyte.values()) {
            for (LoincCode c : a.loincCodes()) {
                String[] parts = c.code().split("-");
                assertEquals(Integer.parseInt(parts[1]), checkDigit(parts[0]), c.code());
                assertFalse(c.name().isBlank());
                assertTrue(c.basis().startsWith("from memory") || c.basis().startsWith("published"), c.basis());
                assertTrue(seen.add(c.code()), "code listed twice: " + c.code());
                assertEquals(Optional.of(a), Analyte.byLoinc(c.code()));
            }
        }
    }

    @Test
    @DisplayName("every lab analyte but the lab's own upper limit has at least one code")
    void everyLab_hasACode() {
        for (Analyte a : Analyte.values()) {
            assertEquals(a != Analyte.CREATININE_UPPER_LIMIT, !a.loincCodes().isEmpty(), a.key());
        }
    }
}
