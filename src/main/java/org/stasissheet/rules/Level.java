package org.stasissheet.rules;

import org.stasissheet.intake.Enums;

/**
 * How urgently a flag asks for attention, most urgent first. Every renderer shows the word and the mark together,
 * never a colour alone. The mark is our own three-step gauge of filled and open dots (three filled: act now), made
 * of two characters that survive copying into a plain-text note and print in the embedded font.
 */
public enum Level implements Enums.Coded {
    ACT_NOW("act-now", "ACT NOW", "●●●"),
    REVIEW("review", "REVIEW", "●●○"),
    NOTE("note", "NOTE", "●○○");

    private final String code;
    private final String word;
    private final String symbol;

    Level(String code, String word, String symbol) {
        this.code = code;
        this.word = word;
        this.symbol = symbol;
    }

    @Override
    public String code() {
        return code;
    }

    /** The word shown to people, e.g. "ACT NOW". */
    public String word() {
        return word;
    }

    public String symbol() {
        return symbol;
    }

    /** Mark and word together, e.g. "●●● ACT NOW". */
    public String badge() {
        return symbol + " " + word;
    }
}
