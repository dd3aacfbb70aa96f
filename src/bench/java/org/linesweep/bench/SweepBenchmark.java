package org.linesweep.bench;

import java.util.concurrent.TimeUnit;
import org.linesweep.design.Design;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LineType;
import org.linesweep.physics.Telegrapher;
import org.linesweep.sweep.FrequencyGrid;
import org.linesweep.sweep.GridScale;
import org.linesweep.sweep.SweepEngine;
import org.linesweep.sweep.SweepResult;
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
import org.openjdk.jmh.infra.Blackhole;

/**
 * A 2,000-point log sweep of each line type, the shared telegrapher floor, the limits, and one design
 * change as the explorer makes it. Times are per operation (one whole sweep), in microseconds.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 6, time = 1)
@Fork(1)
public class SweepBenchmark {

    /** Points per sweep. */
    public static final int POINTS = 2000;

    @Param({"COAX", "TWO_WIRE", "WIRE_OVER_GROUND", "PARALLEL_PLATE", "MICROSTRIP", "STRIPLINE"})
    public String type;

    private Design design;
    private LineModel model;
    private double[] frequencies;
    private final SweepEngine engine = new SweepEngine();
    private final SweepResult reuse = new SweepResult();
    private double[] r;
    private double[] l;
    private double[] g;
    private double[] c;
    private final double[] solution = new double[Telegrapher.SIZE];
    private int toggle;
    private int dragCount;

    @Setup
    public void setUp() {
        design = BenchDesigns.of(LineType.valueOf(type));
        model = design.toModel();
        frequencies = new FrequencyGrid(design.sweep().fromHz(), design.sweep().toHz(), POINTS, GridScale.LOG)
                .frequencies();
        SweepResult sweep = engine.run(model, frequencies, design.lengthMetres());
        r = new double[POINTS];
        l = new double[POINTS];
        g = new double[POINTS];
        c = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            r[i] = sweep.resistanceOhmPerMetre(i);
            l[i] = sweep.inductanceHenryPerMetre(i);
            g[i] = sweep.conductanceSiemensPerMetre(i);
            c[i] = sweep.capacitanceFaradPerMetre(i);
        }
    }

    /** The whole sweep: R', L', G', C', γ, Z0, group velocity and skin depth at every point. */
    @Benchmark
    public SweepResult sweep() {
        return engine.run(model, frequencies, POINTS, design.lengthMetres(), reuse);
    }

    /**
     * The floor every sweep stands on: from fixed R', L', G', C' to γ and Z0 with the grid's ω, results
     * consumed so nothing is hoisted or discarded.
     */
    @Benchmark
    public void floor(Blackhole sink) {
        for (int i = 0; i < POINTS; i++) {
            Telegrapher.solve(r[i], l[i], g[i], c[i], 2 * Math.PI * frequencies[i], solution);
            sink.consume(solution[Telegrapher.ALPHA] + solution[Telegrapher.BETA] + solution[Telegrapher.Z0_RE]
                    + solution[Telegrapher.Z0_IM]);
        }
    }

    /** The frequency limits by root finding. */
    @Benchmark
    public FrequencyLimits limits() {
        return LimitFinder.find(model, design.lengthMetres(), design.threshold(), 3.0);
    }

    /**
     * One design change as the explorer makes it: validate the new design (the first geometry field nudged by
     * ±0.1 %), build its model, sweep 2,000 points and find its limits.
     */
    @Benchmark
    public FrequencyLimits designChange() {
        toggle ^= 1;
        String field = design.geometry().valuesMetres().keySet().iterator().next();
        Design changed = design.withGeometryValue(field, design.geometry().value(field) * (toggle == 0 ? 1.001 : 0.999));
        LineModel changedModel = changed.toModel();
        engine.run(changedModel, frequencies, POINTS, changed.lengthMetres(), reuse);
        return LimitFinder.find(changedModel, changed.lengthMetres(), changed.threshold(), changed.lossBudgetDb());
    }

    /**
     * One step of a drag as the explorer computes it (model, 2,000-point sweep, limits): each call moves one
     * geometry field, the fields in turn, to a value no earlier call used, so no table kept for an earlier value
     * (a tube's c/b, a mode cutoff) can serve, as in a real drag. {@link #designChange} alternates between two
     * values, which the kept tables do serve.
     */
    @Benchmark
    public FrequencyLimits dragStep() {
        dragCount++;
        String[] fields = design.geometry().valuesMetres().keySet().toArray(String[]::new);
        String field = fields[dragCount % fields.length];
        double factor = 1.0 + 0.05 * (dragCount % 100_000) / 100_000.0;
        Design changed = design.withGeometryValue(field, design.geometry().value(field) * factor);
        LineModel changedModel = changed.toModel();
        engine.run(changedModel, frequencies, POINTS, changed.lengthMetres(), reuse);
        return LimitFinder.find(changedModel, changed.lengthMetres(), changed.threshold(), changed.lossBudgetDb());
    }
}
