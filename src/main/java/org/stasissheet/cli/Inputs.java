package org.stasissheet.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.stasissheet.files.CaseFiles;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;

/**
 * Where the commands get their case and rule set from: the one place that turns files into core objects or
 * into an {@link InvalidInputException} naming every problem.
 */
final class Inputs {
    private Inputs() {
    }

    static Case readCase(Path file) {
        CaseReader.Result result = CaseFiles.read(file);
        if (result instanceof CaseReader.Accepted accepted) {
            return accepted.c();
        }
        List<String> lines = new ArrayList<>();
        lines.add(file + ": the case was not read; nothing was assessed.");
        ((CaseReader.Rejected) result).problems().forEach(p -> lines.add("  " + p));
        throw new InvalidInputException(lines);
    }

    /** The shipped set, or the local protocol in {@code dir}; a refused set lists every problem (exit 2). */
    static RuleSet ruleSet(Optional<Path> dir) {
        LoadResult result = dir.map(RuleSources::folder).orElseGet(RuleSources::shipped);
        if (result instanceof LoadResult.Refused refused) {
            List<String> lines = new ArrayList<>();
            lines.add("The rule set " + dir.map(Path::toString).orElse("(shipped)")
                    + " was refused; nothing of it was used:");
            refused.problems().forEach(p -> lines.add("  " + p));
            throw new InvalidInputException(lines);
        }
        return ((LoadResult.Loaded) result).ruleSet();
    }
}
