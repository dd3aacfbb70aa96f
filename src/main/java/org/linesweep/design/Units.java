package org.linesweep.design;

import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Parses quantities written with units: "0.82 mm", "35 mil", "2.4GHz", "20 degC", "1 oz". SI prefixes are
 * case-sensitive (m is milli, M is mega); the lowercase spellings khz, ghz and thz are accepted, "mhz" is
 * refused because it could mean millihertz or megahertz. A bare number is in SI base units.
 *
 * <p>Conversions: 1 mil = 25.4 µm, 1 in = 25.4 mm, 1 ft = 0.3048 m (exact, international inch);
 * 1 oz of copper = 35 µm (common practice; some makers use 1.37 mil = 34.8 µm).
 */
public final class Units {

    /** Thickness of one ounce (per square foot) of copper foil, m: 35 µm, common practice. */
    public static final double OUNCE_COPPER_METRES = 35e-6;

    private static final Pattern QUANTITY =
            Pattern.compile("^([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(\\S*)$");

    private static final Map<String, Double> PREFIXES = Map.ofEntries(
            Map.entry("p", 1e-12), Map.entry("n", 1e-9), Map.entry("u", 1e-6), Map.entry("µ", 1e-6),
            Map.entry("μ", 1e-6), Map.entry("m", 1e-3), Map.entry("c", 1e-2), Map.entry("k", 1e3),
            Map.entry("M", 1e6), Map.entry("G", 1e9), Map.entry("T", 1e12), Map.entry("", 1.0));

    private static final Map<String, Double> LENGTHS = Map.of(
            "mil", 25.4e-6, "mils", 25.4e-6, "thou", 25.4e-6, "in", 25.4e-3, "inch", 25.4e-3, "ft", 0.3048);

    private Units() {
    }

    /**
     * Parses a quantity.
     *
     * @param field the field's name, for messages
     * @param text what the user wrote
     * @param kind what kind of quantity the field holds
     * @return the value in SI base units (kelvin for temperatures)
     * @throws InvalidInputException naming the field, the text and an example of accepted input
     */
    public static double parse(String field, String text, UnitKind kind) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(field, text == null ? null : text, "expected " + kind.example());
        }
        String trimmed = text.strip();
        Matcher matcher = QUANTITY.matcher(trimmed);
        if (!matcher.matches()) {
            throw new InvalidInputException(field, text, "expected " + kind.example());
        }
        double number = Double.parseDouble(matcher.group(1));
        if (!Double.isFinite(number)) {
            throw new InvalidInputException(field, text, "the number is out of range; expected " + kind.example());
        }
        if (number == 0.0 && matcher.group(1).startsWith("-")) {
            throw new InvalidInputException(field, text, "a negative zero is not a value; expected " + kind.example());
        }
        double value = number * unitFactor(field, text, matcher.group(2), kind) + unitOffset(matcher.group(2));
        if (!Double.isFinite(value)) {
            throw new InvalidInputException(field, text, "the value is out of range; expected " + kind.example());
        }
        return value;
    }

    /** Parses a frequency ("2.4GHz" or a number of hertz). */
    public static double parseFrequency(String field, String text) {
        return parse(field, text, UnitKind.FREQUENCY);
    }

    private static double unitOffset(String unit) {
        return isCelsius(unit) ? org.linesweep.physics.PhysicalConstants.ZERO_CELSIUS_KELVIN : 0.0;
    }

    private static boolean isCelsius(String unit) {
        return unit.equals("degC") || unit.equals("°C");
    }

    private static double unitFactor(String field, String text, String unit, UnitKind kind) {
        if (unit.isEmpty()) {
            return 1.0;
        }
        Double factor = switch (kind) {
            case LENGTH -> length(unit);
            case THICKNESS -> unit.equals("oz") ? Double.valueOf(OUNCE_COPPER_METRES) : length(unit);
            case FREQUENCY -> frequency(field, text, unit);
            case TEMPERATURE -> unit.equals("K") || isCelsius(unit) ? 1.0 : null;
            case DECIBEL -> unit.equals("dB") ? 1.0 : null;
            case CONDUCTIVITY -> unit.endsWith("S/m") ? PREFIXES.get(unit.substring(0, unit.length() - 3)) : null;
            case TIME -> unit.endsWith("s") ? PREFIXES.get(unit.substring(0, unit.length() - 1)) : null;
            case RESISTANCE -> resistance(unit);
            case CAPACITANCE -> unit.endsWith("F") ? PREFIXES.get(unit.substring(0, unit.length() - 1)) : null;
            case NUMBER -> null;
        };
        if (factor == null) {
            throw new InvalidInputException(field, text, "unknown unit '" + unit + "'; expected " + kind.example());
        }
        return factor;
    }

    private static Double resistance(String unit) {
        // resistor shorthand "4.7k", "1M" (common practice); a bare "m" is refused as too easily a mistake
        if (unit.equals("k") || unit.equals("M") || unit.equals("G")) {
            return PREFIXES.get(unit);
        }
        for (String name : new String[] {"ohms", "ohm", "Ω"}) {
            if (unit.endsWith(name)) {
                return PREFIXES.get(unit.substring(0, unit.length() - name.length()));
            }
        }
        return null;
    }

    private static Double length(String unit) {
        Double imperial = LENGTHS.get(unit);
        if (imperial != null) {
            return imperial;
        }
        if (unit.endsWith("m")) {
            return PREFIXES.get(unit.substring(0, unit.length() - 1));
        }
        return null;
    }

    private static Double frequency(String field, String text, String unit) {
        switch (unit) {
            case "khz":
                return 1e3;
            case "ghz":
                return 1e9;
            case "thz":
                return 1e12;
            case "mhz":
                throw new InvalidInputException(field, text,
                        "'mhz' is ambiguous: write MHz for megahertz or mHz for millihertz");
            default:
                break;
        }
        if (unit.endsWith("Hz")) {
            return PREFIXES.get(unit.substring(0, unit.length() - 2));
        }
        return null;
    }

    /**
     * Formats a value in engineering notation with an SI prefix and the unit, e.g. 2.4e9 → "2.4 GHz".
     *
     * @param significant significant digits
     */
    public static String engineering(double value, String unit, int significant) {
        if (value == 0 || !Double.isFinite(value)) {
            return (Double.isNaN(value) ? "—" : trim(String.valueOf(value))) + " " + unit;
        }
        String[] prefixes = {"f", "p", "n", "µ", "m", "", "k", "M", "G", "T", "P"};
        int exponent = (int) Math.floor(Math.log10(Math.abs(value)) / 3.0);
        exponent = Math.max(-5, Math.min(5, exponent));
        double scaled = value / Math.pow(1000.0, exponent);
        int decimals = Math.max(0, significant - 1 - (int) Math.floor(Math.log10(Math.abs(scaled))));
        String number = trim(String.format(java.util.Locale.ROOT, "%." + decimals + "f", scaled));
        return number + " " + prefixes[exponent + 5] + unit;
    }

    private static String trim(String number) {
        if (number.contains(".") && !number.contains("E")) {
            number = number.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return number;
    }
}
