package org.linesweep.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.linesweep.design.Design;
import org.linesweep.design.Tolerance;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LineType;
import org.linesweep.signal.Stimulus;
import org.linesweep.signal.Terminations;
import org.linesweep.signal.TimeDomain;
import org.linesweep.signal.Waveform;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The decision and signal tools: a 2,000-sample tolerance run at one frequency (all cores, as the explorer
 * runs it) and one time-domain response (a 100 ps step, matched source, open load with 2 pF), per line type.
 * Times per operation in milliseconds.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SignalBenchmark {

    /** Monte Carlo samples per tolerance run. */
    public static final int SAMPLES = 2000;

    @Param({"COAX", "MICROSTRIP"})
    public String type;

    private Design design;
    private LineModel model;
    private List<Tolerance.Variation> variations;
    private Stimulus stimulus;
    private Terminations terminations;
    private double duration;

    @Setup
    public void setUp() {
        design = BenchDesigns.of(LineType.valueOf(type));
        model = design.toModel();
        String first = design.geometry().valuesMetres().keySet().iterator().next();
        variations = List.of(Tolerance.parseVariation(design, first + "=±5%"),
                Tolerance.parseVariation(design, "permittivity=±0.1"));
        stimulus = Stimulus.step(100e-12);
        terminations = new Terminations(50, Double.POSITIVE_INFINITY, 2e-12);
        duration = TimeDomain.defaultDurationSeconds(model, design.lengthMetres(), stimulus, terminations);
    }

    /** 2,000 samples of the design with two inputs varied, at 1 GHz, on every core. */
    @Benchmark
    public Tolerance.Result tolerance() {
        return Tolerance.run(design, variations, Tolerance.Distribution.UNIFORM, SAMPLES, 1L, 1e9, 50, 0.1,
                Runtime.getRuntime().availableProcessors(), n -> { }, () -> false);
    }

    /** One time-domain response: spectrum by the line model, inverse FFT, read-outs. */
    @Benchmark
    public Waveform waveform() {
        return TimeDomain.simulate(model, design.lengthMetres(), stimulus, terminations, duration);
    }
}
