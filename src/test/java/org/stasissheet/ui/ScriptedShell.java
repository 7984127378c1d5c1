package org.stasissheet.ui;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import org.stasissheet.ui.app.Shell;

/** A shell whose answers a test sets in advance, and which records every question it was asked. */
public final class ScriptedShell implements Shell {
    public final List<String> asked = new ArrayList<>();
    public final List<List<String>> problemsShown = new ArrayList<>();
    public final List<String> clipboard = new ArrayList<>();
    public boolean restore;
    public final Deque<UnsavedChoice> unsavedAnswers = new ArrayDeque<>();
    public final Deque<Path> files = new ArrayDeque<>();
    /** The folder each PDF export was suggested in. */
    public final List<Optional<Path>> pdfNear = new ArrayList<>();

    @Override
    public boolean offerRestore(String detail) {
        asked.add("restore: " + detail);
        return restore;
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

    @Override
    public void copyToClipboard(String text) {
        clipboard.add(text);
    }
}
