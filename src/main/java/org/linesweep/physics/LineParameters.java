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

    public double resistanceOhmPerMetre() {
        return resistanceOhmPerMetre;
    }

    public double inductanceHenryPerMetre() {
        return inductanceHenryPerMetre;
    }

    public double conductanceSiemensPerMetre() {
        return conductanceSiemensPerMetre;
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
