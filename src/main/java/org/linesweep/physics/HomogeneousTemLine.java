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

    protected HomogeneousTemLine(Conductor conductor, Dielectric dielectric) {
        super(conductor, dielectric);
    }

    /** The capacitance per unit permittivity F = C'/ε of the geometry. */
    public abstract double capacitanceFactor();

    /** The internal impedance of all conductors per metre of line at f, Ω/m. */
    public Complex conductorImpedance(double frequencyHz) {
        return conductorImpedanceWithSlope(frequencyHz)[0];
    }

    /** The conductors' internal impedance per metre and its derivative with respect to ω: {Z, dZ/dω}. */
    public abstract Complex[] conductorImpedanceWithSlope(double frequencyHz);

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
    public void evaluateWithSlopes(double frequencyHz, LineParameters out) {
        double omega = 2 * Math.PI * frequencyHz;
        double factor = capacitanceFactor();
        double eps0 = PhysicalConstants.VACUUM_PERMITTIVITY_FARAD_PER_METRE;
        double realPermittivity = permittivity.real(frequencyHz);
        double imaginaryPermittivity = permittivity.imaginary(frequencyHz);
        Complex[] internal = conductorImpedanceWithSlope(frequencyHz);
        double externalInductance = PhysicalConstants.VACUUM_PERMEABILITY_HENRY_PER_METRE
                * dielectric.relativePermeability() / factor;
        out.set(internal[0].getReal(),
                externalInductance + internal[0].getImaginary() / omega,
                (omega * eps0 * imaginaryPermittivity + permittivity.conductivity()) * factor,
                eps0 * realPermittivity * factor,
                realPermittivity);
        out.setSlopes(internal[1].getReal(),
                internal[1].getImaginary() / omega - internal[0].getImaginary() / (omega * omega),
                eps0 * factor * (imaginaryPermittivity + omega * permittivity.imaginarySlope(frequencyHz)),
                eps0 * factor * permittivity.realSlope(frequencyHz));
    }

    /** Lossless characteristic impedance η/F at f, Ω (ignoring conductor and dielectric loss). */
    public double losslessImpedanceOhm(double frequencyHz) {
        return PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM
                * Math.sqrt(dielectric.relativePermeability() / permittivity.real(frequencyHz)) / capacitanceFactor();
    }
}
