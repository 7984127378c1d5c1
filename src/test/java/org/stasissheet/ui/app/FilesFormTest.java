package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Files around the form: the suggested export name and folder, a file given on the command line, and the flow chart
 * taking no space without a hematocrit. The samples are invented.
 */
class FilesFormTest extends FormFixture {
    @Start
    void start(Stage stage) {
        open(stage);
    }

    private MainWindow openWith(Path file, ScriptedShell otherShell) throws Exception {
        Path otherData = Files.createDirectories(data.resolve("second-window"));
        MainWindow w = WaitForAsyncUtils.asyncFx(() -> MainWindow.open(new Stage(),
                FormHarness.settings(otherData, otherShell), Optional.of(file))).get(20, TimeUnit.SECONDS);
        FormHarness.settle(w);
        return w;
    }

    @Test
    @DisplayName("Export suggests <label>-<assessment date>.pdf, then the last export folder (kept in preferences)")
    void exportNameAndFolder() throws Exception {
        Path sample = Path.of("samples", "aml-breathless.json");
        FormHarness.fx(() -> window.actions().openFile(sample));
        FormHarness.settle(window);
        Path folder = Files.createDirectories(data.resolve("exports"));
        shell.files.add(folder.resolve("first.pdf"));
        FormHarness.fx(() -> window.actions().exportPdf());
        FormHarness.settle(window);
        // the sample's label "Demo patient C, ward 9", assessed 2026-03-05T23:15+01:00 (its own date, not UTC's)
        assertTrue(shell.asked.contains("pdf Demo-patient-C-ward-9-2026-03-05.pdf"), shell.asked.toString());
        assertEquals(Optional.of(sample), shell.pdfNear.get(0), "first export: beside the case file");
        assertTrue(Files.isRegularFile(folder.resolve("first.pdf")));

        shell.files.add(folder.resolve("second.pdf"));
        FormHarness.fx(() -> window.actions().exportPdf());
        FormHarness.settle(window);
        assertEquals(Optional.of(folder.toAbsolutePath().normalize()), shell.pdfNear.get(1), "the last folder used");
        assertEquals(Optional.of(folder.toAbsolutePath().normalize()),
                new PreferencesStore(data).load().exportFolder(), "remembered for the next session");
    }

    @Test
    @DisplayName("a case file given at start opens in the form, tied to its file, instead of the demo case")
    void caseFileAtStart() throws Exception {
        Path sample = Path.of("samples", "aml-breathless.json").toAbsolutePath();
        ScriptedShell other = new ScriptedShell();
        MainWindow w = openWith(sample, other);
        assertEquals(Optional.of(sample), w.session().documentProperty().get());
        assertEquals("Demo patient C, ward 9", w.session().entry().field("patient.label").textProperty().get());
        assertTrue(other.problemsShown.isEmpty(), other.problemsShown.toString());
        FormHarness.fx(() -> w.stage().close());
        w.background().close();
    }

    @Test
    @DisplayName("a course given at start opens as the course, tied to its file, the form showing its latest assessment")
    void courseAtStart() throws Exception {
        Path course = Path.of("samples", "courses", "igm-exchange-series.json").toAbsolutePath();
        ScriptedShell other = new ScriptedShell();
        MainWindow w = openWith(course, other);
        // it opens as the course, tied to its file (Save writes the course, never a single case over it)
        assertTrue(w.course().active(), w.actions().statusProperty().get());
        assertEquals(Optional.of(course), w.course().documentProperty().get());
        assertEquals(Optional.empty(), w.session().documentProperty().get());
        assertEquals("Demo patient E, ward 3", w.session().entry().field("patient.label").textProperty().get());
        // the form shows the sample's third and latest assessment: serum viscosity 3.7 cP at 2026-06-12T14:00+02:00
        assertEquals("3.7", w.session().entry().field("labs.serumViscosity").textProperty().get());
        assertTrue(w.actions().statusProperty().get().contains("Opened the course"),
                w.actions().statusProperty().get());
        FormHarness.fx(() -> w.stage().close());
        w.background().close();
    }

    @Test
    @DisplayName("a course PDF given at start opens the course it embeds, showing its latest assessment")
    void coursePdfAtStart() throws Exception {
        Path course = Path.of("samples", "courses", "igm-exchange-series.json");
        Path pdf = data.resolve("course.pdf");
        assertEquals(0, org.stasissheet.cli.StasisCommand.run(new String[] {"course", course.toString(), "-o",
                pdf.toString()}, new java.io.PrintWriter(java.io.Writer.nullWriter()),
                new java.io.PrintWriter(java.io.Writer.nullWriter())));
        ScriptedShell other = new ScriptedShell();
        MainWindow w = openWith(pdf, other);
        assertTrue(other.problemsShown.isEmpty(), other.problemsShown.toString());
        assertTrue(w.course().active(), w.actions().statusProperty().get());
        assertEquals(Optional.empty(), w.course().documentProperty().get(), "Save asks where: the PDF stays as it is");
        assertEquals(Optional.empty(), w.session().documentProperty().get());
        assertEquals("3.7", w.session().entry().field("labs.serumViscosity").textProperty().get());
        FormHarness.fx(() -> w.stage().close());
        w.background().close();
    }

    @Test
    @DisplayName("a file that is neither a case nor a course nor a PDF: the form says so and stays as it was")
    void unknownFileAtStart() throws Exception {
        Path notes = Files.writeString(data.resolve("notes.txt"), "not a case");
        ScriptedShell other = new ScriptedShell();
        MainWindow w = openWith(notes, other);
        assertEquals(1, other.problemsShown.size());
        assertTrue(other.asked.contains("problems: notes.txt was not opened; the form is unchanged"),
                other.asked.toString());
        assertEquals(Optional.empty(), w.session().documentProperty().get());
        FormHarness.fx(() -> w.stage().close());
        w.background().close();
    }

    @Test
    @DisplayName("without a hematocrit the flow chart takes no space; its reason stays in the notes")
    void emptyChartTakesNoSpace(FxRobot robot) throws Exception {
        Node chart = robot.lookup("#flow-chart").query();
        assertTrue(chart.isVisible() && chart.isManaged(), "the demo case has a hematocrit");
        FormHarness.fx(() -> {
            window.session().entry().field("labs.hematocrit").textProperty().set("");
            window.session().entry().field("labs.hemoglobin").textProperty().set("");
            window.session().recomputeNow();
        });
        FormHarness.waitUntil(() -> !chart.isManaged());
        assertFalse(chart.isVisible());
        assertFalse(robot.lookup("#flow-toggles").query().isManaged());
        assertTrue(robot.lookup((javafx.scene.control.Label l) -> l.getText().startsWith("not shown: "))
                .tryQuery().isPresent(), "the reason is still shown");
    }
}
