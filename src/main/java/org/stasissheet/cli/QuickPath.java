package org.stasissheet.cli;

import java.io.PrintWriter;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Optional;

/**
 * The two most common commands in their plain forms, {@code assess CASE [--json]} and {@code pdf CASE -o OUT}
 * ({@code --output} too, either order), run without building the command-line library's model of the whole command
 * tree: a cold start spent a large part of its time there (src/bench/RESULTS.md). They run the very code the
 * commands run, report failures through the same {@link StasisCommand#report}, and return the same exit codes.
 * Anything else, including any argument that the library would read in a way of its own (another option, an
 * attached value such as {@code -oOUT}, {@code --}, an {@code @file}), goes the full way.
 */
final class QuickPath {
    /** The arguments of a run the quick path can take. */
    sealed interface Run permits Assess, Pdf {
    }

    record Assess(Path caseFile, boolean json) implements Run {
    }

    record Pdf(Path caseFile, Path output) implements Run {
    }

    private QuickPath() {
    }

    /** The quick form of these arguments, or empty when they need the full command line. */
    static Optional<Run> recognise(String[] args) {
        if (args.length == 4 && "pdf".equals(args[0])) {
            return pdf(args);
        }
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

    /** {@code pdf CASE -o OUT}, {@code pdf -o OUT CASE}, with {@code --output} for {@code -o}. */
    private static Optional<Run> pdf(String[] args) {
        int flag = isOutputFlag(args[1]) ? 1 : isOutputFlag(args[2]) ? 2 : -1;
        if (flag < 0) {
            return Optional.empty();
        }
        String output = args[flag + 1];
        String file = flag == 1 ? args[3] : args[1];
        if (!plainPath(output) || !plainPath(file)) {
            return Optional.empty();
        }
        try {
            return Optional.of(new Pdf(Path.of(file), Path.of(output)));
        } catch (InvalidPathException e) {
            return Optional.empty();
        }
    }

    private static boolean isOutputFlag(String a) {
        return "-o".equals(a) || "--output".equals(a);
    }

    private static int assess(Assess a, PrintWriter out, PrintWriter err) {
        return AssessCommand.print(a.caseFile(), a.json(), Optional.empty(), Optional.empty(), out, err);
    }

    /** A path argument the command-line library would take as it is: not an option, not an argument file. */
    private static boolean plainPath(String a) {
        return !a.isEmpty() && a.charAt(0) != '-' && a.charAt(0) != '@' && a.indexOf('\0') < 0;
    }

    /** Runs a recognised command; never throws. */
    static int run(Run run, PrintWriter out, PrintWriter err) {
        try {
            int code = run instanceof Pdf p
                    ? PdfCommand.write(p.caseFile(), p.output(), PdfLayoutOptions.defaults(), Optional.empty(), out, err)
                    : assess((Assess) run, out, err);
            out.flush();
            err.flush();
            return code;
        } catch (RuntimeException | Error e) {
            return StasisCommand.report(e, err);
        }
    }
}
