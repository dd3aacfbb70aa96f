package org.linesweep.sweep;

/**
 * A grid of frequencies from {@code fromHz} to {@code toHz} inclusive. Validation of the bounds is the
 * design layer's job; here 0 &lt; from &lt; to and points ≥ 2 are assumed.
 *
 * @param fromHz first frequency, Hz
 * @param toHz last frequency, Hz
 * @param points number of points, ≥ 2
 * @param scale spacing
 */
public record FrequencyGrid(double fromHz, double toHz, int points, GridScale scale) {

    /** Fills {@code out[0..points)} with the grid's frequencies; the end points are exact. */
    public void fill(double[] out) {
        int last = points - 1;
        if (scale == GridScale.LOG) {
            double logFrom = Math.log(fromHz);
            double logStep = (Math.log(toHz) - logFrom) / last;
            for (int i = 0; i < last; i++) {
                out[i] = Math.exp(logFrom + i * logStep);
            }
        } else {
            double step = (toHz - fromHz) / last;
            for (int i = 0; i < last; i++) {
                out[i] = fromHz + i * step;
            }
        }
        out[0] = fromHz;
        out[last] = toHz;
    }

    /** The grid's frequencies in a new array. */
    public double[] frequencies() {
        double[] out = new double[points];
        fill(out);
        return out;
    }
}
