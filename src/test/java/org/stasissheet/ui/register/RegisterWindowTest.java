package org.stasissheet.ui.register;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.register.Decision;
import org.stasissheet.register.DecisionOutcome;
import org.stasissheet.register.DecisionRequest;
import org.stasissheet.register.NewReferral;
import org.stasissheet.register.Procedure;
import org.stasissheet.register.Referral;
import org.stasissheet.register.Snapshot;
import org.stasissheet.register.store.Register;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.stasissheet.worksheet.Assessor;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The register window on a real SQLite register, clicked through with TestFX (headless Monocle). */
@ExtendWith(ApplicationExtension.class)
class RegisterWindowTest {
    static final Instant T0 = Instant.parse("2026-03-05T01:40:00Z");
    static final RuleSet SHIPPED = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();

    @TempDir
    Path data;

    Optional<String> db;
    long reviewEarly;
    long actNowLate;
    long closed;
    RegisterWindow window;

    static NewReferral referral(String sample, Instant received) throws Exception {
        return referralOf(Files.readString(Path.of("samples", sample), StandardCharsets.UTF_8), received);
    }

    static NewReferral referralOf(String json, Instant received) throws Exception {
        var sheet = Assessor.assess(((CaseReader.Accepted) CaseReader.read(json.getBytes(StandardCharsets.UTF_8))).c(),
                SHIPPED);
        return new NewReferral(received, "Invented registrar", "Invented General, ward 7", Procedure.NOT_STATED,
                Snapshot.of(sheet, json), "Invented coordinator", received);
    }

    Register other() {
        return Register.open(db, data, Map.of());
    }

    @Start
    void start(Stage stage) throws Exception {
        db = Optional.of("jdbc:sqlite:" + data.resolve("register.sqlite"));
        Register r = other();
        // an invented CLL case with a normal potassium: its highest flag is a review (test resource)
        reviewEarly = r.add(referralOf(Files.readString(Path.of("src/test/resources/cases/cll-review.json"),
                StandardCharsets.UTF_8), T0));
        actNowLate = r.add(referral("igm-symptomatic.json", T0.plusSeconds(3600)));
        closed = r.add(referral("aml-breathless.json", T0.plusSeconds(60)));
        r.decide(new DecisionRequest(closed, OptionalInt.empty(), Decision.DECLINED,
                new Referral.DecisionRecord("Invented consultant", T0.plusSeconds(120), Optional.empty(), "", "", "")));
        // a stage of its own: TestFX hands every test class the same primary stage, which other windows bind
        window = RegisterWindow.open(new Stage(), r, FormHarness.settings(data, new ScriptedShell()),
                Duration.ofMillis(200));
    }

    @AfterEach
    void close() throws Exception {
        FormHarness.fx(() -> window.stage().hide());
    }

    private void settle() {
        WaitForAsyncUtils.waitForFxEvents();
        window.background().drain(20, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitForFxEvents();
        window.background().drain(20, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private <T extends Node> T node(FxRobot robot, String id) {
        return robot.lookup("#" + id).query();
    }

    private List<Long> shownIds(FxRobot robot) {
        TableView<Referral> table = node(robot, "register-table");
        return table.getItems().stream().map(Referral::id).toList();
    }

    private void selectFirstRow(FxRobot robot) {
        robot.clickOn((Node) robot.lookup("#register-table .table-row-cell").nth(0).query());
        settle();
    }

    private void decideInTheWindow(FxRobot robot, Decision decision, String by) throws Exception {
        ComboBox<Decision> box = node(robot, "register-decision");
        FormHarness.fx(() -> box.setValue(decision));
        robot.clickOn((Node) node(robot, "register-by")).write(by);
        robot.clickOn((Node) node(robot, "register-record"));
        settle();
    }

    @Test
    @DisplayName("open referrals only, act now first, then by received time; the caution is on screen")
    void table_showsOpenReferralsByUrgency(FxRobot robot) throws Exception {
        settle();
        FormHarness.waitUntil(() -> shownIds(robot).size() == 2);
        assertEquals(List.of(actNowLate, reviewEarly), shownIds(robot));
        Label caution = node(robot, "register-caution");
        assertTrue(caution.isVisible() && caution.getText().contains("never replaces, clinical judgement"),
                caution.getText());
    }

    @Test
    @DisplayName("selecting a referral shows its worksheet (made with the same rule set) and its history")
    void select_showsWorksheetAndHistory(FxRobot robot) throws Exception {
        settle();
        FormHarness.waitUntil(() -> shownIds(robot).size() == 2);
        selectFirstRow(robot);
        assertEquals(Optional.of(actNowLate), window.model().selectedProperty().get().map(Referral::id));
        assertTrue(window.model().sheet().content().worksheet().isPresent(), "a worksheet is shown");
        assertTrue(((Label) node(robot, "register-provenance")).getText()
                .startsWith("Worksheet with the rule set it was assessed with"));
        FormHarness.waitUntil(() -> !window.model().history().isEmpty());
        ListView<String> history = node(robot, "register-history");
        assertTrue(history.getItems().stream().anyMatch(l -> l.contains("received (none) -> pending")),
                String.join("\n", history.getItems()));
    }

    @Test
    @DisplayName("recording a decision in the window saves it with its author, and the referral leaves the open list")
    void decide_inTheWindow_isSaved(FxRobot robot) throws Exception {
        settle();
        FormHarness.waitUntil(() -> shownIds(robot).size() == 2);
        selectFirstRow(robot);
        decideInTheWindow(robot, Decision.ACCEPTED, "Invented apheresis nurse");
        assertTrue(window.model().statusProperty().get().startsWith("Referral " + actNowLate + ": accepted recorded"),
                window.model().statusProperty().get());
        Referral saved = other().list(false).stream().filter(r -> r.id() == actNowLate).findFirst().orElseThrow();
        assertEquals(Decision.ACCEPTED, saved.decision());
        assertEquals("Invented apheresis nurse", saved.decisionRecord().orElseThrow().by());
        FormHarness.waitUntil(() -> shownIds(robot).equals(List.of(reviewEarly)));
    }

    @Test
    @DisplayName("another user decides first: the window's decision is refused with a conflict, theirs stands")
    void decide_afterAnotherUser_conflicts(FxRobot robot) throws Exception {
        settle();
        FormHarness.waitUntil(() -> shownIds(robot).size() == 2);
        selectFirstRow(robot);
        assertTrue(other().decide(new DecisionRequest(actNowLate, OptionalInt.of(1), Decision.DEFERRED,
                new Referral.DecisionRecord("Invented colleague", T0.plusSeconds(7200), Optional.empty(), "", "",
                        ""))) instanceof DecisionOutcome.Recorded);
        // decide at once, before polling could show the change
        FormHarness.fx(() -> window.model().decide(Decision.DECLINED, "Invented apheresis nurse", "", "", "", ""));
        settle();
        String status = window.model().statusProperty().get();
        assertTrue(status.startsWith("Conflict: referral " + actNowLate + " was changed by someone else (now version 2: "
                + "deferred by Invented colleague"), status);
        assertEquals(Decision.DEFERRED, other().list(false).stream().filter(r -> r.id() == actNowLate).findFirst()
                .orElseThrow().decision());
    }

    @Test
    @DisplayName("a referral added by someone else appears without any action (polling)")
    void polling_showsAnotherUsersReferral(FxRobot robot) throws Exception {
        settle();
        FormHarness.waitUntil(() -> shownIds(robot).size() == 2);
        long added = other().add(referral("igm-symptomatic.json", T0.plusSeconds(30)));
        FormHarness.waitUntil(() -> shownIds(robot).size() == 3);
        assertEquals(List.of(added, actNowLate, reviewEarly), shownIds(robot));
    }

    @Test
    @DisplayName("a planned slot that is not an ISO time is refused naming the field and the value; nothing is saved")
    void badSlot_isRefused(FxRobot robot) throws Exception {
        settle();
        FormHarness.waitUntil(() -> shownIds(robot).size() == 2);
        selectFirstRow(robot);
        FormHarness.fx(() -> window.model().decide(Decision.ACCEPTED, "Invented nurse", "", "tomorrow 8am", "", ""));
        assertEquals("Planned slot: \"tomorrow 8am\" is not an ISO 8601 time with an offset; write it like "
                + "2026-03-05T08:00:00+01:00. Nothing was saved.", window.model().statusProperty().get());
        assertFalse(other().list(true).stream().anyMatch(r -> r.decision() != Decision.PENDING));
    }
}
