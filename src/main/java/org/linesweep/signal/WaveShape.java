package org.linesweep.signal;

import java.util.Locale;

/** The source waveforms the time-domain view drives a line with. */
public enum WaveShape {
    /** One rising edge from 0 to 1 V. */
    STEP,
    /** One pulse of 1 V: a rising edge, then a falling edge a width later (50 % to 50 %). */
    PULSE,
    /** A 0/1 V square wave of 50 % duty cycle, starting with a rising edge. */
    SQUARE;

    /** The command-line and design-file spelling: "step", "pulse", "square". */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The shape for a key, or null if none has it. */
    public static WaveShape fromKey(String key) {
        for (WaveShape shape : values()) {
            if (shape.key().equalsIgnoreCase(key == null ? "" : key.trim())) {
                return shape;
            }
        }
        return null;
    }
}
