package org.linesweep.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class UnitsTest {

    /** Exact conversions: international inch 25.4 mm (1959), foot 0.3048 m; 1 oz copper = 35 µm (common practice). */
    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "0.82 mm; 0.82e-3", "35 mil; 889e-6", "1 in; 0.0254", "2 ft; 0.6096", "12 um; 12e-6", "12 µm; 12e-6",
        "1.5 m; 1.5", "0.003; 0.003", "1.5e-3m; 1.5e-3", "3 cm; 0.03", "10 nm; 1e-8"})
    void lengths(String text, double metres) {
        assertEquals(metres, Units.parse("f", text, UnitKind.LENGTH), 1e-15 * Math.max(1, metres));
    }

    @Test
    void ouncesOnlyForThickness() {
        assertEquals(35e-6, Units.parse("line.thickness", "1 oz", UnitKind.THICKNESS), 1e-18);
        assertEquals(17.5e-6, Units.parse("line.thickness", "0.5 oz", UnitKind.THICKNESS), 1e-18);
        assertThrows(InvalidInputException.class, () -> Units.parse("line.width", "1 oz", UnitKind.LENGTH));
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
        "2.4 GHz; 2.4e9", "2.4GHz; 2.4e9", "10 kHz; 1e4", "10 khz; 1e4", "3 ghz; 3e9", "1 THz; 1e12", "1 thz; 1e12",
        "5 MHz; 5e6", "60 Hz; 60", "1e9; 1e9"})
    void frequencies(String text, double hertz) {
        assertEquals(hertz, Units.parseFrequency("f", text), 1e-6);
    }

    @Test
    void lowercaseMhzIsRefusedWithAHint() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Units.parseFrequency("sweep.to", "5 mhz"));
        assertTrue(e.getMessage().contains("MHz") && e.getMessage().contains("mHz"), e.getMessage());
        assertTrue(e.getMessage().startsWith("sweep.to"));
    }

    /** Found by the fuzz test: an unknown prefix on a thickness once threw instead of refusing. */
    @ParameterizedTest
    @ValueSource(strings = {"2 xm", "1 Qm", "3 ozz", "1 oz oz", "5 Hz"})
    void unknownThicknessUnitsAreRefused(String text) {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Units.parse("line.thickness", text, UnitKind.THICKNESS));
        assertTrue(e.getMessage().startsWith("line.thickness"), e.getMessage());
    }

    @Test
    void temperatures() {
        assertEquals(293.15, Units.parse("t", "20 degC", UnitKind.TEMPERATURE), 1e-12);
        assertEquals(293.15, Units.parse("t", "20 °C", UnitKind.TEMPERATURE), 1e-12);
        assertEquals(300, Units.parse("t", "300 K", UnitKind.TEMPERATURE), 1e-12);
        assertEquals(300, Units.parse("t", "300", UnitKind.TEMPERATURE), 1e-12);
    }

    @ParameterizedTest
    @ValueSource(strings = {"10 mmm", "5 GHz GHz", "1e999", "NaN", "-0", "", "  ", "abc", "1,5 mm", "Infinity",
        "0x10", "5 parsecs", "mm"})
    void rejectsNonsenseWithTheFieldAndAnExample(String text) {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Units.parse("line.width", text, UnitKind.LENGTH));
        assertTrue(e.getMessage().startsWith("line.width"), e.getMessage());
        assertTrue(e.getMessage().contains("mil") || e.getMessage().contains("negative"), e.getMessage());
    }

    @Test
    void rulesNameTheRange() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Rule.DIMENSION.parse("line.innerDiameter", "-1 mm"));
        assertEquals("line.innerDiameter: '-1 mm': a length greater than 0 and at most 10 m", e.getMessage());
        assertThrows(InvalidInputException.class, () -> Rule.FREQUENCY.parse("sweep.to", "20 THz"));
        assertThrows(InvalidInputException.class, () -> Rule.POINTS.check("sweep.points", 2.5));
        assertEquals(100_000, Rule.POINTS.check("sweep.points", 100_000));
    }

    @Test
    void engineeringNotation() {
        assertEquals("2.4 GHz", Units.engineering(2.4e9, "Hz", 3));
        assertEquals("820 µm", Units.engineering(0.82e-3, "m", 3));
        assertEquals("1.5 m", Units.engineering(1.5, "m", 3));
    }
}
