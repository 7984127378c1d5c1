package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.stasissheet.ui.draft.RestoreChoice;

/**
 * Everything the form asks of the desktop around its window: questions, file pickers, the clipboard. The real
 * one ({@link FxShell}) shows dialogs; tests hand in their own answers, so every path through a question can be
 * checked headless.
 */
public interface Shell {
    /** What to do with unsaved changes. */
    enum UnsavedChoice { SAVE, DISCARD, CANCEL }

    /**
     * A draft from a session that did not end cleanly was found.
     *
     * @param detail when it was saved, its patient label, which case file it belonged to and the draft file, in
     *               words
     * @return what to do with it; closing the question keeps it for later
     */
    RestoreChoice offerRestore(String detail);

    /** The form has changes that are not in a file; asked before they would be replaced or closed. */
    UnsavedChoice askUnsaved(String documentName);

    /** A case file, a course file (both JSON) or a worksheet or course PDF to open. */
    Optional<Path> chooseCaseToOpen(Optional<Path> near);

    /** Where to save the case JSON (or the course JSON while the form holds a course). */
    Optional<Path> chooseCaseTarget(String suggestedName, Optional<Path> near);

    /** Where to write the worksheet PDF. */
    Optional<Path> choosePdfTarget(String suggestedName, Optional<Path> near);

    /** A lab report to import: report text, a FHIR R4 Bundle or an HL7 v2 message. */
    Optional<Path> chooseLabReport(Optional<Path> near);

    /** A folder holding a local rule set. */
    Optional<Path> chooseRuleFolder(Optional<Path> near);

    /** Tells the user that something could not be done and why, one line per reason. */
    void showProblems(String title, List<String> lines);

    /**
     * The assessor new cases start with, asked in the settings.
     *
     * @param current the name kept now, empty when none
     * @return the new name (empty to keep none), or empty when the question was cancelled
     */
    Optional<String> askAssessor(String current);

    /** Puts text on the system clipboard. */
    void copyToClipboard(String text);
}
