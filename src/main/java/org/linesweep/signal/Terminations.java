package org.linesweep.signal;

import org.apache.commons.math3.complex.Complex;

/**
 * The circuit around the line: a resistive source and a load of a resistor in parallel with a capacitor
 * (a receiver's input, for instance).
 *
 * @param sourceOhm source resistance, Ω, ≥ 0
 * @param loadOhm load resistance, Ω, &gt; 0; {@link Double#POSITIVE_INFINITY} for an open end
 * @param loadFarad capacitance across the load, F, ≥ 0
 */
public record Terminations(double sourceOhm, double loadOhm, double loadFarad) {

    /** The load's impedance at f; infinite when open and without capacitance, or at DC when open. */
    public Complex loadImpedance(double frequencyHz) {
        double omega = 2 * Math.PI * frequencyHz;
        Complex admittance = new Complex(Double.isInfinite(loadOhm) ? 0.0 : 1.0 / loadOhm, omega * loadFarad);
        if (admittance.getReal() == 0.0 && admittance.getImaginary() == 0.0) {
            return new Complex(Double.POSITIVE_INFINITY, 0.0);
        }
        return Complex.ONE.divide(admittance);
    }

    /** The source's impedance. */
    public Complex sourceImpedance() {
        return new Complex(sourceOhm, 0.0);
    }
}
