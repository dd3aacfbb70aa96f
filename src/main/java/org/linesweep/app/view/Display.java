package org.linesweep.app.view;

import java.util.Locale;
import org.linesweep.app.model.UnitSystem;
import org.linesweep.design.Units;
import org.linesweep.physics.PhysicalConstants;

/** How numbers are written in the window, in the chosen unit system. */
public final class Display {

    private static final double MIL = 25.4e-6;
    private static final double INCH = 25.4e-3;

    private Display() {
    }

    /** A length for a text field: mm or µm (metric), mil or in (imperial). */
    public static String length(double metres, UnitSystem system) {
        if (system == UnitSystem.IMPERIAL) {
            return metres >= INCH ? number(metres / INCH) + " in" : number(metres / MIL) + " mil";
        }
        if (metres >= 1) {
            return number(metres) + " m";
        }
        return metres >= 0.1e-3 ? number(metres * 1e3) + " mm" : number(metres * 1e6) + " µm";
    }

    /** A line length: m (metric), ft or in (imperial). */
    public static String lineLength(double metres, UnitSystem system) {
        if (system == UnitSystem.IMPERIAL) {
            return metres >= 0.3048 ? number(metres / 0.3048) + " ft" : number(metres / INCH) + " in";
        }
        return metres >= 1 ? number(metres) + " m" : number(metres * 1e3) + " mm";
    }

    public static String frequency(double hertz) {
        return Units.engineering(hertz, "Hz", 4);
    }

    public static String celsius(double kelvin) {
        return number(kelvin - PhysicalConstants.ZERO_CELSIUS_KELVIN) + " degC";
    }

    /** Up to 4 significant digits, no exponent for everyday magnitudes. */
    public static String number(double value) {
        if (value == 0) {
            return "0";
        }
        double magnitude = Math.abs(value);
        String text = magnitude >= 1e-3 && magnitude < 1e6
                ? String.format(Locale.ROOT, "%.4g", value) : String.format(Locale.ROOT, "%.4e", value);
        if (text.contains("e")) {
            String[] parts = text.split("e");
            return stripZeros(parts[0]) + "e" + Integer.parseInt(parts[1]);
        }
        return stripZeros(text);
    }

    /**
     * Drops a decimal number's trailing zeros after its point, and then the point if nothing follows it
     * ("1.500" → "1.5", "2.000" → "2"); text without a point is returned as it is. Written out rather than with
     * regular expressions: read-outs and axis labels call it dozens of times a frame during a drag.
     */
    static String stripZeros(String text) {
        if (text.indexOf('.') < 0) {
            return text;
        }
        int end = text.length();
        while (end > 0 && text.charAt(end - 1) == '0') {
            end--;
        }
        if (end > 0 && text.charAt(end - 1) == '.') {
            end--;
        }
        return text.substring(0, end);
    }

    /** Attenuation unit label and factor from dB/m. */
    public record AttenuationUnit(String label, double perDbPerMetre, boolean wholeLine) {
    }

    public static final AttenuationUnit DB_PER_METRE = new AttenuationUnit("dB/m", 1, false);
    public static final AttenuationUnit DB_PER_100_FT = new AttenuationUnit("dB/100 ft", 30.48, false);
    public static final AttenuationUnit DB_PER_INCH = new AttenuationUnit("dB/in", 0.0254, false);
    public static final AttenuationUnit DB_WHOLE_LINE = new AttenuationUnit("dB (whole line)", 1, true);
}
