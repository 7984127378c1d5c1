package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;
import javafx.stage.Stage;
import org.stasissheet.rules.RuleSet;

/**
 * What a form window is built from: where its files live, who answers its questions, its clock, its delays and
 * how it loads rule sets. {@link #forUser(Path)} gives the real ones; tests replace the shell and the folder.
 *
 * @param rules      the shipped set for an empty folder, else the set in the folder; throws
 *                   {@link org.stasissheet.load.InvalidInputException} naming every problem when refused
 * @param demoSample the sample (file name under the packaged samples) shown when there is nothing to restore
 */
public record FormSettings(Path dataFolder, Function<Stage, Shell> shell, Clock clock, Duration autosaveDelay,
                           Duration recomputeDelay, Function<Optional<Path>, RuleSet> rules, String demoSample) {
    public static final String DEFAULT_SAMPLE = "igm-symptomatic.json";

    public FormSettings {
        Objects.requireNonNull(dataFolder, "dataFolder");
        Objects.requireNonNull(shell, "shell");
        Objects.requireNonNull(clock, "clock");
        Objects.requireNonNull(autosaveDelay, "autosaveDelay");
        Objects.requireNonNull(recomputeDelay, "recomputeDelay");
        Objects.requireNonNull(rules, "rules");
        Objects.requireNonNull(demoSample, "demoSample");
    }

    public FormSettings withShell(Function<Stage, Shell> s) {
        return new FormSettings(dataFolder, s, clock, autosaveDelay, recomputeDelay, rules, demoSample);
    }

    public FormSettings withAutosaveDelay(Duration d) {
        return new FormSettings(dataFolder, shell, clock, d, recomputeDelay, rules, demoSample);
    }

    public FormSettings withDemoSample(String name) {
        return new FormSettings(dataFolder, shell, clock, autosaveDelay, recomputeDelay, rules, name);
    }
}
