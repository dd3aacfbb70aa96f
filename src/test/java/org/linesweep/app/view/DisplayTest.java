package org.linesweep.app.view;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** How numbers are written in read-outs and on axes: four significant digits, no trailing zeros. */
class DisplayTest {

    @Test
    void trailingZerosAndPointAreDropped() {
        assertEquals("1.5", Display.stripZeros("1.500"));
        assertEquals("2", Display.stripZeros("2.000"));
        assertEquals("0", Display.stripZeros("0.000"));
        assertEquals("100", Display.stripZeros("100"));
        assertEquals("0.0105", Display.stripZeros("0.01050"));
    }

    @Test
    void numbersKeepFourSignificantDigits() {
        assertEquals("50", Display.number(50.0));
        assertEquals("49.87", Display.number(49.8712));
        assertEquals("1.235e4", Display.number(12345.6));
        assertEquals("2.5e-5", Display.number(2.5e-5));
        assertEquals("-0.1", Display.number(-0.1));
        assertEquals("0", Display.number(0));
    }

    @Test
    void axisLabelsUseEngineeringPrefixes() {
        assertEquals("1.5", AxisTicks.engineering(1.5, ""));
        assertEquals("20 GHz", AxisTicks.engineering(20e9, "Hz"));
        assertEquals("100 kHz", AxisTicks.engineering(1e5, "Hz"));
    }
}
