package org.linesweep.design;

/** The kind of quantity a field holds, which decides the units it accepts. Values are kept in SI base units. */
public enum UnitKind {
    /** Metres; also mil, in, ft and SI-prefixed metres. */
    LENGTH("a length such as \"0.82 mm\", \"35 mil\" or \"1.5 m\""),
    /** A conductor thickness: a length, or ounces of copper ("1 oz" = 35 µm). */
    THICKNESS("a thickness such as \"35 um\", \"1.4 mil\" or \"1 oz\""),
    /** Hertz with SI prefixes. */
    FREQUENCY("a frequency such as \"2.4 GHz\", \"10 kHz\" or 1e9"),
    /** Kelvin; degC is converted. A bare number is kelvin. */
    TEMPERATURE("a temperature such as \"20 degC\" or \"293.15 K\""),
    /** Decibels. */
    DECIBEL("a loss such as \"3 dB\""),
    /** Siemens per metre. */
    CONDUCTIVITY("a conductivity such as 5.8e7 or \"58 MS/m\""),
    /** Seconds with SI prefixes. */
    TIME("a time such as \"100 ps\", \"2.5 ns\" or 1e-9"),
    /** Ohms with SI prefixes; "ohm", "ohms" and "Ω" are accepted. */
    RESISTANCE("a resistance such as \"50\", \"50 ohm\" or \"1 kohm\""),
    /** Farads with SI prefixes. */
    CAPACITANCE("a capacitance such as \"2 pF\" or 1e-12"),
    /** A plain number. */
    NUMBER("a plain number such as 2.1");

    private final String example;

    UnitKind(String example) {
        this.example = example;
    }

    /** An example of accepted input, for messages. */
    public String example() {
        return example;
    }
}
