package org.linesweep.app;

import javafx.application.Application;

/** Starts the JavaFX explorer; separate from the Application class so the jar runs from the class path. */
public final class ExplorerLauncher {

    private ExplorerLauncher() {
    }

    public static void launch(String[] args) {
        Application.launch(ExplorerApplication.class, args);
    }
}
