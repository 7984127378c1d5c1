package org.stasissheet.measure;

import java.util.Objects;

/**
 * One LOINC code that reports an analyte, with the name LOINC gives it and where that pairing was checked.
 *
 * @param code  the LOINC code, e.g. {@code 718-7}
 * @param name  LOINC's long common name, as far as it is known
 * @param basis where the code-to-name pairing comes from: a page that prints it, or "from memory"
 */
public record LoincCode(String code, String name, String basis) {
    /** LOINC's URI in FHIR and the coding-system name HL7 v2 uses for it. */
    public static final String FHIR_SYSTEM = "http://loinc.org";
    public static final String HL7_SYSTEM = "LN";

    public LoincCode {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(basis, "basis");
        if (!code.matches("\\d{1,7}-\\d")) {
            throw new IllegalArgumentException("not a LOINC code: " + code);
        }
    }
}
