package org.linesweep.app;

import java.util.concurrent.Executor;
import javafx.application.Application;
import javafx.application.Platform;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.design.Design;

/**
 * Starts the JavaFX explorer, and sets up what the window and the latency harness share; separate from the
 * Application class so the jar runs from the class path.
 */
public final class ExplorerLauncher {

    private ExplorerLauncher() {
    }

    public static void launch(String[] args) {
        configureRendering();
        Application.launch(ExplorerApplication.class, args);
    }

    /**
     * The explorer's model as the window uses it: results delivered on the FX thread, and a change made there
     * computed in place when cheap (within {@link ExplorerModel#INLINE_BUDGET_NANOS}).
     *
     * @param worker where the other sweeps are computed (a background thread)
     */
    public static ExplorerModel newModel(Design initial, Executor worker) {
        return new ExplorerModel(initial, worker, Platform::runLater, Platform::isFxApplicationThread,
                ExplorerModel.INLINE_BUDGET_NANOS);
    }

    /**
     * Rendering settings, applied before JavaFX starts (it reads them once). JavaFX caches a region's
     * background (panel fills, frames, control shapes) as an image and draws it stretched; in the software
     * pipeline (no usable GPU: many virtual machines, remote desktops, screen-sharing sessions) drawing that
     * image costs far more than filling the rectangle, and it is drawn under every changed area, so it took
     * over half the time to paint a frame of a drag. Drawing backgrounds directly halved that paint time.
     *
     * <p>JavaFX repaints a frame's changed areas as at most six rectangles by default, merging the closest when
     * there are more. A drag step changes seven to ten (four plot areas, the slider, its field, the
     * cross-section, the read-out), so a plot area was merged with a piece of the design panel into one
     * rectangle that only the window itself covers, and everything under it was painted. With up to fifteen
     * (JavaFX's maximum) each plot area is painted from its own frame, and the window's and the design panel's
     * backgrounds are not painted again under the plots (docs/performance.md has the measurements). A value
     * given on the command line wins.
     */
    public static void configureRendering() {
        setUnlessGiven("prism.disableRegionCaching", "true");
        setUnlessGiven("prism.dirtyregioncount", "15");
    }

    private static void setUnlessGiven(String key, String value) {
        if (System.getProperty(key) == null) {
            System.setProperty(key, value);
        }
    }
}
