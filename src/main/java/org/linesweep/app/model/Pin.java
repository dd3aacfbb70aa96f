package org.linesweep.app.model;

/**
 * A design pinned for comparison, with what was computed for it.
 *
 * @param slot 0..3: decides its colour and dash pattern
 * @param label what the legend calls it
 * @param snapshot the design and its results
 */
public record Pin(int slot, String label, SweepSnapshot snapshot) {
}
