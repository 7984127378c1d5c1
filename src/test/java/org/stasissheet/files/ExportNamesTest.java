package org.stasissheet.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The suggested export name. What a file name may hold: POSIX forbids only '/' and NUL in a name; Windows also
 * forbids {@code < > : " / \ | ? *}, control characters 1–31, and the device names CON, PRN, AUX, NUL, COM1–9 and
 * LPT1–9 (from memory of the Windows file-naming documentation). Labels are invented.
 */
class ExportNamesTest {
    private static final LocalDate DAY = LocalDate.of(2026, 3, 5);

    @ParameterizedTest(name = "[{0}] -> {1}")
    @CsvSource(delimiterString = " => ", value = {
        "Demo patient C, ward 9 => Demo-patient-C-ward-9-2026-03-05.pdf",
        "bed 4 / JS => bed-4-JS-2026-03-05.pdf",
        "..\\..\\etc\\passwd => etc-passwd-2026-03-05.pdf",
        "a:b*c?d\"e<f>g|h => a-b-c-d-e-f-g-h-2026-03-05.pdf",
        "  .hidden.   => hidden-2026-03-05.pdf",
        "CON => case-CON-2026-03-05.pdf",
        "lpt1.txt => case-lpt1.txt-2026-03-05.pdf",
        "Ελένη Π., κλίνη 4 => Ελένη-Π.-κλίνη-4-2026-03-05.pdf",
        "/// => worksheet-2026-03-05.pdf"})
    void sanitised(String label, String expected) {
        assertEquals(expected, ExportNames.pdf(label, DAY));
    }

    @Test
    @DisplayName("an empty label gives worksheet-<date>.pdf")
    void emptyLabel() {
        assertEquals("worksheet-2026-03-05.pdf", ExportNames.pdf("", DAY));
    }

    @Test
    @DisplayName("control characters, tabs and line breaks never reach the name")
    void controlCharacters() {
        String name = ExportNames.pdf("bed\u00001\t2\n3\u001b[31m\u007f", DAY);
        assertEquals("bed-1-2-3-31m-2026-03-05.pdf", name);
        assertTrue(name.codePoints().noneMatch(Character::isISOControl));
    }

    @Test
    @DisplayName("a long label is cut to a safe length, never inside a character, and stays one file in its folder")
    void safeLength() {
        String label = "𝔄".repeat(200) + "x".repeat(300);
        String stem = ExportNames.stem(label);
        assertEquals(ExportNames.MAX_STEM, stem.codePointCount(0, stem.length()));
        assertFalse(Character.isHighSurrogate(stem.charAt(stem.length() - 1)));
        String name = ExportNames.pdf(label, DAY);
        assertTrue(name.getBytes(java.nio.charset.StandardCharsets.UTF_8).length <= 255);
        Path p = Path.of("/tmp").resolve(name);
        assertEquals(Path.of("/tmp"), p.getParent(), "no separator survives");
    }
}
