package org.linesweep.sweep;

import org.linesweep.physics.CoupledPair;
import org.linesweep.physics.FrequencyColumns;
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
    /** The last grid swept and what the models derive from it: a drag re-sweeps the same grid. */
    private final FrequencyColumns grid = new FrequencyColumns();
    /** dR'/dω, dL'/dω, dG'/dω, dC'/dω of the sweep, between the engine's two passes. */
    private double[] resistanceSlope = new double[0];
    private double[] inductanceSlope = new double[0];
    private double[] conductanceSlope = new double[0];
    private double[] capacitanceSlope = new double[0];

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
        if (!grid.holds(frequenciesHz, count)) {
            grid.fill(frequenciesHz, count);
        }
        FrequencyColumns columns = grid;
        // the columns in locals: the model's call in the loop could, as far as the compiler knows, change the
        // result's fields, so it would reload each of them (and its bounds) at every point
        LineParameters p = scratch;
        double[] out = solution;
        double[] frequency = reuse.frequencyHz;
        double[] resistance = reuse.resistanceOhmPerMetre;
        double[] inductance = reuse.inductanceHenryPerMetre;
        double[] conductance = reuse.conductanceSiemensPerMetre;
        double[] capacitance = reuse.capacitanceFaradPerMetre;
        double[] z0Real = reuse.z0RealOhm;
        double[] z0Imaginary = reuse.z0ImaginaryOhm;
        double[] alphaColumn = reuse.alphaNepersPerMetre;
        double[] conductorAlpha = reuse.conductorAlphaNepersPerMetre;
        double[] betaColumn = reuse.betaRadiansPerMetre;
        double[] groupVelocityColumn = reuse.groupVelocityMetresPerSecond;
        double[] permittivity = reuse.effectivePermittivity;
        double[] skinDepth = reuse.skinDepthMetres;
        if (resistanceSlope.length < count) {
            resistanceSlope = new double[count];
            inductanceSlope = new double[count];
            conductanceSlope = new double[count];
            capacitanceSlope = new double[count];
        }
        double[] dr = resistanceSlope;
        double[] dl = inductanceSlope;
        double[] dg = conductanceSlope;
        double[] dc = capacitanceSlope;
        // two passes rather than one: each loop body is short enough for the processor to overlap consecutive
        // points (a point is a long chain of dependent operations), which a single long body prevents
        for (int i = 0; i < count; i++) {
            p.setFrequency(columns, i);
            model.evaluatePoint(p);
            frequency[i] = frequenciesHz[i];
            resistance[i] = p.resistanceOhmPerMetre();
            inductance[i] = p.inductanceHenryPerMetre();
            conductance[i] = p.conductanceSiemensPerMetre();
            capacitance[i] = p.capacitanceFaradPerMetre();
            dr[i] = p.resistanceSlope();
            dl[i] = p.inductanceSlope();
            dg[i] = p.conductanceSlope();
            dc[i] = p.capacitanceSlope();
            permittivity[i] = p.effectivePermittivity();
            skinDepth[i] = p.skinDepthMetres();
        }
        for (int i = 0; i < count; i++) {
            double r = resistance[i];
            double l = inductance[i];
            double g = conductance[i];
            double c = capacitance[i];
            double omega = columns.omega(i);
            Telegrapher.solve(r, l, g, c, omega, out);
            double alpha = out[Telegrapher.ALPHA];
            double beta = out[Telegrapher.BETA];
            double z0Re = out[Telegrapher.Z0_RE];
            double z0Im = out[Telegrapher.Z0_IM];
            // α ≈ (R' + G'·|Z0|²)/(2|Z0|) on a low-loss line, so the conductors' share of α is R'/(R' + G'·|Z0|²)
            double dielectricTerm = g * (z0Re * z0Re + z0Im * z0Im);
            double total = r + dielectricTerm;
            z0Real[i] = z0Re;
            z0Imaginary[i] = z0Im;
            alphaColumn[i] = alpha;
            conductorAlpha[i] = total > 0 ? alpha * r / total : 0.0;
            betaColumn[i] = beta;
            groupVelocityColumn[i] = Telegrapher.groupVelocity(r, l, g, c, dr[i], dl[i], dg[i], dc[i], omega, alpha,
                    beta);
        }
        return reuse;
    }
}
