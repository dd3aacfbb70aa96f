package org.linesweep.app.view;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Tick positions and labels for log and linear axes, in engineering notation. */
final class AxisTicks {

    private static final String[] PREFIXES = {"f", "p", "n", "µ", "m", "", "k", "M", "G", "T", "P"};

    private AxisTicks() {
    }

    /** A tick: value and label (empty for a minor tick). */
    record Tick(double value, String label, boolean major) {
    }

    /** Decade ticks between min and max, with minor ticks at 2..9 when few decades are shown. */
    static List<Tick> log(double min, double max, String unit) {
        List<Tick> ticks = new ArrayList<>();
        int first = (int) Math.floor(Math.log10(min));
        int last = (int) Math.ceil(Math.log10(max));
        int decades = last - first;
        int every = decades > 12 ? 2 : 1;
        for (int e = first; e <= last; e++) {
            double decade = Math.pow(10, e);
            if (decade >= min * (1 - 1e-9) && decade <= max * (1 + 1e-9)) {
                boolean labelled = Math.floorMod(e, every) == 0;
                ticks.add(new Tick(decade, labelled ? engineering(decade, unit) : "", true));
            }
            if (decades <= 8) {
                for (int m = 2; m <= 9; m++) {
                    double minor = m * decade;
                    if (minor >= min && minor <= max) {
                        ticks.add(new Tick(minor, "", false));
                    }
                }
            }
        }
        return ticks;
    }

    /** "Nice" linear ticks (steps of 1, 2 or 5 × 10^k) between min and max. */
    static List<Tick> linear(double min, double max, String unit, int target) {
        List<Tick> ticks = new ArrayList<>();
        double span = max - min;
        if (!(span > 0) || !Double.isFinite(span)) {
            return ticks;
        }
        double raw = span / Math.max(2, target);
        double magnitude = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = magnitude * (raw / magnitude < 1.5 ? 1 : raw / magnitude < 3.5 ? 2 : raw / magnitude < 7.5 ? 5 : 10);
        double start = Math.ceil(min / step) * step;
        for (double v = start; v <= max + step * 1e-9; v += step) {
            double value = Math.abs(v) < step * 1e-9 ? 0.0 : v;
            ticks.add(new Tick(value, engineering(value, unit), true));
        }
        return ticks;
    }

    /**
     * Engineering notation with an SI prefix (2.4e9 → "2.4 G" + unit). Without a unit, everyday magnitudes
     * (0.001 to 9999) are written as plain decimals, so a bare "m" is never mistaken for metres.
     */
    static String engineering(double value, String unit) {
        if (value == 0) {
            return "0" + (unit.isEmpty() ? "" : " " + unit);
        }
        if (unit.isEmpty() && Math.abs(value) >= 1e-3 && Math.abs(value) < 1e4) {
            return Display.stripZeros(String.format(Locale.ROOT, "%.4g", value));
        }
        int exponent = (int) Math.floor(Math.log10(Math.abs(value)) / 3 + 1e-9);
        exponent = Math.max(-5, Math.min(5, exponent));
        double scaled = value / Math.pow(1000, exponent);
        String number = Display.stripZeros(String.format(Locale.ROOT, "%.3g", scaled));
        String prefix = PREFIXES[exponent + 5];
        return number + (unit.isEmpty() && prefix.isEmpty() ? "" : " ") + prefix + unit;
    }
}
