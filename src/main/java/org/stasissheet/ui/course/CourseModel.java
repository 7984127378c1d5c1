package org.stasissheet.ui.course;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.stasissheet.course.Course;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.course.CourseEntry;
import org.stasissheet.course.CourseReader;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.CourseWriter;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.intake.Findings;
import org.stasissheet.intake.Labs;
import org.stasissheet.ui.app.CaseSession;
import org.stasissheet.ui.entry.FormJson;
import org.stasissheet.ui.entry.FormState;
import org.stasissheet.worksheet.Worksheet;

/**
 * The view-model of the course of treatment in the form: the course as last complete, which of its assessments the
 * entry form shows, the core's report of it, the file it belongs to and whether it has unsaved changes.
 *
 * <p>The entry form edits one assessment at a time; whenever the form holds a complete case with its time, that
 * assessment of the course is replaced by it (and the patient and condition of every assessment follow, as a course
 * holds them once). While the form has problems the course keeps its last complete version and says so, and it is
 * not saved. Procedures are checked by {@link CourseReader} exactly as in a file, so its messages are the ones the
 * command line gives. Everything is computed by the course package; this class only holds and hands over. It runs
 * on the JavaFX thread.
 */
public final class CourseModel {
    /** The draft of a course (the course as last complete, the form as typed, which assessment it shows). */
    static final String DRAFT_FORMAT = "stasis-sheet-course-draft/1";
    private static final ObjectMapper JSON = new ObjectMapper();

    private final CaseSession session;
    private final ReadOnlyObjectWrapper<Optional<Course>> course =
            new ReadOnlyObjectWrapper<>(this, "course", Optional.empty());
    private final ReadOnlyObjectWrapper<Optional<CourseReport>> report =
            new ReadOnlyObjectWrapper<>(this, "report", Optional.empty());
    private final ReadOnlyObjectWrapper<Optional<Path>> document =
            new ReadOnlyObjectWrapper<>(this, "document", Optional.empty());
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty", false);
    private final ReadOnlyBooleanWrapper formComplete = new ReadOnlyBooleanWrapper(this, "formComplete", true);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final ReadOnlyIntegerWrapper changes = new ReadOnlyIntegerWrapper(this, "changes", 0);
    /** The assessment the entry form shows, by its index among the course's assessments (time order). */
    private int editing;
    private byte[] savedJson = new byte[0];
    private boolean loadingForm;

    public CourseModel(CaseSession session) {
        this.session = Objects.requireNonNull(session, "session");
        session.completeCaseProperty().addListener((o, was, now) -> formChanged());
        // a recomputation ends with this tick, after the session showed the case alone: the course's worksheet of
        // the moment (with the course's tumor-lysis baseline) replaces it
        session.recomputationsProperty().addListener(o -> {
            formChanged();
            showSheet();
        });
        session.ruleSetProperty().addListener(o -> course.get().ifPresent(this::show));
    }

    /** The course as last complete; empty while the form holds a single case. */
    public ReadOnlyObjectProperty<Optional<Course>> courseProperty() {
        return course.getReadOnlyProperty();
    }

    /** The core's report of the course (verdicts per assessment, projections beside measured values). */
    public ReadOnlyObjectProperty<Optional<CourseReport>> reportProperty() {
        return report.getReadOnlyProperty();
    }

    /** The course file, empty until the course is saved or when it was restored from a draft without one. */
    public ReadOnlyObjectProperty<Optional<Path>> documentProperty() {
        return document.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    /** False while the assessment in the form has problems (the course then shows its last complete version). */
    public ReadOnlyBooleanProperty formCompleteProperty() {
        return formComplete.getReadOnlyProperty();
    }

    /** What the last command did or why it was refused, naming the field, the value and what to write. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** Ticks on every change of the course (for the autosave). */
    public ReadOnlyIntegerProperty changesProperty() {
        return changes.getReadOnlyProperty();
    }

    public boolean active() {
        return course.get().isPresent();
    }

    /**
     * The case of the assessment the form shows as the course assesses it (with the course's tumor-lysis baseline
     * when the entry has none); empty without a course or while the form has problems.
     */
    public Optional<Case> currentCase() {
        if (course.get().isEmpty() || !formComplete.get() || session.completeCaseProperty().get().isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(course.get().get().caseAt(editing));
    }

    /** The worksheet of {@link #currentCase()}, from the course report. */
    public Optional<Worksheet> currentWorksheet() {
        return currentCase().flatMap(c -> report.get().map(r -> r.worksheets().get(editing)));
    }

    /** Whether the form shows the course's latest assessment (its handoff note then carries the trend). */
    public boolean editingLatest() {
        return course.get().map(c -> editing == c.assessments().size() - 1).orElse(false);
    }

    private void showSheet() {
        currentWorksheet().ifPresent(w -> session.sheet().show(w, List.of()));
    }

    /** The index, among the assessments in time order, of the one the entry form shows. */
    public int editing() {
        return editing;
    }

    /** The file name people see for the course. */
    public String documentName() {
        return document.get().map(p -> p.getFileName().toString()).orElse("the unsaved course");
    }

    /**
     * Makes the open case the first assessment of a new course, at its own time or, when it has none, at
     * {@code timeText}. Refused (with the reason in {@link #messageProperty()}) while the case has problems.
     */
    public boolean start(String timeText) {
        session.recomputeNow();
        Optional<Case> complete = session.completeCaseProperty().get();
        if (complete.isEmpty()) {
            return refuse("Not made a course: the case has problems. Fix the entries marked PROBLEM first.");
        }
        Case c = complete.get();
        if (c.assessedAt().isEmpty()) {
            Optional<OffsetDateTime> at = time("Time of the first assessment", timeText);
            if (at.isEmpty()) {
                return false;
            }
            loadingForm = true;
            try {
                session.entry().field("assessedAt").textProperty().set(timeText.trim());
                session.recomputeNow();
            } finally {
                loadingForm = false;
            }
            Optional<Case> timed = session.completeCaseProperty().get();
            if (timed.isEmpty() || timed.get().assessedAt().isEmpty()) {
                return refuse("Not made a course: Assessed at \"" + timeText.trim() + "\" was refused; see the "
                        + "message beside the field.");
            }
            c = timed.get();
        }
        editing = 0;
        savedJson = new byte[0];
        document.set(Optional.empty());
        set(new Course(c.patient(), c.condition(), List.of(new CourseEntry.Assessment(c)), "{}"));
        message.set("Course started with the assessment of " + c.assessedAt().orElseThrow()
                + "; add later assessments and procedures, then save the course.");
        return true;
    }

    /**
     * Adds an assessment at {@code timeText} and shows it in the entry form. It keeps what a course holds once
     * (patient, condition) and what the latest assessment planned, its assessor and its tumor-lysis baseline; its
     * lab values and signs start empty, because a value copied from an earlier time would pass as measured or
     * examined at the new one.
     */
    public boolean addAssessment(String timeText) {
        if (!mayChange("No assessment added")) {
            return false;
        }
        Optional<OffsetDateTime> at = time("Time of the new assessment", timeText);
        if (at.isEmpty()) {
            return false;
        }
        Course now = course.get().orElseThrow();
        List<CourseEntry.Assessment> all = now.assessments();
        Case latest = all.get(all.size() - 1).moment();
        Case next = new Case(latest.patient(), latest.condition(), Labs.NONE, latest.baseline(), Findings.NOT_ASSESSED,
                latest.plan(), Optional.of(at.get()), latest.assessor(), "{}");
        CourseEntry.Assessment added = new CourseEntry.Assessment(next);
        List<CourseEntry> entries = new ArrayList<>(now.entries());
        entries.add(added);
        Course grown = new Course(now.patient(), now.condition(), entries, now.extraJson());
        editing = indexOf(grown, added);
        set(grown);
        loadForm(next);
        message.set("Assessment of " + at.get() + " added and shown in the form: enter what was measured and "
                + "examined then.");
        return true;
    }

    /**
     * Adds a procedure from the text of the procedure fields. The course with the new entry is written and read
     * back by {@link CourseReader}, so a procedure is refused for the same reasons, in the same words, as in a
     * file; nothing is added then and the fields keep what was typed.
     */
    public boolean addProcedure(ProcedureFields fields) {
        Objects.requireNonNull(fields, "fields");
        if (!mayChange("No procedure added")) {
            return false;
        }
        Course now = course.get().orElseThrow();
        ObjectNode root = tree(CourseWriter.write(now));
        ArrayNode entries = (ArrayNode) root.get("entries");
        int position = entries.size();
        entries.addObject().set("procedure", fields.toJson());
        CourseReader.Result read = CourseReader.read(bytes(root));
        if (read instanceof CourseReader.Rejected rejected) {
            List<String> lines = new ArrayList<>();
            String prefix = "entries[" + position + "].procedure";
            for (CaseReader.Problem p : rejected.problems()) {
                lines.add(p.path().startsWith(prefix)
                        ? ProcedureFields.label(p.path().substring(prefix.length())) + ": "
                        + ProcedureFields.inFieldWords(p.message()) : p.toString());
            }
            return refuse("Procedure not added. " + String.join(" ", lines));
        }
        Course grown = ((CourseReader.Accepted) read).course();
        set(grown);
        message.set("Procedure added: " + fields.describe() + ".");
        return true;
    }

    /**
     * Shows the assessment {@code n} (time order) in the entry form, to correct it. Refused while the form has
     * problems, so nothing typed is replaced.
     */
    public boolean edit(int n) {
        if (!mayChange("Not switched")) {
            return false;
        }
        List<CourseEntry.Assessment> all = course.get().orElseThrow().assessments();
        if (n < 0 || n >= all.size()) {
            return refuse("Not switched: the course has " + all.size() + " assessments.");
        }
        editing = n;
        loadForm(all.get(n).moment());
        message.set("The form shows the assessment of " + all.get(n).at() + ".");
        return true;
    }

    /** The course file's bytes as Save writes them; empty (with the reason) while the form has problems. */
    public Optional<byte[]> fileBytes() {
        session.recomputeNow();
        if (!formComplete.get() || course.get().isEmpty()) {
            refuse("The course was not saved: the assessment in the form has problems (or no time). Fix the entries "
                    + "marked PROBLEM; the autosaved draft keeps what you typed meanwhile.");
            return Optional.empty();
        }
        return Optional.of(CourseWriter.write(course.get().get()).getBytes(StandardCharsets.UTF_8));
    }

    /** The course has been written to {@code file}. */
    public void saved(Path file, byte[] json) {
        document.set(Optional.of(file));
        savedJson = json.clone();
        dirty.set(false);
        message.set("Course saved: " + file.getFileName());
    }

    /**
     * Opens a course read from {@code file} (or from the PDF it was embedded in, then with no file: Save asks
     * where); the entry form shows its latest assessment. Returns the reader's problems, empty when opened.
     */
    public List<String> open(byte[] json, Optional<Path> file) {
        CourseReader.Result read = CourseReader.read(json);
        if (read instanceof CourseReader.Rejected rejected) {
            return rejected.problems().stream().map(CaseReader.Problem::toString).toList();
        }
        Course opened = ((CourseReader.Accepted) read).course();
        editing = opened.assessments().size() - 1;
        document.set(file);
        set(opened);
        savedJson = file.isPresent() ? CourseWriter.write(opened).getBytes(StandardCharsets.UTF_8) : new byte[0];
        loadForm(opened.assessments().get(editing).moment());
        dirty.set(file.isEmpty());
        message.set("Course opened: " + opened.assessments().size() + " assessments, " + opened.procedures().size()
                + " procedures; the form shows the latest assessment.");
        return List.of();
    }

    /** Leaves the course: the form holds a single case again (after New case, or opening a case). */
    public void end() {
        course.set(Optional.empty());
        report.set(Optional.empty());
        document.set(Optional.empty());
        dirty.set(false);
        savedJson = new byte[0];
        message.set("");
        changes.set(changes.get() + 1);
    }

    /**
     * The autosaved draft: the course as last complete, the form as typed (mistakes and all) and which assessment
     * it shows, so a crash loses neither.
     */
    public byte[] draftJson() {
        ObjectNode d = JSON.createObjectNode();
        d.put("format", DRAFT_FORMAT);
        d.set("course", tree(CourseWriter.write(course.get().orElseThrow())));
        d.put("editing", editing);
        d.set("form", tree(new String(FormJson.write(session.entry().snapshot()), StandardCharsets.UTF_8)));
        document.get().ifPresent(p -> d.put("document", p.toAbsolutePath().toString()));
        return bytes(d);
    }

    /** Whether these draft bytes hold a course (rather than a single case). */
    public static boolean isCourseDraft(byte[] draft) {
        try {
            JsonNode n = JSON.readTree(draft);
            return n != null && DRAFT_FORMAT.equals(n.path("format").asText(""));
        } catch (IOException e) {
            return false;
        }
    }

    /**
     * Restores a course draft; false (nothing changed) when it cannot be read back. The restored course is not
     * saved anywhere yet, so it starts with unsaved changes.
     */
    public boolean restore(byte[] draft) {
        try {
            JsonNode d = JSON.readTree(draft);
            CourseReader.Result read = CourseReader.read(bytes(d.get("course")));
            Optional<FormState> form = FormJson.read(bytes(d.get("form")),
                    session.entry().unitSystemProperty().get());
            if (!(read instanceof CourseReader.Accepted accepted) || form.isEmpty()) {
                return false;
            }
            Course restored = accepted.course();
            if (restored.assessments().isEmpty()) {
                return false;
            }
            editing = Math.max(0, Math.min(d.path("editing").asInt(0), restored.assessments().size() - 1));
            String doc = d.path("document").asText("");
            document.set(doc.isBlank() ? Optional.empty() : Optional.of(Path.of(doc)));
            set(restored);
            savedJson = new byte[0];
            loadingForm = true;
            try {
                session.restore(form.get(), Optional.empty());
            } finally {
                loadingForm = false;
            }
            formChanged();
            dirty.set(true);
            message.set("Course restored from the draft: check it, then save the course.");
            return true;
        } catch (IOException | RuntimeException unreadable) {
            return false;
        }
    }

    /** The patient label written in a course draft ("" when there is none), for the restore question. */
    public static String labelOf(byte[] draft) {
        try {
            JsonNode n = JSON.readTree(draft);
            return n == null ? "" : n.path("course").path("patient").path("label").asText("");
        } catch (IOException e) {
            return "";
        }
    }

    /** Whether a course draft can be read back (checked before the user is offered it). */
    public boolean readable(byte[] draft) {
        try {
            JsonNode d = JSON.readTree(draft);
            return d != null && d.get("course") != null && d.get("form") != null
                    && CourseReader.read(bytes(d.get("course"))) instanceof CourseReader.Accepted
                    && FormJson.read(bytes(d.get("form")), session.entry().unitSystemProperty().get()).isPresent();
        } catch (IOException | RuntimeException unreadable) {
            return false;
        }
    }

    private void formChanged() {
        if (loadingForm || course.get().isEmpty()) {
            return;
        }
        Optional<Case> complete = session.completeCaseProperty().get();
        if (complete.isEmpty() || complete.get().assessedAt().isEmpty()) {
            formComplete.set(false);
            message.set(complete.isEmpty()
                    ? "The assessment in the form has problems: the course shows its last complete version until "
                    + "they are fixed."
                    : "Assessed at: every assessment in a course needs its time (ISO-8601 with offset, e.g. "
                    + "2026-06-11T14:00+02:00); the course shows its last complete version.");
            return;
        }
        formComplete.set(true);
        Course now = course.get().get();
        Case c = complete.get();
        CourseEntry.Assessment shown = now.assessments().get(editing);
        if (shown.moment().equals(c)) {
            return;
        }
        CourseEntry.Assessment replaced = new CourseEntry.Assessment(c);
        List<CourseEntry> entries = new ArrayList<>();
        for (CourseEntry e : now.entries()) {
            if (e == shown) {
                entries.add(replaced);
            } else if (e instanceof CourseEntry.Assessment a) {
                Case m = a.moment();
                entries.add(new CourseEntry.Assessment(new Case(c.patient(), c.condition(), m.labs(), m.baseline(),
                        m.findings(), m.plan(), m.assessedAt(), m.assessor(), m.extraJson())));
            } else {
                entries.add(e);
            }
        }
        Course changed = new Course(c.patient(), c.condition(), entries, now.extraJson());
        editing = indexOf(changed, replaced);
        set(changed);
    }

    private void set(Course c) {
        course.set(Optional.of(c));
        show(c);
        dirty.set(!Arrays.equals(CourseWriter.write(c).getBytes(StandardCharsets.UTF_8), savedJson));
        changes.set(changes.get() + 1);
    }

    private void show(Course c) {
        report.set(Optional.of(CourseAssessor.assess(c, session.ruleSetProperty().get())));
        showSheet();
    }

    private void loadForm(Case c) {
        Optional<FormState> state = FormJson.read(CaseWriter.write(c).getBytes(StandardCharsets.UTF_8),
                session.entry().unitSystemProperty().get());
        loadingForm = true;
        try {
            session.load(state.orElseThrow(), Optional.empty());
        } finally {
            loadingForm = false;
        }
        formComplete.set(true);
        showSheet();
    }

    private boolean mayChange(String what) {
        if (course.get().isEmpty()) {
            return refuse(what + ": there is no course yet. Make the open case a course first.");
        }
        session.recomputeNow();
        if (!formComplete.get()) {
            return refuse(what + ": the assessment in the form has problems (or no time). Fix the entries marked "
                    + "PROBLEM first, so nothing typed is lost.");
        }
        return true;
    }

    private Optional<OffsetDateTime> time(String field, String text) {
        String t = text == null ? "" : text.trim();
        if (t.isEmpty()) {
            refuse(field + ": missing; write the time as ISO-8601 with offset, e.g. 2026-06-11T14:00+02:00");
            return Optional.empty();
        }
        try {
            return Optional.of(OffsetDateTime.parse(t));
        } catch (DateTimeParseException e) {
            refuse(field + ": \"" + t + "\" is not an ISO-8601 time with offset; write it e.g. "
                    + "2026-06-11T14:00+02:00");
            return Optional.empty();
        }
    }

    private boolean refuse(String why) {
        message.set(why);
        return false;
    }

    private static int indexOf(Course c, CourseEntry.Assessment a) {
        List<CourseEntry.Assessment> all = c.assessments();
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i) == a) {
                return i;
            }
        }
        throw new IllegalStateException("the assessment is not in the course");
    }

    private static ObjectNode tree(String json) {
        try {
            return (ObjectNode) JSON.readTree(json);
        } catch (IOException e) {
            throw new IllegalStateException("the course writer wrote JSON that does not read back", e);
        }
    }

    private static byte[] bytes(JsonNode n) {
        try {
            return JSON.writeValueAsBytes(n);
        } catch (IOException e) {
            throw new IllegalStateException("JSON could not be written", e);
        }
    }
}
