package org.linesweep.app.model;

import java.util.List;
import org.linesweep.design.Design;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LossRegions;
import org.linesweep.sweep.SweepEngine;
import org.linesweep.sweep.SweepResult;

/**
 * Everything computed for one design, as one immutable unit: the sweep, the limits, the loss regions and
 * the validity warnings. Views only read it.
 *
 * @param sequence increasing number of the request that produced it
 * @param design the design
 * @param model its physics model (immutable; used for exact point read-outs at the crosshair)
 * @param sweep the sweep over the design's grid
 * @param limits the frequency limits, by root finding
 * @param regions the RC corner and the loss crossover
 * @param warnings validity warnings, in words
 */
public record SweepSnapshot(long sequence, Design design, LineModel model, SweepResult sweep, FrequencyLimits limits,
        LossRegions regions, List<String> warnings) {

    /** Computes a snapshot with a new engine. */
    public static SweepSnapshot compute(long sequence, Design design) {
        return compute(sequence, design, new SweepEngine(), design.sweep().grid().frequencies());
    }

    /**
     * Computes a snapshot with the caller's engine (which must be its own: engines are not thread-safe) over the
     * design's grid, given as its frequencies (read, not kept).
     */
    public static SweepSnapshot compute(long sequence, Design design, SweepEngine engine, double[] frequencies) {
        LineModel model = design.toModel();
        SweepResult sweep = engine.run(model, design.toPair(), frequencies, design.lengthMetres());
        FrequencyLimits limits = LimitFinder.find(model, design.lengthMetres(), design.threshold(),
                design.lossBudgetDb());
        return new SweepSnapshot(sequence, design, model, sweep, limits, LossRegions.of(model),
                List.copyOf(design.warnings(model)));
    }
}
