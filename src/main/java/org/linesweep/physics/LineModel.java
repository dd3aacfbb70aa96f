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

    /** δ·sqrt(f) of the conductor, m·Hz^½ (δ = 1/sqrt(πfμσ)); NaN for a perfect conductor. */
    private final double skinDepthAtOneHertz;
    /** 1.4·(Δ/δ)²/f, 1/Hz: Hammerstad's roughness argument per hertz; 0 when smooth or perfect. */
    private final double roughnessPerHertz;
    private final double logRoughnessPerHertz;

    /**
     * (2/π)·atan(v), the roughness factor's rising part, against ln v from v = e^−20 to e^20 (outside, the
     * arc tangent itself serves), 64 nodes per unit: the function is a smooth step on the scale of one unit of
     * ln v, so the table holds it within about 1e-10 (tested). Shared by every rough conductor; about 2,600
     * closed-form evaluations, built on first use.
     */
    static final HermiteTable ROUGHNESS_TABLE = new HermiteTable((v, out) -> {
        out[0] = (2.0 / Math.PI) * Math.atan(v);
        out[1] = 0.0;
        out[2] = (2.0 / Math.PI) / (1.0 + v * v);
        out[3] = 0.0;
    }, Math.exp(-20), Math.exp(20), 64);

    protected LineModel(Conductor conductor, Dielectric dielectric) {
        this.conductor = conductor;
        this.dielectric = dielectric;
        this.permittivity = dielectric.evaluator();
        boolean perfect = conductor.isPerfect();
        double piMuSigma = Math.PI * conductor.permeabilityHenryPerMetre() * conductor.conductivitySiemensPerMetre();
        this.skinDepthAtOneHertz = perfect ? Double.NaN : 1.0 / Math.sqrt(piMuSigma);
        double roughness = conductor.roughnessRmsMetres();
        this.roughnessPerHertz = perfect || !(roughness > 0) ? 0.0 : 1.4 * roughness * roughness * piMuSigma;
        this.logRoughnessPerHertz = Math.log(roughnessPerHertz);
    }

    /**
     * Starts the evaluation of the frequency set in the caller's scratch {@code p} (see
     * {@link LineParameters#setFrequency}): the skin depth, the roughness factor K = 1 + (2/π)·atan(1.4·(Δ/δ)²) and dK/dω (Hammerstad and Jensen 1980, see
     * {@link Conductor#roughnessFactor}; read from {@link #ROUGHNESS_TABLE}), and an empty internal impedance.
     */
    final void beginPoint(LineParameters p) {
        double frequencyHz = p.frequencyHz;
        double omega = p.omega;
        double logFrequency = p.logFrequency;
        p.skinDepthMetres = skinDepthAtOneHertz * p.inverseSqrtFrequency;
        if (roughnessPerHertz > 0) {
            // v = 1.4(Δ/δ)² ∝ f; the table holds (2/π)·atan(v) against ln v, so dK/dω = (dK/d ln v)/ω
            double logV = logRoughnessPerHertz + logFrequency;
            if (ROUGHNESS_TABLE.coversLog(logV)) {
                double[] f = p.lookup;
                ROUGHNESS_TABLE.evaluateLog(logV, f);
                p.roughness = 1.0 + f[0];
                p.roughnessSlope = f[2] * p.inverseOmega;
            } else {
                double v = roughnessPerHertz * frequencyHz;
                p.roughness = conductor.roughnessFactor(frequencyHz);
                p.roughnessSlope = (2.0 / Math.PI) * v / (omega * (1.0 + v * v));
            }
        } else {
            p.roughness = 1.0;
            p.roughnessSlope = 0.0;
        }
        p.impedanceRe = 0.0;
        p.impedanceIm = 0.0;
        p.impedanceReSlope = 0.0;
        p.impedanceImSlope = 0.0;
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
     * Computes the parameters and their derivatives with respect to ω at one frequency.
     */
    public final void evaluateWithSlopes(double frequencyHz, LineParameters out) {
        out.setFrequency(frequencyHz);
        evaluatePoint(out);
    }

    /**
     * Computes the parameters and their derivatives with respect to ω at the frequency already set in {@code p}
     * (see {@link LineParameters#setFrequency}): what a sweep calls at each point. This default takes a central
     * difference of {@link #evaluate} with relative step {@link #GROUP_VELOCITY_STEP}; line types that know
     * their derivatives in closed form override it.
     */
    public void evaluatePoint(LineParameters p) {
        double frequencyHz = p.frequencyHz;
        double step = GROUP_VELOCITY_STEP * frequencyHz;
        evaluate(frequencyHz + step, p);
        double r = p.resistanceOhmPerMetre;
        double l = p.inductanceHenryPerMetre;
        double g = p.conductanceSiemensPerMetre;
        double c = p.capacitanceFaradPerMetre;
        evaluate(frequencyHz - step, p);
        double span = 2 * Math.PI * 2 * step;
        double dr = (r - p.resistanceOhmPerMetre) / span;
        double dl = (l - p.inductanceHenryPerMetre) / span;
        double dg = (g - p.conductanceSiemensPerMetre) / span;
        double dc = (c - p.capacitanceFaradPerMetre) / span;
        evaluate(frequencyHz, p);
        p.setSlopes(dr, dl, dg, dc);
        p.setFrequency(frequencyHz);
        p.skinDepthMetres = skinDepthMetres(frequencyHz);
    }

    /**
     * Told by the sweep engine which frequencies are about to be evaluated, so a line type may tabulate an
     * expensive part of its model over just that range when that costs less than evaluating it exactly at
     * each point. Results stay within the tables' stated accuracy of the exact model (see
     * {@code HermiteTable}); safe to call from any thread. It finds the sweep's range and hands it to
     * {@link #prepareForRange}, which tabulates a wideband dielectric's ε(f) and, in line types that override it,
     * their own parts (when {@code HermiteTable.pays}).
     *
     * @param count number of frequencies of {@code frequenciesHz} to be used
     */
    public final void prepareForSweep(double[] frequenciesHz, int count) {
        double low = Double.POSITIVE_INFINITY;
        double high = 0.0;
        for (int i = 0; i < count; i++) {
            low = Math.min(low, frequenciesHz[i]);
            high = Math.max(high, frequenciesHz[i]);
        }
        prepareForRange(frequenciesHz, count, low, high);
    }

    /**
     * {@link #prepareForSweep} with the sweep's lowest and highest frequency found: line types that tabulate
     * more override this and call it first.
     */
    protected void prepareForRange(double[] frequenciesHz, int count, double lowHz, double highHz) {
        permittivity.prepareForSweep(lowHz, highHz, count);
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
        return skinDepthAtOneHertz / Math.sqrt(frequencyHz);
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
