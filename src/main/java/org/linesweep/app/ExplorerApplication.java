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
import org.linesweep.io.SessionFiles;

/** The JavaFX application: composes the model, a background sweep thread and the window. */
public final class ExplorerApplication extends Application {

    private ExecutorService worker;
    private Autosave autosave;

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
        ExplorerModel model = ExplorerLauncher.newModel(initial, worker);
        if (problem != null) {
            model.report(problem);
        }
        ExplorerWindow window = new ExplorerWindow(model, new ChooserDialogs(stage),
                Preferences.userNodeForPackage(ExplorerApplication.class));
        Path autosaveFile = SessionFiles.defaultFolder().resolve("autosave.json");
        Optional<SessionFiles.Session> leftOver = Autosave.leftOver(autosaveFile, model::report);
        leftOver.ifPresent(session -> offerRestore(model, session));
        autosave = new Autosave(model, autosaveFile, model::report);
        Scene scene = new Scene(window.root(), 1440, 900);
        stage.setScene(scene);
        window.attach(stage);
        if (Boolean.getBoolean("linesweep.reportStartup")) {
            reportFirstCurves(scene, window);
        }
        stage.show();
    }

    /**
     * For the start-up measurement: prints the time from the JVM's start to the end of the first pulse whose
     * layout drew curves on all four plots, then exits.
     */
    private static void reportFirstCurves(Scene scene, ExplorerWindow window) {
        Runnable[] listener = new Runnable[1];
        listener[0] = () -> {
            boolean drawn = window.plots().plots().stream().allMatch(p -> !p.getSeries().isEmpty() && p.drawCount() > 0);
            if (drawn) {
                long startedMillis = java.lang.management.ManagementFactory.getRuntimeMXBean().getStartTime();
                System.out.println("STARTUP first_curves_ms=" + (System.currentTimeMillis() - startedMillis));
                scene.removePostLayoutPulseListener(listener[0]);
                Platform.runLater(Platform::exit);
            }
        };
        scene.addPostLayoutPulseListener(listener[0]);
    }

    /** After a crash or kill: asks whether to bring back the last session's design and pins. */
    private static void offerRestore(ExplorerModel model, SessionFiles.Session session) {
        javafx.scene.control.ButtonType restore = new javafx.scene.control.ButtonType("Restore");
        javafx.scene.control.ButtonType discard = new javafx.scene.control.ButtonType("Start fresh");
        javafx.scene.control.Alert ask = new javafx.scene.control.Alert(javafx.scene.control.Alert.AlertType.CONFIRMATION,
                "LineSweep did not close cleanly last time. Restore its design \"" + session.live().name() + "\""
                        + (session.pins().isEmpty() ? "" : " and " + session.pins().size() + " pinned design(s)") + "?",
                restore, discard);
        ask.setHeaderText("Restore the last session?");
        if (ask.showAndWait().orElse(discard) == restore) {
            model.open(session.live());
            session.pins().forEach(model::pinDesign);
        }
    }

    @Override
    public void stop() {
        if (autosave != null) {
            autosave.discard();
        }
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
