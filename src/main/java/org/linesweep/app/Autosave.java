package org.linesweep.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Consumer;
import javafx.animation.PauseTransition;
import javafx.collections.ListChangeListener;
import javafx.util.Duration;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.Pin;
import org.linesweep.design.InvalidInputException;
import org.linesweep.io.SessionFiles;

/**
 * Saves the live design and the pins a moment after each change, so a crash or a kill loses nothing. The
 * file is removed on a clean exit; finding it at start-up means the last session did not end cleanly, and
 * the explorer offers to restore it.
 */
public final class Autosave {

    /** How long after the last change the session is written. */
    public static final Duration DELAY = Duration.millis(800);

    private final ExplorerModel model;
    private final Path file;
    private final PauseTransition debounce = new PauseTransition(DELAY);
    private final Consumer<String> problems;
    private int writes;

    public Autosave(ExplorerModel model, Path file, Consumer<String> problems) {
        this.model = model;
        this.file = file;
        this.problems = problems;
        debounce.setOnFinished(e -> writeNow());
        model.designProperty().addListener((o, old, now) -> debounce.playFromStart());
        model.pins().addListener((ListChangeListener<Pin>) c -> debounce.playFromStart());
    }

    /** The autosave left by an earlier session that did not end cleanly, if any and if readable. */
    public static Optional<SessionFiles.Session> leftOver(Path file, Consumer<String> problems) {
        if (!Files.exists(file)) {
            return Optional.empty();
        }
        try {
            return Optional.of(SessionFiles.read(file));
        } catch (InvalidInputException e) {
            problems.accept("An earlier session's autosave could not be restored (" + e.getMessage()
                    + "); it is left at " + file + ".");
            return Optional.empty();
        }
    }

    /** Writes the session now. */
    public void writeNow() {
        debounce.stop();
        try {
            SessionFiles.write(new SessionFiles.Session(model.getDesign(),
                    model.pins().stream().map(p -> p.snapshot().design()).toList()), file);
            writes++;
        } catch (IOException | RuntimeException e) {
            problems.accept("Autosave to " + file + " failed: " + e.getMessage());
        }
    }

    /** A clean exit: the autosave is no longer needed. */
    public void discard() {
        debounce.stop();
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            problems.accept("Could not remove the autosave " + file + ": " + e.getMessage());
        }
    }

    /** How many times the session has been written (for tests). */
    public int writes() {
        return writes;
    }

    public Path file() {
        return file;
    }
}
