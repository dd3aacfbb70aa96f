package org.linesweep.cli;

import java.nio.file.Path;
import org.linesweep.design.Design;
import org.linesweep.io.DesignFiles;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Options every design command shares: the design file and --debug. */
final class CommonOptions {

    @Parameters(index = "0", paramLabel = "DESIGN.json", description = "The design file.")
    Path designFile;

    @Option(names = "--debug", description = "Show a stack trace on an internal error.")
    boolean debug;

    /** Reads the design file. */
    Design loadDesign() {
        return DesignFiles.read(designFile);
    }

    static void printWarnings(Design design, java.io.PrintWriter err) {
        for (String warning : design.warnings()) {
            err.println("warning: " + warning);
        }
        err.flush();
    }
}
