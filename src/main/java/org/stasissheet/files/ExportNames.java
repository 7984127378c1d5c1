package org.stasissheet.files;

import java.time.LocalDate;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;

/**
 * File names suggested for what the form writes: "{@code <label>-<yyyy-MM-dd>.pdf}" from the patient label and the
 * assessment date, safe on every desktop file system. The label keeps its letters (any script), digits and a few
 * marks; path separators, control characters and the characters Windows forbids become a dash; the name is never
 * empty, never a device name, never starts or ends with a dot or a space, and its stem is at most
 * {@link #MAX_STEM} code points (file systems allow 255 bytes; UTF-8 takes up to 4 per character).
 */
public final class ExportNames {
    /** Code points kept of the label: 60 × 4 bytes + date and extension stays far below 255 bytes. */
    public static final int MAX_STEM = 60;
    static final String FALLBACK = "worksheet";
    /** Device names Windows refuses as file names, with or without an extension (common practice). */
    private static final Set<String> DEVICES = Set.of("CON", "PRN", "AUX", "NUL", "COM1", "COM2", "COM3", "COM4",
            "COM5", "COM6", "COM7", "COM8", "COM9", "LPT1", "LPT2", "LPT3", "LPT4", "LPT5", "LPT6", "LPT7", "LPT8",
            "LPT9");

    private ExportNames() {
    }

    /** "{@code <safe label>-<date>.pdf}"; the label part is "worksheet" when nothing usable is left of it. */
    public static String pdf(String label, LocalDate date) {
        Objects.requireNonNull(date, "date");
        return stem(label) + "-" + date + ".pdf";
    }

    /** The label made safe for a file name (see the class comment). */
    public static String stem(String label) {
        Objects.requireNonNull(label, "label");
        StringBuilder sb = new StringBuilder();
        label.codePoints().forEach(cp -> sb.appendCodePoint(allowed(cp) ? cp : '-'));
        String s = sb.toString().replaceAll("-{2,}", "-").replaceAll("^[-. ]+|[-. ]+$", "");
        if (s.codePointCount(0, s.length()) > MAX_STEM) {
            s = s.substring(0, s.offsetByCodePoints(0, MAX_STEM)).replaceAll("[-. ]+$", "");
        }
        if (s.isEmpty()) {
            return FALLBACK;
        }
        String device = s.split("\\.", 2)[0].toUpperCase(Locale.ROOT);
        return DEVICES.contains(device) ? "case-" + s : s;
    }

    private static boolean allowed(int cp) {
        if (Character.isLetterOrDigit(cp)) {
            return true;
        }
        // spaces become dashes too: a name without spaces survives shells and mail
        return cp == '.' || cp == '_' || cp == '-' || cp == '(' || cp == ')' || cp == '+';
    }
}
