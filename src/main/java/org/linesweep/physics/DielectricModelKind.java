package org.linesweep.physics;

import java.util.Arrays;
import java.util.Optional;

/** How a dielectric's permittivity varies with frequency. */
public enum DielectricModelKind {
    /** ε′ and tan δ the same at every frequency: simple, but not causal. */
    CONSTANT("constant"),
    /** The causal wideband Debye model of Djordjevic, Biljić, Likar-Smiljanić and Sarkar (2001). */
    WIDEBAND_DEBYE("wideband-debye");

    private final String key;

    DielectricModelKind(String key) {
        this.key = key;
    }

    /** The name used in design files. */
    public String key() {
        return key;
    }

    /** Finds a model by its design-file key. */
    public static Optional<DielectricModelKind> byKey(String key) {
        return Arrays.stream(values()).filter(m -> m.key.equals(key)).findFirst();
    }
}
