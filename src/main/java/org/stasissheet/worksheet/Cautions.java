package org.stasissheet.worksheet;

import java.util.List;

/** The standing cautions: the same words on every screen, every PDF page and every text output. */
public final class Cautions {
    private Cautions() {
    }

    /** One line that fits a page footer or a status bar. */
    public static final String SHORT = "Decision support only: it supports, and never replaces, clinical judgement, "
            + "local protocols and licensed practice.";

    /**
     * Shown wherever the leukostasis organ grades show (form, text, PDF): the per-organ descriptors and the
     * combination rule were not found in Novotny 2005's text, so they are ours and unverified (README, "Still
     * unverified").
     */
    public static final String GRADING_UNVERIFIED = "Organ-grade descriptors and the combination rule (overall = "
            + "highest organ grade): unverified — check the source (Novotny JR et al., Eur J Haematol "
            + "2005;74(6):501–510).";

    public static final List<String> STANDING = List.of(
            SHORT,
            "Check every value against the source documents before acting on this sheet.",
            "In an emergency, act on the clinical picture: a normal-looking sheet never rules out hyperviscosity "
                    + "or leukostasis.",
            "Serum viscosity is compared on the scale the laboratory reported (cP or relative to water); "
                    + "thresholds assume that scale.");
}
