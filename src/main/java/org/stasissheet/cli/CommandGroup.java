package org.stasissheet.cli;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** A command that only holds subcommands ({@code rules}, {@code labs}, {@code export}): alone, it prints its usage. */
abstract class CommandGroup implements Runnable {
    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
