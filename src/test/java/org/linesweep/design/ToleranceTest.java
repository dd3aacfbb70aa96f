package org.linesweep.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.concurrent.CancellationException;
import org.junit.jupiter.api.Test;
import org.linesweep.io.Presets;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineType;

/**
 * Monte Carlo of tolerances against closed forms. For an ideal coax with only εr varying uniformly by ±a,
 * Z0 ∝ εr^(−1/2), so the p-quantile of Z0 is Z0·(1 + a·(1 − 2p))^(−1/2) and the yield of |Z0| within ±s is
 * the measure of εr in [1/(1 + s)², 1/(1 − s)²] ∩ [1 − a, 1 + a], over 2a (Pozar, table of common lines).
 */
class ToleranceTest {

    /** Sampling error of a quantile or fraction from 4,000 samples, with margin (≈ 4 standard errors). */
    private static final double SAMPLING = 0.004;

    private static Design idealCoax() {
        return new Design("ideal", "", Geometry.of(LineType.COAX, 1e-3, 3.5e-3, 0.2e-3),
                ConductorSpec.of(ConductorMaterial.PERFECT),
                new DielectricSpec(null, 2.1, 0, 1e9, 0, 1, DielectricModelKind.CONSTANT, 1e3, 1e12), 2.0, 293.15,
                SweepSettings.DEFAULT, 0.01, Double.NaN);
    }

    private static Tolerance.Result permittivityOnly(int threads, double spec) {
        Design d = idealCoax();
        return Tolerance.run(d, List.of(new Tolerance.Variation(Tolerance.input(d, "permittivity"), 0.10, true)),
                Tolerance.Distribution.UNIFORM, 4000, 42, 1e8, d.toModel().at(1e8).z0MagnitudeOhm(), spec,
                threads, n -> { }, () -> false);
    }

    @Test
    void percentilesFollowTheClosedForm() {
        Tolerance.Result r = permittivityOnly(2, 0.03);
        double nominal = r.z0Ohm().nominal();
        assertEquals(nominal / Math.sqrt(1 + 0.10 * 0.9), r.z0Ohm().p5(), nominal * SAMPLING);
        assertEquals(nominal / Math.sqrt(1 - 0.10 * 0.9), r.z0Ohm().p95(), nominal * SAMPLING);
        assertEquals(nominal, r.z0Ohm().p50(), nominal * SAMPLING);
        double low = Math.max(0.9, 1 / (1.03 * 1.03));
        double high = Math.min(1.1, 1 / (0.97 * 0.97));
        assertEquals((high - low) / 0.2, r.yield(), 0.03, "binomial σ ≈ 0.008 at 4,000 samples");
    }

    @Test
    void theSameSeedGivesTheSameAnswerOnAnyNumberOfThreads() {
        assertEquals(permittivityOnly(1, 0.05), permittivityOnly(2, 0.05));
        assertEquals(permittivityOnly(1, 0.05), permittivityOnly(7, 0.05));
    }

    @Test
    void rootSumSquareMatchesForOneLinearInput() {
        // one input, nearly linear effect: the RSS band and the Monte Carlo band nearly coincide
        Tolerance.Result r = permittivityOnly(2, 0.05);
        assertEquals(r.z0Ohm().p5(), r.z0Ohm().rssP5(), r.z0Ohm().nominal() * 0.01);
        assertEquals(r.z0Ohm().p95(), r.z0Ohm().rssP95(), r.z0Ohm().nominal() * 0.01);
    }

    @Test
    void cancellationStopsTheRun() {
        Design d = Presets.load("board-trace-50-ohm");
        assertThrows(CancellationException.class, () -> Tolerance.run(d,
                List.of(new Tolerance.Variation(Tolerance.input(d, "width"), 0.1, true)), Tolerance.Distribution.NORMAL,
                1000, 1, 1e9, Double.NaN, 0, 2, n -> { }, () -> true));
        assertThrows(InvalidInputException.class, () -> Tolerance.input(d, "innerDiameter"));
    }
}
