package org.stasissheet.ui.app;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import org.stasissheet.load.InvalidInputException;
import org.stasissheet.load.ToolVersion;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.report.HandoffNote;
import org.stasissheet.report.PdfOptions;
import org.stasissheet.report.WorksheetPdf;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.course.CourseReader;
import org.stasissheet.ui.course.CourseModel;
import org.stasissheet.ui.draft.Autosaver;
import org.stasissheet.ui.draft.DraftStore;
import org.stasissheet.ui.draft.RestoreDialog;
import org.stasissheet.ui.entry.AssessedTime;
import org.stasissheet.ui.entry.FormJson;
import org.stasissheet.ui.entry.FormState;
import org.stasissheet.worksheet.Worksheet;

/**
 * The commands of the window (new, open, save, export, copy the note, rule folder, close), each the same from
 * the menu, its shortcut and a test. File work runs on the {@link Background} thread; the form itself is only
 * touched on the JavaFX thread. Nothing typed is replaced without asking first.
 */
public final class Actions {
    private final CaseSession session;
    private final Shell shell;
    private final Background background;
    private final DraftStore drafts;
    private final Autosaver autosaver;
    private final PreferencesStore preferenceStore;
    private final ObjectProperty<Preferences> preferences;
    private final java.util.function.Function<Optional<Path>, RuleSet> ruleLoader;
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
    private final ObjectProperty<Optional<Path>> ruleFolder = new SimpleObjectProperty<>(this, "ruleFolder",
            Optional.empty());
    private final Clock clock;
    private final ZoneId zone;
    /** The course of treatment the form may hold instead of a single case (attached once by the window). */
    private CourseModel course;

    Actions(CaseSession session, Shell shell, Background background, DraftStore drafts, Autosaver autosaver,
            PreferencesStore preferenceStore, ObjectProperty<Preferences> preferences,
            java.util.function.Function<Optional<Path>, RuleSet> ruleLoader, Clock clock) {
        this.session = Objects.requireNonNull(session, "session");
        this.shell = Objects.requireNonNull(shell, "shell");
        this.background = Objects.requireNonNull(background, "background");
        this.drafts = Objects.requireNonNull(drafts, "drafts");
        this.autosaver = Objects.requireNonNull(autosaver, "autosaver");
        this.preferenceStore = Objects.requireNonNull(preferenceStore, "preferenceStore");
        this.preferences = Objects.requireNonNull(preferences, "preferences");
        this.ruleLoader = Objects.requireNonNull(ruleLoader, "ruleLoader");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.zone = clock.getZone();
        ruleFolder.set(preferences.get().ruleFolder());
    }

    /** Attaches the course model: from then on Save, open, replace and restore also know about a course. */
    void attachCourse(CourseModel model) {
        this.course = Objects.requireNonNull(model, "model");
    }

    private boolean inCourse() {
        return course != null && course.active();
    }

    /** Leaves a course when the form turns to a single case again. */
    private void endCourse() {
        if (course != null) {
            course.end();
        }
    }

    /** What the last command did, in words, for the status bar. */
    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** Puts a message from another part of the form (the register launcher) in the status bar. */
    void report(String message) {
        status.set(message);
    }

    /** The folder of the local protocol in use, empty for the shipped rule set. */
    public ObjectProperty<Optional<Path>> ruleFolderProperty() {
        return ruleFolder;
    }

    /** The file name people see for the form's case. */
    public String documentName() {
        return session.documentProperty().get().map(p -> p.getFileName().toString()).orElse("the unsaved case");
    }

    /** Asks before unsaved changes would be lost; false when the user cancelled (or a save was not made). */
    boolean mayReplace() {
        if (inCourse()) {
            // the course holds the form's assessment: it is the document to save, not the case alone
            if (!course.dirtyProperty().get()) {
                return true;
            }
            return switch (shell.askUnsaved(course.documentName())) {
                case SAVE -> saveCourseAndWait();
                case DISCARD -> true;
                case CANCEL -> false;
            };
        }
        if (!session.dirtyProperty().get()) {
            return true;
        }
        return switch (shell.askUnsaved(documentName())) {
            case SAVE -> saveAndWait();
            case DISCARD -> true;
            case CANCEL -> false;
        };
    }

    public void newCase() {
        if (!mayReplace()) {
            return;
        }
        endCourse();
        // the time and the author are recorded from the start; both stay editable
        session.load(FormJson.blank(preferences.get().units())
                .with("assessedAt", AssessedTime.now(clock))
                .with("assessor", preferences.get().assessor()), Optional.empty());
        markRunning();
        status.set("New case, assessed at " + AssessedTime.show(AssessedTime.now(clock)).time()
                + (preferences.get().assessor().isEmpty() ? " (no assessor set: Settings, Assessor for new cases)"
                : " by " + preferences.get().assessor()));
    }

    /** Asks for the assessor new cases start with, and keeps the answer in the preferences. */
    public void chooseAssessor() {
        shell.askAssessor(preferences.get().assessor()).ifPresent(name -> {
            updatePreferences(preferences.get().withAssessor(name));
            status.set(preferences.get().assessor().isEmpty() ? "New cases start without an assessor"
                    : "New cases start with assessor " + preferences.get().assessor());
        });
    }

    /** Opens a packaged demo case (not tied to any file: Save asks where). */
    public void openSample(String name) {
        if (!mayReplace()) {
            return;
        }
        Optional<FormState> state = Samples.read(name).flatMap(b -> FormJson.read(b, preferences.get().units()));
        if (state.isEmpty()) {
            shell.showProblems("The demo case could not be opened", List.of(name + " is not in this build."));
            return;
        }
        endCourse();
        session.load(state.get(), Optional.empty());
        markRunning();
        status.set("Demo case " + name + " (invented data; Save asks where to keep it)");
    }

    public void open() {
        if (!mayReplace()) {
            return;
        }
        Optional<Path> near = session.documentProperty().get().or(() -> preferences.get().recentFiles().stream()
                .findFirst());
        shell.chooseCaseToOpen(near).ifPresent(this::openFile);
    }

    /** Opens a case JSON or a worksheet PDF, without asking about unsaved changes (callers have asked). */
    public void openFile(Path file) {
        status.set("Opening " + file.getFileName() + "…");
        boolean pdfByName = file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".pdf");
        background.run(() -> CaseOpening.read(file, pdfByName), opened -> {
            boolean pdf = pdfByName || opened.fromPdf();
            if (opened.problems().isEmpty() && CourseReader.claimsToBeCourse(opened.caseJson())) {
                openCourse(file, pdf, opened.caseJson());
                return;
            }
            if (opened.problems().isEmpty()) {
                Optional<FormState> state = FormJson.read(opened.caseJson(), preferences.get().units());
                if (state.isPresent()) {
                    // A case read out of a PDF belongs to no case file: Save asks where.
                    endCourse();
                    session.load(state.get(), pdf ? Optional.empty() : Optional.of(file));
                    remember(file);
                    markRunning();
                    status.set("Opened " + file.getFileName() + (pdf ? " (the case inside the worksheet PDF)" : "")
                            + opened.warnings().stream().map(w -> ". Warning: " + w).collect(Collectors.joining()));
                    return;
                }
            }
            List<String> lines = new ArrayList<>(opened.problems());
            if (lines.isEmpty()) {
                CaseReader.Result r = CaseReader.read(opened.caseJson());
                if (r instanceof CaseReader.Rejected rejected) {
                    rejected.problems().forEach(p -> lines.add(p.toString()));
                } else {
                    lines.add("the file is not a JSON object");
                }
            }
            status.set("Not opened: " + file.getFileName());
            shell.showProblems(file.getFileName() + " was not opened; the form is unchanged", lines);
        }, e -> {
            status.set("Not opened: " + file.getFileName());
            shell.showProblems(file.getFileName() + " was not opened", List.of(oneLine(e)));
        });
    }

    /** Opens a course file (or the course inside a course PDF, which then belongs to no file). */
    private void openCourse(Path file, boolean pdf, byte[] json) {
        List<String> problems = course.open(json, pdf ? Optional.empty() : Optional.of(file));
        if (!problems.isEmpty()) {
            status.set("Not opened: " + file.getFileName());
            shell.showProblems(file.getFileName() + " was not opened; the form is unchanged", problems);
            return;
        }
        remember(file);
        markRunning();
        status.set("Opened the course " + file.getFileName() + (pdf ? " (the course inside the PDF)" : ""));
    }

    public void openRecent(Path file) {
        if (mayReplace()) {
            openFile(file);
        }
    }

    public void save() {
        if (inCourse()) {
            saveCourse(false);
            return;
        }
        Optional<Path> doc = session.documentProperty().get();
        if (doc.isPresent()) {
            write(doc.get(), () -> { });
        } else {
            saveAs();
        }
    }

    public void saveAs() {
        if (inCourse()) {
            saveCourse(true);
            return;
        }
        chooseTarget().ifPresent(p -> write(p, () -> { }));
    }

    /** Saves and waits for the write (before closing or replacing); false when nothing was saved. */
    boolean saveAndWait() {
        Optional<Path> target = session.documentProperty().get().or(this::chooseTarget);
        if (target.isEmpty()) {
            return false;
        }
        byte[] json = session.caseJson();
        try {
            Storage.writeDocument(target.get(), json); // the user is waiting for this one write before closing
            afterSave(target.get(), json);
            return true;
        } catch (IOException e) {
            shell.showProblems("The case was not saved", List.of(oneLine(e)));
            return false;
        }
    }

    /**
     * Saves the course (stasis-course/1, written atomically) on the background thread; refused, with the reason,
     * while the assessment in the form has problems, so a course is never saved without what the form shows.
     */
    public void saveCourse(boolean askWhere) {
        Optional<byte[]> json = course.fileBytes();
        if (json.isEmpty()) {
            status.set("Course NOT saved");
            shell.showProblems("The course was not saved", List.of(course.messageProperty().get()));
            return;
        }
        Optional<Path> target = askWhere ? Optional.empty() : course.documentProperty().get();
        target = target.or(this::chooseCourseTarget);
        if (target.isEmpty()) {
            return;
        }
        Path to = target.get();
        status.set("Saving " + to.getFileName() + "…");
        background.run(() -> {
            Storage.writeDocument(to, json.get());
            return to;
        }, saved -> afterCourseSave(saved, json.get()), e -> {
            status.set("Course NOT saved: " + oneLine(e));
            shell.showProblems("The course was not saved", List.of(oneLine(e)));
        });
    }

    private boolean saveCourseAndWait() {
        Optional<byte[]> json = course.fileBytes();
        if (json.isEmpty()) {
            shell.showProblems("The course was not saved", List.of(course.messageProperty().get()));
            return false;
        }
        Optional<Path> target = course.documentProperty().get().or(this::chooseCourseTarget);
        if (target.isEmpty()) {
            return false;
        }
        try {
            Storage.writeDocument(target.get(), json.get()); // the user is waiting for this one write
            afterCourseSave(target.get(), json.get());
            return true;
        } catch (IOException e) {
            shell.showProblems("The course was not saved", List.of(oneLine(e)));
            return false;
        }
    }

    private Optional<Path> chooseCourseTarget() {
        String suggested = session.entry().field("patient.label").textProperty().get()
                .replaceAll("[^A-Za-z0-9._-]+", "-").replaceAll("^-+|-+$", "");
        return shell.chooseCaseTarget((suggested.isEmpty() ? "course" : suggested + "-course") + ".json",
                course.documentProperty().get()).map(p -> withExtension(p, ".json"));
    }

    private void afterCourseSave(Path saved, byte[] json) {
        course.saved(saved, json);
        remember(saved);
        markRunning();
        autosaver.forget();
        background.run(() -> {
            drafts.discardDraft(); // the course file holds it now
            return saved;
        }, d -> { }, e -> { });
        status.set("Saved the course " + saved.getFileName());
    }

    private Optional<Path> chooseTarget() {
        String suggested = session.entry().field("patient.label").textProperty().get()
                .replaceAll("[^A-Za-z0-9._-]+", "-").replaceAll("^-+|-+$", "");
        return shell.chooseCaseTarget((suggested.isEmpty() ? "case" : suggested) + ".json",
                session.documentProperty().get()).map(p -> withExtension(p, ".json"));
    }

    private void write(Path target, Runnable then) {
        byte[] json = session.caseJson();
        status.set("Saving " + target.getFileName() + "…");
        background.run(() -> {
            Storage.writeDocument(target, json);
            return target;
        }, saved -> {
            afterSave(saved, json);
            then.run();
        }, e -> {
            status.set("NOT saved: " + oneLine(e));
            shell.showProblems("The case was not saved", List.of(oneLine(e)));
        });
    }

    private void afterSave(Path saved, byte[] json) {
        session.saved(saved, json);
        remember(saved);
        markRunning();
        autosaver.forget();
        background.run(() -> {
            drafts.discardDraft(); // the file holds it now
            return saved;
        }, d -> { }, e -> { });
        int problems = countProblems();
        status.set("Saved " + saved.getFileName() + (problems == 0 ? ""
                : " with " + problems + " PROBLEM(S): the command line will refuse the file until they are fixed"));
    }

    private int countProblems() {
        return CaseReader.read(session.caseJson()) instanceof CaseReader.Rejected r ? r.problems().size() : 0;
    }

    /**
     * Writes the worksheet PDF of the complete case (with the case file embedded, so the PDF can be opened again).
     * Rendering and writing run on the background thread; the form stays usable meanwhile.
     */
    public void exportPdf() {
        // in a course, the moment as the course assesses it (its tumor-lysis baseline), and that case embedded
        Optional<Worksheet> sheet = inCourse() ? course.currentWorksheet() : session.completeWorksheetProperty().get();
        if (sheet.isEmpty()) {
            shell.showProblems("No PDF: the case has problems", List.of(
                    "Fix the entries marked PROBLEM first: a PDF is only made of a complete case."));
            return;
        }
        // "<label>-<assessment date>.pdf" in the folder of the last export (else beside the case file)
        java.time.LocalDate day = sheet.get().source().assessedAt().map(java.time.OffsetDateTime::toLocalDate)
                .orElseGet(() -> java.time.LocalDate.now(clock));
        String suggested = org.stasissheet.files.ExportNames.pdf(sheet.get().source().patient().label(), day);
        Optional<Path> near = preferences.get().exportFolder().or(() -> session.documentProperty().get());
        Optional<Path> target = shell.choosePdfTarget(suggested, near).map(p -> withExtension(p, ".pdf"));
        if (target.isEmpty()) {
            return;
        }
        Optional<Path> folder = Optional.ofNullable(target.get().toAbsolutePath().getParent());
        if (!folder.equals(preferences.get().exportFolder())) {
            updatePreferences(preferences.get().withExportFolder(folder));
        }
        byte[] json = inCourse() ? org.stasissheet.intake.CaseWriter.write(course.currentCase().orElseThrow())
                .getBytes(StandardCharsets.UTF_8) : session.caseJson();
        OffsetDateTime now = OffsetDateTime.now(clock);
        Worksheet ws = sheet.get();
        status.set("Writing " + target.get().getFileName() + "…");
        background.run(() -> {
            byte[] pdf = WorksheetPdf.render(ws, PdfOptions.defaults(ToolVersion.get()), now, json);
            Storage.writeDocument(target.get(), pdf);
            return target.get();
        }, written -> status.set("PDF written: " + written), e -> {
            status.set("PDF NOT written: " + oneLine(e));
            shell.showProblems("The PDF was not written", List.of(oneLine(e)));
        });
    }

    /** Puts the handoff note of the complete case on the clipboard (without the patient label). */
    public void copyHandoffNote() {
        if (inCourse() && course.editingLatest() && course.currentWorksheet().isPresent()) {
            // the latest assessment of a course: its note with the trend line
            shell.copyToClipboard(org.stasissheet.report.CourseText.note(course.reportProperty().get().orElseThrow(),
                    false));
            status.set("Handoff note with the course's trend copied to the clipboard (no patient label in it)");
            return;
        }
        Optional<Worksheet> sheet = inCourse() ? course.currentWorksheet() : session.completeWorksheetProperty().get();
        if (sheet.isEmpty()) {
            shell.showProblems("No handoff note: the case has problems", List.of(
                    "Fix the entries marked PROBLEM first: a note is only written for a complete case."));
            return;
        }
        shell.copyToClipboard(HandoffNote.render(sheet.get(), false));
        status.set("Handoff note copied to the clipboard (no patient label in it)");
    }

    /** Loads the rule set of a folder the user picks; a refused set changes nothing and lists every problem. */
    public void chooseRuleFolder() {
        shell.chooseRuleFolder(ruleFolder.get()).ifPresent(this::useRuleFolder);
    }

    public void useRuleFolder(Path folder) {
        loadRules(Optional.of(folder));
    }

    public void useShippedRules() {
        loadRules(Optional.empty());
    }

    private void loadRules(Optional<Path> folder) {
        status.set("Loading rules " + folder.map(Path::toString).orElse("(shipped)") + "…");
        background.run(() -> ruleLoader.apply(folder), rules -> {
            session.ruleSetProperty().set(rules);
            ruleFolder.set(folder);
            updatePreferences(preferences.get().withRuleFolder(folder));
            status.set("Rules: " + rules.provenance().name() + " " + rules.provenance().version()
                    + (rules.provenance().local() ? " (LOCAL PROTOCOL)" : ""));
        }, e -> {
            List<String> lines = e instanceof InvalidInputException bad ? bad.lines() : List.of(oneLine(e));
            status.set("Rules not changed");
            shell.showProblems("The rule set was refused; the rules in use are unchanged", lines);
        });
    }

    void updatePreferences(Preferences p) {
        preferences.set(p);
        background.run(() -> {
            preferenceStore.save(p);
            return p;
        }, saved -> { }, e -> status.set("Preferences not saved: " + oneLine(e)));
    }

    private void remember(Path file) {
        updatePreferences(preferences.get().withRecent(file));
    }

    /** Records (in the session marker) which file the form belongs to, so a restored draft knows it. */
    void markRunning() {
        Optional<Path> doc = inCourse() ? course.documentProperty().get() : session.documentProperty().get();
        background.run(() -> {
            drafts.markRunning(doc);
            return doc;
        }, d -> { }, e -> status.set("Session marker not written: " + oneLine(e)));
    }

    /**
     * Offers the drafts left by sessions that did not end cleanly, newest first, until one is restored; true when
     * one was. A draft is deleted only when the user says so in words; closing the question keeps it, and the
     * drafts not yet offered, for the next start. A draft the form cannot read back is kept under another name
     * and named in the status bar.
     */
    boolean offerDraft() {
        List<DraftStore.Draft> found = drafts.crashedDrafts();
        List<String> notes = new ArrayList<>();
        boolean restored = false;
        boolean kept = false;
        for (int i = 0; i < found.size() && !restored && !kept; i++) {
            DraftStore.Draft d = found.get(i);
            boolean courseDraft = course != null && CourseModel.isCourseDraft(d.caseJson());
            Optional<FormState> state = courseDraft
                    ? (course.readable(d.caseJson()) ? Optional.of(FormState.BLANK) : Optional.empty())
                    : FormJson.read(d.caseJson(), preferences.get().units());
            if (state.isEmpty()) {
                try {
                    notes.add("A draft could not be read back; it was kept as " + drafts.setAside(d));
                } catch (IOException e) {
                    notes.add("A draft could not be read back and stays where it is: " + oneLine(e));
                }
                continue;
            }
            Path file = drafts.fileOf(d);
            String detail = (courseDraft ? "This is a draft of a course of treatment, not of a single case.\n\n" : "")
                    + RestoreDialog.text(d, courseDraft ? CourseModel.labelOf(d.caseJson()) : state.get().get("patient.label"),
                            file, zone, i + 1, found.size());
            switch (shell.offerRestore(detail)) {
                case RESTORE -> {
                    if (courseDraft) {
                        course.restore(d.caseJson());
                    } else {
                        session.restore(state.get(), d.document());
                    }
                    restored = true;
                    int left = found.size() - i - 1;
                    notes.add(0, "Draft restored: check it, then save" + (left == 0 ? "" : " (" + left + " more draft"
                            + (left == 1 ? "" : "s") + " will be offered at the next start)"));
                    try {
                        drafts.adopt(d);
                    } catch (IOException e) {
                        notes.add("the old draft file stays and will be offered again: " + oneLine(e));
                    }
                }
                case KEEP_FOR_LATER -> {
                    kept = true;
                    int left = found.size() - i;
                    notes.add(0, (left == 1 ? "Draft kept for later (" + file + ")"
                            : left + " drafts kept for later (" + file + " and others)")
                            + ": offered again at the next start");
                }
                case DELETE -> {
                    try {
                        drafts.discard(d);
                        notes.add("Draft deleted as asked: " + file);
                    } catch (IOException e) {
                        notes.add("Draft NOT deleted, it stays at " + file + ": " + oneLine(e));
                    }
                }
            }
        }
        if (!notes.isEmpty()) {
            status.set(String.join("; ", notes));
        }
        return restored;
    }

    /**
     * The window is asked to close. Unsaved changes are asked about; when closing goes ahead, pending writes
     * finish and the session ends cleanly (no draft is offered next time).
     *
     * @return true when the window may close
     */
    public boolean closeRequested() {
        if (!mayReplace()) {
            return false;
        }
        autosaver.cancel();
        background.drain(10, TimeUnit.SECONDS);
        try {
            drafts.endCleanly();
        } catch (IOException e) {
            // the next start offers the draft once more, which loses nothing
        }
        return true;
    }

    static Path withExtension(Path p, String ext) {
        String name = p.getFileName().toString();
        return name.toLowerCase(Locale.ROOT).endsWith(ext) ? p : p.resolveSibling(name + ext);
    }

    static String oneLine(Exception e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return m.replaceAll("\\s*\\R\\s*", " ").trim();
    }

    /**
     * What opening a file gave: the case as JSON bytes, or why not; {@code warnings} are what the reader should
     * know about a case that was opened (a worksheet PDF without the digest of its case).
     */
    record Opened(byte[] caseJson, List<String> problems, boolean fromPdf, List<String> warnings) {
        Opened {
            Objects.requireNonNull(caseJson, "caseJson");
            problems = List.copyOf(problems);
            warnings = List.copyOf(warnings);
        }

        Opened(byte[] caseJson, List<String> problems) {
            this(caseJson, problems, false, List.of());
        }
    }

    /** The file reads of {@link #openFile}, on the background thread. */
    static final class CaseOpening {
        /** The largest worksheet PDF read (the command line's limit too): 32 MiB. */
        static final long MAX_PDF_BYTES = WorksheetPdfs.MAX_PDF_BYTES;

        private CaseOpening() {
        }

        /** The case JSON of a case file, or of the case embedded in a worksheet PDF (by name or {@code %PDF}). */
        static Opened read(Path file, boolean pdfByName) throws IOException {
            if (Files.isDirectory(file)) {
                return new Opened(new byte[0], List.of(file.getFileName() + " is a folder, not a case file"));
            }
            if (!Files.isRegularFile(file)) {
                // a FIFO would block the form for ever; a device never ends
                return new Opened(new byte[0], List.of(file.getFileName() + " is not a regular file; it was not opened"));
            }
            long size = Files.size(file);
            if (size > MAX_PDF_BYTES || (!pdfByName && size > CaseReader.MAX_BYTES && !startsAsPdf(file))) {
                return new Opened(new byte[0], List.of(file.getFileName() + ": " + size
                        + " bytes is larger than a case file can be (" + CaseReader.MAX_BYTES + " bytes)"));
            }
            byte[] bytes = Files.readAllBytes(file);
            if (WorksheetPdfs.looksLikePdf(file, bytes)) {
                try {
                    WorksheetPdfs.ReadBack back = WorksheetPdfs.read(bytes);
                    // a course PDF embeds its course: returned as it is, for the course view to open
                    return new Opened(back.caseJson(), List.of(), true, back.warnings());
                } catch (IOException e) {
                    return new Opened(new byte[0], List.of(file.getFileName() + ": " + oneLine(e)));
                }
            }
            return new Opened(bytes, List.of());
        }

        private static boolean startsAsPdf(Path file) throws IOException {
            try (var in = Files.newInputStream(file)) {
                return WorksheetPdfs.startsWithPdfMagic(in.readNBytes(4));
            }
        }
    }

    static String text(byte[] b) {
        return new String(b, StandardCharsets.UTF_8);
    }
}
