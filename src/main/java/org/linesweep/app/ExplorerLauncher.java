package org.linesweep.app;

import javafx.application.Application;

/** Starts the JavaFX explorer; separate from the Application class so the jar runs from the class path. */
public final class ExplorerLauncher {

    private ExplorerLauncher() {
    }

    public static void launch(String[] args) {
        configureRendering();
        Application.launch(ExplorerApplication.class, args);
    }

    /**
     * Rendering settings, applied before JavaFX starts (it reads them once). JavaFX caches a region's
     * background (panel fills, frames, control shapes) as an image and draws it stretched; in the software
     * pipeline (no usable GPU: many virtual machines, remote desktops, screen-sharing sessions) drawing that
     * image costs far more than filling the rectangle, and it is drawn under every changed area, so it took
     * over half the time to paint a frame of a drag. Drawing backgrounds directly halved that paint time
     * (docs/performance.md). A value given on the command line wins.
     */
    public static void configureRendering() {
        if (System.getProperty("prism.disableRegionCaching") == null) {
            System.setProperty("prism.disableRegionCaching", "true");
        }
    }
}
