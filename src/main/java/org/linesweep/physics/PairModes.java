package org.linesweep.physics;

/**
 * The two quasi-TEM modes of a symmetric pair of coupled lines at one frequency.
 *
 * @param oddImpedanceOhm Z_odd: one line's impedance when the two are driven in antiphase, Ω
 * @param evenImpedanceOhm Z_even: one line's impedance when the two are driven in phase, Ω
 * @param oddEffectivePermittivity ε_eff of the odd mode
 * @param evenEffectivePermittivity ε_eff of the even mode
 */
public record PairModes(double oddImpedanceOhm, double evenImpedanceOhm, double oddEffectivePermittivity,
        double evenEffectivePermittivity) {

    /** Differential impedance, 2·Z_odd, Ω: what a differential driver sees across the pair. */
    public double differentialImpedanceOhm() {
        return 2 * oddImpedanceOhm;
    }

    /** Common-mode impedance, Z_even/2, Ω: the two lines in parallel against the ground. */
    public double commonImpedanceOhm() {
        return evenImpedanceOhm / 2;
    }

    /** Backward coupling coefficient (Z_even − Z_odd)/(Z_even + Z_odd). */
    public double couplingCoefficient() {
        return (evenImpedanceOhm - oddImpedanceOhm) / (evenImpedanceOhm + oddImpedanceOhm);
    }
}
