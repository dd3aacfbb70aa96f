package org.linesweep.cli;

/** A command that solves found no solution in the allowed range. */
public final class NoSolutionException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public NoSolutionException(String message) {
        super(message);
    }
}
