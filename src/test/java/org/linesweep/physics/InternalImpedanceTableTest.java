package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.function.DoubleFunction;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * The tabulated internal impedances against the exact Bessel-function forms they are built from, at random
 * points between the nodes: the interpolated value within 1e-10 and the slope within 1e-7 for the wire and the
 * flat conductor (5e-10 and 2e-7 for the tubes), relative to the function's size, which is below any
 * difference the plots or read-outs can show and below the Kramers-Kronig and identity tolerances of the
 * other tests.
 */
class InternalImpedanceTableTest {

    static final double VALUE_TOLERANCE = 1e-10;
    static final double SLOPE_TOLERANCE = 1e-7;
    /** Tube tables have half the wire table's node density (each node costs four Bessel functions; they are read
     *  from Chebyshev samples, see ChebyshevSamplerTest): measured 2.4e-10 and 9.5e-8 at every c/b tried, held to
     *  twice that. */
    static final double TUBE_VALUE_TOLERANCE = 5e-10;
    static final double TUBE_SLOPE_TOLERANCE = 2e-7;

    /**
     * The worst relative errors of a tabulated {F, F′} against the exact one at points spread evenly in ln x.
     * The slope is measured against F/x, its natural scale (F ∝ x at large x, F − 1 ∝ x⁴ at small x).
     *
     * @return {worst value error, worst slope error}
     */
    private static double[] worstErrors(DoubleFunction<Complex[]> tabulated, DoubleFunction<Complex[]> exact,
            double xMin, double xMax, int points, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double worstValue = 0;
        double worstSlope = 0;
        for (int i = 0; i < points; i++) {
            double x = Math.exp(Math.log(xMin) + random.nextDouble() * Math.log(xMax / xMin));
            Complex[] table = tabulated.apply(x);
            Complex[] reference = exact.apply(x);
            worstValue = Math.max(worstValue, table[0].subtract(reference[0]).abs() / reference[0].abs());
            worstSlope = Math.max(worstSlope, table[1].subtract(reference[1]).abs() / (reference[0].abs() / x));
        }
        return new double[] {worstValue, worstSlope};
    }

    @Test
    void roundWireTableMatchesTheBesselForm() {
        double[] worst = worstErrors(InternalImpedance::roundWireRatioWithSlope,
                InternalImpedance::exactRoundWireRatioWithSlope, 0.01, 1000, 20_000, 11);
        assertTrue(worst[0] < VALUE_TOLERANCE, "value " + worst[0]);
        assertTrue(worst[1] < SLOPE_TOLERANCE, "slope " + worst[1]);
    }

    /** A tube table for several wall ratios c/b, over the whole thin-wall range of b/δ, against the exact form. */
    @Test
    void tubeTablesMatchTheBesselForm() {
        for (double kappa : new double[] {3.0, 1.5, 1.17, 1.02}) {
            double xMax = InternalImpedance.THICK_WALL_SKIN_DEPTHS / (kappa - 1);
            HermiteTable table = InternalImpedance.tubeTable(kappa, 0.01, xMax);
            double[] worst = worstErrors(table::valueAndSlope, x -> InternalImpedance.tubeRatioWithSlope(x, kappa),
                    0.01, xMax, 5_000, 12);
            assertTrue(worst[0] < TUBE_VALUE_TOLERANCE, "c/b " + kappa + " value " + worst[0]);
            assertTrue(worst[1] < TUBE_SLOPE_TOLERANCE, "c/b " + kappa + " slope " + worst[1]);
        }
    }

    /** The flat conductor's u·coth u, u = (1 + j)t/δ, against its exact form. */
    @Test
    void flatTableMatchesTheExactForm() {
        double[] worst = worstErrors(InternalImpedance::flatRatioWithSlope, InternalImpedance::exactFlatRatioWithSlope,
                0.01, 1000, 20_000, 13);
        assertTrue(worst[0] < VALUE_TOLERANCE, "value " + worst[0]);
        assertTrue(worst[1] < SLOPE_TOLERANCE, "slope " + worst[1]);
    }
}
