package org.stasissheet.ui.course;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.util.Map;
import java.util.Objects;

/**
 * What the procedure fields of the course panel hold, as typed, and their course-file form. A number that does not
 * parse is written as text, so the course reader names the field and the value instead of the form guessing; an
 * empty field is left out, so a missing amount is refused by the reader as it is in a file.
 *
 * @param kind       {@link Kind}
 * @param at         the time as typed (ISO-8601 with offset)
 * @param volumeUnit {@code L} or {@code mL}
 * @param replacement the file word of the replacement fluid ({@code albumin}, {@code plasma},
 *                    {@code albumin-and-plasma})
 */
public record ProcedureFields(Kind kind, String at, String plasmaVolumes, String volume, String volumeUnit,
                              String replacement, String bloodVolumesProcessed) {
    /** The procedures the form adds: the two that remove what the course follows. */
    public enum Kind {
        PLASMA_EXCHANGE("plasma-exchange", "plasma exchange"), LEUKAPHERESIS("leukapheresis", "leukapheresis");

        private final String code;
        private final String words;

        Kind(String code, String words) {
            this.code = code;
            this.words = words;
        }

        public String code() {
            return code;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    /** The panel's label for each key the reader may name (its path below the procedure). */
    private static final Map<String, String> LABELS = Map.of(
            "", "New procedure",
            ".at", "Time of the procedure",
            ".plasmaVolumes", "Plasma volumes",
            ".volume", "Volume removed",
            ".volume.value", "Volume removed",
            ".volume.unit", "Volume removed (unit)",
            ".replacement", "Replacement fluid",
            ".bloodVolumesProcessed", "Blood volumes processed");

    public ProcedureFields {
        Objects.requireNonNull(kind, "kind");
        at = clean(at);
        plasmaVolumes = clean(plasmaVolumes);
        volume = clean(volume);
        volumeUnit = clean(volumeUnit);
        replacement = clean(replacement);
        bloodVolumesProcessed = clean(bloodVolumesProcessed);
    }

    static String label(String pathBelowProcedure) {
        return LABELS.getOrDefault(pathBelowProcedure, "New procedure " + pathBelowProcedure);
    }

    /** The reader's message with the file's keys named as the panel labels its fields. */
    static String inFieldWords(String message) {
        return message.replace("plasmaVolumes", "Plasma volumes").replace("bloodVolumesProcessed",
                "Blood volumes processed").replace("or volume (", "or Volume removed (");
    }

    /** The procedure entry of a course file, with only what was typed for this kind. */
    ObjectNode toJson() {
        ObjectNode p = JsonNodeFactory.instance.objectNode();
        if (!at.isEmpty()) {
            p.put("at", at);
        }
        p.put("kind", kind.code());
        if (kind == Kind.PLASMA_EXCHANGE) {
            number(p, "plasmaVolumes", plasmaVolumes);
            if (!volume.isEmpty()) {
                ObjectNode v = p.putObject("volume");
                number(v, "value", volume);
                v.put("unit", volumeUnit);
            }
            if (!replacement.isEmpty()) {
                p.put("replacement", replacement);
            }
        } else {
            number(p, "bloodVolumesProcessed", bloodVolumesProcessed);
        }
        return p;
    }

    /** In words, for the status line. */
    String describe() {
        String amount = kind == Kind.LEUKAPHERESIS ? bloodVolumesProcessed + " blood volumes processed"
                : !plasmaVolumes.isEmpty() ? plasmaVolumes + " plasma volumes" : volume + " " + volumeUnit + " removed";
        return kind + " at " + at + ", " + amount;
    }

    private static void number(ObjectNode into, String key, String text) {
        if (text.isEmpty()) {
            return;
        }
        try {
            into.put(key, new BigDecimal(text));
        } catch (NumberFormatException notANumber) {
            into.put(key, text);
        }
    }

    private static String clean(String s) {
        return s == null ? "" : s.trim();
    }
}
