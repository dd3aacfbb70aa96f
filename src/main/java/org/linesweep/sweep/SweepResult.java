package org.linesweep.sweep;

import org.linesweep.physics.PhysicalConstants;

/**
 * A computed sweep: one primitive array per quantity (structure of arrays), all of length {@link #size()}.
 *
 * <p>An instance is mutable only while {@link SweepEngine} fills it. Once handed out it is treated as an
 * immutable snapshot unless its owner explicitly passes it back to the engine for reuse; the accessors
 * never expose the arrays for writing.
 */
public final class SweepResult {

    private int size;
    private double lengthMetres;
    double[] frequencyHz = new double[0];
    double[] resistanceOhmPerMetre = new double[0];
    double[] inductanceHenryPerMetre = new double[0];
    double[] conductanceSiemensPerMetre = new double[0];
    double[] capacitanceFaradPerMetre = new double[0];
    double[] z0RealOhm = new double[0];
    double[] z0ImaginaryOhm = new double[0];
    double[] alphaNepersPerMetre = new double[0];
    double[] conductorAlphaNepersPerMetre = new double[0];
    double[] betaRadiansPerMetre = new double[0];
    double[] groupVelocityMetresPerSecond = new double[0];
    double[] effectivePermittivity = new double[0];
    double[] skinDepthMetres = new double[0];
    private boolean pair;
    double[] oddImpedanceOhm = new double[0];
    double[] evenImpedanceOhm = new double[0];
    double[] oddEffectivePermittivity = new double[0];
    double[] evenEffectivePermittivity = new double[0];

    /** Makes sure every array holds at least n points; keeps the arrays if they are large enough. */
    void prepare(int n, double length) {
        this.size = n;
        this.lengthMetres = length;
        if (frequencyHz.length < n) {
            frequencyHz = new double[n];
            resistanceOhmPerMetre = new double[n];
            inductanceHenryPerMetre = new double[n];
            conductanceSiemensPerMetre = new double[n];
            capacitanceFaradPerMetre = new double[n];
            z0RealOhm = new double[n];
            z0ImaginaryOhm = new double[n];
            alphaNepersPerMetre = new double[n];
            conductorAlphaNepersPerMetre = new double[n];
            betaRadiansPerMetre = new double[n];
            groupVelocityMetresPerSecond = new double[n];
            effectivePermittivity = new double[n];
            skinDepthMetres = new double[n];
        }
    }

    /** Makes room for the pair columns and marks this sweep as a pair's (or not). */
    void preparePair(boolean isPair) {
        this.pair = isPair;
        if (isPair && oddImpedanceOhm.length < size) {
            oddImpedanceOhm = new double[size];
            evenImpedanceOhm = new double[size];
            oddEffectivePermittivity = new double[size];
            evenEffectivePermittivity = new double[size];
        }
    }

    /** True when the sweep also holds an edge-coupled pair's mode values. */
    public boolean isPair() {
        return pair;
    }

    /** Odd-mode impedance of the pair, Ω; NaN for a single line. */
    public double oddImpedanceOhm(int i) {
        return pair ? oddImpedanceOhm[i] : Double.NaN;
    }

    /** Even-mode impedance of the pair, Ω; NaN for a single line. */
    public double evenImpedanceOhm(int i) {
        return pair ? evenImpedanceOhm[i] : Double.NaN;
    }

    /** Differential impedance 2·Z_odd, Ω; NaN for a single line. */
    public double differentialImpedanceOhm(int i) {
        return 2 * oddImpedanceOhm(i);
    }

    /** Common-mode impedance Z_even/2, Ω; NaN for a single line. */
    public double commonImpedanceOhm(int i) {
        return evenImpedanceOhm(i) / 2;
    }

    /** Odd-mode effective permittivity; NaN for a single line. */
    public double oddEffectivePermittivity(int i) {
        return pair ? oddEffectivePermittivity[i] : Double.NaN;
    }

    /** Even-mode effective permittivity; NaN for a single line. */
    public double evenEffectivePermittivity(int i) {
        return pair ? evenEffectivePermittivity[i] : Double.NaN;
    }

    /** Number of points. */
    public int size() {
        return size;
    }

    /** Physical length of the line the sweep was computed for, m. */
    public double lengthMetres() {
        return lengthMetres;
    }

    public double frequencyHz(int i) {
        return frequencyHz[i];
    }

    public double resistanceOhmPerMetre(int i) {
        return resistanceOhmPerMetre[i];
    }

    public double inductanceHenryPerMetre(int i) {
        return inductanceHenryPerMetre[i];
    }

    public double conductanceSiemensPerMetre(int i) {
        return conductanceSiemensPerMetre[i];
    }

    public double capacitanceFaradPerMetre(int i) {
        return capacitanceFaradPerMetre[i];
    }

    public double z0RealOhm(int i) {
        return z0RealOhm[i];
    }

    public double z0ImaginaryOhm(int i) {
        return z0ImaginaryOhm[i];
    }

    public double z0MagnitudeOhm(int i) {
        return Math.hypot(z0RealOhm[i], z0ImaginaryOhm[i]);
    }

    public double alphaNepersPerMetre(int i) {
        return alphaNepersPerMetre[i];
    }

    public double alphaDbPerMetre(int i) {
        return alphaNepersPerMetre[i] * PhysicalConstants.DECIBELS_PER_NEPER;
    }

    /**
     * The conductor's share of α, dB/m. The exact α is split in proportion to the low-loss terms
     * R'/(2|Z0|) and G'|Z0|/2, so the two shares always add up to α.
     */
    public double conductorAlphaDbPerMetre(int i) {
        return conductorAlphaNepersPerMetre[i] * PhysicalConstants.DECIBELS_PER_NEPER;
    }

    /** The dielectric's share of α, dB/m (see {@link #conductorAlphaDbPerMetre}). */
    public double dielectricAlphaDbPerMetre(int i) {
        return (alphaNepersPerMetre[i] - conductorAlphaNepersPerMetre[i]) * PhysicalConstants.DECIBELS_PER_NEPER;
    }

    public double betaRadiansPerMetre(int i) {
        return betaRadiansPerMetre[i];
    }

    public double phaseVelocityMetresPerSecond(int i) {
        return 2 * Math.PI * frequencyHz[i] / betaRadiansPerMetre[i];
    }

    public double groupVelocityMetresPerSecond(int i) {
        return groupVelocityMetresPerSecond[i];
    }

    public double wavelengthMetres(int i) {
        return 2 * Math.PI / betaRadiansPerMetre[i];
    }

    /** L/λ for the sweep's length, in wavelengths. */
    public double electricalLength(int i) {
        return lengthMetres * betaRadiansPerMetre[i] / (2 * Math.PI);
    }

    /** Total loss over the sweep's length, dB. */
    public double totalLossDb(int i) {
        return alphaDbPerMetre(i) * lengthMetres;
    }

    public double effectivePermittivity(int i) {
        return effectivePermittivity[i];
    }

    /** Skin depth of the characteristic conductor, m; NaN for a perfect conductor. */
    public double skinDepthMetres(int i) {
        return skinDepthMetres[i];
    }
}
