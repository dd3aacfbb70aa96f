package org.linesweep.physics;

import org.apache.commons.math3.complex.Complex;

/**
 * A TEM line in one homogeneous dielectric. Its geometry enters through one number, the capacitance
 * per unit permittivity F = C'/ε (dimensionless), so that
 * <pre>C' = ε0ε′F,  G' = (ωε0ε″ + σ_d)·F,  L'_ext = μ0μr/F</pre>
 * and the identities L'_ext·C' = με′ and G'/C' = (ωε″ε0 + σ_d)/(ε0ε′) hold exactly. The conductors add
 * their internal impedance Z_int(ω): R' = Re Z_int and L' = L'_ext + Im Z_int/ω.
 */
public abstract class HomogeneousTemLine extends LineModel {

    /** The conductors' shares of the internal impedance; empty for a perfect conductor. */
    private SkinEffectTerm[] conductorTerms = new SkinEffectTerm[0];

    protected HomogeneousTemLine(Conductor conductor, Dielectric dielectric) {
        super(conductor, dielectric);
    }

    /** μ0μr/F, ε0F and σ_d·F: what the geometry contributes to every point. */
    private double externalInductance;
    private double vacuumCapacitance;
    private double bulkConductance;

    /**
     * Completes construction, from the end of the subclass's constructor (once F is known): sets the
     * conductors' shares of the internal impedance (none if perfect) and the geometry's constants.
     */
    final void setConductorTerms(SkinEffectTerm... terms) {
        this.conductorTerms = conductor.isPerfect() ? new SkinEffectTerm[0] : terms.clone();
        double factor = capacitanceFactor();
        this.externalInductance = PhysicalConstants.VACUUM_PERMEABILITY_HENRY_PER_METRE
                * dielectric.relativePermeability() / factor;
        this.vacuumCapacitance = PhysicalConstants.VACUUM_PERMITTIVITY_FARAD_PER_METRE * factor;
        this.bulkConductance = permittivity.conductivity() * factor;
    }

    /** Prepares the dielectric's and the conductors' tables for the sweep (see {@link LineModel#prepareForSweep}). */
    @Override
    protected void prepareForRange(double[] frequenciesHz, int count, double lowHz, double highHz) {
        super.prepareForRange(frequenciesHz, count, lowHz, highHz);
        for (SkinEffectTerm term : conductorTerms) {
            term.prepareForSweep(frequenciesHz, count);
        }
    }

    /** The capacitance per unit permittivity F = C'/ε of the geometry. */
    public abstract double capacitanceFactor();

    /** The internal impedance of all conductors per metre of line at f, Ω/m. */
    public Complex conductorImpedance(double frequencyHz) {
        LineParameters p = new LineParameters();
        p.setFrequency(frequencyHz);
        beginPoint(p);
        addConductorImpedance(p);
        return new Complex(p.impedanceRe, p.impedanceIm);
    }

    /**
     * Adds the internal impedance per metre of every conductor, and its derivative with respect to ω, at the
     * point {@code p} describes (see {@link SkinEffectTerm#addTo}); nothing for a perfect conductor.
     */
    private void addConductorImpedance(LineParameters p) {
        for (SkinEffectTerm term : conductorTerms) {
            term.addTo(p);
        }
    }

    @Override
    public void evaluate(double frequencyHz, LineParameters out) {
        // the slopes cost a few multiplications beyond the values, so one code path serves both
        evaluateWithSlopes(frequencyHz, out);
    }

    /**
     * Closed-form derivatives: C'_ω = ε0F·dε′/dω, G'_ω = ε0F·(ε″ + ω·dε″/dω), and from the internal impedance
     * R'_ω = Re dZ/dω, L'_ω = Im(dZ/dω)/ω − Im Z/ω².
     */
    @Override
    public void evaluatePoint(LineParameters out) {
        beginPoint(out);
        addConductorImpedance(out);
        permittivity.evaluate(out);
        double omega = out.omega;
        double inverseOmega = out.inverseOmega;
        double eps0Factor = vacuumCapacitance;
        double realPermittivity = out.permittivityRe;
        double imaginaryPermittivity = out.permittivityIm;
        double internalIm = out.impedanceIm;
        out.set(out.impedanceRe,
                externalInductance + internalIm * inverseOmega,
                omega * eps0Factor * imaginaryPermittivity + bulkConductance,
                eps0Factor * realPermittivity,
                realPermittivity);
        out.setSlopes(out.impedanceReSlope,
                (out.impedanceImSlope - internalIm * inverseOmega) * inverseOmega,
                eps0Factor * (imaginaryPermittivity + omega * out.permittivityImSlope),
                eps0Factor * out.permittivityReSlope);
    }

    /** Lossless characteristic impedance η/F at f, Ω (ignoring conductor and dielectric loss). */
    public double losslessImpedanceOhm(double frequencyHz) {
        return PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM
                * Math.sqrt(dielectric.relativePermeability() / permittivity.real(frequencyHz)) / capacitanceFactor();
    }
}
