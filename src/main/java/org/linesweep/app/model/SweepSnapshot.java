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

    /** Computes a snapshot; runs off the FX thread. */
    public static SweepSnapshot compute(long sequence, Design design) {
        LineModel model = design.toModel();
        SweepResult sweep = new SweepEngine().run(model, design.toPair(), design.sweep().grid().frequencies(),
                design.lengthMetres());
        FrequencyLimits limits = LimitFinder.find(model, design.lengthMetres(), design.threshold(),
                design.lossBudgetDb());
        return new SweepSnapshot(sequence, design, model, sweep, limits, LossRegions.of(model),
                List.copyOf(design.warnings(model)));
    }
}
