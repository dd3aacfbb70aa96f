package org.linesweep.cli;

/** The command's output could not be written. */
final class OutputFailedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    OutputFailedException(String message, Throwable cause) {
        super(message, cause);
    }
}
