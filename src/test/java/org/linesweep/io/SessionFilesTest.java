package org.linesweep.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linesweep.design.InvalidInputException;

class SessionFilesTest {

    @Test
    void sessionRoundTrips(@TempDir Path dir) throws IOException {
        var session = new SessionFiles.Session(Presets.load("bench-patch-lead"),
                List.of(Presets.load("board-trace-50-ohm"), Presets.load("ladder-line-feeder")));
        Path file = dir.resolve("nested/autosave.json");
        SessionFiles.write(session, file);
        assertEquals(session, SessionFiles.read(file));
    }

    @Test
    void corruptOrNewerAutosavesAreRefusedAndLeftAlone(@TempDir Path dir) throws IOException {
        Path corrupt = dir.resolve("corrupt.json");
        Files.writeString(corrupt, "{ \"live\": { \"line\": ");
        assertThrows(InvalidInputException.class, () -> SessionFiles.read(corrupt));
        assertEquals("{ \"live\": { \"line\": ", Files.readString(corrupt));
        Path newer = dir.resolve("newer.json");
        Files.writeString(newer, "{ \"sessionFormatVersion\": 9, \"live\": {} }");
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> SessionFiles.read(newer));
        assertTrue(e.getMessage().contains("format"), e.getMessage());
    }
}
