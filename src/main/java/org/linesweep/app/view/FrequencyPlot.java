package org.linesweep.app.view;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;
import javafx.geometry.Insets;
import javafx.geometry.VPos;
import javafx.scene.SnapshotParameters;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.WritableImage;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.scene.shape.Line;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import javafx.scene.transform.Transform;

/**
 * A plot against frequency on a log axis, drawn on two canvases: the background (frame, grid, ticks,
 * labels) is redrawn only when the size or an axis changes; the plot layer (regions, curves, markers,
 * legend) once per pulse when its content changed. The crosshair is a separate line node, so moving it
 * redraws nothing.
 *
 * <p>Curves with more points than twice the plot's width in pixels are decimated per pixel column: each
 * column draws the first, lowest, highest and last point it holds, in their order, so steep segments and
 * narrow peaks keep their full extent.
 */
public final class FrequencyPlot extends Region {

    /** Vertical scale of an axis. */
    public enum Scale { LINEAR, LOG }

    private static final double LEFT = 70;
    private static final double BOTTOM = 28;
    private static final double TOP = 26;
    private static final double RIGHT_PLAIN = 14;
    private static final double RIGHT_SECONDARY = 62;
    private static final double[] NO_DASH = {};

    private final Canvas background = new Canvas();
    private final Canvas foreground = new Canvas();
    private final Line crosshair = new Line();
    private String title = "";
    private String yUnit = "";
    private String rightUnit = "";
    private Scale yScale = Scale.LINEAR;
    private Scale rightScale = Scale.LINEAR;
    private double minHz = 1e3;
    private String horizontalUnit = "Hz";
    private Scale horizontalScale = Scale.LOG;
    private double maxHz = 1e9;
    private List<PlotSeries> series = List.of();
    private List<PlotMarker> markers = List.of();
    private List<PlotRegion> regions = List.of();
    private List<PlotSeries[]> bands = List.of();
    private double[] yRange = {0, 1};
    private double[] rightRange = {0, 1};
    private boolean backgroundDirty = true;
    private boolean foregroundDirty = true;
    private double lineScale = 1.0;
    private double fontSize = 12;
    private Color ink = Color.web("#1f2328");
    private Color grid = Color.web("#d8dde3");
    private Color paper = Color.WHITE;
    private DoubleConsumer onHover = f -> { };
    private int drawCount;
    private boolean decimation = true;
    /** Drops decimated points within a tenth of a pixel of the drawn segment (invisible, and cheaper to draw). */
    private final PathSimplifier path = new PathSimplifier(0.1);
    /** Horizontal pixels of the grid {@link #pixelColumnOf}, valid during one drawing of the curves. */
    private double[] pixelColumn = new double[0];
    private double[] pixelColumnOf;
    private int pixelColumnCount;
    /** A decimated column whose values span less than this is drawn as one point at its middle. */
    static final double FLAT_COLUMN_PIXELS = 0.2;

    public FrequencyPlot() {
        getChildren().addAll(background, foreground, crosshair);
        crosshair.setManaged(false);
        crosshair.setVisible(false);
        crosshair.setStroke(Color.web("#555555"));
        crosshair.getStrokeDashArray().setAll(3.0, 3.0);
        crosshair.setMouseTransparent(true);
        setMinSize(200, 120);
        setPrefSize(480, 260);
        declareOpaque();
        setOnMouseMoved(e -> {
            double f = frequencyAt(e.getX());
            onHover.accept(f >= minHz && f <= maxHz ? f : Double.NaN);
        });
        setOnMouseExited(e -> onHover.accept(Double.NaN));
        getStyleClass().add("frequency-plot");
    }

    /** Called with the frequency under the pointer, or NaN when it leaves the plot area. */
    public void setOnHover(DoubleConsumer onHover) {
        this.onHover = onHover;
    }

    public void setTitle(String title) {
        if (!title.equals(this.title)) {
            this.title = title;
            markBackground();
        }
    }

    public String getTitle() {
        return title;
    }

    /** Sets the frequency axis, Hz. */
    public void setFrequencyRange(double minHz, double maxHz) {
        if (minHz != this.minHz || maxHz != this.maxHz) {
            this.minHz = minHz;
            this.maxHz = maxHz;
            markBackground();
        }
    }

    /**
     * The horizontal axis: frequency on a log scale unless set otherwise (the time-domain view uses the same
     * component with seconds on a linear scale). The "frequency" methods then speak of that quantity.
     */
    public void setHorizontalAxis(String unit, Scale scale) {
        if (!unit.equals(horizontalUnit) || scale != horizontalScale) {
            horizontalUnit = unit;
            horizontalScale = scale;
            markBackground();
        }
    }

    /** The left axis' unit and scale. */
    public void setLeftAxis(String unit, Scale scale) {
        if (!unit.equals(yUnit) || scale != yScale) {
            yUnit = unit;
            yScale = scale;
            markBackground();
        }
    }

    /** The right (secondary) axis' unit and scale; an empty unit hides the axis. */
    public void setRightAxis(String unit, Scale scale) {
        if (!unit.equals(rightUnit) || scale != rightScale) {
            rightUnit = unit;
            rightScale = scale;
            markBackground();
        }
    }

    /** Replaces the curves; the vertical axes rescale to them. */
    public void setSeries(List<PlotSeries> newSeries) {
        series = List.copyOf(newSeries);
        double[] left = stable(yRange, range(false, yScale), yScale);
        double[] right = stable(rightRange, range(true, rightScale), rightScale);
        if (left[0] != yRange[0] || left[1] != yRange[1] || right[0] != rightRange[0] || right[1] != rightRange[1]) {
            yRange = left;
            rightRange = right;
            backgroundDirty = true;
        }
        markForeground();
    }

    public List<PlotSeries> getSeries() {
        return series;
    }

    public void setMarkers(List<PlotMarker> newMarkers) {
        markers = List.copyOf(newMarkers);
        markForeground();
    }

    public List<PlotMarker> getMarkers() {
        return markers;
    }

    public void setRegions(List<PlotRegion> newRegions) {
        regions = List.copyOf(newRegions);
        markForeground();
    }

    public List<PlotRegion> getRegions() {
        return regions;
    }

    /**
     * Shaded bands between pairs of curves (low, high), drawn behind the curves, in the low curve's colour at
     * low opacity. The vertical axis is not rescaled for them.
     */
    public void setBands(List<PlotSeries[]> newBands) {
        bands = List.copyOf(newBands);
        markForeground();
    }

    public List<PlotSeries[]> getBands() {
        return bands;
    }

    /** Shows the crosshair at a frequency, or hides it for NaN. */
    public void setCrosshair(double frequencyHz) {
        if (Double.isNaN(frequencyHz) || frequencyHz < minHz || frequencyHz > maxHz) {
            crosshair.setVisible(false);
            return;
        }
        double x = xOf(frequencyHz);
        crosshair.setStartX(x);
        crosshair.setEndX(x);
        crosshair.setStartY(TOP);
        crosshair.setEndY(getHeight() - BOTTOM);
        crosshair.setVisible(true);
    }

    /** Style for screen-sharing: thicker lines and larger text, with the given ink and paper colours. */
    /** The look of meeting mode (thick lines, large type, its palette) or of the ordinary window. */
    public void setMeetingLook(boolean meeting) {
        Palette palette = Palette.of(meeting);
        setLook(meeting ? 1.9 : 1.0, meeting ? 17 : 12, palette.ink(), palette.grid(), palette.paper());
    }

    public void setLook(double lineScale, double fontSize, Color ink, Color grid, Color paper) {
        this.lineScale = lineScale;
        this.fontSize = fontSize;
        this.ink = ink;
        this.grid = grid;
        this.paper = paper;
        declareOpaque();
        markBackground();
    }

    /**
     * The axes' canvas covers the plot and paints every pixel of it, paper first: so the plot is opaque over its
     * whole area when the paper is, and a repaint of the curves starts here rather than at the frame behind.
     */
    private void declareOpaque() {
        OpaqueArea.declare(this, paper.isOpaque() ? Insets.EMPTY : null);
    }

    /** Turns per-column decimation off, to compare against the full drawing in tests. */
    void setDecimation(boolean enabled) {
        decimation = enabled;
        markForeground();
    }

    /** How many times the plot layer has been drawn (for tests and the latency harness). */
    public int drawCount() {
        return drawCount;
    }

    /** The plot as an image at a scale (2 for slides). */
    public WritableImage snapshot(double scale) {
        layoutChildren();
        SnapshotParameters parameters = new SnapshotParameters();
        parameters.setTransform(Transform.scale(scale, scale));
        parameters.setFill(paper);
        return snapshot(parameters, null);
    }

    /** Frequency at a horizontal position in this node's coordinates. */
    public double frequencyAt(double x) {
        double fraction = (x - LEFT) / plotWidth();
        if (horizontalScale == Scale.LINEAR) {
            return minHz + fraction * (maxHz - minHz);
        }
        return Math.pow(10, Math.log10(minHz) + fraction * (Math.log10(maxHz) - Math.log10(minHz)));
    }

    /** Horizontal position of a frequency in this node's coordinates. */
    public double xOf(double frequencyHz) {
        return horizontalMapping().pixel(frequencyHz);
    }

    /**
     * From a value to a pixel along one axis: {@code offset + slope * value}, or of log10 value on a log
     * axis. Worked out once for a drawing, so a point costs one logarithm at most.
     */
    private record AxisMapping(boolean log, double offset, double slope) {
        static AxisMapping of(boolean log, double low, double high, double pixelAtLow, double pixelAtHigh) {
            double from = log ? Math.log10(low) : low;
            double to = log ? Math.log10(high) : high;
            double slope = (pixelAtHigh - pixelAtLow) / (to - from);
            return new AxisMapping(log, pixelAtLow - slope * from, slope);
        }

        double pixel(double value) {
            return offset + slope * (log ? Math.log10(value) : value);
        }
    }

    private AxisMapping horizontalMapping() {
        return AxisMapping.of(horizontalScale != Scale.LINEAR, minHz, maxHz, LEFT, LEFT + plotWidth());
    }

    private AxisMapping verticalMapping(boolean right) {
        double[] r = right ? rightRange : yRange;
        Scale s = right ? rightScale : yScale;
        return AxisMapping.of(s == Scale.LOG, r[0], r[1], TOP + plotHeight(), TOP);
    }

    /** The horizontal pixel of each frequency of a grid, shared by every curve drawn on that grid. */
    private double[] pixelColumn(double[] frequencies, int count, AxisMapping mapping) {
        if (frequencies != pixelColumnOf || count > pixelColumnCount) {
            if (pixelColumn.length < count) {
                pixelColumn = new double[count];
            }
            for (int i = 0; i < count; i++) {
                pixelColumn[i] = mapping.pixel(frequencies[i]);
            }
            pixelColumnOf = frequencies;
            pixelColumnCount = count;
        }
        return pixelColumn;
    }

    private double rightMargin() {
        return rightUnit.isEmpty() ? RIGHT_PLAIN : RIGHT_SECONDARY;
    }

    private double plotWidth() {
        return Math.max(1, getWidth() - LEFT - rightMargin());
    }

    private double plotHeight() {
        return Math.max(1, getHeight() - TOP - BOTTOM);
    }

    private double yOf(double value, boolean right) {
        return verticalMapping(right).pixel(value);
    }

    private void markBackground() {
        backgroundDirty = true;
        foregroundDirty = true;
        requestLayout();
    }

    private void markForeground() {
        foregroundDirty = true;
        requestLayout();
    }

    private double[] range(boolean right, Scale scale) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (PlotSeries s : series) {
            if (s.rightAxis() != right) {
                continue;
            }
            for (int i = 0; i < s.count(); i++) {
                double v = s.y()[i];
                if (Double.isFinite(v) && (scale == Scale.LINEAR || v > 0)) {
                    min = Math.min(min, v);
                    max = Math.max(max, v);
                }
            }
        }
        if (!(min <= max)) {
            return scale == Scale.LOG ? new double[] {1, 10} : new double[] {0, 1};
        }
        if (scale == Scale.LOG) {
            double low = Math.pow(10, Math.floor(Math.log10(min) * 4) / 4);
            double high = Math.pow(10, Math.ceil(Math.log10(max) * 4) / 4);
            if (high / low < 10) {
                double middle = Math.sqrt(low * high);
                low = middle / Math.sqrt(10);
                high = middle * Math.sqrt(10);
            }
            return new double[] {low, high};
        }
        double span = max - min;
        double pad = span > 0 ? 0.06 * span : Math.max(Math.abs(max) * 0.05, 1e-12);
        double[] nice = niceRange(min - pad, max + pad);
        return nice;
    }

    /**
     * Keeps the current axis range while the new data's range lies inside it and fills at least half of it
     * (in log units for a log axis): during a drag the grid and labels then stay put instead of being
     * redrawn on every step. When the data drift out of it a little (the new range overlaps the current one
     * and is of a similar span, as in a drag), the new range leaves headroom on the side they left by (a
     * fifth of the span, or a quarter decade), so the next steps of the drag stay inside it too.
     */
    static double[] stable(double[] current, double[] wanted, Scale scale) {
        boolean log = scale == Scale.LOG;
        if (log && current[0] <= 0) {
            return wanted;
        }
        double currentSpan = log ? Math.log10(current[1] / current[0]) : current[1] - current[0];
        double wantedSpan = log ? Math.log10(wanted[1] / wanted[0]) : wanted[1] - wanted[0];
        boolean inside = wanted[0] >= current[0] && wanted[1] <= current[1];
        if (inside && wantedSpan >= 0.5 * currentSpan) {
            return current;
        }
        boolean drifting = wanted[0] < current[1] && wanted[1] > current[0]
                && wantedSpan >= 0.5 * currentSpan && wantedSpan <= 2 * currentSpan;
        if (!drifting) {
            return wanted;
        }
        if (log) {
            double quarterDecade = Math.pow(10, 0.25);
            return new double[] {wanted[0] < current[0] ? wanted[0] / quarterDecade : wanted[0],
                wanted[1] > current[1] ? wanted[1] * quarterDecade : wanted[1]};
        }
        double headroom = 0.2 * wantedSpan;
        return niceRange(wanted[0] < current[0] ? wanted[0] - headroom : wanted[0],
                wanted[1] > current[1] ? wanted[1] + headroom : wanted[1]);
    }

    private static double[] niceRange(double min, double max) {
        double span = max - min;
        double step = Math.pow(10, Math.floor(Math.log10(span)) - 1);
        return new double[] {Math.floor(min / step) * step, Math.ceil(max / step) * step};
    }

    @Override
    protected void layoutChildren() {
        double width = getWidth();
        double height = getHeight();
        if (background.getWidth() != width || background.getHeight() != height) {
            background.setWidth(width);
            background.setHeight(height);
            backgroundDirty = true;
            foregroundDirty = true;
        }
        // the curves' layer covers the plot area only: every step of a drag repaints it, and the software
        // pipeline's cost of compositing a layer grows with its area (a third less than the whole plot)
        if (foreground.getWidth() != plotWidth() || foreground.getHeight() != plotHeight()) {
            foreground.setWidth(plotWidth());
            foreground.setHeight(plotHeight());
            foreground.relocate(LEFT, TOP);
            foregroundDirty = true;
        }
        if (backgroundDirty) {
            drawBackground();
            backgroundDirty = false;
        }
        if (foregroundDirty) {
            drawForeground();
            foregroundDirty = false;
        }
    }

    private Font font(double scale, boolean bold) {
        return Font.font("System", bold ? FontWeight.BOLD : FontWeight.NORMAL, fontSize * scale);
    }

    private void drawBackground() {
        GraphicsContext g = background.getGraphicsContext2D();
        double width = background.getWidth();
        double height = background.getHeight();
        g.setFill(paper);
        g.fillRect(0, 0, width, height);
        double right = LEFT + plotWidth();
        double bottom = TOP + plotHeight();
        g.setLineWidth(1);
        g.setFont(font(0.9, false));
        g.setTextBaseline(VPos.TOP);
        g.setTextAlign(TextAlignment.CENTER);
        List<AxisTicks.Tick> horizontalTicks = horizontalScale == Scale.LINEAR
                ? AxisTicks.linear(minHz, maxHz, horizontalUnit, Math.max(3, (int) (plotWidth() / 95))) : AxisTicks.log(minHz, maxHz, horizontalUnit);
        for (AxisTicks.Tick tick : horizontalTicks) {
            double x = Math.round(xOf(tick.value())) + 0.5;
            g.setFill(tick.major() ? grid : grid.interpolate(paper, 0.55));
            fillVerticalLine(g, x, TOP, bottom, 1, NO_DASH);
            if (!tick.label().isEmpty()) {
                g.setFill(ink);
                g.fillText(tick.label(), x, bottom + 4);
            }
        }
        drawValueAxis(g, false, LEFT - 6, TextAlignment.RIGHT, bottom, right);
        if (!rightUnit.isEmpty()) {
            drawValueAxis(g, true, right + 6, TextAlignment.LEFT, bottom, right);
        }
        g.setStroke(ink.interpolate(paper, 0.35));
        g.strokeRect(LEFT + 0.5, TOP + 0.5, plotWidth(), plotHeight());
        g.setFill(ink);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        g.setFont(font(1.05, true));
        g.fillText(title, LEFT, 4);
        g.setFont(font(0.9, false));
        g.setTextAlign(TextAlignment.RIGHT);
        g.fillText(yUnit + (rightUnit.isEmpty() ? "" : "   |   right: " + rightUnit), right, 6);
    }

    private void drawValueAxis(GraphicsContext g, boolean right, double x, TextAlignment align, double bottom,
            double plotRight) {
        double[] r = right ? rightRange : yRange;
        Scale s = right ? rightScale : yScale;
        List<AxisTicks.Tick> ticks = s == Scale.LOG ? AxisTicks.log(r[0], r[1], "")
                : AxisTicks.linear(r[0], r[1], "", Math.max(3, (int) (plotHeight() / (fontSize * 3.2))));
        g.setTextAlign(align);
        g.setTextBaseline(VPos.CENTER);
        g.setFont(font(0.9, false));
        for (AxisTicks.Tick tick : ticks) {
            double y = Math.round(yOf(tick.value(), right)) + 0.5;
            if (y < TOP - 0.5 || y > bottom + 0.5) {
                continue;
            }
            if (!right) {
                g.setFill(tick.major() ? grid : grid.interpolate(paper, 0.55));
                g.fillRect(LEFT - 0.5, y - 0.5, plotRight - LEFT + 1, 1); // a 1-pixel line, as filled
            }
            if (!tick.label().isEmpty()) {
                g.setFill(ink);
                g.fillText(tick.label(), x, y);
            }
        }
    }

    private void drawForeground() {
        drawCount++;
        GraphicsContext g = foreground.getGraphicsContext2D();
        g.clearRect(0, 0, foreground.getWidth(), foreground.getHeight());
        pixelColumnOf = null; // the axes may have moved since the last drawing
        double bottom = TOP + plotHeight();
        double right = LEFT + plotWidth();
        // the layer covers the plot area exactly, so its bounds clip the curves; it sits at the area's corner,
        // and is drawn in the plot's coordinates
        g.save();
        g.translate(-LEFT, -TOP);
        for (PlotRegion region : regions) {
            drawRegion(g, region, bottom, right);
        }
        for (PlotSeries[] band : bands) {
            drawBand(g, band[0], band[1]);
        }
        for (PlotSeries s : series) {
            drawSeries(g, s);
        }
        g.setLineDashes();
        g.setFont(font(0.85, false));
        g.setTextBaseline(VPos.TOP);
        g.setTextAlign(TextAlignment.LEFT);
        int row = 0;
        for (PlotMarker marker : markers) {
            if (!(marker.frequencyHz() >= minHz && marker.frequencyHz() <= maxHz)) {
                continue;
            }
            double x = Math.round(xOf(marker.frequencyHz())) + 0.5;
            g.setFill(marker.color());
            fillVerticalLine(g, x, TOP, bottom, 1.5 * lineScale, scaled(marker.dash()));
            double labelY = TOP + 16 + (row % 4) * (fontSize + 3);
            boolean flip = x > right - 150;
            g.setTextAlign(flip ? TextAlignment.RIGHT : TextAlignment.LEFT);
            g.fillText(marker.label(), flip ? x - 4 : x + 4, labelY);
            row++;
        }
        drawLegend(g, right);
        g.restore();
    }

    /**
     * A dash pattern for lines {@link #lineScale} times as wide: the dashes and gaps grow with the width, or the
     * square caps of thick lines would close the gaps and a dashed curve would read as solid (meeting mode).
     */
    private double[] scaled(double[] dash) {
        if (lineScale == 1 || dash.length == 0) {
            return dash;
        }
        double[] out = new double[dash.length];
        for (int i = 0; i < dash.length; i++) {
            out[i] = dash[i] * lineScale;
        }
        return out;
    }

    /**
     * Draws what {@code strokeLine(x, top, x, bottom)} draws with the canvas's default square caps and the
     * given width and dash pattern, as filled rectangles: the software pipeline fills an axis-aligned
     * rectangle directly, while a stroke goes through the general anti-aliased rasteriser, which cost about
     * a quarter of the render thread's time with the grid and the markers redrawn during a drag.
     */
    static void fillVerticalLine(GraphicsContext g, double x, double top, double bottom, double width,
            double[] dash) {
        double half = width / 2;
        double period = 0;
        for (double length : dash) {
            period += length;
        }
        if (!(period > 0)) {
            g.fillRect(x - half, top - half, width, bottom - top + width);
            return;
        }
        // the pattern alternates on and off across repeats, so an odd-length pattern swaps them each time;
        // dashes whose caps meet across a short gap are filled as one rectangle, as a stroke's union would be
        double y = top;
        double runTop = Double.NaN;
        double runBottom = Double.NaN;
        for (int i = 0; y < bottom; i++) {
            double length = dash[i % dash.length];
            if (i % 2 == 0) {
                double dashTop = y - half;
                double dashBottom = Math.min(y + length, bottom) + half;
                if (dashTop <= runBottom) {
                    runBottom = dashBottom;
                } else {
                    if (runBottom > runTop) {
                        g.fillRect(x - half, runTop, width, runBottom - runTop);
                    }
                    runTop = dashTop;
                    runBottom = dashBottom;
                }
            }
            y += length;
        }
        if (runBottom > runTop) {
            g.fillRect(x - half, runTop, width, runBottom - runTop);
        }
    }

    private void drawRegion(GraphicsContext g, PlotRegion region, double bottom, double right) {
        double from = Math.max(LEFT, xOf(Math.max(region.fromHz(), minHz)));
        double to = Math.min(right, xOf(Math.min(region.toHz(), maxHz)));
        if (!(to > from)) {
            return;
        }
        if (region.stripRow() >= 0) {
            double stripHeight = fontSize * 1.4;
            double stripBottom = bottom - region.stripRow() * (stripHeight + 2);
            g.setFill(region.color());
            g.fillRect(from, stripBottom - stripHeight, to - from, stripHeight);
            g.setFill(ink);
            g.setFont(font(0.8, false));
            g.setTextBaseline(VPos.CENTER);
            g.setTextAlign(TextAlignment.CENTER);
            g.fillText(region.label(), (from + to) / 2, stripBottom - stripHeight / 2, Math.max(10, to - from - 4));
            return;
        }
        if (region.hatched()) {
            g.setStroke(region.color());
            g.setLineWidth(1);
            g.setLineDashes();
            double height = bottom - TOP;
            // one path of all the strokes, stroked once: a hundred separate lines per region cost a command
            // and a rasterisation set-up each, at every step of a drag
            g.beginPath();
            for (double x = from - height; x < to; x += 9) {
                double x0 = Math.max(from, x);
                double y0 = bottom - (x0 - x);
                double x1 = Math.min(to, x + height);
                double y1 = bottom - (x1 - x);
                g.moveTo(x0, y0);
                g.lineTo(x1, y1);
            }
            g.stroke();
        } else {
            g.setFill(region.color());
            g.fillRect(from, TOP, to - from, bottom - TOP);
        }
        if (!region.label().isEmpty()) {
            g.setFill(region.color().deriveColor(0, 1, 0.55, 1 / Math.max(0.05, region.color().getOpacity())));
            g.setFont(font(0.8, false));
            g.setTextBaseline(VPos.TOP);
            g.setTextAlign(TextAlignment.CENTER);
            g.fillText(region.label(), (from + to) / 2, TOP + 2, Math.max(20, to - from - 4));
        }
    }

    private void drawBand(GraphicsContext g, PlotSeries low, PlotSeries high) {
        Scale scale = low.rightAxis() ? rightScale : yScale;
        int n = Math.min(low.count(), high.count());
        g.setFill(low.color().deriveColor(0, 1, 1, 0.22));
        g.beginPath();
        boolean started = false;
        for (int i = 0; i < n; i++) {
            double v = low.y()[i];
            if (!Double.isFinite(v) || (scale == Scale.LOG && v <= 0)) {
                continue;
            }
            double x = xOf(low.x()[i]);
            double y = yOf(v, low.rightAxis());
            if (started) {
                g.lineTo(x, y);
            } else {
                g.moveTo(x, y);
                started = true;
            }
        }
        for (int i = n - 1; i >= 0; i--) {
            double v = high.y()[i];
            if (!Double.isFinite(v) || (scale == Scale.LOG && v <= 0)) {
                continue;
            }
            g.lineTo(xOf(high.x()[i]), yOf(v, high.rightAxis()));
        }
        g.closePath();
        if (started) {
            g.fill();
        }
    }

    private void drawSeries(GraphicsContext g, PlotSeries s) {
        if (s.count() == 0) {
            return;
        }
        boolean right = s.rightAxis();
        Scale scale = right ? rightScale : yScale;
        g.setStroke(s.color());
        g.setLineWidth(s.width() * lineScale);
        g.setLineDashes(scaled(s.dash()));
        // bevel joins: a miter at a sharp turn would spike past the data, and round joins cost the
        // software rasteriser far more
        g.setLineJoin(javafx.scene.shape.StrokeLineJoin.BEVEL);
        g.beginPath();
        boolean penDown = false;
        double[] ys = s.y();
        double[] xs = pixelColumn(s.x(), s.count(), horizontalMapping());
        AxisMapping vertical = verticalMapping(right);
        boolean decimate = decimation && s.count() > 2 * plotWidth();
        if (!decimate) {
            for (int i = 0; i < s.count(); i++) {
                double v = ys[i];
                if (!Double.isFinite(v) || (scale == Scale.LOG && v <= 0)) {
                    penDown = false;
                    continue;
                }
                double x = xs[i];
                double y = vertical.pixel(v);
                if (penDown) {
                    g.lineTo(x, y);
                } else {
                    g.moveTo(x, y);
                    penDown = true;
                }
            }
            g.stroke();
            return;
        }
        path.start(g);
        int column = Integer.MIN_VALUE;
        double firstY = 0;
        double lastY = 0;
        double minY = 0;
        double maxY = 0;
        int minIndex = 0;
        int maxIndex = 0;
        double columnX = 0;
        for (int i = 0; i <= s.count(); i++) {
            boolean valid = i < s.count() && Double.isFinite(ys[i]) && (scale == Scale.LOG ? ys[i] > 0 : true);
            double x = valid ? xs[i] : 0;
            int c = valid ? (int) Math.floor(x) : Integer.MIN_VALUE;
            if (c != column && column != Integer.MIN_VALUE) {
                // flush the finished column: first, extremes in their order, last; a column whose points all
                // lie within a fifth of a pixel is one point (the usual case on a smooth curve)
                if (maxY - minY <= FLAT_COLUMN_PIXELS) {
                    double middle = 0.5 * (minY + maxY);
                    if (penDown) {
                        path.lineTo(columnX, middle);
                    } else {
                        path.moveTo(columnX, middle);
                        penDown = true;
                    }
                } else {
                    double first = minIndex <= maxIndex ? minY : maxY;
                    double second = minIndex <= maxIndex ? maxY : minY;
                    if (penDown) {
                        path.lineTo(columnX, firstY);
                    } else {
                        path.moveTo(columnX, firstY);
                        penDown = true;
                    }
                    path.lineTo(columnX, first);
                    path.lineTo(columnX, second);
                    path.lineTo(columnX, lastY);
                }
            }
            if (!valid) {
                if (i < s.count()) {
                    penDown = false;
                }
                column = Integer.MIN_VALUE;
                continue;
            }
            double y = vertical.pixel(ys[i]);
            if (c != column) {
                column = c;
                columnX = c + 0.5;
                firstY = y;
                minY = y;
                maxY = y;
                minIndex = i;
                maxIndex = i;
            }
            if (y < minY) {
                minY = y;
                minIndex = i;
            }
            if (y > maxY) {
                maxY = y;
                maxIndex = i;
            }
            lastY = y;
        }
        path.flush();
        g.stroke();
    }

    private void drawLegend(GraphicsContext g, double right) {
        List<PlotSeries> named = new ArrayList<>();
        for (PlotSeries s : series) {
            if (!s.name().isEmpty()) {
                named.add(s);
            }
        }
        if (named.isEmpty()) {
            return;
        }
        g.setFont(font(0.85, false));
        g.setTextBaseline(VPos.CENTER);
        g.setTextAlign(TextAlignment.LEFT);
        double rowHeight = fontSize * 1.25;
        double boxWidth = 0;
        for (PlotSeries s : named) {
            boxWidth = Math.max(boxWidth, s.name().length() * fontSize * 0.55);
        }
        boxWidth += 40;
        double x = right - boxWidth - 6;
        double y = TOP + plotHeight() - named.size() * rowHeight - 8;
        g.setFill(paper.deriveColor(0, 1, 1, 0.85));
        g.fillRect(x, y, boxWidth, named.size() * rowHeight + 4);
        for (int i = 0; i < named.size(); i++) {
            PlotSeries s = named.get(i);
            double rowY = y + 2 + rowHeight * (i + 0.5);
            g.setStroke(s.color());
            g.setLineWidth(s.width() * lineScale);
            g.setLineDashes(scaled(s.dash()));
            g.strokeLine(x + 4, rowY, x + 28, rowY);
            g.setLineDashes();
            g.setFill(ink);
            g.fillText(s.name(), x + 34, rowY);
        }
    }
}
