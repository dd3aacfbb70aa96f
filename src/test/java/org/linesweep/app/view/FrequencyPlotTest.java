package org.linesweep.app.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import javafx.geometry.Insets;
import javafx.geometry.Point2D;
import javafx.scene.Scene;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.scene.layout.Background;
import javafx.scene.layout.BackgroundFill;
import javafx.scene.layout.StackPane;
import javafx.scene.paint.Color;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The plot component mounted alone: axis mapping, decimation faithful to the full drawing, snapshots. */
@ExtendWith(ApplicationExtension.class)
class FrequencyPlotTest {

    private static final int WIDTH = 420;
    private static final int HEIGHT = 260;
    private FrequencyPlot plot;

    @Start
    void start(Stage stage) {
        plot = new FrequencyPlot();
        plot.setPrefSize(WIDTH, HEIGHT);
        stage.setScene(new Scene(new StackPane(plot), WIDTH, HEIGHT));
        stage.show();
    }

    /** A curve of many points: y = amplitude·sin(k·log10 f)·e^(−u/5), with a spike narrower than a pixel. */
    private static PlotSeries curve(int points, double amplitude, double wavenumber, Color color) {
        double[] x = new double[points];
        double[] y = new double[points];
        for (int i = 0; i < points; i++) {
            x[i] = Math.pow(10, 3 + 7.0 * i / (points - 1));
            double u = Math.log10(x[i]);
            y[i] = amplitude * Math.sin(wavenumber * u) * Math.exp(-u / 5) + (Math.abs(u - 6.3) < 0.003 ? 3 : 0);
        }
        return new PlotSeries("", x, y, points, color, 1.0, new double[0], false);
    }

    /** Topmost and bottommost tinted pixel per column (−1 where the column is empty). */
    private static int[][] extents(WritableImage image) {
        PixelReader reader = image.getPixelReader();
        int w = (int) image.getWidth();
        int h = (int) image.getHeight();
        int[][] out = new int[w][2];
        for (int x = 0; x < w; x++) {
            out[x][0] = -1;
            out[x][1] = -1;
            for (int y = 0; y < h; y++) {
                Color c = reader.getColor(x, y);
                // any pixel visibly tinted by the red curve, however partly covered by anti-aliasing
                if (c.getRed() - c.getGreen() > 0.12 && c.getRed() - c.getBlue() > 0.12) {
                    if (out[x][0] < 0) {
                        out[x][0] = y;
                    }
                    out[x][1] = y;
                }
            }
        }
        return out;
    }

    /** Draws a series decimated and in full; returns both pixel extents. */
    private int[][][] drawBothWays(FxRobot robot, PlotSeries series) {
        robot.interact(() -> {
            plot.setDecimation(true);
            plot.setFrequencyRange(1e3, 1e10);
            plot.setLeftAxis("", FrequencyPlot.Scale.LINEAR);
            plot.setSeries(List.of(series));
        });
        WaitForAsyncUtils.waitForFxEvents();
        WritableImage[] decimated = new WritableImage[1];
        robot.interact(() -> decimated[0] = plot.snapshot(1));
        robot.interact(() -> plot.setDecimation(false));
        WritableImage[] full = new WritableImage[1];
        robot.interact(() -> full[0] = plot.snapshot(1));
        return new int[][][] {extents(decimated[0]), extents(full[0])};
    }

    /** The union of a column's extent with its two neighbours'. */
    private static int[] window(int[][] extents, int x) {
        int top = Integer.MAX_VALUE;
        int bottom = -1;
        for (int i = x - 1; i <= x + 1; i++) {
            if (extents[i][0] >= 0) {
                top = Math.min(top, extents[i][0]);
                bottom = Math.max(bottom, extents[i][1]);
            }
        }
        return bottom < 0 ? new int[] {-1, -1} : new int[] {top, bottom};
    }

    /** True when an extent lies inside another, give or take a tolerance; an empty extent is inside anything. */
    private static boolean inside(int[] extent, int[] container, int tolerance) {
        if (extent[0] < 0) {
            return true;
        }
        return container[0] >= 0 && extent[0] >= container[0] - tolerance && extent[1] <= container[1] + tolerance;
    }

    /** Plot-area columns, less two at each end where the paths start at the column centre or the exact point. */
    private int[] columns() {
        return new int[] {(int) Math.ceil(plot.xOf(1e3)) + 2, (int) Math.floor(plot.xOf(1e10)) - 2};
    }

    /**
     * 200 000 points of a gently sloping curve with a spike one third of a pixel wide: the decimated drawing
     * matches the full drawing column by column within 2 px, the spike included.
     */
    @Test
    void decimationKeepsDetailColumnByColumn(FxRobot robot) {
        int[][][] both = drawBothWays(robot, curve(200_000, 1.0, 3, Color.rgb(230, 20, 20)));
        int[][] a = both[0];
        int[][] b = both[1];
        int[] range = columns();
        int compared = 0;
        for (int x = range[0]; x <= range[1]; x++) {
            if (a[x][0] < 0 && b[x][0] < 0) {
                continue;
            }
            compared++;
            // agreement up to one pixel of horizontal position and two of vertical
            assertTrue(inside(a[x], window(b, x), 2), "column " + x + " draws what the full drawing lacks");
            assertTrue(inside(b[x], window(a, x), 2), "column " + x + " loses what the full drawing shows");
        }
        assertTrue(compared > WIDTH / 2, "the curve spans the plot");
        int spikeColumn = (int) Math.floor(plot.xOf(Math.pow(10, 6.3)));
        int tallest = Integer.MAX_VALUE;
        for (int x = spikeColumn - 1; x <= spikeColumn + 1; x++) {
            tallest = Math.min(tallest, a[x][0]);
        }
        assertTrue(tallest < a[spikeColumn - 10][0] - 30, "the sub-pixel spike survives decimation");
    }

    /**
     * A curve rising ~20 px per column: the decimated drawing never puts ink outside the full drawing (whose
     * anti-aliased diagonal is wider than the data by half a column's rise on each side).
     */
    @Test
    void decimationInventsNothingOnSteepCurves(FxRobot robot) {
        int[][][] both = drawBothWays(robot, curve(200_000, 1.0, 40, Color.rgb(230, 20, 20)));
        int[][] a = both[0];
        int[][] b = both[1];
        int[] range = columns();
        for (int x = range[0]; x <= range[1]; x++) {
            if (a[x][0] < 0) {
                continue;
            }
            assertTrue(inside(a[x], window(b, x), 1),
                    "column " + x + ": decimated " + a[x][0] + ".." + a[x][1] + ", full " + b[x][0] + ".." + b[x][1]);
        }
    }

    /**
     * Grid and marker lines are filled as rectangles (the software pipeline's fast path): they cover the same
     * pixels as the canvas's own stroked line with its default square caps, solid, dashed, and with an odd
     * dash pattern (whose on and off swap on each repeat), to within anti-aliasing rounding.
     */
    @Test
    void filledLinesMatchStrokedLines(FxRobot robot) {
        double[][] patterns = {{}, {6, 4}, {2, 3, 5}};
        double[] widths = {1, 1.5, 3};
        for (double[] dash : patterns) {
            for (double width : widths) {
                WritableImage[] images = new WritableImage[2];
                robot.interact(() -> {
                    for (int way = 0; way < 2; way++) {
                        javafx.scene.canvas.Canvas canvas = new javafx.scene.canvas.Canvas(40, 200);
                        javafx.scene.canvas.GraphicsContext g = canvas.getGraphicsContext2D();
                        g.setFill(Color.WHITE);
                        g.fillRect(0, 0, 40, 200);
                        if (way == 0) {
                            g.setStroke(Color.BLACK);
                            g.setLineWidth(width);
                            g.setLineDashes(dash);
                            g.strokeLine(20.5, 10.25, 20.5, 187.5);
                        } else {
                            g.setFill(Color.BLACK);
                            FrequencyPlot.fillVerticalLine(g, 20.5, 10.25, 187.5, width, dash);
                        }
                        images[way] = canvas.snapshot(null, null);
                    }
                });
                double worst = 0;
                for (int x = 0; x < 40; x++) {
                    for (int y = 0; y < 200; y++) {
                        double stroked = images[0].getPixelReader().getColor(x, y).getBrightness();
                        double filled = images[1].getPixelReader().getColor(x, y).getBrightness();
                        worst = Math.max(worst, Math.abs(stroked - filled));
                    }
                }
                assertTrue(worst < 0.1, "dash " + java.util.Arrays.toString(dash) + ", width " + width
                        + ": largest difference in brightness " + worst);
            }
        }
    }

    /** Axis ranges: kept while the data fit, headroom when a drag drifts out, tight for unrelated data. */
    @Test
    void axisRangesHoldStillDuringADrag() {
        double[] current = {0.60, 0.70};
        FrequencyPlot.Scale linear = FrequencyPlot.Scale.LINEAR;
        assertTrue(FrequencyPlot.stable(current, new double[] {0.62, 0.69}, linear) == current, "inside: kept");
        double[] drifted = FrequencyPlot.stable(current, new double[] {0.61, 0.71}, linear);
        assertEquals(0.61, drifted[0], 1e-12, "the side the data did not leave by stays where the data are");
        assertTrue(drifted[1] >= 0.71 + 0.2 * 0.10 - 1e-12, "a fifth of the span above: " + drifted[1]);
        double[] unrelated = {5, 9};
        assertTrue(FrequencyPlot.stable(current, unrelated, linear) == unrelated, "new data elsewhere: tight");
        double[] logDrift = FrequencyPlot.stable(new double[] {1, 100}, new double[] {1.778, 177.8},
                FrequencyPlot.Scale.LOG);
        assertEquals(177.8 * Math.pow(10, 0.25), logDrift[1], 1e-9, "a quarter decade of headroom");
        assertEquals(1.778, logDrift[0], 1e-12);
    }

    @Test
    void frequencyAxisIsLogarithmic(FxRobot robot) {
        robot.interact(() -> plot.setFrequencyRange(1e3, 1e9));
        WaitForAsyncUtils.waitForFxEvents();
        double left = plot.xOf(1e3);
        double right = plot.xOf(1e9);
        assertEquals((left + right) / 2, plot.xOf(1e6), 1e-9);
        assertEquals(1e6, plot.frequencyAt((left + right) / 2), 1e-3);
    }

    /**
     * With thick lines (meeting mode's scale) a dashed curve still shows gaps: the dash pattern grows with the
     * width, or the square caps would close the gaps of the shorter patterns.
     */
    @Test
    void dashedCurvesKeepTheirGapsWhenLinesAreThick(FxRobot robot) {
        int points = 400;
        double[] x = new double[points];
        double[] y = new double[points];
        for (int i = 0; i < points; i++) {
            x[i] = Math.pow(10, 3 + 7.0 * i / (points - 1));
            y[i] = 0.5;
        }
        for (double[] dash : new double[][] {{8, 4}, {2, 3}}) {
            WritableImage[] image = new WritableImage[1];
            robot.interact(() -> {
                plot.setLook(1.9, 17, Color.BLACK, Color.LIGHTGRAY, Color.WHITE);
                plot.setFrequencyRange(1e3, 1e10);
                plot.setLeftAxis("", FrequencyPlot.Scale.LINEAR);
                plot.setSeries(List.of(new PlotSeries("", x, y, points, Color.rgb(230, 20, 20), 2.0, dash, false)));
            });
            WaitForAsyncUtils.waitForFxEvents();
            robot.interact(() -> image[0] = plot.snapshot(1));
            int[][] columns = extents(image[0]);
            int gaps = 0;
            for (int c = columns()[0] + 1; c < columns()[1]; c++) {
                if (columns[c][0] < 0 && columns[c - 1][0] >= 0) {
                    gaps++;
                }
            }
            assertTrue(gaps >= 10, "dash " + java.util.Arrays.toString(dash) + ": " + gaps + " gaps along the curve");
        }
    }

    @Test
    void snapshotAtTwiceTheScale(FxRobot robot) {
        robot.interact(() -> plot.setSeries(List.of(curve(500, 1.0, 3, Color.BLUE))));
        WritableImage[] image = new WritableImage[1];
        robot.interact(() -> image[0] = plot.snapshot(2));
        assertEquals(2 * plot.getWidth(), image[0].getWidth(), 1);
    }

    /**
     * The plot declares its whole area opaque, so the renderer starts a repaint there and paints nothing behind
     * it: the claim must be true (shown on a magenta pane, no pixel of the plot may let it through), its own
     * background must never paint, and a translucent paper withdraws the claim.
     */
    @Test
    void declaresOpaqueOnlyWhatItCovers(FxRobot robot) {
        robot.interact(() -> {
            ((StackPane) plot.getParent()).setBackground(new Background(new BackgroundFill(Color.MAGENTA, null, null)));
            plot.setSeries(List.of(curve(500, 1.0, 3, Color.BLUE)));
        });
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(Insets.EMPTY, plot.getOpaqueInsets());
        BackgroundFill fill = plot.getBackground().getFills().get(0);
        assertTrue(fill.getInsets().getTop() + fill.getInsets().getBottom() >= plot.getHeight(),
                "the plot's own fill has no height, so it is never painted");
        WritableImage[] scene = new WritableImage[1];
        robot.interact(() -> scene[0] = plot.getScene().snapshot(null));
        PixelReader reader = scene[0].getPixelReader();
        Point2D origin = plot.localToScene(0, 0);
        int seeThrough = 0;
        for (int x = 0; x < (int) plot.getWidth(); x++) {
            for (int y = 0; y < (int) plot.getHeight(); y++) {
                if (reader.getColor((int) origin.getX() + x, (int) origin.getY() + y).equals(Color.MAGENTA)) {
                    seeThrough++;
                }
            }
        }
        assertEquals(0, seeThrough, "pixels of the plot showing the pane behind it");
        robot.interact(() -> plot.setLook(1, 12, Color.BLACK, Color.LIGHTGRAY, Color.color(1, 1, 1, 0.5)));
        assertEquals(null, plot.getOpaqueInsets());
        robot.interact(() -> plot.setMeetingLook(false));
        assertEquals(Insets.EMPTY, plot.getOpaqueInsets());
    }
}
