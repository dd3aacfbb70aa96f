package org.linesweep.io;

import java.nio.file.Path;
import org.linesweep.design.Design;

/** A child process for {@link KillDuringSaveTest}: saves a large design file over and over until killed. */
public final class SaveLoop {

    private SaveLoop() {
    }

    public static void main(String[] args) throws Exception {
        Path target = Path.of(args[0]);
        Design base = Presets.load("bench-patch-lead");
        String padding = "x".repeat(400_000);
        System.out.println("ready");
        System.out.flush();
        for (int i = 1; ; i++) {
            Design version = new Design("version " + i, padding, base.geometry(), base.conductor(), base.dielectric(),
                    base.lengthMetres(), base.temperatureKelvin(), base.sweep(), base.threshold(), base.lossBudgetDb());
            DesignFiles.write(version, target);
        }
    }
}
