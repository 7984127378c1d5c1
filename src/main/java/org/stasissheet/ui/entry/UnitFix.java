package org.stasissheet.ui.entry;

import java.util.Objects;

/**
 * A one-click correction for an implausible value: the same number read in another accepted unit, which makes it
 * plausible (e.g. 150000 in ×10⁹/L becomes 150000 /µL = 150 ×10⁹/L).
 *
 * @param ucum      the unit code to switch to
 * @param display   the unit as clinicians write it, e.g. {@code /µL}
 * @param canonical the value it then means, in the analyte's canonical unit, for the button's help text
 */
public record UnitFix(String ucum, String display, String canonical) {
    public UnitFix {
        Objects.requireNonNull(ucum, "ucum");
        Objects.requireNonNull(display, "display");
        Objects.requireNonNull(canonical, "canonical");
    }

    /** The button text. */
    public String label() {
        return "use " + display;
    }
}
