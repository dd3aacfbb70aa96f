package org.linesweep.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.linesweep.design.Design;
import org.linesweep.design.Rule;
import org.linesweep.design.SweepSettings;
import org.linesweep.io.SweepTable;
import org.linesweep.sweep.GridScale;
import org.linesweep.sweep.SweepEngine;
import org.linesweep.sweep.SweepResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code linesweep sweep}: one row per frequency. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Write R', L', G', C', Z0, attenuation, velocities, wavelength, electrical length, effective"
                + " permittivity and skin depth at each frequency of the design's sweep (or of --at).")
final class SweepCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--from", paramLabel = "F", description = "First frequency, e.g. 10kHz (default: the design's).")
    String from;

    @Option(names = "--to", paramLabel = "F", description = "Last frequency, e.g. 20GHz (default: the design's).")
    String to;

    @Option(names = "--points", paramLabel = "N", description = "Number of points, 2 to 100000.")
    String points;

    @Option(names = "--scale", paramLabel = "log|lin", description = "Point spacing: log or lin.")
    String scale;

    @Option(names = "--at", split = ",", paramLabel = "F1,F2,...",
            description = "Evaluate exactly these frequencies instead of a grid.")
    List<String> at;

    @Option(names = "--format", paramLabel = "csv|json", defaultValue = "csv",
            description = "Output format: csv (default) or json.")
    String format;

    @Option(names = "--out", paramLabel = "FILE", description = "Write to FILE (atomically) instead of standard output.")
    String out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        if (!format.equals("csv") && !format.equals("json")) {
            throw new org.linesweep.design.InvalidInputException("--format", format, "expected csv or json");
        }
        Design design = common.loadDesign();
        double[] frequencies;
        if (at != null && !at.isEmpty()) {
            if (from != null || to != null || points != null || scale != null) {
                throw new org.linesweep.design.InvalidInputException("--at", String.join(",", at),
                        "--at lists the frequencies itself; leave out --from, --to, --points and --scale");
            }
            frequencies = new double[at.size()];
            for (int i = 0; i < at.size(); i++) {
                frequencies[i] = Rule.FREQUENCY.parse("--at", at.get(i));
            }
        } else {
            SweepSettings base = design.sweep();
            double fromHz = from == null ? base.fromHz() : Rule.FREQUENCY.parse("--from", from);
            double toHz = to == null ? base.toHz() : Rule.FREQUENCY.parse("--to", to);
            int count = points == null ? base.points() : (int) Rule.POINTS.parse("--points", points);
            GridScale gridScale = scale == null ? base.scale() : GridScale.byKey(scale).orElseThrow(() ->
                    new org.linesweep.design.InvalidInputException("--scale", scale, "expected log or lin"));
            if (fromHz >= toHz) {
                throw new org.linesweep.design.InvalidInputException("--from", from == null ? String.valueOf(fromHz)
                        : from, "the sweep must start below its end (" + toHz + " Hz)");
            }
            design = design.withSweep(new SweepSettings(fromHz, toHz, count, gridScale));
            frequencies = design.sweep().grid().frequencies();
        }
        CommonOptions.printWarnings(design, err);
        SweepResult result = new SweepEngine().run(design.toModel(), design.toPair(), frequencies, design.lengthMetres());
        Output.deliver(CommonOptions.path("--out", out), spec.commandLine().getOut(), stream -> {
            if (format.equals("json")) {
                SweepTable.writeJson(result, stream);
            } else {
                SweepTable.writeCsv(result, stream);
            }
        });
        return ExitStatus.OK;
    }
}
