package org.linesweep.bench;

/** Class-path entry for the latency harness (a main class that extends Application cannot start from the class path). */
public final class LatencyMain {

    private LatencyMain() {
    }

    public static void main(String[] args) {
        LatencyHarness.main(args);
    }
}
