package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import org.stasissheet.load.InvalidInputException;
import org.stasissheet.rules.RuleSet;

/**
 * The rule set the window starts with: the remembered local folder when it still loads, else the shipped set
 * with the reasons the folder was refused (shown once the window is up). Rule files are small: read at start-up.
 */
record RuleLoad(RuleSet rules, Optional<Path> folder, Optional<List<String>> problem) {
    static RuleLoad first(Function<Optional<Path>, RuleSet> loader, Optional<Path> remembered) {
        if (remembered.isPresent()) {
            try {
                return new RuleLoad(loader.apply(remembered), remembered, Optional.empty());
            } catch (InvalidInputException e) {
                return new RuleLoad(loader.apply(Optional.empty()), Optional.empty(), Optional.of(e.lines()));
            }
        }
        return new RuleLoad(loader.apply(Optional.empty()), Optional.empty(), Optional.empty());
    }
}
