package org.stasissheet.cli;

import java.io.PrintWriter;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Optional;

/**
 * The most common command, {@code assess CASE} (with or without {@code --json}), run without building the
 * command-line library's model of the whole command tree: a cold start spent most of its time there
 * (src/bench/RESULTS.md). It runs the very code the {@code assess} command runs, reports failures through the
 * same {@link StasisCommand#report}, and returns the same exit codes. Anything else, including any argument that
 * the library would read in a way of its own (an option, {@code --}, an {@code @file}), goes the full way.
 */
final class QuickPath {
    /** The arguments of a run the quick path can take. */
    record Assess(Path caseFile, boolean json) {
    }

    private QuickPath() {
    }

    /** The quick form of these arguments, or empty when they need the full command line. */
    static Optional<Assess> recognise(String[] args) {
        if (args.length < 2 || args.length > 3 || !"assess".equals(args[0])) {
            return Optional.empty();
        }
        String file = null;
        boolean json = false;
        for (int i = 1; i < args.length; i++) {
            String a = args[i];
            if ("--json".equals(a) && !json) {
                json = true;
            } else if (file == null && plainPath(a)) {
                file = a;
            } else {
                return Optional.empty();
            }
        }
        if (file == null) {
            return Optional.empty();
        }
        try {
            return Optional.of(new Assess(Path.of(file), json));
        } catch (InvalidPathException e) {
            return Optional.empty(); // the full command line words this one
        }
    }

    /** A path argument the command-line library would take as it is: not an option, not an argument file. */
    private static boolean plainPath(String a) {
        return !a.isEmpty() && a.charAt(0) != '-' && a.charAt(0) != '@' && a.indexOf('\0') < 0;
    }

    /** Runs a recognised {@code assess}; never throws. */
    static int run(Assess a, PrintWriter out, PrintWriter err) {
        try {
            int code = AssessCommand.print(a.caseFile(), a.json(), Optional.empty(), Optional.empty(), out, err);
            out.flush();
            err.flush();
            return code;
        } catch (RuntimeException | Error e) {
            return StasisCommand.report(e, err);
        }
    }
}
