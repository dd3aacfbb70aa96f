package org.linesweep.physics;

import java.util.List;

/**
 * A transmission line of one geometry with its conductor and dielectric, reduced at each frequency to
 * per-unit-length R', L', G', C'. Subclasses implement the geometry; the wave quantities follow from
 * {@link Telegrapher} for every type alike.
 *
 * <p>Instances are immutable and safe to share between threads; {@link #evaluate} writes only into the
 * caller's scratch object.
 */
public abstract class LineModel {

    /**
     * Relative frequency step of the central difference used for the derivatives of the parameters when a
     * line type has no closed form for them. With h = 1e-5 the truncation error (∝ h²) and the rounding
     * error (∝ 1e-16/h) are both near 1e-10.
     */
    static final double GROUP_VELOCITY_STEP = 1e-5;

    protected final Conductor conductor;
    protected final Dielectric dielectric;
    protected final Dielectric.Evaluator permittivity;

    protected LineModel(Conductor conductor, Dielectric dielectric) {
        this.conductor = conductor;
        this.dielectric = dielectric;
        this.permittivity = dielectric.evaluator();
    }

    /** The geometry this model describes. */
    public abstract LineType type();

    /**
     * Computes R', L', G', C' and the effective permittivity at one frequency.
     *
     * @param frequencyHz f &gt; 0, Hz
     * @param out receives the parameters
     */
    public abstract void evaluate(double frequencyHz, LineParameters out);

    /**
     * Computes the parameters and their derivatives with respect to ω at one frequency. This default takes a
     * central difference of {@link #evaluate} with relative step {@link #GROUP_VELOCITY_STEP}; line types that
     * know their derivatives in closed form override it.
     */
    public void evaluateWithSlopes(double frequencyHz, LineParameters out) {
        double step = GROUP_VELOCITY_STEP * frequencyHz;
        evaluate(frequencyHz + step, out);
        double r = out.resistanceOhmPerMetre;
        double l = out.inductanceHenryPerMetre;
        double g = out.conductanceSiemensPerMetre;
        double c = out.capacitanceFaradPerMetre;
        evaluate(frequencyHz - step, out);
        double span = 2 * Math.PI * 2 * step;
        double dr = (r - out.resistanceOhmPerMetre) / span;
        double dl = (l - out.inductanceHenryPerMetre) / span;
        double dg = (g - out.conductanceSiemensPerMetre) / span;
        double dc = (c - out.capacitanceFaradPerMetre) / span;
        evaluate(frequencyHz, out);
        out.setSlopes(dr, dl, dg, dc);
    }

    /**
     * Told by the sweep engine which frequencies are about to be evaluated, so a line type may tabulate an
     * expensive part of its model over just that range when that costs less than evaluating it exactly at
     * each point. The default does nothing. Results stay within the tables' stated accuracy of the exact
     * model (see {@code HermiteTable}); safe to call from any thread.
     *
     * @param count number of frequencies of {@code frequenciesHz} to be used
     */
    public void prepareForSweep(double[] frequenciesHz, int count) {
    }

    /**
     * Radius (round conductor) or half-thickness (flat conductor) of the conductor whose skin effect
     * characterises the line: the coax inner, one wire, one plate or the strip.
     */
    public abstract double characteristicHalfSizeMetres();

    /** R_ac/R_dc of the characteristic conductor at f, as the line's model computes it; NaN if perfect. */
    public abstract double characteristicResistanceRatio(double frequencyHz);

    /** Cutoff of the first higher-order mode, Hz; NaN for open lines, which have none. */
    public abstract double higherModeCutoffHz();

    /** The separation that makes an open line radiate (spacing of two wires, twice the height); NaN if closed. */
    public double radiatingSpacingMetres() {
        return Double.NaN;
    }

    /** Where this design lies outside a published formula's stated validity range, in words. */
    public abstract List<String> validityWarnings();

    /** The geometry in words, for reports: each dimension with its name, in metres. */
    protected abstract String geometryText();

    @Override
    public String toString() {
        return type().key() + "[" + geometryText() + "; " + conductor + "; " + dielectric + "]";
    }

    /** The conductor. */
    public Conductor conductor() {
        return conductor;
    }

    /** The dielectric. */
    public Dielectric dielectric() {
        return dielectric;
    }

    /** Skin depth of the characteristic conductor, m; NaN for a perfect conductor. */
    public double skinDepthMetres(double frequencyHz) {
        return conductor.isPerfect() ? Double.NaN : conductor.skinDepthMetres(frequencyHz);
    }

    /** Phase constant β at f, rad/m, using the caller's scratch space. */
    public double beta(double frequencyHz, LineParameters scratch, double[] solution) {
        evaluate(frequencyHz, scratch);
        Telegrapher.solve(scratch.resistanceOhmPerMetre, scratch.inductanceHenryPerMetre,
                scratch.conductanceSiemensPerMetre, scratch.capacitanceFaradPerMetre,
                2 * Math.PI * frequencyHz, solution);
        return solution[Telegrapher.BETA];
    }

    /**
     * Everything the model says at one frequency, computed exactly as the sweep engine computes each point:
     * the group velocity is dω/dβ of the model at f, from {@link #evaluateWithSlopes}.
     */
    public LinePoint at(double frequencyHz) {
        LineParameters p = new LineParameters();
        double[] solution = new double[Telegrapher.SIZE];
        evaluateWithSlopes(frequencyHz, p);
        double omega = 2 * Math.PI * frequencyHz;
        Telegrapher.solve(p.resistanceOhmPerMetre, p.inductanceHenryPerMetre, p.conductanceSiemensPerMetre,
                p.capacitanceFaradPerMetre, omega, solution);
        double groupVelocity = Telegrapher.groupVelocity(p.resistanceOhmPerMetre, p.inductanceHenryPerMetre,
                p.conductanceSiemensPerMetre, p.capacitanceFaradPerMetre, p.resistanceSlope, p.inductanceSlope,
                p.conductanceSlope, p.capacitanceSlope, omega, solution[Telegrapher.ALPHA], solution[Telegrapher.BETA]);
        return new LinePoint(frequencyHz, p.resistanceOhmPerMetre, p.inductanceHenryPerMetre,
                p.conductanceSiemensPerMetre, p.capacitanceFaradPerMetre,
                solution[Telegrapher.Z0_RE], solution[Telegrapher.Z0_IM], solution[Telegrapher.ALPHA],
                solution[Telegrapher.BETA], groupVelocity, p.effectivePermittivity, skinDepthMetres(frequencyHz));
    }

    /** Relative permeability of the dielectric times its ε′ at f: the square of the slowing factor. */
    protected double slowingSquared(double frequencyHz) {
        return permittivity.real(frequencyHz) * dielectric.relativePermeability();
    }

    /**
     * Solves f = f0/sqrt(ε′(f)·μr) for a cutoff whose free-space value is f0, by fixed-point iteration
     * (ε′ changes by well under a percent per decade, so three passes are plenty).
     */
    protected double cutoffInDielectric(double freeSpaceCutoffHz) {
        double f = freeSpaceCutoffHz / Math.sqrt(dielectric.relativePermittivity() * dielectric.relativePermeability());
        for (int i = 0; i < 3; i++) {
            f = freeSpaceCutoffHz / Math.sqrt(slowingSquared(f));
        }
        return f;
    }

    /** acosh x for x ≥ 1, written to keep accuracy as x → 1. */
    protected static double acosh(double x) {
        double excess = x - 1.0;
        return Math.log1p(excess + Math.sqrt(excess * (x + 1.0)));
    }
}
