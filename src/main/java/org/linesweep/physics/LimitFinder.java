package org.linesweep.physics;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Finds a design's frequency limits by root finding on log10 f (Brent's method, Commons Math), never by
 * scanning a plotted grid, so the explorer's markers and the command line agree to the solver's accuracy.
 */
public final class LimitFinder {

    /** Lowest frequency searched, Hz. */
    public static final double LOWEST_FREQUENCY_HZ = 1.0;
    /** Highest frequency searched, Hz. */
    public static final double HIGHEST_FREQUENCY_HZ = 1e13;
    /** Default electrical-length threshold L/λ (common practice: below it a line may be treated as lumped). */
    public static final double DEFAULT_THRESHOLD = 0.01;
    /** Absolute accuracy of the roots in log10 f: a relative accuracy of about 2e-12 in f. */
    private static final double LOG_ACCURACY = 1e-12;
    /** Fraction of the wavelength at which an open line's spacing is flagged (common practice). */
    public static final double RADIATION_SPACING_FRACTION = 0.1;

    private LimitFinder() {
    }

    /**
     * Computes all limits.
     *
     * @param model the line
     * @param lengthMetres physical length L
     * @param threshold L/λ threshold, in (0, 1]
     * @param lossBudgetDb total-loss budget, dB; NaN for none
     */
    public static FrequencyLimits find(LineModel model, double lengthMetres, double threshold, double lossBudgetDb) {
        LineParameters scratch = new LineParameters();
        double[] solution = new double[Telegrapher.SIZE];
        double electrical = rootOnLogFrequency(
                f -> lengthMetres * model.beta(f, scratch, solution) / (2 * Math.PI) - threshold);
        double skinRadius = skinDepthEqualsHalfSize(model);
        double doubling = model.conductor().isPerfect() ? Double.NaN
                : rootOnLogFrequency(f -> model.characteristicResistanceRatio(f) - 2.0);
        double mode = inBand(model.higherModeCutoffHz());
        double loss = Double.NaN;
        if (!Double.isNaN(lossBudgetDb)) {
            loss = rootOnLogFrequency(f -> {
                model.evaluate(f, scratch);
                Telegrapher.solve(scratch.resistanceOhmPerMetre, scratch.inductanceHenryPerMetre,
                        scratch.conductanceSiemensPerMetre, scratch.capacitanceFaradPerMetre, 2 * Math.PI * f,
                        solution);
                return solution[Telegrapher.ALPHA] * PhysicalConstants.DECIBELS_PER_NEPER * lengthMetres
                        - lossBudgetDb;
            });
        }
        double ceiling = Double.NaN;
        LimitKind limitedBy = null;
        double[] candidates = {electrical, mode, loss};
        LimitKind[] kinds = {LimitKind.ELECTRICAL_LENGTH, LimitKind.HIGHER_ORDER_MODE, LimitKind.LOSS_BUDGET};
        for (int i = 0; i < candidates.length; i++) {
            if (!Double.isNaN(candidates[i]) && (Double.isNaN(ceiling) || candidates[i] < ceiling)) {
                ceiling = candidates[i];
                limitedBy = kinds[i];
            }
        }
        return new FrequencyLimits(electrical, skinRadius, doubling, mode, loss, ceiling, limitedBy,
                radiationSpacing(model));
    }

    /** δ = r ⇔ f = 1/(π μ σ r²), closed form. */
    private static double skinDepthEqualsHalfSize(LineModel model) {
        Conductor conductor = model.conductor();
        if (conductor.isPerfect()) {
            return Double.NaN;
        }
        double r = model.characteristicHalfSizeMetres();
        return inBand(1.0 / (Math.PI * conductor.permeabilityHenryPerMetre() * conductor.conductivitySiemensPerMetre()
                * r * r));
    }

    /**
     * Where an open line's spacing reaches a tenth of the wavelength in its medium, s = λ0/(10·sqrt(εr μr))
     * (common practice), Hz; NaN for closed lines or outside the band.
     */
    public static double radiationSpacing(LineModel model) {
        double spacing = model.radiatingSpacingMetres();
        if (Double.isNaN(spacing)) {
            return Double.NaN;
        }
        double freeSpace = RADIATION_SPACING_FRACTION * PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND / spacing;
        return inBand(model.cutoffInDielectric(freeSpace));
    }

    private static double inBand(double frequencyHz) {
        return frequencyHz >= LOWEST_FREQUENCY_HZ && frequencyHz <= HIGHEST_FREQUENCY_HZ ? frequencyHz : Double.NaN;
    }

    /**
     * The frequency where an increasing function of f crosses zero in the searched band; NaN if it is
     * already positive at the bottom or still negative at the top.
     */
    static double rootOnLogFrequency(UnivariateFunction ofFrequency) {
        UnivariateFunction ofLog = x -> ofFrequency.value(Math.pow(10.0, x));
        double low = Math.log10(LOWEST_FREQUENCY_HZ);
        double high = Math.log10(HIGHEST_FREQUENCY_HZ);
        double atLow = ofLog.value(low);
        double atHigh = ofLog.value(high);
        if (!(atLow < 0) || !(atHigh >= 0)) {
            return Double.NaN;
        }
        BrentSolver solver = new BrentSolver(1e-15, LOG_ACCURACY);
        return Math.pow(10.0, solver.solve(500, ofLog, low, high));
    }
}
