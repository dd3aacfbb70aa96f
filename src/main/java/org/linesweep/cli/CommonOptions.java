package org.linesweep.cli;

import java.nio.file.Path;
import org.linesweep.design.Design;
import org.linesweep.io.DesignFiles;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Options every design command shares: the design file and --debug. */
final class CommonOptions {

    @Parameters(index = "0", paramLabel = "DESIGN.json", description = "The design file.")
    String designFile;

    @Option(names = "--debug", description = "Show a stack trace on an internal error.")
    boolean debug;

    /** Reads the design file. */
    Design loadDesign() {
        return DesignFiles.read(path("DESIGN.json", designFile));
    }

    /** A file name from the command line, or a clear error naming the option. */
    static Path path(String option, String value) {
        if (value == null) {
            return null;
        }
        try {
            return Path.of(value);
        } catch (java.nio.file.InvalidPathException e) {
            throw new org.linesweep.design.InvalidInputException(option, value.replace("\0", "\\0"),
                    "not a usable file name (" + e.getReason() + ")");
        }
    }

    static void printWarnings(Design design, java.io.PrintWriter err) {
        for (String warning : design.warnings()) {
            err.println("warning: " + warning);
        }
        err.flush();
    }
}
