package org.linesweep.app;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.prefs.Preferences;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.SweepSnapshot;
import org.linesweep.design.Design;
import org.linesweep.io.Presets;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real explorer window on a stage, headless, for the window tests: a worker thread for the sweeps, file
 * dialogs that answer with a path the test chose, and a guard that fails the test on any exception nobody
 * caught, on any thread (throwing from the handler would kill the FX thread instead).
 */
@ExtendWith(ApplicationExtension.class)
abstract class WindowTestBase {

    @TempDir
    Path folder;

    ExecutorService worker;
    ExplorerModel model;
    ExplorerWindow window;
    final StubDialogs dialogs = new StubDialogs();
    private final List<Throwable> uncaught = new CopyOnWriteArrayList<>();

    /** File dialogs that answer with a path chosen by the test. */
    static final class StubDialogs implements FileDialogs {
        Path next;

        @Override
        public Optional<Path> open(String title, String extension) {
            return Optional.ofNullable(next);
        }

        @Override
        public Optional<Path> save(String title, String extension, String suggestedName) {
            return Optional.ofNullable(next);
        }
    }

    /** The design the window opens on. */
    Design initialDesign() {
        return Presets.load("bench-patch-lead");
    }

    /** Opens the window; each test class calls it from its own {@code @Start} method (TestFX finds only those). */
    void open(Stage stage) {
        Thread.setDefaultUncaughtExceptionHandler((t, e) -> uncaught.add(e));
        Thread.currentThread().setUncaughtExceptionHandler((t, e) -> uncaught.add(e));
        worker = Executors.newSingleThreadExecutor();
        model = ExplorerLauncher.newModel(initialDesign(), worker);
        window = new ExplorerWindow(model, dialogs, Preferences.userRoot().node("org/linesweep/test-" + System.nanoTime()));
        stage.setScene(new Scene(window.root(), 1400, 900));
        window.attach(stage);
        stage.show();
    }

    @AfterEach
    void stop() {
        worker.shutdownNow();
        if (!uncaught.isEmpty()) {
            AssertionError failure = new AssertionError("uncaught exception: " + uncaught.get(0), uncaught.get(0));
            uncaught.clear();
            throw failure;
        }
    }

    /** Waits until the computation has caught up with the design. */
    void settle() throws TimeoutException {
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> {
            SweepSnapshot s = model.snapshotProperty().get();
            return s != null && s.design().equals(model.getDesign());
        });
        WaitForAsyncUtils.waitForFxEvents();
        // the read-out refreshes at most ten times a second: wait for its last refresh
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> window.readout().isCurrent());
        WaitForAsyncUtils.waitForFxEvents();
    }
}
