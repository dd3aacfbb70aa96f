package org.linesweep.app.view;

import javafx.scene.canvas.GraphicsContext;

/**
 * Feeds a polyline to a canvas path, leaving out points that lie within a fraction of a pixel of the segment
 * that replaces them. After per-column decimation a smooth curve still sends up to four points per pixel
 * column; most of them are collinear to well under a pixel, and every point costs the FX thread (the
 * graphics context transforms and buffers it) and the software rasteriser (one more edge per point).
 *
 * <p>Each dropped point was checked against the segment that finally replaced it (segment distance, not
 * distance to the infinite line, so a spike that doubles back is kept), so no drawn point is off by more than
 * the tolerance. At most {@link #MAX_SKIPPED} points are folded into one segment, which bounds the work per
 * point.
 */
final class PathSimplifier {

    /** Points folded into one segment at most. */
    static final int MAX_SKIPPED = 16;

    private final double toleranceSquared;
    private final double[] xs = new double[MAX_SKIPPED + 1];
    private final double[] ys = new double[MAX_SKIPPED + 1];
    private GraphicsContext g;
    private int buffered;
    private double anchorX;
    private double anchorY;

    /** @param tolerancePixels largest distance of a dropped point from the drawn segment */
    PathSimplifier(double tolerancePixels) {
        this.toleranceSquared = tolerancePixels * tolerancePixels;
    }

    /** Starts on a graphics context whose path has been begun. */
    void start(GraphicsContext graphics) {
        this.g = graphics;
        this.buffered = 0;
    }

    void moveTo(double x, double y) {
        flush();
        g.moveTo(x, y);
        anchorX = x;
        anchorY = y;
    }

    void lineTo(double x, double y) {
        if (buffered > 0 && (buffered == MAX_SKIPPED + 1 || !allNear(x, y))) {
            double endX = xs[buffered - 1];
            double endY = ys[buffered - 1];
            g.lineTo(endX, endY);
            anchorX = endX;
            anchorY = endY;
            buffered = 0;
        }
        xs[buffered] = x;
        ys[buffered] = y;
        buffered++;
    }

    /** Draws the pending end point; call before stroking or moving. */
    void flush() {
        if (buffered > 0) {
            g.lineTo(xs[buffered - 1], ys[buffered - 1]);
            buffered = 0;
        }
    }

    /** True when every buffered point lies within the tolerance of the segment from the anchor to (x, y). */
    private boolean allNear(double x, double y) {
        double dx = x - anchorX;
        double dy = y - anchorY;
        double lengthSquared = dx * dx + dy * dy;
        for (int i = 0; i < buffered; i++) {
            double px = xs[i] - anchorX;
            double py = ys[i] - anchorY;
            double t = lengthSquared == 0 ? 0 : Math.max(0, Math.min(1, (px * dx + py * dy) / lengthSquared));
            double ex = px - t * dx;
            double ey = py - t * dy;
            if (ex * ex + ey * ey > toleranceSquared) {
                return false;
            }
        }
        return true;
    }
}
