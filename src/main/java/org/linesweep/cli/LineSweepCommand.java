package org.linesweep.cli;

import java.io.PrintStream;
import java.io.PrintWriter;
import org.linesweep.design.InvalidInputException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;

/**
 * The {@code linesweep} command and its subcommands. Use {@link #execute} so that every outcome maps to
 * the documented exit status and no stack trace reaches the console unless {@code --debug} is given.
 */
@Command(name = "linesweep", mixinStandardHelpOptions = true, version = "LineSweep 0.1.0",
        description = "Transmission-line sweeps against frequency: RLGC, attenuation, velocity, impedance and"
                + " frequency limits.",
        subcommands = {SweepCommand.class, LimitsCommand.class, SolveCommand.class, ToleranceCommand.class,
            WaveformCommand.class, TouchstoneCommand.class, ReviewCommand.class,
            MaterialsCommand.class},
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:success", "1:internal error (please report it)", "2:invalid input",
            "3:no solution exists", "4:the output could not be written"})
public final class LineSweepCommand implements Runnable {

    @Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "name a command: sweep, limits, solve, tolerance, waveform, touchstone, review or materials");
    }

    /**
     * Runs the command line.
     *
     * @return the exit status
     */
    public static int execute(String[] args, PrintStream out, PrintStream err) {
        boolean debug = java.util.Arrays.asList(args).contains("--debug");
        CommandLine commandLine = new CommandLine(new LineSweepCommand());
        commandLine.setOut(new PrintWriter(out, true));
        commandLine.setErr(new PrintWriter(err, true));
        commandLine.setCaseInsensitiveEnumValuesAllowed(true);
        commandLine.setExecutionExceptionHandler((exception, line, parseResult) -> {
            if (exception instanceof InvalidInputException invalid) {
                err.println("error: " + invalid.getMessage());
                return ExitStatus.INVALID_INPUT;
            }
            if (exception instanceof NoSolutionException none) {
                err.println("no solution: " + none.getMessage());
                return ExitStatus.NO_SOLUTION;
            }
            if (exception instanceof OutputFailedException failed) {
                err.println("error: " + failed.getMessage());
                return ExitStatus.OUTPUT_FAILED;
            }
            err.println("internal error: " + exception + ". Please report it with the command and design file"
                    + " that caused it; run again with --debug for details.");
            if (debug) {
                exception.printStackTrace(err);
            }
            return ExitStatus.INTERNAL_ERROR;
        });
        commandLine.setParameterExceptionHandler((exception, arguments) -> {
            err.println("error: " + exception.getMessage());
            err.println("Try 'linesweep " + exception.getCommandLine().getCommandName() + " --help'.");
            return ExitStatus.INVALID_INPUT;
        });
        try {
            return commandLine.execute(args);
        } catch (RuntimeException | Error e) {
            err.println("internal error: " + e + ". Please report it.");
            if (debug) {
                e.printStackTrace(err);
            }
            return ExitStatus.INTERNAL_ERROR;
        }
    }
}
