package org.linesweep.app;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.prefs.Preferences;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.io.Presets;

/** The JavaFX application: composes the model, a background sweep thread and the window. */
public final class ExplorerApplication extends Application {

    private ExecutorService worker;

    @Override
    public void start(Stage stage) {
        worker = Executors.newSingleThreadExecutor(r -> {
            Thread thread = new Thread(r, "linesweep-sweep");
            thread.setDaemon(true);
            return thread;
        });
        java.util.List<String> raw = getParameters().getRaw();
        org.linesweep.design.Design initial = Presets.load(Presets.DEFAULT);
        String problem = null;
        if (raw.size() >= 2 && "explore".equals(raw.get(0))) {
            try {
                initial = org.linesweep.io.DesignFiles.read(Path.of(raw.get(1)));
            } catch (org.linesweep.design.InvalidInputException e) {
                problem = "Could not open " + raw.get(1) + ": " + e.getMessage() + ". Showing the default design.";
            }
        }
        ExplorerModel model = new ExplorerModel(initial, worker, Platform::runLater);
        if (problem != null) {
            model.report(problem);
        }
        ExplorerWindow window = new ExplorerWindow(model, new ChooserDialogs(stage),
                Preferences.userNodeForPackage(ExplorerApplication.class));
        stage.setScene(new Scene(window.root(), 1440, 900));
        window.attach(stage);
        stage.show();
    }

    @Override
    public void stop() {
        if (worker != null) {
            worker.shutdownNow();
        }
    }

    /** File dialogs through the platform's chooser. */
    private record ChooserDialogs(Stage owner) implements FileDialogs {
        @Override
        public Optional<Path> open(String title, String extension) {
            FileChooser chooser = chooser(title, extension);
            return Optional.ofNullable(chooser.showOpenDialog(owner)).map(java.io.File::toPath);
        }

        @Override
        public Optional<Path> save(String title, String extension, String suggestedName) {
            FileChooser chooser = chooser(title, extension);
            chooser.setInitialFileName(suggestedName);
            return Optional.ofNullable(chooser.showSaveDialog(owner)).map(java.io.File::toPath);
        }

        private static FileChooser chooser(String title, String extension) {
            FileChooser chooser = new FileChooser();
            chooser.setTitle(title);
            chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter(extension.toUpperCase() + " files",
                    "*." + extension));
            return chooser;
        }
    }
}
