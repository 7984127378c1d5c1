package org.stasissheet.ui.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Labeled;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Toggle;
import javafx.stage.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.stasissheet.ui.FormHarness;
import org.stasissheet.ui.ScriptedShell;
import org.stasissheet.ui.sheet.SheetContent;
import org.stasissheet.ui.sheet.SheetView;
import org.stasissheet.ui.sheet.SheetViewModel;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The worksheet side updates in place after an edit (only what changed is rebuilt, same-shaped tables and cards
 * get new texts, the chart's points new values): after every edit it must show exactly what a worksheet side
 * built from nothing shows for the same content. Compared node by node: kind, id, style classes, pseudo-classes,
 * visibility, texts, toggles, and every plotted value.
 */
@ExtendWith(ApplicationExtension.class)
class SheetInPlaceTest {
    @TempDir
    Path data;

    MainWindow window;

    @Start
    void start(Stage stage) {
        window = MainWindow.open(stage, FormHarness.settings(data, new ScriptedShell()));
    }

    /** Edits that move numbers, cross thresholds, blank a value and make a field wrong (then right again). */
    static final List<String[]> EDITS = List.of(
            new String[] {"labs.serumViscosity", "1.6"}, new String[] {"labs.serumViscosity", "4.1"},
            new String[] {"labs.serumViscosity", "6.5"}, new String[] {"labs.serumViscosity", ""},
            new String[] {"labs.serumViscosity", "not a number"}, new String[] {"labs.serumViscosity", "3.2"},
            new String[] {"labs.hematocrit", "0.30"}, new String[] {"labs.hematocrit", "0.55"},
            new String[] {"labs.hematocrit", ""}, new String[] {"labs.wbc", "250"}, new String[] {"labs.wbc", "12"},
            new String[] {"labs.wbc", "0"});

    @Test
    @DisplayName("after each edit of each demo case, the sheet updated in place equals one built afresh")
    void inPlaceEqualsFresh() throws Exception {
        int compared = 0;
        for (String name : Samples.NAMES) {
            FormHarness.fx(() -> window.actions().openFile(Path.of("samples", name)));
            FormHarness.settle(window);
            assertSameAsFresh(name + " as opened");
            for (String[] edit : EDITS) {
                FormHarness.fx(() -> {
                    window.session().entry().field(edit[0]).textProperty().set(edit[1]);
                    window.session().recomputeNow();
                });
                assertSameAsFresh(name + ", then " + edit[0] + " = '" + edit[1] + "'");
                compared++;
            }
        }
        assertEquals(Samples.NAMES.size() * EDITS.size(), compared);
    }

    private void assertSameAsFresh(String step) throws Exception {
        AtomicReference<List<String>> live = new AtomicReference<>();
        AtomicReference<List<String>> fresh = new AtomicReference<>();
        FormHarness.fx(() -> {
            ScrollPane shown = (ScrollPane) window.stage().getScene().lookup(".sheet-side");
            live.set(describe(shown.getContent()));
            SheetContent content = window.session().sheet().content();
            SheetViewModel model = new SheetViewModel();
            if (content.worksheet().isPresent()) {
                model.show(content.worksheet().get(), content.leftOut());
            } else {
                model.showNothing(content.blocking());
            }
            assertEquals(content, model.content(), step + ": the same content rebuilt");
            fresh.set(describe(((ScrollPane) new SheetView(model).node()).getContent()));
        });
        assertTrue(live.get().size() > 50, step + ": a whole sheet is compared (" + live.get().size() + " lines)");
        List<String> want = fresh.get();
        List<String> got = live.get();
        for (int i = 0; i < Math.min(want.size(), got.size()); i++) {
            assertEquals(want.get(i), got.get(i), step + ": line " + i + " differs");
        }
        assertEquals(want.size(), got.size(), step + ": number of lines");
    }

    /** Every node under {@code root} as one line of what a reader (or a screen reader) gets from it. */
    static List<String> describe(Node root) {
        List<String> lines = new ArrayList<>();
        walk(root, lines, 0);
        return lines;
    }

    private static void walk(Node n, List<String> lines, int depth) {
        StringBuilder line = new StringBuilder("  ".repeat(depth)).append(n.getClass().getSimpleName());
        line.append(" #").append(n.getId()).append(' ').append(n.getStyleClass()).append(' ')
                .append(n.getPseudoClassStates()).append(n.isVisible() ? " visible" : " hidden")
                .append(n.isManaged() ? "" : " unmanaged");
        if (n instanceof Labeled l) {
            line.append(" text=").append(l.getText());
        }
        if (n instanceof Toggle t) {
            line.append(" selected=").append(t.isSelected());
        }
        if (n.getAccessibleText() != null) {
            line.append(" spoken=").append(n.getAccessibleText());
        }
        lines.add(line.toString());
        if (n instanceof XYChart<?, ?> chart) {
            for (XYChart.Series<?, ?> s : chart.getData()) {
                StringBuilder points = new StringBuilder("  ".repeat(depth + 1)).append("series ").append(s.getName());
                for (XYChart.Data<?, ?> d : s.getData()) {
                    points.append(" (").append(d.getXValue()).append(", ").append(d.getYValue()).append(')');
                }
                lines.add(points.toString());
            }
            return; // the plot's own nodes are the chart's business
        }
        if (n instanceof javafx.scene.control.Control) {
            return; // a control's skin is built only once it is shown; its text and state are above
        }
        if (n instanceof Parent p) {
            for (Node child : p.getChildrenUnmodifiable()) {
                walk(child, lines, depth + 1);
            }
        }
    }
}
