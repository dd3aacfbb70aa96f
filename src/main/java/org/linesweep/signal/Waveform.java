package org.linesweep.signal;

import java.util.List;

/**
 * A computed time-domain response, with what an engineer reads off it first.
 *
 * @param timeSeconds sample times, s, evenly spaced from 0
 * @param sourceVolts the source's open-circuit voltage, V
 * @param inputVolts the line's near-end voltage, V
 * @param outputVolts the line's far-end (load) voltage, V
 * @param delaySeconds from the source's first edge crossing 50 % to the output's first crossing of 50 % of
 *        its settled value, s; NaN if it never does within the record
 * @param outputRiseSeconds the output's first 10 % to first 90 % of its settled value after the first edge,
 *        s; NaN if not reached
 * @param overshootPercent how far the output's first-edge response peaks above its settled value, % of it
 * @param settledVolts the far-end voltage the first edge settles to (the circuit's DC division), V
 * @param warnings what makes the result doubtful, in words: non-causal models, modes above TEM, aliasing
 */
public record Waveform(double[] timeSeconds, double[] sourceVolts, double[] inputVolts, double[] outputVolts,
        double delaySeconds, double outputRiseSeconds, double overshootPercent, double settledVolts,
        List<String> warnings) {

    /** The far end's read-outs in one line: "delay …, rise 10-90 % …, overshoot … %, settles to … V". */
    public String summary() {
        return String.format(java.util.Locale.ROOT, "delay %s, rise 10-90 %% %s, overshoot %.1f %%, settles to %.4g V",
                org.linesweep.design.Units.engineering(delaySeconds, "s", 4),
                org.linesweep.design.Units.engineering(outputRiseSeconds, "s", 4), overshootPercent, settledVolts);
    }

    /** Number of samples. */
    public int size() {
        return timeSeconds.length;
    }
}
