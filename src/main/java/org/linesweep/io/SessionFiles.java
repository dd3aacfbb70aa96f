package org.linesweep.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;

/**
 * The explorer's autosave: the live design and the pinned designs, in one JSON file with a format version,
 * written atomically. A corrupt or newer autosave is reported, never half-read and never overwritten
 * before the user has decided.
 */
public final class SessionFiles {

    /** Current autosave format. */
    public static final int FORMAT_VERSION = 1;

    /** What an autosave holds. */
    public record Session(Design live, List<Design> pins) {
        public Session {
            pins = List.copyOf(pins);
        }
    }

    private SessionFiles() {
    }

    /** The folder for LineSweep's own files: $XDG_CONFIG_HOME/linesweep, or ~/.config/linesweep. */
    public static Path defaultFolder() {
        String xdg = System.getenv("XDG_CONFIG_HOME");
        Path base = xdg != null && !xdg.isBlank() ? Path.of(xdg) : Path.of(System.getProperty("user.home"), ".config");
        return base.resolve("linesweep");
    }

    /** Writes a session atomically, creating the folder if needed. */
    public static void write(Session session, Path file) throws IOException {
        Files.createDirectories(file.toAbsolutePath().getParent());
        ObjectNode root = DesignFiles.mapper().createObjectNode();
        root.put("sessionFormatVersion", FORMAT_VERSION);
        root.set("live", DesignFiles.toTree(session.live()));
        ArrayNode pins = root.putArray("pins");
        for (Design pin : session.pins()) {
            pins.add(DesignFiles.toTree(pin));
        }
        AtomicFiles.write(file, (DesignFiles.mapper().writeValueAsString(root) + "\n").getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Reads a session.
     *
     * @throws InvalidInputException if the file cannot be read or is not a valid session
     */
    public static Session read(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new InvalidInputException("autosave", file.toString(), "cannot be read (" + e.getMessage() + ")");
        }
        JsonNode root;
        try {
            root = DesignFiles.mapper().readTree(text);
        } catch (IOException e) {
            throw new InvalidInputException("autosave", file.toString(), "is not valid JSON");
        }
        if (root == null || !root.isObject() || !root.has("live")) {
            throw new InvalidInputException("autosave", file.toString(), "is not a LineSweep autosave");
        }
        int version = root.path("sessionFormatVersion").asInt(-1);
        if (version > FORMAT_VERSION || version < 1) {
            throw new InvalidInputException("autosave.sessionFormatVersion", String.valueOf(version),
                    "this LineSweep reads autosave format 1");
        }
        Design live = DesignFiles.parse(root.get("live").toString());
        List<Design> pins = new ArrayList<>();
        for (JsonNode pin : root.path("pins")) {
            pins.add(DesignFiles.parse(pin.toString()));
        }
        return new Session(live, pins);
    }
}
