package org.linesweep.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.linesweep.design.Design;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineType;

/** One fixture per design-file format version; every later LineSweep must read each of them the same way. */
class FormatFixturesTest {

    private static String fixture(String name) throws IOException {
        try (InputStream in = FormatFixturesTest.class.getResourceAsStream("/fixtures/" + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void formatOneReadsEveryField() throws IOException {
        Design d = DesignFiles.parse(fixture("design-format-1.json"));
        assertEquals(LineType.STRIPLINE, d.geometry().type());
        assertEquals(8 * 25.4e-6, d.geometry().value("width"), 1e-15);
        assertEquals(17.5e-6, d.geometry().value("thickness"), 1e-15, "0.5 oz at 35 µm per ounce");
        assertEquals(5e7, d.conductor().conductivitySiemensPerMetre(), 1e-3);
        assertEquals(0.7e-6, d.conductor().roughnessRmsMetres(), 1e-15);
        assertEquals(DielectricModelKind.WIDEBAND_DEBYE, d.dielectric().model());
        assertEquals(2e9, d.dielectric().referenceFrequencyHz());
        assertEquals(9 * 0.0254, d.lengthMetres(), 1e-15);
        assertEquals(318.15, d.temperatureKelvin(), 1e-9);
        assertEquals(801, d.sweep().points());
        assertEquals(0.05, d.threshold());
        assertEquals(2.0, d.lossBudgetDb());
        assertEquals(d, DesignFiles.parse(DesignFiles.toJson(d)), "what we write reads back the same");
    }
}
