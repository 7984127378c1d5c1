package org.stasissheet;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Tells "{@code stasis-sheet CASE.json}" (one file to open in the form: a case, a course or a worksheet PDF) from a
 * command. A lone argument is taken as a file when it looks like one (a dot or a path separator in it); command names
 * have neither, and options start with a dash. Plain Java: no JavaFX, no
 * picocli, so deciding costs nothing at start-up.
 */
final class FileArgument {
    private FileArgument() {
    }

    /** The lone file argument, as given; empty when the arguments are for the command line. */
    static Optional<String> of(String[] args) {
        if (args.length != 1 || args[0].isEmpty() || args[0].startsWith("-")) {
            return Optional.empty();
        }
        String a = args[0];
        // a bare word stays a command even if a file or folder of that name is here (the rules folder is)
        return a.contains(".") || a.contains("/") || a.contains("\\") ? Optional.of(a) : Optional.empty();
    }

    /** Why this argument cannot be opened, in one line naming it; empty when it is a readable regular file. */
    static Optional<String> problem(String arg) {
        Path p;
        try {
            p = Path.of(arg);
        } catch (InvalidPathException e) {
            return Optional.of(quoted(arg) + " is not a usable path (" + e.getReason() + "). Give a case file (.json),"
                    + " a course file (.json) or a worksheet PDF.");
        }
        if (!Files.exists(p)) {
            return Optional.of(quoted(arg) + ": no such file. Give a case file (.json), a course file (.json) or a"
                    + " worksheet PDF; or a command (stasis-sheet --help lists them).");
        }
        if (Files.isDirectory(p)) {
            return Optional.of(quoted(arg) + " is a folder; give one case file, course file or worksheet PDF"
                    + " (for a folder of referrals: stasis-sheet triage).");
        }
        if (!Files.isRegularFile(p) || !Files.isReadable(p)) {
            return Optional.of(quoted(arg) + " is not a readable regular file.");
        }
        return Optional.empty();
    }

    /** The argument in quotes, with control characters shown as escapes so a terminal prints it safely. */
    private static String quoted(String arg) {
        StringBuilder sb = new StringBuilder("\"");
        arg.codePoints().forEach(cp -> {
            if (Character.isISOControl(cp)) {
                sb.append(String.format("\\u%04x", cp));
            } else {
                sb.appendCodePoint(cp);
            }
        });
        return sb.append('"').toString();
    }
}
