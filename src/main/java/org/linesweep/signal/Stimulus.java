package org.linesweep.signal;

/**
 * What the source does: its open-circuit voltage is a 0-to-1 V waveform of the given shape whose edges have
 * a Gaussian (error-function) profile with the given 10-90 % rise time.
 *
 * <p>The Gaussian edge is the usual idealisation of a digital edge: its spectrum falls as exp(−f²), so the
 * line model only needs evaluating up to a few times 1/rise, and it has no corners to ring.
 *
 * @param shape step, pulse or square
 * @param riseSeconds 10-90 % rise time of every edge, s
 * @param widthSeconds pulse width, 50 % to 50 %, s (pulse only)
 * @param periodSeconds square-wave period, s (square only)
 */
public record Stimulus(WaveShape shape, double riseSeconds, double widthSeconds, double periodSeconds) {

    /** Ratio of the 10-90 % time of a Gaussian edge to its standard deviation: 2·Φ⁻¹(0.9) = 2.5631. */
    static final double RISE_PER_SIGMA = 2.5631031310892007;

    /** A step of the given rise time. */
    public static Stimulus step(double riseSeconds) {
        return new Stimulus(WaveShape.STEP, riseSeconds, Double.NaN, Double.NaN);
    }

    /** Standard deviation of the edge's Gaussian derivative, s. */
    public double edgeSigmaSeconds() {
        return riseSeconds / RISE_PER_SIGMA;
    }
}
