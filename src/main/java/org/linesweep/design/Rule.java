package org.linesweep.design;

import java.util.Locale;

/**
 * The rule for each kind of numeric input: its unit kind, its allowed range and the one message that says
 * so. The design-file reader, the command line and the explorer all check input through these.
 */
public enum Rule {
    /** A cross-section dimension: diameter, spacing, height, width, separation. */
    DIMENSION(UnitKind.LENGTH, 0.0, false, 10.0, true, "a length greater than 0 and at most 10 m"),
    /** A conductor thickness. */
    THICKNESS(UnitKind.THICKNESS, 0.0, false, 10.0, true, "a thickness greater than 0 and at most 10 m"),
    /** The physical length of the line. */
    LINE_LENGTH(UnitKind.LENGTH, 0.0, false, 1e7, true, "a length greater than 0 and at most 10 000 km"),
    /** A frequency of the sweep or of an evaluation. */
    FREQUENCY(UnitKind.FREQUENCY, 1.0, true, 1e13, true, "a frequency from 1 Hz to 10 THz"),
    /** A band edge of the wideband Debye model. */
    BAND_EDGE(UnitKind.FREQUENCY, 0.0, false, 1e15, true, "a frequency greater than 0 and at most 1000 THz"),
    /** Number of sweep points. */
    POINTS(UnitKind.NUMBER, 2, true, 100_000, true, "a whole number from 2 to 100000"),
    /** The electrical-length threshold L/λ. */
    THRESHOLD(UnitKind.NUMBER, 0.0, false, 1.0, true, "a number greater than 0 and at most 1 (0.01 is usual)"),
    /** Relative permittivity of a dielectric. */
    PERMITTIVITY(UnitKind.NUMBER, 1.0, true, 10_000.0, true, "a relative permittivity from 1 to 10000"),
    /** Loss tangent of a dielectric. */
    LOSS_TANGENT(UnitKind.NUMBER, 0.0, true, 10.0, true, "a loss tangent from 0 to 10"),
    /** Bulk conductivity of a dielectric. */
    DIELECTRIC_CONDUCTIVITY(UnitKind.CONDUCTIVITY, 0.0, true, 1e4, true,
            "a dielectric conductivity from 0 to 10000 S/m"),
    /** Relative permeability of a conductor or dielectric. */
    PERMEABILITY(UnitKind.NUMBER, 1.0, true, 1e6, true, "a relative permeability from 1 to 1000000"),
    /** Conductivity of a conductor (a lossless conductor is the explicit material "perfect"). */
    CONDUCTIVITY(UnitKind.CONDUCTIVITY, 0.0, false, 1e9, true,
            "a conductivity greater than 0 and at most 1e9 S/m (use the material \"perfect\" for a lossless one)"),
    /** Temperature coefficient of a conductor's resistivity. */
    TEMPERATURE_COEFFICIENT(UnitKind.NUMBER, -0.01, true, 0.1, true,
            "a temperature coefficient from -0.01 to 0.1 per kelvin"),
    /** RMS surface roughness. */
    ROUGHNESS(UnitKind.LENGTH, 0.0, true, 1e-3, true, "a roughness from 0 to 1 mm"),
    /** Operating temperature. */
    TEMPERATURE(UnitKind.TEMPERATURE, 173.15, true, 773.15, true, "a temperature from -100 degC to 500 degC"),
    /** The 10-90 % rise time of a source edge. */
    RISE_TIME(UnitKind.TIME, 1e-15, true, 1.0, true, "a rise time from 1 fs to 1 s"),
    /** A pulse width, square-wave period or record duration. */
    TIME_SPAN(UnitKind.TIME, 0.0, false, 10.0, true, "a time greater than 0 and at most 10 s"),
    /** A source resistance. */
    SOURCE_RESISTANCE(UnitKind.RESISTANCE, 0.0, true, 1e6, true, "a resistance from 0 to 1 Mohm"),
    /** A load resistance ("open" is written as such where it is allowed). */
    LOAD_RESISTANCE(UnitKind.RESISTANCE, 0.0, false, 1e12, true,
            "a resistance greater than 0 and at most 1 Tohm, or \"open\""),
    /** A capacitance across a load. */
    LOAD_CAPACITANCE(UnitKind.CAPACITANCE, 0.0, true, 1e-3, true, "a capacitance from 0 to 1 mF"),
    /** The reference impedance of S-parameters. */
    REFERENCE_IMPEDANCE(UnitKind.RESISTANCE, 0.0, false, 1e6, true, "a resistance greater than 0 and at most 1 Mohm"),
    /** A target impedance. */
    IMPEDANCE(UnitKind.RESISTANCE, 0.0, false, 1e6, true, "an impedance greater than 0 and at most 1 Mohm"),
    /** A total-loss budget. */
    LOSS_BUDGET(UnitKind.DECIBEL, 0.0, false, 1e6, true, "a loss greater than 0 dB");

    private final UnitKind kind;
    private final double minimum;
    private final boolean minimumIncluded;
    private final double maximum;
    private final boolean maximumIncluded;
    private final String allowed;

    Rule(UnitKind kind, double minimum, boolean minimumIncluded, double maximum, boolean maximumIncluded,
            String allowed) {
        this.kind = kind;
        this.minimum = minimum;
        this.minimumIncluded = minimumIncluded;
        this.maximum = maximum;
        this.maximumIncluded = maximumIncluded;
        this.allowed = allowed;
    }

    /** The unit kind the field accepts. */
    public UnitKind kind() {
        return kind;
    }

    /** What is allowed, in words. */
    public String allowed() {
        return allowed;
    }

    /** Smallest allowed value (see {@link #test} for whether it is included), SI units. */
    public double minimum() {
        return minimum;
    }

    /** Largest allowed value, SI units. */
    public double maximum() {
        return maximum;
    }

    /** True when the value is finite and inside the range. */
    public boolean test(double value) {
        if (!Double.isFinite(value)) {
            return false;
        }
        boolean aboveMinimum = minimumIncluded ? value >= minimum : value > minimum;
        boolean belowMaximum = maximumIncluded ? value <= maximum : value < maximum;
        boolean whole = this != POINTS || value == Math.rint(value);
        return aboveMinimum && belowMaximum && whole;
    }

    /**
     * Checks a value.
     *
     * @param field the field's name for the message
     * @param value the value in SI units
     * @return the value
     * @throws InvalidInputException naming the field, the value and the allowed range
     */
    public double check(String field, double value) {
        if (!test(value)) {
            throw new InvalidInputException(field, format(value), allowed);
        }
        return value;
    }

    /** Parses text in this rule's unit kind and checks it. */
    public double parse(String field, String text) {
        double value = Units.parse(field, text, kind);
        if (!test(value)) {
            throw new InvalidInputException(field, text.strip(), allowed);
        }
        return value;
    }

    private String format(double value) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        return switch (kind) {
            case LENGTH, THICKNESS -> Units.engineering(value, "m", 4);
            case FREQUENCY -> Units.engineering(value, "Hz", 4);
            case TEMPERATURE -> String.format(Locale.ROOT, "%.6g K", value);
            case DECIBEL -> String.format(Locale.ROOT, "%.6g dB", value);
            case CONDUCTIVITY -> String.format(Locale.ROOT, "%.6g S/m", value);
            case TIME -> Units.engineering(value, "s", 4);
            case RESISTANCE -> Units.engineering(value, "ohm", 4);
            case CAPACITANCE -> Units.engineering(value, "F", 4);
            case NUMBER -> String.format(Locale.ROOT, "%.6g", value);
        };
    }
}
