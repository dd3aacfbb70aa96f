package org.linesweep.app.view;

import javafx.geometry.Insets;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import org.linesweep.design.Geometry;

/** A small to-scale drawing of the line's cross-section, redrawn when the geometry changes. */
public final class CrossSectionView extends Region {

    private static final Color METAL = Color.web("#b87333");
    private static final Color DIELECTRIC = Color.web("#cfe3f3");
    private static final Color OUTLINE = Color.web("#4a4a4a");
    private final Canvas canvas = new Canvas(260, 150);
    private Geometry geometry;

    public CrossSectionView() {
        getChildren().add(canvas);
        setPrefSize(260, 150);
        setMinSize(260, 150);
        getStyleClass().add("cross-section");
    }

    @Override
    protected void layoutChildren() {
        // the drawing fills its canvas (white first), so that area is declared opaque; the canvas sits on whole
        // pixels so that the area covers its repainted pixels exactly
        double left = Math.max(0, Math.floor((getWidth() - canvas.getWidth()) / 2));
        canvas.relocate(left, 0);
        OpaqueArea.declare(this, new Insets(0, Math.max(0, getWidth() - left - canvas.getWidth()),
                Math.max(0, getHeight() - canvas.getHeight()), left));
    }

    public void show(Geometry newGeometry) {
        geometry = newGeometry;
        draw();
    }

    private void draw() {
        GraphicsContext g = canvas.getGraphicsContext2D();
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        g.setFill(Color.WHITE);
        g.fillRect(0, 0, w, h);
        if (geometry == null) {
            return;
        }
        g.setStroke(OUTLINE);
        g.setLineWidth(1);
        double cx = w / 2;
        double cy = h / 2;
        switch (geometry.type()) {
            case COAX -> {
                double a = geometry.value("innerDiameter") / 2;
                double b = geometry.value("outerDiameter") / 2;
                double c = b + geometry.value("outerThickness");
                double s = (h / 2 - 6) / c;
                disc(g, cx, cy, c * s, METAL);
                disc(g, cx, cy, b * s, DIELECTRIC);
                disc(g, cx, cy, Math.max(a * s, 0.5), METAL);
            }
            case TWO_WIRE -> {
                // the model's medium fills all space
                g.setFill(DIELECTRIC);
                g.fillRect(0, 0, w, h);
                double a = geometry.value("wireDiameter") / 2;
                double d = geometry.value("spacing");
                double s = Math.min((w - 40) / (d + 2 * a), (h - 40) / (2 * a));
                disc(g, cx - d / 2 * s, cy, Math.max(a * s, 0.5), METAL);
                disc(g, cx + d / 2 * s, cy, Math.max(a * s, 0.5), METAL);
            }
            case WIRE_OVER_GROUND -> {
                g.setFill(DIELECTRIC);
                g.fillRect(0, 0, w, h);
                double a = geometry.value("wireDiameter") / 2;
                double height = geometry.value("height");
                double ground = h - 14;
                double s = Math.min((ground - 20) / (height + a), (w - 40) / (2 * a));
                g.setFill(METAL);
                g.fillRect(8, ground, w - 16, 6);
                disc(g, cx, ground - height * s, Math.max(a * s, 0.5), METAL);
            }
            case PARALLEL_PLATE -> {
                double width = geometry.value("width");
                double sep = geometry.value("separation");
                double t = geometry.value("thickness");
                double s = Math.min((w - 16) / width, (h - 16) / (sep + 2 * t));
                double top = cy - (sep / 2 + t) * s;
                g.setFill(METAL);
                g.fillRect(cx - width / 2 * s, top, width * s, Math.max(t * s, 1));
                g.setFill(DIELECTRIC);
                g.fillRect(cx - width / 2 * s, cy - sep / 2 * s, width * s, Math.max(sep * s, 1));
                g.setFill(METAL);
                g.fillRect(cx - width / 2 * s, cy + sep / 2 * s, width * s, Math.max(t * s, 1));
            }
            case MICROSTRIP -> {
                double width = geometry.value("width");
                double sub = geometry.value("height");
                double t = geometry.value("thickness");
                double gap = geometry.isPair() ? geometry.value("gap") : 0;
                double strips = geometry.isPair() ? 2 * width + gap : width;
                double span = Math.max(strips * 1.6, Math.max(width * 3, sub * 6));
                double s = Math.min((w - 16) / span, (h - 30) / (sub + t));
                double ground = h - 12;
                g.setFill(METAL);
                g.fillRect(8, ground, w - 16, 5);
                g.setFill(DIELECTRIC);
                g.fillRect(8, ground - sub * s, w - 16, sub * s);
                g.setFill(METAL);
                stripOrPair(g, cx, ground - (sub + t) * s, width, gap, geometry.isPair(), t, s);
            }
            case STRIPLINE -> {
                double width = geometry.value("width");
                double b = geometry.value("spacing");
                double t = geometry.value("thickness");
                double gap = geometry.isPair() ? geometry.value("gap") : 0;
                double strips = geometry.isPair() ? 2 * width + gap : width;
                double span = Math.max(strips * 1.6, Math.max(width * 3, b * 3));
                double s = Math.min((w - 16) / span, (h - 24) / b);
                g.setFill(DIELECTRIC);
                g.fillRect(8, cy - b / 2 * s, w - 16, b * s);
                g.setFill(METAL);
                g.fillRect(8, cy - b / 2 * s - 5, w - 16, 5);
                g.fillRect(8, cy + b / 2 * s, w - 16, 5);
                stripOrPair(g, cx, cy - t / 2 * s, width, gap, geometry.isPair(), t, s);
            }
        }
        g.setFill(OUTLINE);
        g.fillText("to scale", 6, 12);
    }

    /** One strip centred on cx, or a pair of them a gap apart, top edge at y. */
    private static void stripOrPair(GraphicsContext g, double cx, double y, double width, double gap, boolean pair,
            double thickness, double scale) {
        double height = Math.max(thickness * scale, 1.5);
        if (!pair) {
            g.fillRect(cx - width / 2 * scale, y, width * scale, height);
            return;
        }
        double gapPixels = Math.max(gap * scale, 1.0);
        g.fillRect(cx - gapPixels / 2 - width * scale, y, width * scale, height);
        g.fillRect(cx + gapPixels / 2, y, width * scale, height);
    }

    private static void disc(GraphicsContext g, double x, double y, double r, Color fill) {
        g.setFill(fill);
        g.fillOval(x - r, y - r, 2 * r, 2 * r);
        g.strokeOval(x - r, y - r, 2 * r, 2 * r);
    }
}
