package org.linesweep.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.io.Presets;
import org.linesweep.io.SessionFiles;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The autosave writes the live design and pins shortly after a change, restores them, and goes on clean exit. */
@ExtendWith(ApplicationExtension.class)
class AutosaveTest {

    private static final Executor NOW = Runnable::run;

    @TempDir
    Path folder;

    @Start
    void start(Stage stage) {
        stage.show();
    }

    @Test
    void savesRestoresAndDiscards(FxRobot robot) throws Exception {
        Path file = folder.resolve("config/autosave.json");
        List<String> problems = new ArrayList<>();
        ExplorerModel model = new ExplorerModel(Presets.load("bench-patch-lead"), NOW, NOW);
        Autosave[] autosave = new Autosave[1];
        robot.interact(() -> autosave[0] = new Autosave(model, file, problems::add));
        robot.interact(() -> {
            model.pinCurrent();
            model.apply(d -> d.withLength(3.0));
        });
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> Files.exists(file));
        SessionFiles.Session saved = SessionFiles.read(file);
        assertEquals(3.0, saved.live().lengthMetres());
        assertEquals(1, saved.pins().size());

        // a later start finds the left-over session and restores it into a fresh model
        var leftOver = Autosave.leftOver(file, problems::add);
        assertTrue(leftOver.isPresent());
        ExplorerModel restored = new ExplorerModel(Presets.load("board-trace-50-ohm"), NOW, NOW);
        robot.interact(() -> {
            restored.open(leftOver.get().live());
            leftOver.get().pins().forEach(restored::pinDesign);
        });
        assertEquals(model.getDesign(), restored.getDesign());
        assertEquals(1, restored.pins().size());

        robot.interact(() -> autosave[0].discard());
        assertFalse(Files.exists(file), "a clean exit removes the autosave");
        assertTrue(problems.isEmpty(), problems.toString());
    }

    @Test
    void aCorruptLeftOverIsReportedAndKept(FxRobot robot) throws Exception {
        Path file = folder.resolve("autosave.json");
        Files.writeString(file, "{ broken");
        List<String> problems = new ArrayList<>();
        assertTrue(Autosave.leftOver(file, problems::add).isEmpty());
        assertEquals(1, problems.size());
        assertEquals("{ broken", Files.readString(file));
    }
}
