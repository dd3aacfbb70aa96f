package org.linesweep.sweep;

import java.util.Arrays;
import java.util.Optional;

/** How the points of a frequency grid are spaced. */
public enum GridScale {
    /** Equal ratios between neighbouring points. */
    LOG("log"),
    /** Equal differences between neighbouring points. */
    LINEAR("lin");

    private final String key;

    GridScale(String key) {
        this.key = key;
    }

    /** The name used in design files and on the command line. */
    public String key() {
        return key;
    }

    /** Finds a scale by its key; "linear" is accepted as well as "lin". */
    public static Optional<GridScale> byKey(String key) {
        if ("linear".equals(key)) {
            return Optional.of(LINEAR);
        }
        return Arrays.stream(values()).filter(s -> s.key.equals(key)).findFirst();
    }
}
