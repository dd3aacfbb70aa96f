package org.linesweep.app.model;

/** How the explorer shows dimensions and attenuation; every field accepts either. */
public enum UnitSystem {
    /** mm and µm; dB/m. */
    METRIC,
    /** mil and inch; dB/100 ft. */
    IMPERIAL
}
