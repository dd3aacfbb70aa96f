package org.linesweep.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.linesweep.io.AtomicFiles;

/** Sends a command's result to standard output or, atomically, to a file. */
final class Output {

    private Output() {
    }

    static void deliver(Path file, PrintWriter standardOut, AtomicFiles.Content content) {
        try {
            if (file == null) {
                ByteArrayOutputStream buffer = new ByteArrayOutputStream();
                content.writeTo(buffer);
                standardOut.write(buffer.toString(StandardCharsets.UTF_8));
                standardOut.flush();
                if (standardOut.checkError()) {
                    throw new IOException("standard output is closed");
                }
            } else {
                AtomicFiles.write(file, content);
            }
        } catch (IOException | RuntimeException e) {
            String target = file == null ? "standard output" : file.toString();
            String reason;
            if (e instanceof java.nio.file.NoSuchFileException) {
                reason = "the folder does not exist";
            } else if (e instanceof java.nio.file.AccessDeniedException) {
                reason = "permission denied";
            } else {
                reason = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            }
            throw new OutputFailedException("cannot write " + target + ": " + reason, e);
        }
    }
}
