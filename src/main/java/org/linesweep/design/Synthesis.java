package org.linesweep.design;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Synthesis: the value of one geometry field that makes the line meet a target (|Z0|, attenuation or delay
 * per metre at a frequency), all other inputs held. The field is searched over the range its rule and the
 * other fields allow (e.g. a coax inner diameter below the outer one), on a logarithmic grid to find a
 * bracket, then by Brent's method (Commons Math) on log of the dimension.
 */
public final class Synthesis {

    /** Default frequency at which a target is evaluated when none is given: 1 GHz. */
    public static final double DEFAULT_FREQUENCY_HZ = 1e9;
    /** Relative accuracy of the solved dimension. */
    public static final double RELATIVE_ACCURACY = 1e-12;
    /** Smallest dimension searched, m: 0.1 µm. */
    static final double SMALLEST_DIMENSION_METRES = 1e-7;
    private static final int BRACKET_STEPS = 60;

    /** What to hit. */
    public enum Quantity {
        /** |Z0|, Ω. */
        Z0_MAGNITUDE("|Z0|", "Ω"),
        /** Attenuation, dB/m. */
        ATTENUATION("attenuation", "dB/m"),
        /** Phase delay per metre, s/m. */
        DELAY("delay", "s/m"),
        /** Differential impedance 2·Z_odd of an edge-coupled pair, Ω. */
        DIFFERENTIAL_IMPEDANCE("Zdiff", "Ω");

        private final String label;
        private final String unit;

        Quantity(String label, String unit) {
            this.label = label;
            this.unit = unit;
        }

        /** What the quantity is called in messages. */
        public String label() {
            return label;
        }

        /** Its unit. */
        public String unit() {
            return unit;
        }

        /** The quantity's value for a design at a frequency. */
        public double of(Design design, double frequencyHz) {
            return switch (this) {
                case Z0_MAGNITUDE -> design.toModel().at(frequencyHz).z0MagnitudeOhm();
                case ATTENUATION -> design.toModel().at(frequencyHz).alphaDbPerMetre();
                case DELAY -> design.toModel().at(frequencyHz).delaySeconds(1.0);
                case DIFFERENTIAL_IMPEDANCE -> design.toPair().modes(frequencyHz).differentialImpedanceOhm();
            };
        }
    }

    /**
     * A target.
     *
     * @param quantity what to hit
     * @param value its value in the quantity's unit
     * @param frequencyHz where it is evaluated
     */
    public record Target(Quantity quantity, double value, double frequencyHz) {
    }

    /** The outcome: the solved design and the value it reaches. */
    public record Solution(Design design, String field, double valueMetres, double achieved) {
    }

    /** No value of the field in its allowed range meets the target. */
    public static final class NoSolutionException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        NoSolutionException(String message) {
            super(message);
        }
    }

    private Synthesis() {
    }

    /**
     * Solves for one geometry field.
     *
     * @throws InvalidInputException if the field does not exist for the line type
     * @throws NoSolutionException if the target cannot be met in the allowed range
     */
    public static Solution solve(Design design, String field, Target target) {
        if (target.quantity() == Quantity.DIFFERENTIAL_IMPEDANCE && !design.geometry().isPair()) {
            throw new InvalidInputException("line.gap", null, "a differential target needs a pair: a microstrip or"
                    + " stripline with line.gap, the edge-to-edge spacing to its twin strip");
        }
        if (!design.geometry().valuesMetres().containsKey(field)) {
            throw new InvalidInputException("--for", field, "the design has the fields "
                    + design.geometry().valuesMetres().keySet());
        }
        double[] range = allowedRange(design.geometry(), field);
        DoubleUnaryOperator error = logValue -> {
            Design trial = design.withGeometryValue(field, Math.exp(logValue));
            return target.quantity().of(trial, target.frequencyHz()) / target.value() - 1.0;
        };
        double low = Math.log(range[0]);
        double high = Math.log(range[1]);
        // bracket on a log grid, preferring the crossing nearest the current value
        double current = Math.log(design.geometry().value(field));
        double bestLow = Double.NaN;
        double bestHigh = Double.NaN;
        double previousX = low;
        double previousE = safe(error, low);
        double lowestE = Double.isFinite(previousE) ? previousE : Double.POSITIVE_INFINITY;
        double highestE = Double.isFinite(previousE) ? previousE : Double.NEGATIVE_INFINITY;
        for (int i = 1; i <= BRACKET_STEPS; i++) {
            double x = low + (high - low) * i / BRACKET_STEPS;
            double e = safe(error, x);
            if (Double.isFinite(e)) {
                lowestE = Math.min(lowestE, e);
                highestE = Math.max(highestE, e);
            }
            if (Double.isFinite(previousE) && Double.isFinite(e) && Math.signum(previousE) != Math.signum(e)) {
                if (Double.isNaN(bestLow) || distance(previousX, x, current) < distance(bestLow, bestHigh, current)) {
                    bestLow = previousX;
                    bestHigh = x;
                }
            }
            previousX = x;
            previousE = e;
        }
        if (Double.isNaN(bestLow)) {
            String reachable = lowestE <= highestE ? String.format(Locale.ROOT, " (over that range it spans %.4g to"
                    + " %.4g %s)", (1 + lowestE) * target.value(), (1 + highestE) * target.value(),
                    target.quantity().unit) : "";
            throw new NoSolutionException(String.format(Locale.ROOT,
                    "no %s between %s and %s gives %s = %.6g %s at %s%s", field,
                    Units.engineering(range[0], "m", 4), Units.engineering(range[1], "m", 4), target.quantity().label,
                    target.value(), target.quantity().unit, Units.engineering(target.frequencyHz(), "Hz", 4),
                    reachable));
        }
        BrentSolver solver = new BrentSolver(RELATIVE_ACCURACY * 1e-3, RELATIVE_ACCURACY);
        double root = solver.solve(200, error::applyAsDouble, bestLow, bestHigh);
        double value = Math.exp(root);
        Design solved = design.withGeometryValue(field, value);
        double achieved = target.quantity().of(solved, target.frequencyHz());
        return new Solution(solved, field, value, achieved);
    }

    private static double safe(DoubleUnaryOperator error, double x) {
        try {
            return error.applyAsDouble(x);
        } catch (InvalidInputException e) {
            return Double.NaN;
        }
    }

    private static double distance(double a, double b, double x) {
        return Math.abs((a + b) / 2 - x);
    }

    /** The open interval a field may take given the other fields, in metres. */
    public static double[] allowedRange(Geometry geometry, String field) {
        Rule rule = GeometryField.of(geometry.type()).stream().filter(f -> f.name().equals(field)).findFirst()
                .orElseThrow(() -> new InvalidInputException("--for", field, "a " + geometry.type().key()
                        + " line has the fields " + geometry.valuesMetres().keySet())).rule();
        double low = SMALLEST_DIMENSION_METRES;
        double high = rule.maximum();
        var v = geometry.valuesMetres();
        switch (geometry.type()) {
            case COAX -> {
                if (field.equals("innerDiameter")) {
                    high = v.get("outerDiameter");
                } else if (field.equals("outerDiameter")) {
                    low = v.get("innerDiameter");
                }
            }
            case TWO_WIRE -> {
                if (field.equals("wireDiameter")) {
                    high = v.get("spacing");
                } else {
                    low = v.get("wireDiameter");
                }
            }
            case WIRE_OVER_GROUND -> {
                if (field.equals("wireDiameter")) {
                    high = 2 * v.get("height");
                } else {
                    low = v.get("wireDiameter") / 2;
                }
            }
            case STRIPLINE -> {
                if (field.equals("thickness")) {
                    high = v.get("spacing");
                } else if (field.equals("spacing")) {
                    low = v.get("thickness");
                }
            }
            default -> {
            }
        }
        // stay strictly inside: the relations are strict and the formulas singular at the edges
        return new double[] {Math.max(low * (1 + 1e-6), SMALLEST_DIMENSION_METRES), high * (1 - 1e-6)};
    }
}
