package org.linesweep.physics;

/** Named tolerances for the physics tests, each with the reason for its size. */
final class Tolerances {
    /** Closed forms evaluated the same way: only rounding separates them. */
    static final double EXACT = 1e-12;
    /** Table values printed to 10 significant digits (Abramowitz and Stegun). */
    static final double TABLE_10_DIGITS = 5e-10;
    /** Check values quoted to 5 significant digits. */
    static final double FIVE_DIGITS = 5e-5;
    /** Check values quoted to 4 significant digits. */
    static final double FOUR_DIGITS = 5e-4;
    /** Values derived through a central-difference derivative or a root finder. */
    static final double NUMERICAL = 1e-7;

    private Tolerances() {
    }

    static double relativeError(double actual, double expected) {
        return Math.abs(actual - expected) / Math.abs(expected);
    }
}
