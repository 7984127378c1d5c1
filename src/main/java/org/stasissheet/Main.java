package org.stasissheet;

import java.util.Optional;
import org.stasissheet.cli.ExitCode;
import org.stasissheet.cli.StasisCommand;

/**
 * Starts the form when called without arguments or with one file to open (a case, a course or a worksheet PDF), the
 * command line otherwise. It deliberately does not extend {@code javafx.application.Application}: the command line
 * must run without loading JavaFX at all.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (ArchiveTraining.requested()) {
            // the launcher's --make-archive: exit here, the form's toolkit may leave threads behind
            System.exit(ArchiveTraining.run(args, System.getenv(), System.err));
        }
        Optional<String> file = FileArgument.of(args);
        if (file.isPresent()) {
            Optional<String> problem = FileArgument.problem(file.get());
            if (problem.isPresent()) {
                System.err.println("stasis-sheet: " + problem.get());
                System.exit(ExitCode.INVALID_INPUT);
            }
            if (!FormLauncher.available()) {
                System.err.println("stasis-sheet: this build has no form; on the command line: stasis-sheet assess "
                        + file.get());
                System.exit(ExitCode.INVALID_INPUT);
            }
            FormLauncher.launch(args);
            return;
        }
        if (args.length == 0 && FormLauncher.available()) {
            FormLauncher.launch(args);
            return;
        }
        System.exit(StasisCommand.run(args));
    }
}
