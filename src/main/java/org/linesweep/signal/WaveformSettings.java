package org.linesweep.signal;

import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Rule;
import org.linesweep.physics.LineModel;

/**
 * What the user asked of the time-domain view, validated with the same rules as every other input.
 *
 * @param shape step, pulse or square
 * @param riseSeconds 10-90 % rise time of the edges
 * @param widthSeconds pulse width (pulse only; NaN otherwise)
 * @param periodSeconds square-wave period (square only; NaN otherwise)
 * @param sourceOhm source resistance
 * @param loadOhm load resistance; {@link Double#POSITIVE_INFINITY} for an open end
 * @param loadFarad capacitance across the load
 * @param durationSeconds record to show; NaN to choose one from the line and the stimulus
 */
public record WaveformSettings(WaveShape shape, double riseSeconds, double widthSeconds, double periodSeconds,
        double sourceOhm, double loadOhm, double loadFarad, double durationSeconds) {

    /** A 100 ps step from 50 Ω into 50 Ω. */
    public static final WaveformSettings DEFAULT =
            new WaveformSettings(WaveShape.STEP, 100e-12, Double.NaN, Double.NaN, 50, 50, 0, Double.NaN);

    public WaveformSettings {
        if (shape == null) {
            throw new InvalidInputException("--shape", null, "expected step, pulse or square");
        }
        Rule.RISE_TIME.check("--rise", riseSeconds);
        if (shape == WaveShape.PULSE) {
            if (Double.isNaN(widthSeconds)) {
                throw new InvalidInputException("--width", null, "a pulse needs its width, e.g. --width 2ns");
            }
            Rule.TIME_SPAN.check("--width", widthSeconds);
            if (widthSeconds < riseSeconds) {
                throw new InvalidInputException("--width", seconds(widthSeconds),
                        "the pulse must be at least as wide as its rise time (" + seconds(riseSeconds) + ")");
            }
        }
        if (shape == WaveShape.SQUARE) {
            if (Double.isNaN(periodSeconds)) {
                throw new InvalidInputException("--period", null, "a square wave needs its period, e.g. --period 10ns");
            }
            Rule.TIME_SPAN.check("--period", periodSeconds);
            if (periodSeconds < 2 * riseSeconds) {
                throw new InvalidInputException("--period", seconds(periodSeconds),
                        "the period must be at least twice the rise time (" + seconds(riseSeconds) + ")");
            }
        }
        Rule.SOURCE_RESISTANCE.check("--source-ohm", sourceOhm);
        if (!Double.isInfinite(loadOhm) || loadOhm < 0) {
            Rule.LOAD_RESISTANCE.check("--load-ohm", loadOhm);
        }
        Rule.LOAD_CAPACITANCE.check("--load-pf", loadFarad);
        if (!Double.isNaN(durationSeconds)) {
            Rule.TIME_SPAN.check("--duration", durationSeconds);
        }
    }

    /** Parses a load resistance: a resistance, or "open". */
    public static double parseLoad(String field, String text) {
        if (text != null && (text.strip().equalsIgnoreCase("open") || text.strip().equalsIgnoreCase("inf"))) {
            return Double.POSITIVE_INFINITY;
        }
        return Rule.LOAD_RESISTANCE.parse(field, text);
    }

    /**
     * Parses a load capacitance: a bare number is picofarads (what the "pF" fields and option ask for), any
     * other text a capacitance with its unit ("2 pF", "1.5e-12 F").
     */
    public static double parseLoadPicofarads(String field, String text) {
        String trimmed = text == null ? "" : text.strip();
        if (trimmed.isEmpty()) {
            return 0.0;
        }
        boolean bare = trimmed.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
        double farad = bare ? org.linesweep.design.Units.parse(field, trimmed, org.linesweep.design.UnitKind.NUMBER) * 1e-12
                : org.linesweep.design.Units.parse(field, trimmed, org.linesweep.design.UnitKind.CAPACITANCE);
        return Rule.LOAD_CAPACITANCE.check(field, farad);
    }

    /** The stimulus. */
    public Stimulus stimulus() {
        return new Stimulus(shape, riseSeconds, widthSeconds, periodSeconds);
    }

    /** The terminations. */
    public Terminations terminations() {
        return new Terminations(sourceOhm, loadOhm, loadFarad);
    }

    /** The duration to compute for this line: the one given, or a sensible one. */
    public double durationFor(LineModel model, double lengthMetres) {
        return Double.isNaN(durationSeconds)
                ? TimeDomain.defaultDurationSeconds(model, lengthMetres, stimulus(), terminations())
                : durationSeconds;
    }

    /** Runs the time-domain computation for a line of the given length. */
    public Waveform simulate(LineModel model, double lengthMetres) {
        return TimeDomain.simulate(model, lengthMetres, stimulus(), terminations(), durationFor(model, lengthMetres));
    }

    public WaveformSettings withShape(WaveShape value) {
        double width = value == WaveShape.PULSE && Double.isNaN(widthSeconds) ? 10 * riseSeconds : widthSeconds;
        double period = value == WaveShape.SQUARE && Double.isNaN(periodSeconds) ? 40 * riseSeconds : periodSeconds;
        return new WaveformSettings(value, riseSeconds, width, period, sourceOhm, loadOhm, loadFarad, durationSeconds);
    }

    public WaveformSettings withRise(double value) {
        return new WaveformSettings(shape, value, widthSeconds, periodSeconds, sourceOhm, loadOhm, loadFarad,
                durationSeconds);
    }

    public WaveformSettings withWidth(double value) {
        return new WaveformSettings(shape, riseSeconds, value, periodSeconds, sourceOhm, loadOhm, loadFarad,
                durationSeconds);
    }

    public WaveformSettings withPeriod(double value) {
        return new WaveformSettings(shape, riseSeconds, widthSeconds, value, sourceOhm, loadOhm, loadFarad,
                durationSeconds);
    }

    public WaveformSettings withSource(double value) {
        return new WaveformSettings(shape, riseSeconds, widthSeconds, periodSeconds, value, loadOhm, loadFarad,
                durationSeconds);
    }

    public WaveformSettings withLoad(double value) {
        return new WaveformSettings(shape, riseSeconds, widthSeconds, periodSeconds, sourceOhm, value, loadFarad,
                durationSeconds);
    }

    public WaveformSettings withLoadCapacitance(double value) {
        return new WaveformSettings(shape, riseSeconds, widthSeconds, periodSeconds, sourceOhm, loadOhm, value,
                durationSeconds);
    }

    public WaveformSettings withDuration(double value) {
        return new WaveformSettings(shape, riseSeconds, widthSeconds, periodSeconds, sourceOhm, loadOhm, loadFarad,
                value);
    }

    private static String seconds(double value) {
        return org.linesweep.design.Units.engineering(value, "s", 4);
    }
}
