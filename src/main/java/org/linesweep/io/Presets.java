package org.linesweep.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.linesweep.design.Design;

/**
 * The designs shipped in {@code presets/}, packaged on the class path under {@code /presets/}.
 */
public final class Presets {

    /** The shipped presets' file names without ".json", in menu order. */
    public static final List<String> NAMES = List.of(
            "bench-patch-lead",
            "rooftop-antenna-feeder",
            "sensor-harness-run",
            "board-trace-50-ohm",
            "motor-drive-bus-bar",
            "buried-clock-stripline",
            "ladder-line-feeder",
            "test-fixture-wire-over-plane",
            "air-line-reference",
            "camera-link-pair");

    /** The preset the explorer opens on. */
    public static final String DEFAULT = "bench-patch-lead";

    private Presets() {
    }

    /** Loads a shipped preset by name. */
    public static Design load(String name) {
        String resource = "/presets/" + name + ".json";
        try (InputStream in = Presets.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("preset " + name + " is not packaged at " + resource);
            }
            return DesignFiles.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new IllegalStateException("preset " + name + " cannot be read", e);
        }
    }
}
