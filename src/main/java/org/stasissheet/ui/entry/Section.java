package org.stasissheet.ui.entry;

/** The groups of the entry side, in screen order; the case-file object each one fills. */
public enum Section {
    PATIENT("Patient", "patient", true),
    CONDITION("Condition", "condition", true),
    LABS("Laboratory values", "labs", true),
    FINDINGS("Symptoms and signs", "findings", true),
    PLAN("Plan", "plan", true),
    BASELINE("Values before therapy (baseline)", "baseline", false),
    RECORD("Record", "", true);

    private final String title;
    private final String jsonKey;
    private final boolean expandedAtStart;

    Section(String title, String jsonKey, boolean expandedAtStart) {
        this.title = title;
        this.jsonKey = jsonKey;
        this.expandedAtStart = expandedAtStart;
    }

    public String title() {
        return title;
    }

    /** The top-level key of the case file, empty for fields written at the top level. */
    public String jsonKey() {
        return jsonKey;
    }

    public boolean expandedAtStart() {
        return expandedAtStart;
    }
}
