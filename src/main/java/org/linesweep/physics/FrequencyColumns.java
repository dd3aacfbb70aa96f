package org.linesweep.physics;

import java.util.Arrays;

/**
 * A frequency grid with the values every line model derives from each frequency: ω, 1/ω, ln f, sqrt f and
 * 1/sqrt f. They depend on the grid alone, and a sweep engine re-sweeps the same grid at every step of a
 * drag, so it keeps one of these and refills it only when the grid changes ({@link #holds}, a vectorised
 * comparison, costs well under a nanosecond a point; the logarithm, root and two divisions it saves cost
 * about ten). Mutable; owned by one thread.
 */
public final class FrequencyColumns {

    private int count;
    double[] frequencyHz = new double[0];
    double[] omega = new double[0];
    double[] inverseOmega = new double[0];
    double[] logFrequency = new double[0];
    double[] sqrtFrequency = new double[0];
    double[] inverseSqrtFrequency = new double[0];

    /** True when this holds exactly the first {@code count} frequencies of {@code frequenciesHz}. */
    public boolean holds(double[] frequenciesHz, int count) {
        return this.count == count && Arrays.equals(frequencyHz, 0, count, frequenciesHz, 0, count);
    }

    /** Fills the columns for the first {@code count} frequencies of {@code frequenciesHz} (each &gt; 0, Hz). */
    public void fill(double[] frequenciesHz, int count) {
        if (frequencyHz.length < count) {
            frequencyHz = new double[count];
            omega = new double[count];
            inverseOmega = new double[count];
            logFrequency = new double[count];
            sqrtFrequency = new double[count];
            inverseSqrtFrequency = new double[count];
        }
        // the values come from LineParameters.setFrequency, so a grid point and a single point agree exactly
        LineParameters point = new LineParameters();
        for (int i = 0; i < count; i++) {
            point.setFrequency(frequenciesHz[i]);
            frequencyHz[i] = point.frequencyHz;
            omega[i] = point.omega;
            inverseOmega[i] = point.inverseOmega;
            logFrequency[i] = point.logFrequency;
            sqrtFrequency[i] = point.sqrtFrequency;
            inverseSqrtFrequency[i] = point.inverseSqrtFrequency;
        }
        this.count = count;
    }

    /** ω of the i-th frequency, rad/s. */
    public double omega(int i) {
        return omega[i];
    }

    /** Number of frequencies held. */
    public int size() {
        return count;
    }
}
