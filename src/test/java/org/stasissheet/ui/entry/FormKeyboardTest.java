package org.stasissheet.ui.entry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.ui.FormFixture;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.app.PreferencesStore;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The form with the keyboard only, on a 1366×768 screen (issue 18, items 1, 2, 4 and 5): the focused field is
 * always on screen, Enter visits every input, pickers take typed letters, a new case records its time and
 * assessor, and typed or pasted units and decimal commas are read or asked about.
 */
class FormKeyboardTest extends FormFixture {
    @Start
    void start(Stage stage) {
        open(stage);
        // the night resident's laptop: 1366×768, less the desktop's panel (the headless screen may be narrower)
        javafx.geometry.Rectangle2D screen = javafx.stage.Screen.getPrimary().getBounds();
        stage.setX(0);
        stage.setY(0);
        stage.setWidth(Math.min(1366, screen.getWidth()));
        stage.setHeight(Math.min(740, screen.getHeight()));
    }

    private String focused() {
        Node n = window.stage().getScene().getFocusOwner();
        return n == null ? "(none)" : n.getId();
    }

    private void press(FxRobot robot, KeyCode key) {
        robot.type(key);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void write(FxRobot robot, String id, String text) throws Exception {
        TextField f = node(robot, id);
        FormHarness.fx(() -> {
            f.requestFocus();
            f.selectAll();
        });
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private String text(String path) {
        return window.session().entry().field(path).textProperty().get();
    }

    private String unit(String path) {
        return window.session().entry().field(path).unitProperty().get();
    }

    /** Whether the focused node lies wholly inside the visible part of the entry side. */
    private String offScreen(FxRobot robot) {
        Node n = window.stage().getScene().getFocusOwner();
        ScrollPane entry = robot.lookup(".entry-side").query();
        Node viewport = entry.lookup(".viewport");
        Bounds seen = viewport.localToScene(viewport.getBoundsInLocal());
        Bounds b = n.localToScene(n.getBoundsInLocal());
        // a node taller than the view (an open section's title bar has its whole section below it): its top
        boolean tall = b.getHeight() > seen.getHeight();
        boolean inside = b.getMinY() >= seen.getMinY() - 0.5
                && (tall ? b.getMinY() + 24 <= seen.getMaxY() : b.getMaxY() <= seen.getMaxY() + 0.5);
        return inside ? "" : n.getId() + " at y " + b.getMinY() + "–" + b.getMaxY() + ", visible " + seen.getMinY()
                + "–" + seen.getMaxY();
    }

    @Test
    @DisplayName("item 1: Tab through the whole entry side: every focused input is on screen")
    void tabWalk(FxRobot robot) throws Exception {
        FormHarness.fx(() -> ((Node) node(robot, "patient-label")).requestFocus());
        List<String> unseen = new ArrayList<>();
        for (int i = 0; i < 120 && !"assessor".equals(focused()); i++) {
            press(robot, KeyCode.TAB);
            if (window.stage().getScene().getFocusOwner() != null && insideEntry(robot)) {
                String off = offScreen(robot);
                if (!off.isEmpty()) {
                    unseen.add(off);
                }
            }
        }
        assertEquals("assessor", focused(), "the walk reached the last field");
        assertEquals(List.of(), unseen);
    }

    @Test
    @DisplayName("item 1: focus moved by the program (a fix button, a search) to a far field brings it on screen")
    void programmaticFocus(FxRobot robot) throws Exception {
        FormHarness.fx(() -> ((Node) node(robot, "assessor")).requestFocus());
        assertEquals("", offScreen(robot));
        FormHarness.fx(() -> ((Node) node(robot, "patient-label")).requestFocus());
        assertEquals("", offScreen(robot));
        // a fix button far above the field in focus
        write(robot, "labs-wbc", "150000");
        FormHarness.fx(() -> window.session().recomputeNow());
        FormHarness.fx(() -> ((Node) node(robot, "assessor")).requestFocus());
        Button fix = node(robot, "labs-wbc-fix-_uL");
        FormHarness.fx(fix::requestFocus);
        assertEquals("", offScreen(robot));
        // pressing it by keyboard takes the fix; the button goes with the problem, the focus back to the field
        press(robot, KeyCode.SPACE);
        assertEquals("/uL", unit("labs.wbc"));
        FormHarness.fx(() -> window.session().recomputeNow());
        assertEquals("labs-wbc", focused());
        assertEquals("", offScreen(robot));
    }

    private boolean insideEntry(FxRobot robot) {
        ScrollPane entry = robot.lookup(".entry-side").query();
        for (Node p = window.stage().getScene().getFocusOwner(); p != null; p = p.getParent()) {
            if (p == entry.getContent()) {
                return true;
            }
        }
        return false;
    }
    @Test
    @DisplayName("item 2: Enter from the label visits every field's input in form order, pickers and switches included")
    void enterWalk(FxRobot robot) throws Exception {
        List<String> expected = new ArrayList<>();
        for (FieldSpec f : FormFields.all()) {
            if (f.kind() == FieldKind.DATE_TIME) {
                expected.add(f.id() + "-date");
                expected.add(f.id() + "-time");
            } else {
                expected.add(f.id());
            }
        }
        FormHarness.fx(() -> ((Node) node(robot, "patient-label")).requestFocus());
        List<String> seen = new ArrayList<>(List.of(focused()));
        List<String> unseen = new ArrayList<>();
        for (int i = 1; i < expected.size(); i++) {
            press(robot, KeyCode.ENTER);
            seen.add(focused());
            String off = offScreen(robot);
            if (!off.isEmpty()) {
                unseen.add(off);
            }
        }
        assertEquals(expected, seen);
        assertEquals(List.of(), unseen, "and each one on screen when it got there");
    }

    @Test
    @DisplayName("item 2: 'm' on Sex picks male and stays; Enter then moves on to Age")
    void letterPicks(FxRobot robot) throws Exception {
        ComboBox<?> sex = node(robot, "patient-sex");
        FormHarness.fx(sex::requestFocus);
        robot.write("m");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("male", text("patient.sex"));
        assertEquals("patient-sex", focused(), "typing never moves the focus");
        assertFalse(sex.isShowing(), "nor opens the list");
        press(robot, KeyCode.ENTER);
        assertEquals("patient-ageYears", focused());
        assertEquals("male", text("patient.sex"));
        FormHarness.fx(sex::requestFocus);
        robot.write("fe");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("female", text("patient.sex"));
    }

    @Test
    @DisplayName("item 4: a new case starts at the clock's time to the minute and with the assessor of the preferences")
    void newCase(FxRobot robot) throws Exception {
        shell.assessorAnswers.add("Dr Invented Resident");
        FormHarness.fx(() -> window.actions().chooseAssessor());
        FormHarness.settle(window);
        assertEquals("Dr Invented Resident", new PreferencesStore(data).load().assessor(), "kept between runs");
        FormHarness.fx(() -> window.actions().newCase());
        // FormHarness.CLOCK: 2026-03-05T01:40:00Z at +01:00
        assertEquals("2026-03-05T02:40+01:00", text("assessedAt"));
        assertEquals("Dr Invented Resident", text("assessor"));
        assertEquals(LocalDate.of(2026, 3, 5), ((DatePicker) node(robot, "assessedAt-date")).getValue());
        assertEquals("02:40", ((TextField) node(robot, "assessedAt-time")).getText());
    }

    @Test
    @DisplayName("item 4: the time field writes assessedAt; a bad time is refused naming the field and the value")
    void timeField(FxRobot robot) throws Exception {
        FormHarness.fx(() -> window.actions().newCase());
        write(robot, "assessedAt-time", "25:61");
        Label message = node(robot, "assessedAt-time-message");
        assertTrue(message.isVisible());
        assertTrue(message.getText().contains("Assessed at (time): '25:61' is not a time of day"),
                message.getText());
        assertEquals("25:61", ((TextField) node(robot, "assessedAt-time")).getText(), "what was typed is kept");
        FormHarness.fx(() -> window.session().recomputeNow());
        assertTrue(window.session().completeCaseProperty().get().isEmpty(),
                "no worksheet is printed with the old time");

        write(robot, "assessedAt-time", "14:05");
        assertFalse(message.isVisible());
        assertEquals("2026-03-05T14:05+01:00", text("assessedAt"));

        DatePicker date = node(robot, "assessedAt-date");
        FormHarness.fx(() -> {
            date.requestFocus();
            date.getEditor().setText("2026-03-04");
        });
        press(robot, KeyCode.ENTER);
        assertEquals("assessedAt-time", focused());
        assertEquals("2026-03-04T14:05+01:00", text("assessedAt"));
    }
    @Test
    @DisplayName("item 5: '5,6' in potassium becomes 5.6 in the unit picked, and says so")
    void decimalComma(FxRobot robot) throws Exception {
        write(robot, "labs-potassium", "5,6");
        press(robot, KeyCode.ENTER);
        assertEquals("5.6", text("labs.potassium"));
        assertEquals("mmol/L", unit("labs.potassium"));
        Label reading = node(robot, "labs-potassium-reading");
        assertTrue(reading.getText().contains("read '5,6' as 5.6 mmol/L"), reading.getText());
    }

    @Test
    @DisplayName("item 5: '180 x10^9/L' typed into WBC with /µL picked sets 180 and ×10⁹/L (UCUM 10*9/L)")
    void typedUnit(FxRobot robot) throws Exception {
        FormHarness.fx(() -> window.session().entry().field("labs.wbc").unitProperty().set("/uL"));
        write(robot, "labs-wbc", "180 x 10^9/l");
        press(robot, KeyCode.TAB);
        assertEquals("180", text("labs.wbc"));
        assertEquals("10*9/L", unit("labs.wbc"), "UCUM: 10*9/L is ×10⁹ per litre");
        assertEquals("10*9/L", ((org.stasissheet.measure.UnitOption) ((ComboBox<?>) node(robot, "labs-wbc-unit"))
                .getValue()).ucum(), "the unit picker shows it");
    }

    @Test
    @DisplayName("item 5: pasted '180×10⁹/L', '180 x10^9/L' and '6.8 mmol/L' are read at once, value and unit")
    void pasted(FxRobot robot) throws Exception {
        for (String pasted : List.of("180×10⁹/L", "180 x10^9/L")) {
            FormHarness.fx(() -> window.session().entry().field("labs.wbc").unitProperty().set("/uL"));
            paste(robot, "labs-wbc", pasted);
            assertEquals("180", text("labs.wbc"), pasted);
            assertEquals("10*9/L", unit("labs.wbc"), pasted);
        }
        FormHarness.fx(() -> window.session().entry().field("labs.potassium").unitProperty().set("meq/L"));
        paste(robot, "labs-potassium", "6.8 mmol/L");
        assertEquals("6.8", text("labs.potassium"));
        assertEquals("mmol/L", unit("labs.potassium"));
    }

    @Test
    @DisplayName("item 5: '1,234' is not guessed: both readings are offered, and the one taken sets the value")
    void ambiguousGrouping(FxRobot robot) throws Exception {
        write(robot, "labs-wbc", "1,234");
        press(robot, KeyCode.ENTER);
        assertEquals("1,234", text("labs.wbc"), "kept as typed until answered");
        Label reading = node(robot, "labs-wbc-reading");
        assertTrue(reading.getText().startsWith("CHECK: "), reading.getText());
        assertTrue(reading.getText().contains("1.234 or 1234"), reading.getText());
        Button comma = node(robot, "labs-wbc-take-0");
        Button grouping = node(robot, "labs-wbc-take-1");
        assertEquals("use 1.234 ×10⁹/L", comma.getText());
        assertEquals("use 1234 ×10⁹/L", grouping.getText());
        FormHarness.fx(comma::fire);
        assertEquals("1.234", text("labs.wbc"));
        assertFalse(reading.getParent().isVisible(), "answered: the question goes");
    }

    @Test
    @DisplayName("item 5: a pasted value implausible in its unit is not taken: the unit that fits is offered")
    void implausiblePasted(FxRobot robot) throws Exception {
        paste(robot, "labs-wbc", "150000 x10^9/L");
        assertEquals("150000 x10^9/L", text("labs.wbc"), "kept as pasted until answered");
        Label reading = node(robot, "labs-wbc-reading");
        assertTrue(reading.getText().startsWith("CHECK: "), reading.getText());
        Button perMicrolitre = node(robot, "labs-wbc-take-0");
        assertEquals("use 150000 /µL", perMicrolitre.getText());
        FormHarness.fx(perMicrolitre::fire);
        assertEquals("150000", text("labs.wbc"));
        assertEquals("/uL", unit("labs.wbc"), "150000 /µL = 150 ×10⁹/L (definition: 1 µL = 10⁻⁶ L)");
    }

    @Test
    @DisplayName("item 5: a unit the reader does not know is refused naming the value and unit; the text is kept")
    void unknownUnit(FxRobot robot) throws Exception {
        write(robot, "labs-wbc", "180 furlongs");
        press(robot, KeyCode.ENTER);
        assertEquals("180 furlongs", text("labs.wbc"));
        Label reading = node(robot, "labs-wbc-reading");
        assertTrue(reading.getText().startsWith("NOT READ: "), reading.getText());
        assertTrue(reading.getText().contains("'furlongs' is not a unit"), reading.getText());
    }

    private void paste(FxRobot robot, String id, String pasted) throws Exception {
        TextField f = node(robot, id);
        FormHarness.fx(() -> {
            ClipboardContent c = new ClipboardContent();
            c.putString(pasted);
            Clipboard.getSystemClipboard().setContent(c);
            f.requestFocus();
            f.selectAll();
            f.paste();
        });
    }
}
