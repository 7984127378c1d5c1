package org.stasissheet.intake;

/** What the team intends to do next, as far as it changes the cautions. Absent in the file means false. */
public record Plan(boolean rituximabPlanned, boolean transfusionPlanned) {
    public static final Plan NOTHING = new Plan(false, false);
}
