package org.stasissheet.ui;

import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.stage.Window;

/**
 * What "the first worksheet is on screen" means, in one place for the archive's training run and the start-up
 * bench: a showing window whose verdict cards ({@code #verdicts}) have children, at the end of the first layout
 * pulse that gives them a height (that pulse hands the scene to the renderer).
 */
final class FirstWorksheetWatch {
    private FirstWorksheetWatch() {
    }

    /**
     * On the JavaFX thread: when a showing window holds the verdict cards, runs {@code onLaidOut} with that window
     * after the first pulse that lays them out, once, and returns true; returns false when there is none yet.
     */
    static boolean arm(java.util.function.Consumer<Window> onLaidOut) {
        for (Window w : Window.getWindows()) {
            Scene scene = w.getScene();
            if (!w.isShowing() || scene == null) {
                continue;
            }
            Node verdicts = scene.lookup("#verdicts");
            if (verdicts instanceof Parent p && !p.getChildrenUnmodifiable().isEmpty()) {
                scene.addPostLayoutPulseListener(new Runnable() {
                    @Override
                    public void run() {
                        if (p.getLayoutBounds().getHeight() > 0) {
                            scene.removePostLayoutPulseListener(this);
                            onLaidOut.accept(w);
                        }
                    }
                });
                javafx.application.Platform.requestNextPulse();
                return true;
            }
        }
        return false;
    }
}
