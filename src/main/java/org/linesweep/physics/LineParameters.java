package org.linesweep.physics;

/**
 * Per-unit-length parameters at one frequency, as written by {@link LineModel#evaluate}. Mutable on
 * purpose: the sweep engine reuses one instance for every point so its loop allocates nothing.
 */
public final class LineParameters {
    /** R', Ω/m. */
    double resistanceOhmPerMetre;
    /** L' including internal inductance, H/m. */
    double inductanceHenryPerMetre;
    /** G', S/m. */
    double conductanceSiemensPerMetre;
    /** C', F/m. */
    double capacitanceFaradPerMetre;
    /** Effective relative permittivity: ε′(f) on homogeneous lines, ε_eff(f) on microstrip. */
    double effectivePermittivity;
    /** dR'/dω, dL'/dω, dG'/dω, dC'/dω (per rad/s), when asked for. */
    double resistanceSlope;
    double inductanceSlope;
    double conductanceSlope;
    double capacitanceSlope;

    // Per-point working values the line models share while they evaluate one frequency (set by setFrequency
    // and LineModel.beginPoint); kept here so that the caller's one scratch object is all a point needs.
    /** f (Hz), ω (rad/s), 1/ω, ln f, sqrt f and 1/sqrt f of the point being evaluated (see setFrequency). */
    double frequencyHz;
    double omega;
    double inverseOmega;
    double logFrequency;
    double sqrtFrequency;
    double inverseSqrtFrequency;
    /** Skin depth of the line's conductor at the point, m (NaN for a perfect conductor). */
    double skinDepthMetres;
    /** Hammerstad's roughness factor K at the point and dK/dω. */
    double roughness;
    double roughnessSlope;
    /** The conductors' internal impedance per metre accumulated so far, and its ω-derivative. */
    double impedanceRe;
    double impedanceIm;
    double impedanceReSlope;
    double impedanceImSlope;
    /** The dielectric's ε′, ε″ at the point and their ω-derivatives. */
    double permittivityRe;
    double permittivityIm;
    double permittivityReSlope;
    double permittivityImSlope;
    /** Receives one table lookup: {Re G, Im G, Re dG/du, Im dG/du}. */
    final double[] lookup = new double[4];
    /** Receives microstrip's dispersion: {ε_eff, ∂/∂fn, ∂/∂εr, ∂/∂ε_eff(0)}. */
    final double[] dispersion = new double[4];
    /** Receives microstrip's substrate side: {L'_ext, C', G', ε_eff, and their ω-derivatives}. */
    final double[] substrate = new double[8];

    public double resistanceOhmPerMetre() {
        return resistanceOhmPerMetre;
    }

    public double inductanceHenryPerMetre() {
        return inductanceHenryPerMetre;
    }

    public double conductanceSiemensPerMetre() {
        return conductanceSiemensPerMetre;
    }

    /** Skin depth of the line's conductor at the last point evaluated, m; NaN for a perfect conductor. */
    public double skinDepthMetres() {
        return skinDepthMetres;
    }

    public double capacitanceFaradPerMetre() {
        return capacitanceFaradPerMetre;
    }

    public double effectivePermittivity() {
        return effectivePermittivity;
    }

    /** dR'/dω, Ω·s/m. */
    public double resistanceSlope() {
        return resistanceSlope;
    }

    /** dL'/dω, H·s/m. */
    public double inductanceSlope() {
        return inductanceSlope;
    }

    /** dG'/dω, S·s/m. */
    public double conductanceSlope() {
        return conductanceSlope;
    }

    /** dC'/dω, F·s/m. */
    public double capacitanceSlope() {
        return capacitanceSlope;
    }

    /** Sets the frequency of the next evaluation, with the values the models derive from it. */
    public void setFrequency(double frequencyHz) {
        double root = Math.sqrt(frequencyHz);
        this.frequencyHz = frequencyHz;
        this.omega = 2 * Math.PI * frequencyHz;
        this.inverseOmega = 1.0 / (2 * Math.PI * frequencyHz);
        this.logFrequency = Math.log(frequencyHz);
        this.sqrtFrequency = root;
        this.inverseSqrtFrequency = 1.0 / root;
    }

    /** Sets the frequency of the next evaluation to the grid's i-th, copying what the grid has derived from it. */
    public void setFrequency(FrequencyColumns grid, int i) {
        this.frequencyHz = grid.frequencyHz[i];
        this.omega = grid.omega[i];
        this.inverseOmega = grid.inverseOmega[i];
        this.logFrequency = grid.logFrequency[i];
        this.sqrtFrequency = grid.sqrtFrequency[i];
        this.inverseSqrtFrequency = grid.inverseSqrtFrequency[i];
    }

    /** The frequency last set, Hz. */
    public double frequencyHz() {
        return frequencyHz;
    }

    void setSlopes(double dr, double dl, double dg, double dc) {
        this.resistanceSlope = dr;
        this.inductanceSlope = dl;
        this.conductanceSlope = dg;
        this.capacitanceSlope = dc;
    }

    void set(double r, double l, double g, double c, double epsEff) {
        this.resistanceOhmPerMetre = r;
        this.inductanceHenryPerMetre = l;
        this.conductanceSiemensPerMetre = g;
        this.capacitanceFaradPerMetre = c;
        this.effectivePermittivity = epsEff;
    }
}
