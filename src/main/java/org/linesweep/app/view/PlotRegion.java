package org.linesweep.app.view;

import javafx.scene.paint.Color;

/**
 * A band of frequencies, shaded or hatched, with an optional label at its top.
 *
 * @param fromHz start, Hz (clipped to the axis)
 * @param toHz end, Hz (clipped to the axis)
 * @param color fill colour (use a translucent one for shading)
 * @param hatched true to hatch instead of fill
 * @param label text at the top of the band, or empty
 * @param stripRow −1 to cover the plot's full height; 0, 1, … for a labelled strip at the bottom of the plot,
 *        stacked upwards by row
 */
public record PlotRegion(double fromHz, double toHz, Color color, boolean hatched, String label, int stripRow) {
}
