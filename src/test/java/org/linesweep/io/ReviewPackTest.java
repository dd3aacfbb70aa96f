package org.linesweep.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.linesweep.design.Design;
import org.linesweep.signal.WaveformSettings;

/** The review pack written without a window: every part present, consistent with the core, and safe HTML. */
class ReviewPackTest {

    private static ReviewPack.Entry entry(String label, Design design) {
        return ReviewPack.Entry.compute(label, design);
    }

    @Test
    void writesEveryPart(@TempDir Path folder) throws IOException {
        Design live = Presets.load("board-trace-50-ohm");
        Design pair = live.withGeometryValue("gap", 0.2e-3);
        Design hostile = Presets.load("bench-patch-lead");
        hostile = new Design("<script>alert(1)</script> & co", hostile.description(), hostile.geometry(),
                hostile.conductor(), hostile.dielectric(), hostile.lengthMetres(), hostile.temperatureKelvin(),
                hostile.sweep(), hostile.threshold(), hostile.lossBudgetDb());
        WaveformSettings settings = WaveformSettings.DEFAULT;
        ReviewPack.TimeDomainPart timeDomain = new ReviewPack.TimeDomainPart(settings,
                settings.simulate(live.toModel(), live.lengthMetres()));
        Path html = folder.resolve("Trace Review.HTML");
        List<Path> files = ReviewPack.write(html, entry("live", live),
                List.of(entry("pair", pair), entry(hostile.name(), hostile)), new byte[] {(byte) 0x89, 'P', 'N', 'G'},
                timeDomain, 50);
        assertEquals(html, files.get(0));
        for (Path file : files) {
            assertTrue(Files.size(file) > 0, file.toString());
        }
        for (String name : List.of("Trace Review-plots.png", "Trace Review-limits.csv", "Trace Review-parameters.csv",
                "Trace Review-sweep.csv", "Trace Review.s2p", "Trace Review-pin1-sweep.csv", "Trace Review-pin2.s2p",
                "Trace Review-design.json", "Trace Review-waveform.csv")) {
            assertTrue(Files.exists(folder.resolve(name)), name);
        }
        String page = Files.readString(html);
        assertFalse(page.contains("<script>"), "names are escaped");
        assertTrue(page.contains("&lt;script&gt;alert(1)&lt;/script&gt; &amp; co"));
        // the ceiling sentence states the core's number
        String ceiling = org.linesweep.design.Units.engineering(entry("live", live).limits().ceilingHz(), "Hz", 4);
        assertTrue(page.contains("Frequency ceiling " + ceiling), ceiling);
        // the models of every design in the pack: the live microstrip, the pinned pair, the pinned coax
        assertTrue(page.contains("Hammerstad-Jensen") && page.contains("Kirschning-Jansen 1984")
                && page.contains("Coax: F = 2π/ln(b/a)"), "models used");
        assertTrue(page.contains("licensed"));
        List<String> limits = Files.readAllLines(folder.resolve("Trace Review-limits.csv"));
        assertEquals(4, limits.size());
        assertTrue(limits.get(3).startsWith("<script>alert(1)</script> & co,"), limits.get(3));
        List<String> parameters = Files.readAllLines(folder.resolve("Trace Review-parameters.csv"));
        int gapRow = -1;
        int lengthRow = -1;
        for (int i = 0; i < parameters.size(); i++) {
            if (parameters.get(i).startsWith("Gap to twin strip")) {
                gapRow = i;
            }
            if (parameters.get(i).startsWith("length,")) {
                lengthRow = i;
            }
        }
        assertTrue(gapRow > 0 && gapRow < lengthRow, "the pin's gap sits with the geometry rows");
        String sweepHeader = Files.readAllLines(folder.resolve("Trace Review-pin1-sweep.csv")).get(0);
        assertTrue(sweepHeader.endsWith("z_diff_ohm,z_common_ohm,eps_eff_odd,eps_eff_even"), sweepHeader);
        assertEquals(live.sweep().points(), Touchstone.read(folder.resolve("Trace Review.s2p")).size());
    }
}
