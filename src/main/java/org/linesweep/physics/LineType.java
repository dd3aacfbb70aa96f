package org.linesweep.physics;

import java.util.Arrays;
import java.util.Optional;

/** The line geometries LineSweep models, with their design-file names. */
public enum LineType {
    COAX("coax", "Coaxial line"),
    TWO_WIRE("two-wire", "Two-wire line"),
    WIRE_OVER_GROUND("wire-over-ground", "Wire over ground plane"),
    PARALLEL_PLATE("parallel-plate", "Parallel-plate line"),
    MICROSTRIP("microstrip", "Microstrip"),
    STRIPLINE("stripline", "Stripline");

    private final String key;
    private final String displayName;

    LineType(String key, String displayName) {
        this.key = key;
        this.displayName = displayName;
    }

    /** The name used in design files and on the command line. */
    public String key() {
        return key;
    }

    /** A name for people. */
    public String displayName() {
        return displayName;
    }

    /** Finds a type by its design-file key. */
    public static Optional<LineType> byKey(String key) {
        return Arrays.stream(values()).filter(t -> t.key.equals(key)).findFirst();
    }
}
