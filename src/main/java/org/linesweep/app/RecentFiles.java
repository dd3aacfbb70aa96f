package org.linesweep.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;

/** The most recently opened or saved design files, kept in the user's preferences. */
final class RecentFiles {

    private static final int LIMIT = 8;
    private static final String KEY = "recentDesignFiles";
    private final Preferences preferences;

    RecentFiles(Preferences preferences) {
        this.preferences = preferences;
    }

    List<Path> list() {
        List<Path> paths = new ArrayList<>();
        for (String line : preferences.get(KEY, "").split("\n")) {
            if (!line.isBlank()) {
                paths.add(Path.of(line));
            }
        }
        return paths;
    }

    void add(Path path) {
        List<Path> paths = list();
        Path absolute = path.toAbsolutePath();
        paths.remove(absolute);
        paths.add(0, absolute);
        while (paths.size() > LIMIT) {
            paths.remove(paths.size() - 1);
        }
        StringBuilder text = new StringBuilder();
        for (Path p : paths) {
            text.append(p).append('\n');
        }
        preferences.put(KEY, text.toString());
    }
}
