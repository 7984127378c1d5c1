package org.stasissheet.register.store;

import java.util.List;

/**
 * The register could not be used, for a reason the user can act on: a malformed {@code --db} value, a database
 * that cannot be reached or read, a schema newer than this program. The message says what and where, never a
 * password and never patient data.
 */
public final class RegisterUnavailable extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final List<String> lines;

    public RegisterUnavailable(List<String> lines) {
        super(String.join("; ", lines), null, false, false);
        this.lines = List.copyOf(lines);
    }

    public RegisterUnavailable(String line) {
        this(List.of(line));
    }

    public List<String> lines() {
        return lines;
    }
}
