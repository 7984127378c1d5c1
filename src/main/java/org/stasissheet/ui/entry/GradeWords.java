package org.stasissheet.ui.entry;

/**
 * The short descriptor beside each organ grade. The general meaning of 0–3 (none, slight, marked, severe) is
 * Novotny et al., Eur J Haematol 2005, as quoted by Piccirillo et al. 2009 [published, secondary].
 */
final class GradeWords {
    static final String HINT = "0 none · 1 slight · 2 marked · 3 severe; descriptors from memory";

    private GradeWords() {
    }

    static String descriptor(FormFields.Organ organ, int grade) {
        return switch (grade) {
            case 0 -> "none";
            case 1 -> "slight";
            case 2 -> "marked";
            case 3 -> "severe";
            default -> throw new IllegalArgumentException("grade must be 0–3, was " + grade);
        };
    }
}
