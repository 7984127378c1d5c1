package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.stasissheet.ui.ScriptedShell;

/**
 * The form in a child JVM for {@link ShutdownSignalTest}: opens a window on headless Monocle with the data folder
 * given, installs the shutdown guard as the real start does, makes one edit that only the shutdown path can save
 * (the autosave waits an hour), prints READY and waits to be stopped.
 */
public final class ShutdownChild {
    private ShutdownChild() {
    }

    public static void main(String[] args) throws Exception {
        Path data = Path.of(args[0]);
        String label = args[1];
        Platform.startup(() -> {
            FormSettings settings = new FormSettings(data, stage -> new ScriptedShell(), Clock.systemUTC(),
                    Duration.ofHours(1), Duration.ofMillis(30), org.stasissheet.load.Inputs::ruleSet,
                    FormSettings.DEFAULT_SAMPLE);
            MainWindow w = MainWindow.open(new Stage(), settings);
            ShutdownGuard.install(w);
            w.session().entry().field("patient.label").textProperty().set(label);
            // a render-sized job still running when the signal comes
            w.background().run(() -> {
                Thread.sleep(60_000);
                return 1;
            }, r -> { }, e -> { });
            System.out.println("READY");
            System.out.flush();
        });
        Thread.sleep(Long.MAX_VALUE);
    }
}
