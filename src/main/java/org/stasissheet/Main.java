package org.stasissheet;

import org.stasissheet.cli.StasisCommand;

/**
 * Starts the form when called without arguments, the command line otherwise. It deliberately does not extend
 * {@code javafx.application.Application}: the command line must run without loading JavaFX at all.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0 && FormLauncher.available()) {
            FormLauncher.launch(args);
            return;
        }
        System.exit(StasisCommand.run(args));
    }
}
