package org.stasissheet.ui.entry;

import org.stasissheet.rules.LeukostasisVerdict;
import org.stasissheet.worksheet.Cautions;

/**
 * The short descriptor beside each organ grade: the rule package's own words
 * ({@link LeukostasisVerdict#DESCRIPTORS}, unverified against Novotny 2005), so the form, the PDF and the rules say the same.
 */
final class GradeWords {
    static final String HINT = "0 none · 1 slight · 2 marked · 3 severe. " + Cautions.GRADING_UNVERIFIED;

    private GradeWords() {
    }

    static String descriptor(LeukostasisVerdict.Organ organ, int grade) {
        return LeukostasisVerdict.descriptor(organ, grade);
    }
}
