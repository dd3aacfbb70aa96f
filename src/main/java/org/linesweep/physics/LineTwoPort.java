package org.linesweep.physics;

import org.apache.commons.math3.complex.Complex;

/**
 * A uniform line of length L as a two-port: its scattering parameters against a real reference impedance,
 * and its voltages when driven from a source impedance into a load.
 *
 * <p>Everything is written with the one-way transmission factor e = exp(−γL) and reflection coefficients
 * rather than with cosh γL and sinh γL: the ABCD form overflows for a long lossy line (cosh of a few
 * hundred nepers is infinite in double precision), while |e| ≤ 1 always. The forms follow from the ABCD
 * matrix of a line section (D. M. Pozar, Microwave Engineering, 4th ed., 2012, table 4.1 and eq. 4.44)
 * by dividing numerator and denominator by cosh γL.
 */
public final class LineTwoPort {

    private LineTwoPort() {
    }

    /**
     * The S-parameters of the line.
     *
     * @param z0 characteristic impedance, Ω
     * @param gammaLength γL = (α + jβ)·L, nepers and radians
     * @param referenceOhm the port reference impedance, Ω, real and positive
     * @return {S11, S21}; by reciprocity S12 = S21 and by symmetry S22 = S11
     */
    public static Complex[] scattering(Complex z0, Complex gammaLength, double referenceOhm) {
        Complex reflection = z0.subtract(referenceOhm).divide(z0.add(referenceOhm));
        Complex transmission = gammaLength.negate().exp();
        Complex reflectionSquared = reflection.multiply(reflection);
        Complex transmissionSquared = transmission.multiply(transmission);
        Complex denominator = Complex.ONE.subtract(reflectionSquared.multiply(transmissionSquared));
        Complex s11 = reflection.multiply(Complex.ONE.subtract(transmissionSquared)).divide(denominator);
        Complex s21 = transmission.multiply(Complex.ONE.subtract(reflectionSquared)).divide(denominator);
        return new Complex[] {s11, s21};
    }

    /**
     * Near-end and far-end voltages per volt of open-circuit source voltage, for a source of impedance Zs
     * driving the line, whose far end carries the load ZL.
     *
     * <p>With Γs = (Zs − Z0)/(Zs + Z0), ΓL = (ZL − Z0)/(ZL + Z0) and e = exp(−γL):
     * V_near/Vs = Z0/(Z0 + Zs)·(1 + ΓL e²)/(1 − Γs ΓL e²) and V_far/Vs = Z0/(Z0 + Zs)·e(1 + ΓL)/(1 − Γs ΓL e²):
     * the sum of the bounce diagram's geometric series of round trips.
     *
     * @param loadOhm the load impedance; {@link Double#POSITIVE_INFINITY} real part for an open end
     * @return {V_near/Vs, V_far/Vs}
     */
    public static Complex[] terminatedVoltages(Complex z0, Complex gammaLength, Complex sourceOhm, Complex loadOhm) {
        Complex sourceReflection = reflection(sourceOhm, z0);
        Complex loadReflection = reflection(loadOhm, z0);
        Complex transmission = gammaLength.negate().exp();
        Complex transmissionSquared = transmission.multiply(transmission);
        Complex launch = z0.divide(z0.add(sourceOhm));
        Complex denominator = Complex.ONE.subtract(sourceReflection.multiply(loadReflection).multiply(transmissionSquared));
        Complex near = launch.multiply(Complex.ONE.add(loadReflection.multiply(transmissionSquared))).divide(denominator);
        Complex far = launch.multiply(transmission).multiply(Complex.ONE.add(loadReflection)).divide(denominator);
        return new Complex[] {near, far};
    }

    /** Reflection coefficient of an impedance Z against Z0; an infinite Z (open end) gives exactly 1. */
    public static Complex reflection(Complex impedance, Complex z0) {
        if (impedance.isInfinite()) {
            return Complex.ONE;
        }
        return impedance.subtract(z0).divide(impedance.add(z0));
    }
}
