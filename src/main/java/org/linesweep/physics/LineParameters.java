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

    void set(double r, double l, double g, double c, double epsEff) {
        this.resistanceOhmPerMetre = r;
        this.inductanceHenryPerMetre = l;
        this.conductanceSiemensPerMetre = g;
        this.capacitanceFaradPerMetre = c;
        this.effectivePermittivity = epsEff;
    }
}
