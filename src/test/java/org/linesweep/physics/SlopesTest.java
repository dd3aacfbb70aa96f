package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleFunction;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The closed-form derivatives behind the group velocity, each against a central difference of the function
 * it differentiates (relative step 1e-6: truncation near 1e-12, rounding near 1e-10).
 */
class SlopesTest {

    /**
     * Agreement expected between a closed-form derivative and the Richardson-extrapolated central difference
     * below, relative to the function's own scale |F|/x: truncation near 1e-12, rounding near 1e-13/1e-3.
     */
    private static final double DIFFERENCE_AGREEMENT = 1e-8;
    private static final double STEP = 1e-3;

    /** (4·D(h/2) − D(h))/3 with D the central difference: error of order h⁴. */
    private static Complex richardson(DoubleFunction<Complex> value, double x) {
        double h = STEP * x;
        Complex wide = value.apply(x + h).subtract(value.apply(x - h)).divide(2 * h);
        Complex narrow = value.apply(x + h / 2).subtract(value.apply(x - h / 2)).divide(h);
        return narrow.multiply(4).subtract(wide).divide(3);
    }

    private static void assertSlope(DoubleFunction<Complex[]> withSlope, DoubleFunction<Complex> value, double x) {
        Complex analytic = withSlope.apply(x)[1];
        Complex numeric = richardson(value, x);
        double scale = Math.max(analytic.abs(), value.apply(x).abs() / x);
        assertTrue(analytic.subtract(numeric).abs() <= DIFFERENCE_AGREEMENT * scale,
                "at " + x + ": closed form " + analytic + ", difference " + numeric);
        assertTrue(withSlope.apply(x)[0].subtract(value.apply(x)).abs() <= 1e-14 * value.apply(x).abs());
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-3, 0.3, 1, 3.45, 10, 17.6, 17.7, 30, 300, 3e4})
    void roundWireSlope(double x) {
        assertSlope(InternalImpedance::roundWireRatioWithSlope, InternalImpedance::roundWireRatio, x);
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-3, 0.3, 1, 1.41, 1.42, 5, 14.1, 14.2, 17.67, 17.68, 60, 3e3})
    void tubeSlope(double x) {
        for (double kappa : new double[] {1.001, 1.05, 1.2, 2.0}) {
            assertSlope(v -> InternalImpedance.tubeRatioWithSlope(v, kappa),
                    v -> InternalImpedance.tubeRatio(v, kappa), x);
        }
    }

    /** The thick-wall form and the full tube formula agree on both sides of the switch (wall = 20 δ). */
    @ParameterizedTest
    @ValueSource(doubles = {19.99, 20.01, 30})
    void thickWallShortcutIsSeamless(double wallOverSkinDepth) {
        for (double kappa : new double[] {1.05, 1.2, 2.0}) {
            double x = wallOverSkinDepth / (kappa - 1);
            Complex[] full = InternalImpedance.fullTubeRatioWithSlope(x, kappa);
            Complex[] thick = InternalImpedance.thickTubeRatioWithSlope(x, kappa);
            assertTrue(full[0].subtract(thick[0]).abs() <= 1e-13 * full[0].abs(), "value at " + x);
            assertTrue(full[1].subtract(thick[1]).abs() <= 1e-12 * full[1].abs(), "slope at " + x);
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-4, 0.005, 0.0071, 0.3, 3, 30})
    void flatSurfaceSlope(double x) {
        // along the ray x·(1 + j): d/dx of F((1 + j)x) = (1 + j)·F′
        assertSlope(v -> new Complex[] {InternalImpedance.xCothX(new Complex(v, v)),
            InternalImpedance.xCothXSlope(new Complex(v, v)).multiply(new Complex(1, 1))},
                v -> InternalImpedance.xCothX(new Complex(v, v)), x);
    }

    /** The analytic group velocity equals the model's numerical dω/dβ, for random designs and frequencies. */
    @Property(tries = 300, seed = "20261205")
    void analyticGroupVelocityMatchesTheDifference(@ForAll("lines") LineModel line,
            @ForAll("frequencies") double frequencyHz) {
        double analytic = line.at(frequencyHz).groupVelocityMetresPerSecond();
        // Richardson-extrapolated difference of β(ω) with a relative step of 1e-2: truncation of order 1e-8,
        // and rounding small even where β is a millionth of α (a lossy, conductive-dielectric line at 1 Hz)
        LineParameters p = new LineParameters();
        double[] s = new double[Telegrapher.SIZE];
        DoubleFunction<Double> beta = f -> line.beta(f, p, s);
        double h = 1e-2 * frequencyHz;
        double wide = (beta.apply(frequencyHz + h) - beta.apply(frequencyHz - h)) / (2 * h);
        double narrow = (beta.apply(frequencyHz + h / 2) - beta.apply(frequencyHz - h / 2)) / h;
        double numeric = 2 * Math.PI / ((4 * narrow - wide) / 3);
        assertTrue(Math.abs(analytic - numeric) <= 1e-6 * Math.abs(numeric),
                line + " at " + frequencyHz + " Hz: analytic " + analytic + ", numeric " + numeric);
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<LineModel> lines() {
        return new LineInvariantsTest().lines();
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<Double> frequencies() {
        return new LineInvariantsTest().frequencies();
    }

    /**
     * Kirschning-Jansen's ε_eff(f): the closed-form partial derivatives in fn, εr and ε_eff(0) against central
     * differences of the formula (relative step 1e-6), over 0.1 ≤ u ≤ 10, 2 ≤ εr ≤ 12 and fn from 1e-4 to 60 GHz·mm.
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.1, 0.5, 1.9, 10.0})
    void dispersionPartials(double u) {
        MicrostripFormulas.Dispersion dispersion = new MicrostripFormulas.Dispersion(u);
        double[] out = new double[4];
        for (double er : new double[] {2.0, 4.2, 12.0}) {
            double staticEffective = 1 + 0.7 * (er - 1);
            for (double fn = 1e-4; fn < 60; fn *= 1.7) {
                dispersion.evaluate(staticEffective, er, fn, Math.log(fn), out);
                double f0 = fn;
                double e0 = staticEffective;
                double r0 = er;
                DoubleFunction<Double> inFn = x -> MicrostripFormulas.dispersiveEffectivePermittivity(e0, u, r0, x * 1e6);
                DoubleFunction<Double> inEr = x -> MicrostripFormulas.dispersiveEffectivePermittivity(e0, u, x, f0 * 1e6);
                DoubleFunction<Double> inStatic = x -> MicrostripFormulas.dispersiveEffectivePermittivity(x, u, r0, f0 * 1e6);
                double hFn = 1e-6 * fn;
                double hEr = 1e-6 * er;
                double hStatic = 1e-6 * staticEffective;
                double byFn = (inFn.apply(fn + hFn) - inFn.apply(fn - hFn)) / (2 * hFn);
                double byEr = (inEr.apply(er + hEr) - inEr.apply(er - hEr)) / (2 * hEr);
                double byStatic = (inStatic.apply(staticEffective + hStatic) - inStatic.apply(staticEffective - hStatic))
                        / (2 * hStatic);
                // each on its natural scale: ε_eff per unit of ln fn, ln εr, ln ε_eff(0)
                assertTrue(Math.abs(out[1] - byFn) * fn <= 1e-8 * out[0], "u " + u + " εr " + er + " fn " + fn);
                assertTrue(Math.abs(out[2] - byEr) * er <= 1e-8 * out[0], "u " + u + " εr " + er + " fn " + fn);
                assertTrue(Math.abs(out[3] - byStatic) * staticEffective <= 1e-8 * out[0],
                        "u " + u + " εr " + er + " fn " + fn);
            }
        }
    }
}
