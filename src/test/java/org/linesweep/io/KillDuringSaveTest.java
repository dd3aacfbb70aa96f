package org.linesweep.io;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linesweep.design.Design;

/**
 * A real kill during a save: a child JVM saves a large design file in a loop and is killed with SIGKILL at
 * a random moment; the file on disk must always be one complete version, old or new, never half of one.
 */
class KillDuringSaveTest {

    private static final int KILLS = 6;

    @Test
    void aKilledSaveLeavesACompleteFile(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("design.json");
        DesignFiles.write(Presets.load("bench-patch-lead"), target);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Random random = new Random(20261201);
        for (int kill = 0; kill < KILLS; kill++) {
            Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                    SaveLoop.class.getName(), target.toString()).redirectErrorStream(true).start();
            BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8));
            assertTrue("ready".equals(out.readLine()), "the child started");
            Thread.sleep(50 + random.nextInt(400));
            child.destroyForcibly();
            assertTrue(child.waitFor(10, TimeUnit.SECONDS));
            Design survivor = DesignFiles.read(target);
            assertTrue(survivor.name().equals("Bench patch lead") || survivor.name().startsWith("version "),
                    "a complete design survived: " + survivor.name());
        }
        try (var files = Files.list(dir)) {
            // a killed writer may leave its temporary file; the design file itself is always whole
            assertTrue(files.anyMatch(target::equals));
        }
    }
}
