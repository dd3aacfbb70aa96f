package org.linesweep.design;

import org.linesweep.sweep.FrequencyGrid;
import org.linesweep.sweep.GridScale;

/**
 * The sweep of a design.
 *
 * @param fromHz first frequency, Hz
 * @param toHz last frequency, Hz, above {@code fromHz}
 * @param points number of points
 * @param scale log or linear
 */
public record SweepSettings(double fromHz, double toHz, int points, GridScale scale) {

    /** The default sweep: 1 kHz to 20 GHz, 401 points, log. */
    public static final SweepSettings DEFAULT = new SweepSettings(1e3, 20e9, 401, GridScale.LOG);

    public SweepSettings {
        Rule.FREQUENCY.check("sweep.from", fromHz);
        Rule.FREQUENCY.check("sweep.to", toHz);
        Rule.POINTS.check("sweep.points", points);
        if (fromHz >= toHz) {
            throw new InvalidInputException("sweep.from", Units.engineering(fromHz, "Hz", 6),
                    "the sweep must start below its end, sweep.to (" + Units.engineering(toHz, "Hz", 6) + ")");
        }
        if (scale == null) {
            throw new InvalidInputException("sweep.scale", null, "expected \"log\" or \"lin\"");
        }
    }

    /** The frequency grid. */
    public FrequencyGrid grid() {
        return new FrequencyGrid(fromHz, toHz, points, scale);
    }
}
