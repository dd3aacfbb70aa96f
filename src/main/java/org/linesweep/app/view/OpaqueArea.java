package org.linesweep.app.view;

import javafx.geometry.Insets;
import javafx.scene.layout.Background;
import javafx.scene.layout.BackgroundFill;
import javafx.scene.layout.CornerRadii;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;

/**
 * Lets a region that paints every pixel of an area itself (a canvas filled edge to edge) say so. JavaFX then
 * starts a repaint of a dirty area inside it at that region, instead of at the panels behind, whose
 * backgrounds the software renderer would otherwise fill under it unseen at every step of a drag. JavaFX reads
 * declared opaque insets only from a region with a background, so the region is given one fill of no height,
 * which is never painted. The claim must be true: a test should show no pixel behind the area coming through.
 */
final class OpaqueArea {

    private static final Background UNPAINTED = new Background(new BackgroundFill(Color.TRANSPARENT,
            CornerRadii.EMPTY, new Insets(0, 0, Double.MAX_VALUE, 0)));

    private OpaqueArea() {
    }

    /** Declares the region opaque inside the given insets, or withdraws the claim for null. */
    static void declare(Region region, Insets opaqueInsets) {
        if (region.getBackground() != UNPAINTED) {
            region.setBackground(UNPAINTED);
        }
        if (opaqueInsets == null ? region.getOpaqueInsets() != null : !opaqueInsets.equals(region.getOpaqueInsets())) {
            region.setOpaqueInsets(opaqueInsets);
        }
    }
}
