package org.stasissheet.rules;

import org.stasissheet.intake.Enums;

/**
 * How urgently a flag asks for attention, most urgent first. Every renderer shows the word and the symbol
 * together, never a colour alone. The symbols are plain ASCII so a pasted handoff keeps them.
 */
public enum Level implements Enums.Coded {
    ACT_NOW("act-now", "ACT NOW", "!!!"),
    REVIEW("review", "REVIEW", "!"),
    NOTE("note", "NOTE", "i");

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

    /** Symbol and word together, e.g. "[!!!] ACT NOW". */
    public String badge() {
        return "[" + symbol + "] " + word;
    }
}
