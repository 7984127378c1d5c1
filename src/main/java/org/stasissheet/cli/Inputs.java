package org.stasissheet.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.stasissheet.files.CaseFiles;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
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

    static RuleSet ruleSet(Optional<Path> dir) {
        throw new InvalidInputException("loading rule sets lands with the rules work");
    }
}
