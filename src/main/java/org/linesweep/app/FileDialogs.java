package org.linesweep.app;

import java.nio.file.Path;
import java.util.Optional;

/** Where the window asks the user for a file: a real chooser in the app, a stub in tests. */
public interface FileDialogs {

    /** Asks for an existing file to open. */
    Optional<Path> open(String title, String extension);

    /** Asks for a file to write. */
    Optional<Path> save(String title, String extension, String suggestedName);
}
