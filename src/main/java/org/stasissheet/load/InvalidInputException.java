package org.stasissheet.load;

import java.util.List;

/**
 * Bad input from the user (a case file, a rule folder, an output path): printed as its lines, exit code 2,
 * never a stack trace.
 */
public final class InvalidInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final List<String> lines;

    public InvalidInputException(List<String> lines) {
        super(String.join("; ", lines), null, false, false);
        this.lines = List.copyOf(lines);
    }

    public InvalidInputException(String line) {
        this(List.of(line));
    }

    public List<String> lines() {
        return lines;
    }
}
