package org.linesweep.app.view;

import static org.junit.jupiter.api.Assertions.assertEquals;

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
import org.linesweep.design.Geometry;
import org.linesweep.physics.LineType;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The cross-section drawing, in a view wider than it: what it declares opaque it must cover. */
@ExtendWith(ApplicationExtension.class)
class CrossSectionViewTest {

    private CrossSectionView view;

    @Start
    void start(Stage stage) {
        view = new CrossSectionView();
        view.setPrefSize(355, 150);
        StackPane behind = new StackPane(view);
        behind.setBackground(new Background(new BackgroundFill(Color.MAGENTA, null, null)));
        stage.setScene(new Scene(behind, 355, 150));
        stage.show();
    }

    /**
     * The drawing sits centred on whole pixels, the opaque insets frame exactly it, and no pixel inside them shows
     * the magenta pane behind; outside them the pane shows through (the view draws nothing there).
     */
    @Test
    void opaqueAreaIsExactlyTheDrawing(FxRobot robot) {
        robot.interact(() -> view.show(Geometry.of(LineType.COAX, 0.9e-3, 2.95e-3, 0.25e-3)));
        WaitForAsyncUtils.waitForFxEvents();
        Insets opaque = view.getOpaqueInsets();
        assertEquals(260, view.getWidth() - opaque.getLeft() - opaque.getRight(), 1e-9);
        assertEquals(Math.floor(opaque.getLeft()), opaque.getLeft(), 0.0, "on a whole pixel");
        WritableImage[] image = new WritableImage[1];
        robot.interact(() -> image[0] = view.getScene().snapshot(null));
        PixelReader reader = image[0].getPixelReader();
        Point2D origin = view.localToScene(0, 0);
        int insideShowingThrough = 0;
        int outsideShowingThrough = 0;
        for (int x = 0; x < (int) view.getWidth(); x++) {
            for (int y = 0; y < (int) view.getHeight(); y++) {
                boolean magenta = reader.getColor((int) origin.getX() + x, (int) origin.getY() + y)
                        .equals(Color.MAGENTA);
                boolean inside = x >= opaque.getLeft() && x < view.getWidth() - opaque.getRight()
                        && y >= opaque.getTop() && y < view.getHeight() - opaque.getBottom();
                if (magenta && inside) {
                    insideShowingThrough++;
                } else if (magenta) {
                    outsideShowingThrough++;
                }
            }
        }
        assertEquals(0, insideShowingThrough);
        assertEquals((int) (view.getWidth() - 260) * 150, outsideShowingThrough, "the margins are the pane's");
    }
}
