package org.stasissheet.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Terminal safety: the control characters are those of ECMA-48 (C0 0x00–0x1F, DEL, C1 0x80–0x9F) and the
 * Unicode line separators and bidirectional controls (Unicode Standard Annex #9); the line bounds are ours.
 */
class TerminalTest {
    @Test
    @DisplayName("escapes C0, C1, DEL, separators and direction controls; keeps text, line breaks and tabs")
    void escapes() {
        assertEquals("a\\u001B[31mb\\u009B\\u007F\\u2028\\u202E\\u2066 é Ж\n\tz",
                Terminal.text("a\u001b[31mb\u009b\u007f\u2028\u202e\u2066 é Ж\n\tz"));
        assertEquals("one\\u000Atwo", Terminal.line("one\ntwo"), "inside one message line a break is escaped");
        assertEquals("a\r\nb", Terminal.text("a\r\nb"), "a Windows line end stays");
        assertEquals("a\\u000Db", Terminal.text("a\rb"), "a lone carriage return could overprint a line");
    }

    @Test
    @DisplayName("where the locale is ASCII, limits and units are spelled in ASCII, never printed as '?'")
    void spelledForAnAsciiLocale() {
        java.nio.charset.CharsetEncoder ascii = java.nio.charset.StandardCharsets.US_ASCII.newEncoder();
        // a limit's direction and a unit's power of ten must survive: "?" would hide both
        assertEquals("WBC >= 100 x10^9/L; K+ <= 6.5 mmol/L",
                Terminal.spelled("WBC ≥ 100 ×10⁹/L; K+ ≤ 6.5 mmol/L", ascii));
        assertEquals("x10^12/L, 37 degC, 250 umol/L, PaO2 -> SpO2",
                Terminal.spelled("×10¹²/L, 37 °C, 250 µmol/L, PaO₂ → SpO₂", ascii));
        assertEquals("*** ACT NOW  **. REVIEW  *.. NOTE", Terminal.spelled("●●● ACT NOW  ●●○ REVIEW  ●○○ NOTE", ascii));
        assertEquals("Muller-Beissenhirtz, -3 ... 5", Terminal.spelled("Müller-Beißenhirtz, −3 … 5", ascii));
        assertEquals("?", Terminal.spelled("Ж", ascii), "a letter with no ASCII spelling stays the encoder's mark");
        java.nio.charset.CharsetEncoder latin1 = java.nio.charset.StandardCharsets.ISO_8859_1.newEncoder();
        assertEquals(">= 100 ×10^9/L µmol/L", Terminal.spelled("≥ 100 ×10⁹/L µmol/L", latin1),
                "what the charset can show is kept as it is (× and µ are in Latin-1)");
    }

    @Test
    @DisplayName("the wrapped writer escapes whatever a command prints through it")
    void writer() {
        StringWriter target = new StringWriter();
        PrintWriter safe = Terminal.safe(target);
        safe.print("x\u001by");
        safe.print('\u0007');
        safe.flush();
        assertEquals("x\\u001By\\u0007", target.toString());
    }

    @Test
    @DisplayName("error reports: 120 lines pass as they are; 121 become 119 and '… and 2 more lines'")
    void lineCount() {
        List<String> atLimit = new ArrayList<>();
        for (int i = 0; i < Terminal.MAX_LINES; i++) {
            atLimit.add("line " + i);
        }
        assertEquals(atLimit, Terminal.lines(atLimit));
        List<String> beyond = new ArrayList<>(atLimit);
        beyond.add("one more");
        List<String> shown = Terminal.lines(beyond);
        assertEquals(Terminal.MAX_LINES, shown.size());
        assertEquals("… and 2 more lines", shown.get(Terminal.MAX_LINES - 1));
    }

    @Test
    @DisplayName("line length: 1,000 characters pass; 1,001 are cut with '…'")
    void lineLength() {
        String atLimit = "x".repeat(Terminal.MAX_LINE_CHARS);
        assertEquals(atLimit, Terminal.line(atLimit));
        String cut = Terminal.line(atLimit + "y");
        assertEquals(Terminal.MAX_LINE_CHARS + 1, cut.length());
        assertFalse(cut.contains("y"));
    }
}
