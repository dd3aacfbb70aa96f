package org.linesweep;

import org.linesweep.cli.LineSweepCommand;

/**
 * Entry point of the runnable jar: with no arguments it opens the explorer window on the default design,
 * with {@code explore DESIGN.json} on that design, otherwise it runs the command line. It does not extend
 * JavaFX's Application, so the jar starts from the class path.
 */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0 || "explore".equals(args[0])) {
            org.linesweep.app.ExplorerLauncher.launch(args);
            return;
        }
        System.exit(LineSweepCommand.execute(args, System.out, System.err));
    }
}
