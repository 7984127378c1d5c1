package org.stasissheet.ui.course;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.scene.chart.LineChart;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.course.AnalyteCheck;
import org.stasissheet.course.Course;
import org.stasissheet.course.CourseAssessor;
import org.stasissheet.course.CourseReader;
import org.stasissheet.course.CourseReport;
import org.stasissheet.course.CourseWriter;
import org.stasissheet.course.Projected;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.measure.Analyte;
import org.stasissheet.report.CourseText;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.stasissheet.ui.app.MainWindow;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The course of treatment in the form, driven headless: the published IgA myeloma course of Gertz MA, Blood
 * 2018;132(13):1379–1385 (13.6 cP, 3479 mL removed, 3.6 cP; 3535 mL removed, 1.8 cP) is built through the form and
 * checked against the course core's own report of the same course file ({@code courses/gertz-2018-iga.json}, as
 * {@code course.GertzCourseTest} assesses it) and against the values worked by hand there.
 */
class CourseFormTest extends FormFixture {
    private static final RuleSet RULES = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();

    @Start
    void start(Stage stage) {
        open(stage);
    }

    private static byte[] gertzBytes() throws IOException {
        try (InputStream in = CourseFormTest.class.getResourceAsStream("/courses/gertz-2018-iga.json")) {
            return in.readAllBytes();
        }
    }

    private static Course gertz() throws IOException {
        return ((CourseReader.Accepted) CourseReader.read(gertzBytes())).course();
    }

    private CourseModel course() {
        return window.course();
    }

    private void recompute() throws Exception {
        FormHarness.fx(() -> window.session().recomputeNow());
    }

    /** Types the measured values of one Gertz assessment into the form (what the published case gives). */
    private void typeGertzLabs(String viscosity) throws Exception {
        FormHarness.fx(() -> {
            var e = window.session().entry();
            e.field("labs.serumViscosity").textProperty().set(viscosity);
            e.field("labs.serumViscosity").unitProperty().set("cP");
            e.field("labs.serumViscosity.temperature").textProperty().set("37");
            e.field("labs.serumViscosity.temperature").unitProperty().set("Cel");
            e.field("labs.hemoglobin").textProperty().set("7.9");
            e.field("labs.hemoglobin").unitProperty().set("g/dL");
            e.field("labs.hematocrit").textProperty().set("23.7");
            e.field("labs.hematocrit").unitProperty().set("%");
        });
        recompute();
    }

    /** Opens the first Gertz assessment as a single case file. */
    private void openFirstGertzCase() throws Exception {
        Path file = data.resolve("gertz-first.json");
        Files.writeString(file, CaseWriter.write(gertz().caseAt(0)));
        FormHarness.fx(() -> window.actions().openFile(file));
        FormHarness.settle(window);
        assertFalse(course().active(), "a case file opens as a case");
    }

    private Path openGertzCourseFile() throws Exception {
        Path file = data.resolve("gertz-course.json");
        Files.write(file, gertzBytes());
        FormHarness.fx(() -> window.actions().openFile(file));
        FormHarness.settle(window);
        return file;
    }

    @Test
    @DisplayName("the Gertz course built in the form (case → course, two exchanges, two later assessments) gives "
            + "the core's table row for row: 3.51 and 2.14 cP right after, 7.70 and 2.90 cP after redistribution, "
            + "no review flag")
    void addAssessmentsAndProcedures() throws Exception {
        openFirstGertzCase();
        boolean[] ok = new boolean[6];
        FormHarness.fx(() -> ok[0] = course().start(""));
        assertTrue(ok[0], course().messageProperty().get());
        FormHarness.fx(() -> ok[1] = course().addProcedure(new ProcedureFields(ProcedureFields.Kind.PLASMA_EXCHANGE,
                "2026-06-11T10:00:00+02:00", "", "3479", "mL", "albumin", "")));
        assertTrue(ok[1], course().messageProperty().get());
        FormHarness.fx(() -> ok[2] = course().addAssessment("2026-06-11T14:00:00+02:00"));
        assertTrue(ok[2], course().messageProperty().get());
        assertEquals("2026-06-11T14:00+02:00",
                window.session().entry().field("assessedAt").textProperty().get().replace(":00+", "+"),
                "the form shows the new assessment with its own time");
        assertEquals("", window.session().entry().field("labs.serumViscosity").textProperty().get(),
                "no earlier value is carried into the later assessment");
        assertEquals("", window.session().entry().field("findings.mucosalBleeding").textProperty().get(),
                "no earlier sign either: it is examined again (the first assessment recorded bleeding)");
        assertEquals("not-examined", window.session().entry().field("findings.retinopathy").textProperty().get());
        assertEquals("Published case (Gertz 2018), no identifiers",
                window.session().entry().field("patient.label").textProperty().get(), "the patient stays");
        typeGertzLabs("3.6");
        FormHarness.fx(() -> ok[3] = course().addProcedure(new ProcedureFields(ProcedureFields.Kind.PLASMA_EXCHANGE,
                "2026-06-12T10:00:00+02:00", "", "3535", "mL", "albumin", "")));
        assertTrue(ok[3], course().messageProperty().get());
        FormHarness.fx(() -> ok[4] = course().addAssessment("2026-06-12T14:00:00+02:00"));
        assertTrue(ok[4], course().messageProperty().get());
        typeGertzLabs("1.8");

        CourseReport shown = course().reportProperty().get().orElseThrow();
        assertEquals(3, shown.course().assessments().size());
        assertEquals(2, shown.course().procedures().size());
        // the core's own report of the published course file: the same rows, cell for cell
        CourseReport core = CourseAssessor.assess(gertz(), RULES);
        CourseView view = viewOf(window);
        List<CourseRows.ReviewRow> table = List.copyOf(view.table().getItems());
        assertEquals(CourseRows.rows(core), table);
        assertEquals(2, table.size(), "one row per exchange (only serum viscosity was measured)");
        // Gertz course, worked by hand in GertzCourseTest: 3.51 cP right after, 7.70 cP after redistribution,
        // measured 3.6 cP (+2.5 %); second exchange 2.14 / 2.90 cP, measured 1.8 cP
        Projected first = check(shown, 0).projected().known().orElseThrow();
        assertEquals(3.51, first.low(), 0.01);
        assertEquals(7.70, first.high(), 0.01);
        assertTrue(table.get(0).projectedLow().contains("3.51 cP"), table.get(0).toString());
        assertTrue(table.get(0).measuredNext().startsWith("3.6 cP"), table.get(0).toString());
        double difference = check(shown, 0).next().orElseThrow().differenceFromLowPercent().orElseThrow();
        assertEquals(2.5, difference, 0.5, "(3.6 − 3.51) / 3.51, GertzCourseTest");
        assertTrue(table.get(0).difference().startsWith(CourseText.percent(difference) + " against low"),
                table.get(0).toString());
        assertTrue(table.get(1).projectedLow().contains("2.14 cP"), table.get(1).toString());
        assertTrue(table.get(1).projectedHigh().contains("2.9 cP"), table.get(1).toString());
        assertEquals("no", table.get(0).review());
        assertEquals("no", table.get(1).review());

        // one chart (serum viscosity, the only followed value measured): measured, both projections, procedures
        List<LineChart<Number, Number>> charts = view.charts();
        assertEquals(1, charts.size());
        LineChart<Number, Number> sv = charts.get(0);
        assertEquals(4, sv.getData().size());
        assertEquals(List.of(3, 2, 2, 2), sv.getData().stream().map(s -> s.getData().size()).toList(),
                "3 measured, 2 projected right after, 2 after redistribution, 2 procedures");
        assertEquals(13.6, sv.getData().get(0).getData().get(0).getYValue().doubleValue(), 1e-9);
        assertEquals(2.0, sv.getData().get(3).getData().get(0).getXValue().doubleValue(), 1e-9,
                "the first exchange 2 hours after the first assessment, on the time axis");
        assertTrue(course().dirtyProperty().get(), "not saved yet");
    }

    @Test
    @DisplayName("a plasma exchange with neither plasma volumes nor a volume is refused by the course reader's "
            + "rule, naming the field; an out-of-range amount names the field and the value; nothing is added")
    void procedureRefused(FxRobot robot) throws Exception {
        openFirstGertzCase();
        FormHarness.fx(() -> {
            window.showCourse();
            course().start("");
        });
        assertTrue(course().active());
        TextField time = robot.lookup("#course-procedure-time").query();
        FormHarness.fx(() -> time.setText("2026-06-11T10:00:00+02:00"));
        Button add = robot.lookup("#course-add-procedure").query();
        FormHarness.scrollTo(add);
        robot.clickOn(add);
        WaitForAsyncUtils.waitForFxEvents();
        String message = ((Label) robot.lookup("#course-message").query()).getText();
        // the course reader's message, its keys named as the panel labels the fields
        assertTrue(message.contains("New procedure: a plasma exchange needs Plasma volumes (0.5–2.0) or Volume "
                + "removed (in L or mL); neither is given"), message);
        assertTrue(message.contains("neither is given"), message);
        assertEquals(0, course().courseProperty().get().orElseThrow().procedures().size());
        assertEquals("2026-06-11T10:00:00+02:00", time.getText(), "what was typed stays");

        TextField volumes = robot.lookup("#course-procedure-plasma-volumes").query();
        FormHarness.fx(() -> volumes.setText("3"));
        robot.clickOn(add);
        WaitForAsyncUtils.waitForFxEvents();
        message = ((Label) robot.lookup("#course-message").query()).getText();
        assertTrue(message.contains("Plasma volumes: 3 plasma volumes is outside 0.5–2"), message);
        assertEquals(0, course().courseProperty().get().orElseThrow().procedures().size());

        FormHarness.fx(() -> volumes.setText("1.0"));
        robot.clickOn(add);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, course().courseProperty().get().orElseThrow().procedures().size());
        assertEquals("", time.getText(), "the fields are cleared once the procedure is added");
    }

    @Test
    @DisplayName("a case without a time asks for one before it becomes a course; a later assessment needs a time")
    void timesAreAskedFor() throws Exception {
        FormHarness.fx(() -> window.actions().newCase());
        // a new case starts with the current time; a case without one (time cleared) must be asked for it
        FormHarness.fx(() -> window.session().entry().field("assessedAt").textProperty().set(""));
        boolean[] ok = new boolean[3];
        FormHarness.fx(() -> ok[0] = course().start(""));
        assertFalse(ok[0]);
        assertTrue(course().messageProperty().get().startsWith("Time of the first assessment: missing"),
                course().messageProperty().get());
        FormHarness.fx(() -> ok[1] = course().start("yesterday"));
        assertFalse(ok[1]);
        assertTrue(course().messageProperty().get().contains("\"yesterday\" is not an ISO-8601 time"),
                course().messageProperty().get());
        FormHarness.fx(() -> ok[2] = course().start("2026-06-11T08:00+02:00"));
        assertTrue(ok[2], course().messageProperty().get());
        assertEquals("2026-06-11T08:00+02:00", window.session().entry().field("assessedAt").textProperty().get());
        FormHarness.fx(() -> ok[0] = course().addAssessment(" "));
        assertFalse(ok[0]);
        assertTrue(course().messageProperty().get().startsWith("Time of the new assessment: missing"));
        assertEquals(1, course().courseProperty().get().orElseThrow().assessments().size());
    }

    @Test
    @DisplayName("save writes the course file atomically; reopened, it is the same course (file bytes and the "
            + "course report) and the form shows its latest assessment")
    void saveAndReopen() throws Exception {
        openGertzCourseFile();
        assertTrue(course().active());
        assertFalse(course().dirtyProperty().get(), "as opened");
        assertEquals("1.8", window.session().entry().field("labs.serumViscosity").textProperty().get(),
                "the form shows the latest assessment");
        FormHarness.fx(() -> course().addProcedure(new ProcedureFields(ProcedureFields.Kind.PLASMA_EXCHANGE,
                "2026-06-13T10:00:00+02:00", "1.0", "", "mL", "albumin", "")));
        assertTrue(course().dirtyProperty().get());
        assertEquals("Stasis Sheet — course gertz-course.json • unsaved changes", window.stage().getTitle());
        Path target = data.resolve("saved").resolve("gertz-after");
        Files.createDirectories(target.getParent());
        shell.files.add(target);
        FormHarness.fx(() -> window.actions().saveAs());
        FormHarness.settle(window);
        Path written = data.resolve("saved").resolve("gertz-after.json");
        assertTrue(Files.exists(written), shell.asked.toString());
        byte[] bytes = Files.readAllBytes(written);
        Course saved = course().courseProperty().get().orElseThrow();
        assertEquals(CourseWriter.write(saved), new String(bytes, StandardCharsets.UTF_8));
        assertFalse(course().dirtyProperty().get());
        assertEquals("Stasis Sheet — course gertz-after.json", window.stage().getTitle());
        try (var left = Files.list(written.getParent())) {
            assertEquals(List.of(written), left.toList(), "no temporary file is left beside it");
        }

        FormHarness.fx(() -> window.actions().newCase());
        assertFalse(course().active());
        FormHarness.fx(() -> window.actions().openFile(written));
        FormHarness.settle(window);
        Course reopened = course().courseProperty().get().orElseThrow();
        assertEquals(saved, reopened);
        assertArrayEquals(bytes, CourseWriter.write(reopened).getBytes(StandardCharsets.UTF_8));
        assertEquals(CourseText.render(CourseAssessor.assess(saved, RULES)),
                CourseText.render(course().reportProperty().get().orElseThrow()));
        assertEquals(3, reopened.procedures().size());
        assertEquals(2, course().editing(), "the form shows the latest of the 3 assessments");
        assertFalse(course().dirtyProperty().get());
        assertEquals(java.util.Optional.of(written), course().documentProperty().get());
    }

    @Test
    @DisplayName("after a crash the course and the form as typed (a mistake included) are offered and restored; "
            + "a course with a mistake in the form is not saved")
    void recoverAfterCrash() throws Exception {
        openGertzCourseFile();
        FormHarness.fx(() -> {
            course().addProcedure(new ProcedureFields(ProcedureFields.Kind.PLASMA_EXCHANGE,
                    "2026-06-13T10:00:00+02:00", "", "3.5", "L", "albumin", ""));
            course().addAssessment("2026-06-13T14:00:00+02:00");
        });
        Course before = course().courseProperty().get().orElseThrow();
        FormHarness.fx(() -> window.session().entry().field("labs.serumViscosity").textProperty().set("two"));
        recompute();
        assertFalse(course().formCompleteProperty().get());
        Path draft = window.drafts().draftFile();
        FormHarness.waitUntil(() -> read(draft).contains(CourseModel.DRAFT_FORMAT) && read(draft).contains("two"));
        FormHarness.crash(window);

        ScriptedShell next = new ScriptedShell();
        next.restore = true;
        MainWindow again = FormHarness.open(FormHarness.settings(data, next));
        assertTrue(next.asked.stream().anyMatch(q -> q.startsWith("restore: This is a draft of a course of treatment")), next.asked.toString());
        CourseModel restored = again.course();
        assertTrue(restored.active());
        assertEquals(CourseWriter.write(before), CourseWriter.write(restored.courseProperty().get().orElseThrow()));
        assertEquals("two", again.session().entry().field("labs.serumViscosity").textProperty().get());
        assertEquals(3, restored.editing(), "the form shows the assessment it showed before the crash");
        assertTrue(restored.dirtyProperty().get(), "a restored course is not saved anywhere yet");
        assertFalse(restored.formCompleteProperty().get());

        next.files.add(data.resolve("never.json"));
        FormHarness.fx(() -> again.actions().save());
        FormHarness.settle(again);
        assertFalse(Files.exists(data.resolve("never.json")));
        assertTrue(next.asked.stream().anyMatch(q -> q.startsWith("problems: The course was not saved")),
                next.asked.toString());
        FormHarness.fx(() -> again.stage().hide());
    }

    @Test
    @DisplayName("a course PDF opens as its embedded course, tied to no file (Save asks where)")
    void openCoursePdf() throws Exception {
        Course c = gertz();
        byte[] pdf = org.stasissheet.report.CoursePdf.render(CourseAssessor.assess(c, RULES),
                org.stasissheet.report.PdfOptions.defaults("test"),
                java.time.OffsetDateTime.parse("2026-06-12T15:00:00+02:00"), gertzBytes());
        Path file = data.resolve("gertz-course.pdf");
        Files.write(file, pdf);
        FormHarness.fx(() -> window.actions().openFile(file));
        FormHarness.settle(window);
        assertTrue(course().active(), shell.asked + " " + window.actions().statusProperty().get());
        assertEquals(CourseWriter.write(c), CourseWriter.write(course().courseProperty().get().orElseThrow()));
        assertTrue(course().documentProperty().get().isEmpty(), "Save does not overwrite the PDF");
    }

    @Test
    @DisplayName("in a course, the worksheet tab, the handoff note and the PDF export take the moment as the course "
            + "assesses it: the invented AML course's latest potassium counts against the first assessment as "
            + "baseline (Cairo–Bishop 25 % change), which the entry alone does not carry")
    void worksheetOfTheMoment() throws Exception {
        Path file = data.resolve("aml.json");
        Files.copy(Path.of("samples", "courses", "aml-leukapheresis-hydroxyurea.json"), file);
        FormHarness.fx(() -> window.actions().openFile(file));
        FormHarness.settle(window);
        recompute();
        Course c = ((CourseReader.Accepted) CourseReader.read(Files.readAllBytes(file))).course();
        CourseReport core = CourseAssessor.assess(c, RULES);
        var shown = window.session().sheet().content().worksheet().orElseThrow();
        assertEquals(core.latest(), shown, "the worksheet tab shows the course's latest moment");
        var alone = window.session().completeWorksheetProperty().get().orElseThrow();
        assertFalse(alone.tumorLysis().equals(shown.tumorLysis()),
                "the entry alone, without the course's baseline, would be assessed differently");
        FormHarness.fx(() -> window.actions().copyHandoffNote());
        assertEquals(CourseText.note(core, false), shell.clipboard.get(0));
        assertTrue(shell.clipboard.get(0).contains("Trend: white cell count 236 → 148 → 91"), shell.clipboard.get(0));

        Path pdf = data.resolve("aml-latest.pdf");
        shell.files.add(pdf);
        FormHarness.fx(() -> window.actions().exportPdf());
        FormHarness.settle(window);
        var back = org.stasissheet.files.WorksheetPdfs.read(Files.readAllBytes(pdf));
        assertEquals(CaseWriter.write(c.caseAt(2)), new String(back.caseJson(), StandardCharsets.UTF_8),
                "the PDF embeds the case it shows, baseline included");
    }

    @Test
    @DisplayName("the invented IgM exchange series: the second exchange's small fall is flagged REVIEW in the table, "
            + "as the core's review rule marks it; one chart each for serum viscosity and IgM")
    void reviewFlagShown() throws Exception {
        Path file = data.resolve("igm.json");
        Files.copy(Path.of("samples", "courses", "igm-exchange-series.json"), file);
        FormHarness.fx(() -> window.actions().openFile(file));
        FormHarness.settle(window);
        CourseReport core = CourseAssessor.assess(
                ((CourseReader.Accepted) CourseReader.read(Files.readAllBytes(file))).course(), RULES);
        assertFalse(core.procedures().get(0).needsReview());
        assertTrue(core.procedures().get(1).needsReview(), "the core marks the second exchange");
        List<CourseRows.ReviewRow> table = List.copyOf(viewOf(window).table().getItems());
        assertEquals(CourseRows.rows(core), table);
        List<CourseRows.ReviewRow> flagged = table.stream().filter(CourseRows.ReviewRow::flagged).toList();
        assertEquals(2, flagged.size(), table.toString());
        assertTrue(flagged.stream().allMatch(r -> r.procedure().startsWith("#4 plasma exchange")), flagged.toString());
        assertTrue(flagged.get(0).review().contains("check the volume processed"), flagged.get(0).review());
        List<LineChart<Number, Number>> charts = viewOf(window).charts();
        assertEquals(List.of("serum viscosity (cP)", "IgM (g/L)"), charts.stream().map(LineChart::getTitle).toList());
        assertEquals(List.of(3, 2, 2, 3), charts.get(0).getData().stream().map(s -> s.getData().size()).toList(),
                "3 measured, 2 projections of each kind, 3 procedures (two exchanges and rituximab)");
    }

    @Test
    @DisplayName("closing or replacing with unsaved course changes asks about the course; Cancel keeps it, Discard "
            + "leaves it for a new case")
    void unsavedCourseIsAskedAbout() throws Exception {
        openGertzCourseFile();
        FormHarness.fx(() -> course().addProcedure(new ProcedureFields(ProcedureFields.Kind.LEUKAPHERESIS,
                "2026-06-13T10:00:00+02:00", "", "", "mL", "", "2")));
        assertEquals(3, course().courseProperty().get().orElseThrow().procedures().size(),
                course().messageProperty().get());
        shell.unsavedAnswers.push(org.stasissheet.ui.app.Shell.UnsavedChoice.CANCEL);
        FormHarness.fx(() -> window.stage().fireEvent(new javafx.stage.WindowEvent(window.stage(),
                javafx.stage.WindowEvent.WINDOW_CLOSE_REQUEST)));
        assertTrue(shell.asked.contains("unsaved: gertz-course.json"), shell.asked.toString());
        assertTrue(window.stage().isShowing());
        assertTrue(course().active());

        shell.unsavedAnswers.push(org.stasissheet.ui.app.Shell.UnsavedChoice.DISCARD);
        FormHarness.fx(() -> window.actions().newCase());
        assertFalse(course().active());
        assertEquals("", window.session().entry().field("patient.label").textProperty().get());
    }

    @Test
    @DisplayName("the course panel shows the standing caution and the course's own")
    void caution(FxRobot robot) throws Exception {
        FormHarness.fx(() -> window.showCourse());
        Label caution = robot.lookup("#course-caution").query();
        assertTrue(caution.isVisible());
        assertTrue(caution.getText().contains("never replaces, clinical judgement, local protocols and licensed "
                + "practice"), caution.getText());
        assertTrue(caution.getText().contains(CourseText.COURSE_CAUTION));
    }

    private static AnalyteCheck check(CourseReport r, int procedure) {
        return r.procedures().get(procedure).checks().stream().filter(c -> c.analyte() == Analyte.SERUM_VISCOSITY)
                .findFirst().orElseThrow();
    }

    private static CourseView viewOf(MainWindow w) {
        return w.courseView();
    }

    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (IOException e) {
            return "";
        }
    }
}
