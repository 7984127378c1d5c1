package org.stasissheet.ui.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.stasissheet.cli.InvalidInputException;
import org.stasissheet.files.RuleSources;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;

/**
 * Loads a rule set the way the command line's {@code --rules DIR} does, through {@link RuleSources}: the shipped
 * set, or the local protocol in a folder. A refused set is an {@link InvalidInputException} listing every
 * problem; nothing of it is used.
 */
public final class RuleLoading {
    private RuleLoading() {
    }

    public static RuleSet load(Optional<Path> folder) {
        LoadResult result = folder.map(RuleSources::folder).orElseGet(RuleSources::shipped);
        if (result instanceof LoadResult.Refused refused) {
            List<String> lines = new ArrayList<>();
            lines.add("The rule set " + folder.map(Path::toString).orElse("(shipped)")
                    + " was refused; nothing of it was used:");
            refused.problems().forEach(p -> lines.add("  " + p));
            throw new InvalidInputException(lines);
        }
        return ((LoadResult.Loaded) result).ruleSet();
    }
}
