package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * The tabulated internal impedances against the exact Bessel-function forms they are built from, at random
 * points between the nodes: the interpolated value within 1e-10 and the slope within 1e-7 for the wire
 * (5e-10 and 2e-7 for the tubes), relative to the function's size, which is below any difference the plots or read-outs can show and below the Kramers-Kronig
 * and identity tolerances of the other tests.
 */
class InternalImpedanceTableTest {

    static final double VALUE_TOLERANCE = 1e-10;
    static final double SLOPE_TOLERANCE = 1e-7;
    /** Tube tables have half the wire table's node density (each node costs four Bessel functions): measured
     *  2.4e-10 and 9.5e-8 at every c/b tried, held to twice that. */
    static final double TUBE_VALUE_TOLERANCE = 5e-10;
    static final double TUBE_SLOPE_TOLERANCE = 2e-7;

    @Test
    void roundWireTableMatchesTheBesselForm() {
        SplittableRandom random = new SplittableRandom(11);
        double worstValue = 0;
        double worstSlope = 0;
        for (int i = 0; i < 20_000; i++) {
            double x = Math.exp(Math.log(0.01) + random.nextDouble() * Math.log(1e5));
            Complex[] table = InternalImpedance.roundWireRatioWithSlope(x);
            Complex[] exact = InternalImpedance.exactRoundWireRatioWithSlope(x);
            worstValue = Math.max(worstValue, table[0].subtract(exact[0]).abs() / exact[0].abs());
            // the slope is measured against F/x, its natural scale (F ∝ x at large x, F − 1 ∝ x⁴ at small x)
            worstSlope = Math.max(worstSlope, table[1].subtract(exact[1]).abs() / (exact[0].abs() / x));
        }
        assertTrue(worstValue < VALUE_TOLERANCE, "value " + worstValue);
        assertTrue(worstSlope < SLOPE_TOLERANCE, "slope " + worstSlope);
    }

    /** A tube table for several wall ratios c/b, over the whole thin-wall range of b/δ, against the exact form. */
    @Test
    void tubeTablesMatchTheBesselForm() {
        SplittableRandom random = new SplittableRandom(12);
        for (double kappa : new double[] {3.0, 1.5, 1.17, 1.02}) {
            double xMax = InternalImpedance.THICK_WALL_SKIN_DEPTHS / (kappa - 1);
            HermiteTable table = InternalImpedance.tubeTable(kappa, 0.01, xMax);
            double worstValue = 0;
            double worstSlope = 0;
            double[] out = new double[4];
            for (int i = 0; i < 5_000; i++) {
                double x = Math.exp(Math.log(0.01) + random.nextDouble() * Math.log(xMax / 0.01));
                table.evaluate(x, out);
                Complex[] exact = InternalImpedance.tubeRatioWithSlope(x, kappa);
                worstValue = Math.max(worstValue, new Complex(out[0], out[1]).subtract(exact[0]).abs() / exact[0].abs());
                worstSlope = Math.max(worstSlope,
                        new Complex(out[2], out[3]).subtract(exact[1]).abs() / (exact[0].abs() / x));
            }
            assertTrue(worstValue < TUBE_VALUE_TOLERANCE, "c/b " + kappa + " value " + worstValue);
            assertTrue(worstSlope < TUBE_SLOPE_TOLERANCE, "c/b " + kappa + " slope " + worstSlope);
        }
    }

    /** The flat conductor's u·coth u, u = (1 + j)t/δ, against its exact form. */
    @Test
    void flatTableMatchesTheExactForm() {
        SplittableRandom random = new SplittableRandom(13);
        double worstValue = 0;
        double worstSlope = 0;
        for (int i = 0; i < 20_000; i++) {
            double x = Math.exp(Math.log(0.01) + random.nextDouble() * Math.log(1e5));
            Complex[] table = InternalImpedance.flatRatioWithSlope(x);
            Complex[] exact = InternalImpedance.exactFlatRatioWithSlope(x);
            worstValue = Math.max(worstValue, table[0].subtract(exact[0]).abs() / exact[0].abs());
            worstSlope = Math.max(worstSlope, table[1].subtract(exact[1]).abs() / (exact[0].abs() / x));
        }
        assertTrue(worstValue < VALUE_TOLERANCE, "value " + worstValue);
        assertTrue(worstSlope < SLOPE_TOLERANCE, "slope " + worstSlope);
    }
}
