package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.linesweep.physics.Tolerances.relativeError;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The wideband Debye model of Djordjevic, Biljić, Likar-Smiljanić and Sarkar, IEEE Trans. EMC 43(4), 2001.
 */
class DielectricTest {

    /** Band edges 10³ and 10¹² rad/s as in the paper, given here in Hz. */
    private static final Dielectric PAPER_BAND = new Dielectric(3.7, 0.01, 1e9, 0, 1,
            DielectricModelKind.WIDEBAND_DEBYE, 1e3 / (2 * Math.PI), 1e12 / (2 * Math.PI));

    /**
     * εr = 3.7, tan δ = 0.01 at 1 GHz, ω1 = 10³, ω2 = 10¹² rad/s: ε′(1 MHz) = 3.8634, tan δ(1 MHz) = 0.009 615,
     * ε′(10 GHz) = 3.6456, tan δ(10 GHz) = 0.009 783, ε∞ = 3.5801 (shared physics sheet §10, computed from the
     * model's closed form).
     */
    @Test
    void matchesTheCheckValues() {
        Dielectric.Evaluator e = PAPER_BAND.evaluator();
        assertTrue(relativeError(e.real(1e6), 3.8634) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(e.imaginary(1e6) / e.real(1e6), 0.009615) < Tolerances.FOUR_DIGITS);
        assertTrue(relativeError(e.real(1e10), 3.6456) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(e.imaginary(1e10) / e.real(1e10), 0.009783) < Tolerances.FOUR_DIGITS);
        assertTrue(relativeError(e.epsilonInfinity(), 3.5801) < Tolerances.FIVE_DIGITS);
        // the same data with band edges 1 kHz and 1 THz gives ε∞ = 3.5372 (sheet §10)
        Dielectric hertz = new Dielectric(3.7, 0.01, 1e9, 0, 1, DielectricModelKind.WIDEBAND_DEBYE, 1e3, 1e12);
        assertTrue(relativeError(hertz.evaluator().epsilonInfinity(), 3.5372) < Tolerances.FIVE_DIGITS);
    }

    /** The fit reproduces the stated ε′ and tan δ at the reference frequency exactly. */
    @Test
    void fitReproducesTheReferencePoint() {
        Dielectric.Evaluator e = PAPER_BAND.evaluator();
        assertTrue(relativeError(e.real(1e9), 3.7) < Tolerances.EXACT);
        assertTrue(relativeError(e.imaginary(1e9), 0.037) < Tolerances.EXACT);
    }

    /**
     * Kramers-Kronig: ε′(ω) − ε∞ = (2/π)·P∫₀^∞ ω′ε″(ω′)/(ω′² − ω²) dω′ (any electromagnetics text, e.g.
     * Jackson, Classical Electrodynamics, §7.10). Subtracting ωε″(ω) in the numerator removes the pole
     * (the principal value of ∫dω′/(ω′² − ω²) is zero), leaving a regular integral, done in log ω′.
     */
    @ParameterizedTest
    @ValueSource(doubles = {1e4, 1e6, 1e9, 1e11})
    void satisfiesKramersKronig(double frequencyHz) {
        Dielectric.Evaluator e = PAPER_BAND.evaluator();
        double omega = 2 * Math.PI * frequencyHz;
        double lossAtOmega = e.imaginary(frequencyHz);
        UnivariateFunction integrand = logOmega -> {
            double w = Math.exp(logOmega);
            double difference = w * w - omega * omega;
            double numerator = w * e.imaginary(w / (2 * Math.PI)) - omega * lossAtOmega;
            if (Math.abs(difference) < 1e-9 * omega * omega) {
                return 0.0; // removable point: the integrand's value there does not change the integral
            }
            return numerator / difference * w; // dω′ = ω′ d(ln ω′)
        };
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-14);
        double lower = Math.log(1e-6);
        double upper = Math.log(1e20);
        double total = 0;
        double step = 0.5;
        for (double a = lower; a < upper; a += step) {
            total += integrator.integrate(Integer.MAX_VALUE, integrand, a, Math.min(a + step, upper));
        }
        double predicted = e.epsilonInfinity() + 2 / Math.PI * total;
        assertTrue(relativeError(predicted, e.real(frequencyHz)) < 1e-7,
                "KK gives " + predicted + ", model " + e.real(frequencyHz));
    }

    /** The constant model keeps ε′ and tan δ at every frequency. */
    @Test
    void constantModelIsFlat() {
        Dielectric.Evaluator e = Dielectric.of(DielectricMaterial.PTFE).evaluator();
        assertTrue(e.real(1) == e.real(1e12));
        assertTrue(relativeError(e.imaginary(1e3) / e.real(1e3), DielectricMaterial.PTFE.lossTangent()) < 1e-15);
    }
}
