package org.stasissheet.cli;

/** The process exit codes, as README documents them. */
public final class ExitCode {
    public static final int DONE = 0;
    public static final int INTERNAL_ERROR = 1;
    public static final int INVALID_INPUT = 2;
    /** A register decision was refused because someone else changed the referral first; nothing was saved. */
    public static final int CONFLICT = 3;

    private ExitCode() {
    }
}
