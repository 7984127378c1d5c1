package org.stasissheet.worksheet;

import java.util.List;

/** The standing cautions: the same words on every screen, every PDF page and every text output. */
public final class Cautions {
    private Cautions() {
    }

    /** One line that fits a page footer or a status bar. */
    public static final String SHORT = "Decision support only: it supports, and never replaces, clinical judgement, "
            + "local protocols and licensed practice.";

    public static final List<String> STANDING = List.of(
            SHORT,
            "Check every value against the source documents before acting on this sheet.",
            "In an emergency, act on the clinical picture: a normal-looking sheet never rules out hyperviscosity "
                    + "or leukostasis.",
            "Serum viscosity is compared on the scale the laboratory reported (cP or relative to water); "
                    + "thresholds assume that scale.");
}
