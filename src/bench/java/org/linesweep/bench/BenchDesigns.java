package org.linesweep.bench;

import org.linesweep.design.Design;
import org.linesweep.io.Presets;
import org.linesweep.physics.LineType;

/** The preset each benchmark uses for a line type: a realistic design, lossy conductors and dielectric. */
final class BenchDesigns {

    private BenchDesigns() {
    }

    static Design of(LineType type) {
        return Presets.load(switch (type) {
            case COAX -> "bench-patch-lead";
            case TWO_WIRE -> "sensor-harness-run";
            case WIRE_OVER_GROUND -> "test-fixture-wire-over-plane";
            case PARALLEL_PLATE -> "motor-drive-bus-bar";
            case MICROSTRIP -> "board-trace-50-ohm";
            case STRIPLINE -> "buried-clock-stripline";
        });
    }
}
