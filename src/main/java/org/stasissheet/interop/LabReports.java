package org.stasissheet.interop;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import org.stasissheet.labs.LabImport;
import org.stasissheet.labs.ReportText;

/**
 * One entry point for a lab report in any of the three forms, told apart by content, not by file name: a JSON
 * object is a FHIR Bundle, a message starting with an {@code MSH} segment is HL7 v2, anything else is report
 * text.
 */
public final class LabReports {
    private LabReports() {
    }

    /** Largest report read, in bytes: a day of one patient's results is a few kilobytes. */
    public static final int MAX_BYTES = 1 << 20;

    public static LabImport read(byte[] bytes) {
        if (bytes.length > MAX_BYTES) {
            throw new ReportRefused("$: larger than " + MAX_BYTES + " bytes (1 MiB), the most a lab report may be");
        }
        String text = utf8(bytes);
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
            text = text.substring(1);
        }
        String start = text.stripLeading();
        if (start.startsWith("{")) {
            return FhirLabBundle.read(start);
        }
        if (start.startsWith("MSH")) {
            return Hl7Results.read(start);
        }
        if (start.isEmpty()) {
            throw new ReportRefused("$: the report is empty");
        }
        return ReportText.read(text);
    }

    private static String utf8(byte[] bytes) {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new ReportRefused("$: the report is not UTF-8 text; save it as UTF-8 and import again");
        }
    }
}
