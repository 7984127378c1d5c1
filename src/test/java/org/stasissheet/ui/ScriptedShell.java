package org.stasissheet.ui;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import org.stasissheet.ui.app.Shell;
import org.stasissheet.ui.draft.RestoreChoice;

/** A shell whose answers a test sets in advance, and which records every question it was asked. */
public final class ScriptedShell implements Shell {
    public final List<String> asked = new ArrayList<>();
    public final List<List<String>> problemsShown = new ArrayList<>();
    public final List<String> clipboard = new ArrayList<>();
    public boolean restore;
    /** The answer when {@link #restore} is false: closing the question, unless a test says otherwise. */
    public RestoreChoice declined = RestoreChoice.KEEP_FOR_LATER;
    public final Deque<UnsavedChoice> unsavedAnswers = new ArrayDeque<>();
    public final Deque<Path> files = new ArrayDeque<>();
    /** The folder each PDF export was suggested in. */
    public final List<Optional<Path>> pdfNear = new ArrayList<>();

    @Override
    public RestoreChoice offerRestore(String detail) {
        asked.add("restore: " + detail);
        return restore ? RestoreChoice.RESTORE : declined;
    }

    @Override
    public UnsavedChoice askUnsaved(String documentName) {
        asked.add("unsaved: " + documentName);
        return unsavedAnswers.isEmpty() ? UnsavedChoice.CANCEL : unsavedAnswers.pop();
    }

    @Override
    public Optional<Path> chooseCaseToOpen(Optional<Path> near) {
        asked.add("open");
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseCaseTarget(String suggestedName, Optional<Path> near) {
        asked.add("save as " + suggestedName);
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> choosePdfTarget(String suggestedName, Optional<Path> near) {
        asked.add("pdf " + suggestedName);
        pdfNear.add(near);
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseLabReport(Optional<Path> near) {
        asked.add("lab report");
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseRuleFolder(Optional<Path> near) {
        asked.add("rules");
        return Optional.ofNullable(files.poll());
    }

    @Override
    public void showProblems(String title, List<String> lines) {
        asked.add("problems: " + title);
        problemsShown.add(lines);
    }

    /** Answers to the assessor question, in order; none left: cancelled. */
    public final Deque<String> assessorAnswers = new ArrayDeque<>();

    @Override
    public Optional<String> askAssessor(String current) {
        asked.add("assessor: " + current);
        return Optional.ofNullable(assessorAnswers.poll());
    }

    @Override
    public void copyToClipboard(String text) {
        clipboard.add(text);
    }
}
