package org.linesweep.app.view;

import javafx.scene.paint.Color;

/**
 * A vertical marker at a frequency, labelled.
 *
 * @param frequencyHz where, Hz
 * @param label text beside the line
 * @param color line and text colour
 * @param dash dash pattern (empty for solid)
 */
public record PlotMarker(double frequencyHz, String label, Color color, double[] dash) {
}
