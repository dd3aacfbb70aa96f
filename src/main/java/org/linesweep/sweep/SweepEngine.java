package org.linesweep.sweep;

import org.linesweep.physics.CoupledPair;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.PairModes;
import org.linesweep.physics.LineParameters;
import org.linesweep.physics.Telegrapher;

/**
 * Computes whole sweeps. One engine holds its scratch space, so it is not thread-safe: give each thread
 * its own (they are cheap). The loop writes only into primitive arrays and allocates nothing of its own.
 */
public final class SweepEngine {

    private final LineParameters scratch = new LineParameters();
    private final double[] solution = new double[Telegrapher.SIZE];

    /** Computes a sweep into a new result. */
    public SweepResult run(LineModel model, double[] frequenciesHz, double lengthMetres) {
        return run(model, frequenciesHz, frequenciesHz.length, lengthMetres, new SweepResult());
    }

    /** Computes a sweep over a grid into a new result. */
    public SweepResult run(LineModel model, FrequencyGrid grid, double lengthMetres) {
        return run(model, grid.frequencies(), lengthMetres);
    }

    /** Computes a sweep of a line that may be one strip of an edge-coupled pair (null for a single line). */
    public SweepResult run(LineModel model, CoupledPair pair, double[] frequenciesHz, double lengthMetres) {
        return addPair(pair, run(model, frequenciesHz, lengthMetres));
    }

    /**
     * Fills the pair's mode values at the sweep's frequencies, or marks the sweep as a single line's when
     * {@code pair} is null.
     *
     * @return {@code result}
     */
    public SweepResult addPair(CoupledPair pair, SweepResult result) {
        result.preparePair(pair != null);
        if (pair != null) {
            for (int i = 0; i < result.size(); i++) {
                PairModes modes = pair.modes(result.frequencyHz[i]);
                result.oddImpedanceOhm[i] = modes.oddImpedanceOhm();
                result.evenImpedanceOhm[i] = modes.evenImpedanceOhm();
                result.oddEffectivePermittivity[i] = modes.oddEffectivePermittivity();
                result.evenEffectivePermittivity[i] = modes.evenEffectivePermittivity();
            }
        }
        return result;
    }

    /**
     * Computes a sweep into {@code reuse}, whose arrays are kept when large enough. The caller must own
     * {@code reuse}: nobody else may be reading it.
     *
     * @param count number of frequencies of {@code frequenciesHz} to use
     * @return {@code reuse}, filled
     */
    public SweepResult run(LineModel model, double[] frequenciesHz, int count, double lengthMetres, SweepResult reuse) {
        reuse.prepare(count, lengthMetres);
        reuse.preparePair(false);
        model.prepareForSweep(frequenciesHz, count);
        for (int i = 0; i < count; i++) {
            double f = frequenciesHz[i];
            model.evaluateWithSlopes(f, scratch);
            double r = scratch.resistanceOhmPerMetre();
            double g = scratch.conductanceSiemensPerMetre();
            double omega = 2 * Math.PI * f;
            Telegrapher.solve(r, scratch.inductanceHenryPerMetre(), g, scratch.capacitanceFaradPerMetre(), omega,
                    solution);
            double groupVelocity = Telegrapher.groupVelocity(r, scratch.inductanceHenryPerMetre(), g,
                    scratch.capacitanceFaradPerMetre(), scratch.resistanceSlope(), scratch.inductanceSlope(),
                    scratch.conductanceSlope(), scratch.capacitanceSlope(), omega, solution[Telegrapher.ALPHA],
                    solution[Telegrapher.BETA]);
            double alpha = solution[Telegrapher.ALPHA];
            double z0Re = solution[Telegrapher.Z0_RE];
            double z0Im = solution[Telegrapher.Z0_IM];
            double z0Squared = z0Re * z0Re + z0Im * z0Im;
            double conductorTerm = r;
            double dielectricTerm = g * z0Squared;
            double total = conductorTerm + dielectricTerm;
            reuse.frequencyHz[i] = f;
            reuse.resistanceOhmPerMetre[i] = r;
            reuse.inductanceHenryPerMetre[i] = scratch.inductanceHenryPerMetre();
            reuse.conductanceSiemensPerMetre[i] = g;
            reuse.capacitanceFaradPerMetre[i] = scratch.capacitanceFaradPerMetre();
            reuse.z0RealOhm[i] = z0Re;
            reuse.z0ImaginaryOhm[i] = z0Im;
            reuse.alphaNepersPerMetre[i] = alpha;
            reuse.conductorAlphaNepersPerMetre[i] = total > 0 ? alpha * conductorTerm / total : 0.0;
            reuse.betaRadiansPerMetre[i] = solution[Telegrapher.BETA];
            reuse.groupVelocityMetresPerSecond[i] = groupVelocity;
            reuse.effectivePermittivity[i] = scratch.effectivePermittivity();
            reuse.skinDepthMetres[i] = model.skinDepthMetres(f);
        }
        return reuse;
    }
}
