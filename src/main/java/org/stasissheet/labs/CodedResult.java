package org.stasissheet.labs;

import java.math.BigDecimal;
import java.time.Instant;
import java.util.Objects;
import java.util.Optional;

/**
 * One result as a coded message carries it (a FHIR Observation, an HL7 v2 OBX segment), already taken apart by
 * the adapter that read the message. Strings are empty where the message had nothing.
 *
 * @param where      for people: "OBX 3", "Observation/k-1"
 * @param text       a one-line summary of the result as received
 * @param loinc      the LOINC code when the result carries one
 * @param label      the local code's text or display name, for results without LOINC
 * @param value      the numeric value, when there is one
 * @param comparator "&lt;", "&gt;" … when the value is a limit rather than a measurement
 * @param unitCode   the UCUM code when given
 * @param unitText   the unit as printed
 * @param status     the message's own status word (FHIR status, HL7 OBX-11)
 * @param refused    the adapter's reason not to use the result at all (cancelled, wrong status); empty if none
 * @param measuredAt when it was measured, for choosing the latest
 * @param time       the same, as the message wrote it (ISO-8601)
 */
public record CodedResult(String where, String text, Optional<String> loinc, String label, Optional<BigDecimal> value,
                          String comparator, String unitCode, String unitText, String flag, String range,
                          String refused, Optional<Instant> measuredAt, Optional<String> time) {
    public CodedResult {
        Objects.requireNonNull(where, "where");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(loinc, "loinc");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(comparator, "comparator");
        Objects.requireNonNull(unitCode, "unitCode");
        Objects.requireNonNull(unitText, "unitText");
        Objects.requireNonNull(flag, "flag");
        Objects.requireNonNull(range, "range");
        Objects.requireNonNull(refused, "refused");
        Objects.requireNonNull(measuredAt, "measuredAt");
        Objects.requireNonNull(time, "time");
    }
}
