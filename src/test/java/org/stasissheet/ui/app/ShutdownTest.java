package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The shutdown path in this JVM: work in flight, the draft written there and then, nothing thrown or printed. */
class ShutdownTest extends FormFixture {
    @Start
    void start(Stage stage) {
        open(stage);
    }

    @Test
    @DisplayName("shutdown with a job in flight: the draft holds the last edit, nothing is thrown or printed")
    void draftSavedWithWorkInFlight() throws Exception {
        FormHarness.settle(window);
        ShutdownGuard guard = WaitForAsyncUtils.asyncFx(() -> new ShutdownGuard(window, Duration.ofSeconds(5)))
                .get(20, TimeUnit.SECONDS);
        // the edit and the shutdown come together: the unsaved-changes flag has not caught up yet
        FormHarness.fx(() -> window.session().entry().field("patient.label").textProperty().set("Invented bed 7"));
        CountDownLatch running = new CountDownLatch(1);
        window.background().run(() -> {
            running.countDown();
            Thread.sleep(400); // a render in flight
            return 1;
        }, r -> { }, e -> { });
        assertTrue(running.await(10, TimeUnit.SECONDS));

        PrintStream out = System.out;
        PrintStream err = System.err;
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        PrintStream capture = new PrintStream(printed, true, StandardCharsets.UTF_8);
        boolean saved;
        try {
            System.setOut(capture);
            System.setErr(capture);
            saved = guard.saveDraft(); // from this test thread, as the JVM's hook thread would
            // what used to throw RejectedExecutionException: an autosave and more work after the shutdown
            FormHarness.fx(() -> window.session().entry().field("patient.label").textProperty().set("later"));
            FormHarness.fx(() -> window.autosaver().saveNow());
            assertDoesNotThrow(() -> window.background().run(() -> 1, r -> { }, e -> { }));
            WaitForAsyncUtils.waitForFxEvents();
            assertFalse(guard.saveDraft(), "the shutdown path runs once");
        } finally {
            System.setOut(out);
            System.setErr(err);
        }
        assertTrue(saved);
        Path draft = window.drafts().draftFile();
        assertTrue(Files.isRegularFile(draft), "the draft file exists");
        assertTrue(Files.readString(draft).contains("Invented bed 7"), Files.readString(draft));
        assertEquals("", printed.toString(StandardCharsets.UTF_8), "nothing printed");
    }

    @Test
    @DisplayName("shutdown while the form holds a course: the draft is the course with the last edit, not one case")
    void courseDraftKeptAtShutdown() throws Exception {
        Path file = Files.copy(Path.of("samples", "courses", "igm-exchange-series.json"), data.resolve("course.json"));
        FormHarness.fx(() -> window.actions().openFile(file));
        FormHarness.settle(window);
        assertTrue(window.course().active());
        ShutdownGuard guard = WaitForAsyncUtils.asyncFx(() -> new ShutdownGuard(window, Duration.ofSeconds(5)))
                .get(20, TimeUnit.SECONDS);
        FormHarness.fx(() -> window.session().entry().field("patient.label").textProperty().set("Invented bed 9"));
        assertTrue(guard.saveDraft());
        byte[] draft = Files.readAllBytes(window.drafts().draftFile());
        assertTrue(org.stasissheet.ui.course.CourseModel.isCourseDraft(draft), new String(draft, StandardCharsets.UTF_8));
        assertTrue(new String(draft, StandardCharsets.UTF_8).contains("Invented bed 9"), "the last edit is in it");
        // the sample's three assessments and its procedures are all there
        assertTrue(window.course().readable(draft));
    }

    @Test
    @DisplayName("shutdown with nothing unsaved ends the session cleanly: no draft is offered next time")
    void cleanWhenNothingUnsaved() throws Exception {
        FormHarness.fx(() -> window.actions().openFile(Path.of("samples", "iga-borderline.json")));
        FormHarness.settle(window);
        assertFalse(window.session().dirtyProperty().get());
        ShutdownGuard guard = WaitForAsyncUtils.asyncFx(() -> new ShutdownGuard(window, Duration.ofSeconds(5)))
                .get(20, TimeUnit.SECONDS);
        assertTrue(guard.saveDraft());
        assertFalse(Files.exists(window.drafts().draftFile()));
        assertTrue(new org.stasissheet.ui.draft.DraftStore(data).crashedDrafts().isEmpty());
    }
}
