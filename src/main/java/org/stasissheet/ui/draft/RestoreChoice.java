package org.stasissheet.ui.draft;

/**
 * The answer to a draft left by a session that did not end cleanly. Only {@link #DELETE}, chosen in so many
 * words, removes it: closing the question or pressing Escape keeps it for the next start.
 */
public enum RestoreChoice {
    /** Put the draft into the form. */
    RESTORE,
    /** Leave the draft file where it is; it is offered again at the next start. */
    KEEP_FOR_LATER,
    /** Delete the draft file for good. */
    DELETE
}
