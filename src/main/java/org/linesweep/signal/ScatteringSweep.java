package org.linesweep.signal;

import org.apache.commons.math3.complex.Complex;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LineParameters;
import org.linesweep.physics.LineTwoPort;
import org.linesweep.physics.Telegrapher;

/**
 * The line of a given length as a two-port, over a list of frequencies: the data of a Touchstone file.
 *
 * @param frequenciesHz the frequencies
 * @param referenceOhm the port reference impedance
 * @param s11 S11 = S22 at each frequency
 * @param s21 S21 = S12 at each frequency
 */
public record ScatteringSweep(double[] frequenciesHz, double referenceOhm, Complex[] s11, Complex[] s21) {

    /** Computes S11 and S21 of the line at each frequency. */
    public static ScatteringSweep of(LineModel model, double lengthMetres, double[] frequenciesHz,
            double referenceOhm) {
        LineParameters parameters = new LineParameters();
        double[] solution = new double[Telegrapher.SIZE];
        Complex[] s11 = new Complex[frequenciesHz.length];
        Complex[] s21 = new Complex[frequenciesHz.length];
        for (int i = 0; i < frequenciesHz.length; i++) {
            model.evaluate(frequenciesHz[i], parameters);
            Telegrapher.solve(parameters.resistanceOhmPerMetre(), parameters.inductanceHenryPerMetre(),
                    parameters.conductanceSiemensPerMetre(), parameters.capacitanceFaradPerMetre(),
                    2 * Math.PI * frequenciesHz[i], solution);
            Complex z0 = new Complex(solution[Telegrapher.Z0_RE], solution[Telegrapher.Z0_IM]);
            Complex gammaLength = new Complex(solution[Telegrapher.ALPHA] * lengthMetres,
                    solution[Telegrapher.BETA] * lengthMetres);
            Complex[] s = LineTwoPort.scattering(z0, gammaLength, referenceOhm);
            s11[i] = s[0];
            s21[i] = s[1];
        }
        return new ScatteringSweep(frequenciesHz.clone(), referenceOhm, s11, s21);
    }

    /** Number of frequencies. */
    public int size() {
        return frequenciesHz.length;
    }
}
