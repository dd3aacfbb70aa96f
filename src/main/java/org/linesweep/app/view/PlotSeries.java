package org.linesweep.app.view;

import javafx.scene.paint.Color;

/**
 * One curve of a plot. The arrays are read, never written; {@code count} points are used.
 *
 * @param name legend text
 * @param x frequencies, Hz, increasing
 * @param y values in the plot's unit; non-finite values leave a gap
 * @param count number of points to use
 * @param color stroke colour
 * @param width stroke width, px
 * @param dash dash pattern (empty for solid)
 * @param rightAxis true to scale against the secondary (right) axis
 */
public record PlotSeries(String name, double[] x, double[] y, int count, Color color, double width, double[] dash,
        boolean rightAxis) {
}
