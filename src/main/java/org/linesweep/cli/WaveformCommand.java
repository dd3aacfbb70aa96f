package org.linesweep.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Rule;
import org.linesweep.io.WaveformTable;
import org.linesweep.physics.LineModel;
import org.linesweep.signal.WaveShape;
import org.linesweep.signal.Waveform;
import org.linesweep.signal.WaveformSettings;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code linesweep waveform}: the time-domain response of the design's line between a source and a load. */
@Command(name = "waveform", mixinStandardHelpOptions = true,
        description = {"Drive the design's line of its length from a source of --source-ohm with a 1 V step, pulse"
                + " or square wave (Gaussian edges of --rise, 10-90 %%) into --load-ohm (with --load-pf across it)"
                + " and write time_s,input_v,output_v: the near-end and far-end voltages.",
            "Delay, 10-90 %% rise time and overshoot of the far end go to standard error, with any warning"
                + " (a constant loss tangent or surface roughness makes the model non-causal)."})
final class WaveformCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--shape", required = true, paramLabel = "step|pulse|square", description = "Source waveform.")
    String shape;

    @Option(names = "--rise", required = true, paramLabel = "T", description = "10-90 %% rise time, e.g. 100ps.")
    String rise;

    @Option(names = "--width", paramLabel = "T", description = "Pulse width, 50 %% to 50 %% (pulse).")
    String width;

    @Option(names = "--period", paramLabel = "T", description = "Period (square wave, 50 %% duty).")
    String period;

    @Option(names = "--source-ohm", required = true, paramLabel = "R", description = "Source resistance, ohms.")
    String sourceOhm;

    @Option(names = "--load-ohm", required = true, paramLabel = "R|open", description = "Load resistance, ohms, or open.")
    String loadOhm;

    @Option(names = "--load-pf", paramLabel = "C", description = "Capacitance across the load, pF (default 0).")
    String loadPicofarad;

    @Option(names = "--duration", paramLabel = "T", description = "Length of the record (default: chosen from the"
            + " line's delay, the edges and the reflections).")
    String duration;

    @Option(names = "--out", paramLabel = "FILE", description = "Write to FILE (atomically) instead of standard output.")
    String out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        WaveShape waveShape = WaveShape.fromKey(shape);
        if (waveShape == null) {
            throw new InvalidInputException("--shape", shape, "expected step, pulse or square");
        }
        if (width != null && waveShape != WaveShape.PULSE) {
            throw new InvalidInputException("--width", width, "only a pulse has a width; use --shape pulse");
        }
        if (period != null && waveShape != WaveShape.SQUARE) {
            throw new InvalidInputException("--period", period, "only a square wave has a period; use --shape square");
        }
        WaveformSettings settings = new WaveformSettings(waveShape, Rule.RISE_TIME.parse("--rise", rise),
                width == null ? Double.NaN : Rule.TIME_SPAN.parse("--width", width),
                period == null ? Double.NaN : Rule.TIME_SPAN.parse("--period", period),
                Rule.SOURCE_RESISTANCE.parse("--source-ohm", sourceOhm),
                WaveformSettings.parseLoad("--load-ohm", loadOhm),
                loadPicofarad == null ? 0.0 : WaveformSettings.parseLoadPicofarads("--load-pf", loadPicofarad),
                duration == null ? Double.NaN : Rule.TIME_SPAN.parse("--duration", duration));
        Design design = common.loadDesign();
        CommonOptions.printWarnings(design, err);
        LineModel model = design.toModel();
        Waveform waveform = settings.simulate(model, design.lengthMetres());
        for (String warning : waveform.warnings()) {
            err.println("warning: " + warning);
        }
        err.println("far end: " + waveform.summary());
        err.flush();
        Output.deliver(CommonOptions.path("--out", out), spec.commandLine().getOut(),
                stream -> WaveformTable.writeCsv(waveform, stream));
        return ExitStatus.OK;
    }
}
