package org.linesweep.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.linesweep.design.Design;
import org.linesweep.design.Rule;
import org.linesweep.io.Touchstone;
import org.linesweep.signal.ScatteringSweep;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code linesweep touchstone}: the line of the design's length as a two-port S-parameter file. */
@Command(name = "touchstone", mixinStandardHelpOptions = true,
        description = "Write the design's line, of its length, as a Touchstone 1.1 two-port (.s2p) over the"
                + " design's sweep grid, for use in a circuit simulator.")
final class TouchstoneCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--reference-ohm", paramLabel = "R", defaultValue = "50",
            description = "Port reference impedance, ohms (default 50).")
    String referenceOhm;

    @Option(names = "--out", required = true, paramLabel = "FILE.s2p", description = "The file to write (atomically).")
    String out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        double reference = Rule.REFERENCE_IMPEDANCE.parse("--reference-ohm", referenceOhm);
        Design design = common.loadDesign();
        CommonOptions.printWarnings(design, err);
        ScatteringSweep sweep = ScatteringSweep.of(design.toModel(), design.lengthMetres(),
                design.sweep().grid().frequencies(), reference);
        Output.deliver(CommonOptions.path("--out", out), spec.commandLine().getOut(),
                stream -> Touchstone.write(sweep, Touchstone.header(design, reference), stream));
        return ExitStatus.OK;
    }
}
