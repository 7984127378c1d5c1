package org.stasissheet.cli;

import java.nio.file.Path;
import java.util.Optional;
import picocli.CommandLine.Option;

/** The {@code --rules DIR} option shared by every command that assesses: a local protocol instead of the shipped set. */
public final class RulesOption {
    @Option(names = "--rules", paramLabel = "DIR",
            description = "Use the rule set in DIR (a local protocol) instead of the shipped one.")
    Path rulesDir;

    public Optional<Path> dir() {
        return Optional.ofNullable(rulesDir);
    }
}
