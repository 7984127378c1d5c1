package org.stasissheet.cli;

import java.nio.file.Path;
import java.util.Optional;
import org.stasissheet.intake.Case;
import org.stasissheet.rules.RuleSet;

/**
 * Where the commands get their case and rule set from: the one place that turns files into core objects or
 * into an {@link InvalidInputException} naming every problem.
 */
final class Inputs {
    private Inputs() {
    }

    static Case readCase(Path file) {
        throw new InvalidInputException("reading case files lands with the intake work: " + file);
    }

    static RuleSet ruleSet(Optional<Path> dir) {
        throw new InvalidInputException("loading rule sets lands with the rules work");
    }
}
