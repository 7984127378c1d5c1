package org.stasissheet.ui.entry;

/** How a field is entered and how its raw text is written into the case JSON. */
public enum FieldKind {
    /** Free text, written as a JSON string; left out when empty. */
    TEXT,
    /** A whole number such as the age, written as a JSON number when it reads as one, else as the text typed. */
    WHOLE,
    /** {@code {"value": …, "unit": UCUM}}: a number and a unit picker; left out when the number is empty. */
    QUANTITY,
    /** A word from a closed list, written as a JSON string; left out when "not entered". */
    CHOICE,
    /** An organ grade 0–3, written as a JSON number; left out when not assessed. */
    GRADE,
    /** A sign: yes / no / not assessed, written as true / false / left out. */
    SIGN,
    /** A yes/no switch that is always written (false unless ticked). */
    SWITCH,
    /** An ISO date (YYYY-MM-DD), written as a string; {@code null} when empty. */
    DATE,
    /** An ISO date and time with offset, written as a string; left out when empty. */
    DATE_TIME
}
