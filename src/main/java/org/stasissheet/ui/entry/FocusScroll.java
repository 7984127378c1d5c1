package org.stasissheet.ui.entry;

import javafx.beans.value.ChangeListener;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.ScrollPane;

/**
 * Keeps the focused node of a scroll pane on screen: whatever moves the focus (Enter, Tab, a fix button, a
 * search, a click), the pane scrolls so that the focused input and a line above and below it are visible. A
 * resident must never type into a field they cannot see.
 */
final class FocusScroll {
    /** Room kept above and below the focused node, in pixels, so its label and its message show too. */
    static final double MARGIN = 36;

    private FocusScroll() {
    }

    static void keepInView(ScrollPane pane) {
        ChangeListener<Node> focus = (o, was, now) -> {
            if (now != null && inside(now, pane.getContent())) {
                scrollTo(pane, now);
            }
        };
        pane.sceneProperty().addListener((o, was, now) -> {
            if (was != null) {
                was.focusOwnerProperty().removeListener(focus);
            }
            if (now != null) {
                now.focusOwnerProperty().addListener(focus);
            }
        });
        Scene scene = pane.getScene();
        if (scene != null) {
            scene.focusOwnerProperty().addListener(focus);
        }
    }

    private static boolean inside(Node n, Node content) {
        for (Node p = n; p != null; p = p.getParent()) {
            if (p == content) {
                return true;
            }
        }
        return false;
    }

    /** Scrolls as little as needed to show {@code node} with {@link #MARGIN} around it. */
    static void scrollTo(ScrollPane pane, Node node) {
        Node content = pane.getContent();
        // a section opened just now must be laid out before its fields have a place
        pane.applyCss();
        pane.layout();
        Bounds b = content.sceneToLocal(node.localToScene(node.getBoundsInLocal()));
        double contentHeight = content.getBoundsInLocal().getHeight();
        double viewport = pane.getViewportBounds().getHeight();
        double extra = contentHeight - viewport;
        if (extra <= 0 || b == null) {
            return;
        }
        double range = pane.getVmax() - pane.getVmin();
        double top = (pane.getVvalue() - pane.getVmin()) / range * extra;
        double wantTop = top;
        if (b.getMinY() - MARGIN < top) {
            wantTop = b.getMinY() - MARGIN;
        } else if (b.getMaxY() + MARGIN > top + viewport) {
            wantTop = Math.min(b.getMaxY() + MARGIN - viewport, b.getMinY() - MARGIN);
        }
        wantTop = Math.max(0, Math.min(extra, wantTop));
        if (wantTop != top) {
            pane.setVvalue(pane.getVmin() + wantTop / extra * range);
        }
    }
}
