package org.linesweep.cli;

/** The exit statuses every command uses. */
public final class ExitStatus {
    /** Success. */
    public static final int OK = 0;
    /** An internal error: a bug to report. */
    public static final int INTERNAL_ERROR = 1;
    /** Invalid input: design file, option or unit. */
    public static final int INVALID_INPUT = 2;
    /** No solution exists (commands that solve). */
    public static final int NO_SOLUTION = 3;
    /** The output could not be written. */
    public static final int OUTPUT_FAILED = 4;

    private ExitStatus() {
    }
}
