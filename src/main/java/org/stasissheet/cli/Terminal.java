package org.stasissheet.cli;

import java.nio.charset.Charset;
import java.nio.charset.CharsetEncoder;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * What the command line prints is made safe for a terminal here, in one place: text from a file may hold
 * control characters that move the cursor, recolour the screen or reverse the reading direction, or a line break
 * that makes a crafted value look like a separate problem line.
 */
final class Terminal {
    /** Most lines of one error report; the rest are counted ("… and N more"). */
    static final int MAX_LINES = 120;
    /** Longest line of an error report, in characters; a longer one is cut with "…". */
    static final int MAX_LINE_CHARS = 1_000;

    private Terminal() {
    }

    /** Multi-line output (a worksheet, a note): line breaks and tabs stay, every other control is escaped. */
    static String text(String s) {
        return escape(s, true);
    }

    /**
     * A writer that escapes as {@link #text} does, for everything a command prints: wrapped once around standard
     * output and standard error, so no command can forget it.
     */
    static java.io.PrintWriter safe(java.io.Writer target) {
        return new java.io.PrintWriter(new java.io.FilterWriter(target) {
            @Override
            public void write(int c) throws java.io.IOException {
                out.write(text(String.valueOf((char) c)));
            }

            @Override
            public void write(char[] buf, int off, int len) throws java.io.IOException {
                out.write(text(new String(buf, off, len)));
            }

            @Override
            public void write(String str, int off, int len) throws java.io.IOException {
                out.write(text(str.substring(off, off + len)));
            }
        }, true);
    }

    /**
     * Standard output or error as a writer in the machine's charset. Where that charset cannot show a character (an
     * ASCII locale, LANG unset), the character is spelled in ASCII rather than left to the encoder, which prints
     * "?": "WBC ? 100" would hide whether a limit is above or below.
     */
    static java.io.PrintWriter console(java.io.OutputStream stream) {
        Charset cs = Charset.defaultCharset();
        java.io.Writer target = new java.io.OutputStreamWriter(stream, cs);
        CharsetEncoder encoder = cs.newEncoder();
        if (encoder.canEncode("≥×µ●○→–—…⁹−·°÷≤₂³ö")) {
            return new java.io.PrintWriter(target, true);
        }
        return new java.io.PrintWriter(new java.io.FilterWriter(target) {
            @Override
            public void write(int c) throws java.io.IOException {
                out.write(spelled(String.valueOf((char) c), encoder));
            }

            @Override
            public void write(char[] buf, int off, int len) throws java.io.IOException {
                out.write(spelled(new String(buf, off, len), encoder));
            }

            @Override
            public void write(String str, int off, int len) throws java.io.IOException {
                out.write(spelled(str.substring(off, off + len), encoder));
            }
        }, true);
    }

    /** ASCII spellings of the characters the worksheet, the note and the messages use. */
    private static final Map<Character, String> SPELLED = Map.ofEntries(
            Map.entry('●', "*"), Map.entry('○', "."), Map.entry('×', "x"), Map.entry('−', "-"),
            Map.entry('µ', "u"), Map.entry('→', "->"), Map.entry('–', "-"), Map.entry('—', "--"),
            Map.entry('÷', "/"), Map.entry('≥', ">="), Map.entry('≤', "<="), Map.entry('·', "-"),
            Map.entry('°', "deg"), Map.entry('…', "..."), Map.entry('ß', "ss"), Map.entry('≈', "~"),
            Map.entry('±', "+/-"), Map.entry('‘', "'"), Map.entry('’', "'"), Map.entry('“', "\""),
            Map.entry('”', "\""), Map.entry('□', "[]"), Map.entry('△', "^"), Map.entry('▲', "^"));
    private static final String SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    private static final String SUBSCRIPTS = "₀₁₂₃₄₅₆₇₈₉";

    /** The text with every character the encoder cannot show spelled in ASCII ("×10⁹/L" becomes "x10^9/L"). */
    static String spelled(String s, CharsetEncoder encoder) {
        StringBuilder sb = new StringBuilder(s.length() + 8);
        boolean inSuperscript = false;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            int sup = SUPERSCRIPTS.indexOf(c);
            if (encoder.canEncode(c)) {
                sb.append(c);
            } else if (sup >= 0) {
                sb.append(inSuperscript ? "" : "^").append(sup);
            } else if (SUBSCRIPTS.indexOf(c) >= 0) {
                sb.append(SUBSCRIPTS.indexOf(c));
            } else if (SPELLED.containsKey(c)) {
                sb.append(SPELLED.get(c));
            } else {
                // a letter with a mark (ö, é): the letter alone; anything else stays the encoder's "?"
                String base = Normalizer.normalize(String.valueOf(c), Normalizer.Form.NFD).replaceAll("\\p{M}", "");
                sb.append(base.length() == 1 && base.charAt(0) < 128 ? base : "?");
            }
            inSuperscript = sup >= 0 && !encoder.canEncode(c);
        }
        return sb.toString();
    }

    /** One line of a message: line breaks are escaped too, and the line is cut at {@link #MAX_LINE_CHARS}. */
    static String line(String s) {
        String safe = escape(s, false);
        return safe.length() <= MAX_LINE_CHARS ? safe : safe.substring(0, MAX_LINE_CHARS) + "…";
    }

    /** The lines of an error report, each made safe, at most {@link #MAX_LINES} of them. */
    static List<String> lines(List<String> lines) {
        List<String> out = new ArrayList<>();
        int shown = lines.size() <= MAX_LINES ? lines.size() : MAX_LINES - 1;
        for (int i = 0; i < shown; i++) {
            out.add(line(lines.get(i)));
        }
        if (shown < lines.size()) {
            out.add("… and " + (lines.size() - shown) + " more lines");
        }
        return out;
    }

    private static String escape(String s, boolean keepBreaks) {
        StringBuilder sb = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean keep = !needsEscape(c) || keepBreaks && (c == '\n' || c == '\t' || c == '\r' && next(s, i) == '\n');
            if (keep) {
                if (sb != null) {
                    sb.append(c);
                }
                continue;
            }
            if (sb == null) {
                sb = new StringBuilder(s.length() + 16).append(s, 0, i);
            }
            sb.append(String.format(java.util.Locale.ROOT, "\\u%04X", (int) c));
        }
        return sb == null ? s : sb.toString();
    }

    private static char next(String s, int i) {
        return i + 1 < s.length() ? s.charAt(i + 1) : 0;
    }

    /** C0 and C1 controls, DEL, the Unicode line and paragraph separators and the bidirectional controls. */
    static boolean needsEscape(char c) {
        return c < 0x20 || c >= 0x7F && c <= 0x9F || c == 0x2028 || c == 0x2029
                || c >= 0x202A && c <= 0x202E || c >= 0x2066 && c <= 0x2069 || c == 0x200E || c == 0x200F
                || c == 0x061C;
    }
}
