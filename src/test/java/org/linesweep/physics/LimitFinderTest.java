package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.linesweep.physics.Tolerances.relativeError;

import org.junit.jupiter.api.Test;

class LimitFinderTest {

    private static final Conductor PERFECT = Conductor.of(ConductorMaterial.PERFECT, 293.15);
    private static final Conductor COPPER = Conductor.of(ConductorMaterial.COPPER, 293.15);
    private static final double C = PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;

    /** Lossless, dispersionless: L/λ = T at f = T·v_p/L exactly (telegrapher's equations). */
    @Test
    void electricalLengthOfAnIdealLine() {
        CoaxLine air = new CoaxLine(3.04e-3, 7e-3, 1e-3, PERFECT, Dielectric.lossless(1));
        FrequencyLimits limits = LimitFinder.find(air, 0.1, 0.01, Double.NaN);
        assertTrue(relativeError(limits.electricalLengthHz(), 0.01 * C / 0.1) < 1e-10);
        assertEquals(LimitKind.ELECTRICAL_LENGTH, limits.limitedBy());
        assertTrue(Double.isNaN(limits.skinDepthEqualsRadiusHz()));
        CoaxLine ptfe = new CoaxLine(3.04e-3, 7e-3, 1e-3, PERFECT, Dielectric.lossless(2.1));
        assertTrue(relativeError(LimitFinder.find(ptfe, 2, 0.1, Double.NaN).electricalLengthHz(),
                0.1 * C / Math.sqrt(2.1) / 2) < 1e-10);
    }

    /** The electrical-length limit is where the model's β gives L/λ = T. */
    @Test
    void electricalLengthAgreesWithTheModel() {
        CoaxLine lossy = new CoaxLine(0.9e-3, 2.95e-3, 0.25e-3, COPPER, Dielectric.of(DielectricMaterial.PTFE));
        FrequencyLimits limits = LimitFinder.find(lossy, 1.5, 0.01, Double.NaN);
        assertEquals(0.01, lossy.at(limits.electricalLengthHz()).electricalLengthWavelengths(1.5), 1e-10);
    }

    /**
     * TE11 of an air line with a = 0.76 mm and b = 1.75 mm: 38.81 GHz exact, 38.02 GHz by c/(π(a + b))
     * (shared physics sheet §3.4; the approximation is 2-3 % low, Marcuvitz 1951 tables).
     */
    @Test
    void coaxTe11() {
        CoaxLine air = new CoaxLine(1.52e-3, 3.5e-3, 0.5e-3, PERFECT, Dielectric.lossless(1));
        assertTrue(relativeError(air.higherModeCutoffHz(), 38.81e9) < Tolerances.FOUR_DIGITS);
        double approximation = C / (Math.PI * (0.76e-3 + 1.75e-3));
        assertTrue(relativeError(approximation, 38.02e9) < Tolerances.FOUR_DIGITS);
        // exact over approximate: 0.1 % at b/a = 1.2, 0.9 % at 1.65, 2.1 % at 2.3, 2.9 % at 3.59 (sheet §3.4)
        double[] ratios = {1.2, 1.65, 2.3, 3.59};
        double[] excess = {0.001, 0.009, 0.021, 0.029};
        for (int i = 0; i < ratios.length; i++) {
            double x = CoaxModes.te11CutoffTimesInnerRadius(ratios[i]);
            double estimate = 2.0 / (1.0 + ratios[i]);
            assertEquals(excess[i], x / estimate - 1, 0.0015, "b/a = " + ratios[i]);
        }
        // in a dielectric the cutoff scales with 1/sqrt(εr)
        CoaxLine ptfe = new CoaxLine(1.52e-3, 3.5e-3, 0.5e-3, PERFECT, Dielectric.lossless(2.1));
        assertTrue(relativeError(ptfe.higherModeCutoffHz() * Math.sqrt(2.1), air.higherModeCutoffHz()) < 1e-12);
    }

    /**
     * Higher-order-mode estimates of the planar lines, each the published closed form (sheet §15):
     * parallel plate c/(2w·sqrt(εr)); stripline c/(2·sqrt(εr)·(w + πb/4)) (Howe 1974);
     * microstrip min of c·atan(εr)/(√2·π·h·sqrt(εr − 1)) (Vendelin 1970) and c/(sqrt(εr)(2w + 0.8h)).
     */
    @Test
    void planarHigherModes() {
        ParallelPlateLine plates = new ParallelPlateLine(50e-3, 1e-3, 1e-3, PERFECT, Dielectric.lossless(4));
        assertTrue(relativeError(plates.higherModeCutoffHz(), C / (2 * 50e-3 * 2)) < Tolerances.EXACT);
        StriplineLine strip = new StriplineLine(0.5e-3, 1e-3, 17e-6, PERFECT, Dielectric.lossless(2.2));
        assertTrue(relativeError(strip.higherModeCutoffHz(),
                C / (2 * Math.sqrt(2.2) * (0.5e-3 + Math.PI * 1e-3 / 4))) < Tolerances.EXACT);
        MicrostripLine wide = new MicrostripLine(10e-3, 1.6e-3, 35e-6, PERFECT, Dielectric.lossless(4.4));
        double transverse = C / (Math.sqrt(4.4) * (2 * 10e-3 + 0.8 * 1.6e-3));
        double surface = C * Math.atan(4.4) / (Math.sqrt(2) * Math.PI * 1.6e-3 * Math.sqrt(3.4));
        assertTrue(relativeError(wide.higherModeCutoffHz(), Math.min(transverse, surface)) < Tolerances.EXACT);
        assertTrue(transverse < surface);
        MicrostripLine thick = new MicrostripLine(0.3e-3, 10e-3, 35e-6, PERFECT, Dielectric.lossless(10));
        double thickSurface = C * Math.atan(10) / (Math.sqrt(2) * Math.PI * 10e-3 * 3);
        assertTrue(relativeError(thick.higherModeCutoffHz(), thickSurface) < Tolerances.EXACT);
    }

    /** Open lines have no cutoff but are flagged where the spacing reaches λ/10 (common practice). */
    @Test
    void openLinesHaveNoCutoff() {
        TwoWireLine pair = new TwoWireLine(2e-3, 25e-3, COPPER, Dielectric.lossless(1));
        FrequencyLimits limits = LimitFinder.find(pair, 20, 0.01, Double.NaN);
        assertTrue(Double.isNaN(limits.higherModeCutoffHz()));
        assertTrue(relativeError(limits.radiationSpacingHz(), 0.1 * C / 25e-3) < 1e-12);
    }

    /** The loss budget is where the model's total loss equals it; the ceiling is the lowest limit. */
    @Test
    void lossBudgetAndCeiling() {
        CoaxLine feeder = new CoaxLine(2.9e-3, 7.9e-3, 0.3e-3, COPPER, Dielectric.of(DielectricMaterial.FOAM_POLYETHYLENE));
        FrequencyLimits limits = LimitFinder.find(feeder, 25, 0.5, 3.0);
        assertEquals(3.0, feeder.at(limits.lossBudgetHz()).totalLossDb(25), 1e-8);
        double lowest = Math.min(limits.electricalLengthHz(), Math.min(limits.higherModeCutoffHz(), limits.lossBudgetHz()));
        assertEquals(lowest, limits.ceilingHz());
        assertEquals(LimitKind.ELECTRICAL_LENGTH, limits.limitedBy());
        FrequencyLimits lossLimited = LimitFinder.find(feeder, 25, 1.0, 0.05);
        assertTrue(lossLimited.lossBudgetHz() < lossLimited.electricalLengthHz());
        assertEquals(LimitKind.LOSS_BUDGET, lossLimited.limitedBy());
    }
}
