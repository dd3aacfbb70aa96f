package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** Tables whose nodes are read from Chebyshev samples, against tables from exact nodes and against exact forms. */
class ChebyshevSamplerTest {

    /**
     * The interpolant through n Chebyshev points reproduces every polynomial of degree below n, up to rounding
     * (Berrut and Trefethen, SIAM Review 46(3), 2004, section 5): a complex polynomial of degree 24 in u = ln x.
     */
    @Test
    void reproducesAPolynomialOfTheSamplersDegree() {
        int degree = ChebyshevSampler.POINTS_PER_PIECE - 1;
        SplittableRandom random = new SplittableRandom(21);
        double[] re = new double[degree + 1];
        double[] im = new double[degree + 1];
        for (int k = 0; k <= degree; k++) {
            re[k] = random.nextDouble(-1, 1);
            im[k] = random.nextDouble(-1, 1);
        }
        double centre = Math.log(3.0);
        HermiteTable.Source polynomial = (x, out) -> {
            // in powers of (u − centre)/0.5, so the piece [ln 3 − 0.5, ln 3 + 0.5] is [−1, 1]
            double s = (Math.log(x) - centre) / 0.5;
            double valueRe = 0;
            double valueIm = 0;
            double slopeRe = 0;
            double slopeIm = 0;
            for (int k = degree; k >= 0; k--) {
                slopeRe = slopeRe * s + valueRe;
                slopeIm = slopeIm * s + valueIm;
                valueRe = valueRe * s + re[k];
                valueIm = valueIm * s + im[k];
            }
            out[0] = valueRe;
            out[1] = valueIm;
            // dF/dx = (dP/ds)(ds/du)/x
            out[2] = slopeRe / 0.5 / x;
            out[3] = slopeIm / 0.5 / x;
        };
        double xMin = Math.exp(centre - 0.5);
        double xMax = Math.exp(centre + 0.5);
        HermiteTable.Source sampled = ChebyshevSampler.sampled(polynomial, xMin, xMax);
        double[] expected = new double[4];
        double[] actual = new double[4];
        for (int i = 0; i < 1000; i++) {
            double x = Math.exp(Math.log(xMin) + random.nextDouble() * Math.log(xMax / xMin));
            polynomial.evaluate(x, expected);
            sampled.evaluate(x, actual);
            double size = Math.hypot(expected[0], expected[1]) + Math.hypot(expected[2] * x, expected[3] * x);
            for (int c = 0; c < 4; c++) {
                double scale = c < 2 ? 1 : x;
                assertEquals(expected[c] * scale, actual[c] * scale, 1e-12 * size, "component " + c + " at " + x);
            }
        }
    }

    /**
     * The tube's thin-wall Z/R_dc for wall ratios from very thin to very thick: a sampled table agrees with a table
     * from exact nodes to 1e-12 of |Z/R_dc| between the nodes, far inside the 5e-10 both keep from the exact form
     * (Schelkunoff 1934's tube formula in modified Bessel functions, checked against its DC, skin-effect and
     * thin-sheet limits in {@code ConductorModelTest}). The tolerances are this method's own (a numerical check, not a physical value).
     */
    @Test
    void sampledTubeTablesMatchTablesFromExactNodes() {
        SplittableRandom random = new SplittableRandom(22);
        for (double kappa : new double[] {1.005, 1.02, 1.17, 1.5, 3.0, 10.0, 100.0}) {
            double xMin = 0.01;
            double xMax = InternalImpedance.THICK_WALL_SKIN_DEPTHS / (kappa - 1);
            HermiteTable.Source exact = HermiteTable.source(x -> InternalImpedance.tubeRatioWithSlope(x, kappa));
            assertTrue(ChebyshevSampler.passesChecks(exact, xMin, xMax), "c/b " + kappa);
            HermiteTable sampled = ChebyshevSampler.tableOf(exact, xMin, xMax,
                    InternalImpedance.TUBE_TABLE_NODES_PER_UNIT_LOG);
            HermiteTable fromExactNodes = new HermiteTable(exact, xMin, xMax,
                    InternalImpedance.TUBE_TABLE_NODES_PER_UNIT_LOG);
            double[] a = new double[4];
            double[] b = new double[4];
            for (int i = 0; i < 5000; i++) {
                double u = Math.log(xMin) + random.nextDouble() * Math.log(xMax / xMin);
                sampled.evaluateLog(u, a);
                fromExactNodes.evaluateLog(u, b);
                double size = Math.hypot(b[0], b[1]);
                assertEquals(0, Math.hypot(a[0] - b[0], a[1] - b[1]), 1e-12 * size, "c/b " + kappa + " value at u " + u);
                assertEquals(0, Math.hypot(a[2] - b[2], a[3] - b[3]), 1e-10 * (size + Math.hypot(b[2], b[3])),
                        "c/b " + kappa + " slope at u " + u);
            }
        }
    }

    /**
     * A function with a pole 0.02 from the real u axis is far too rough for pieces one unit long: the checks fail
     * and the table is built from exact nodes, identical to one built directly.
     */
    @Test
    void aFunctionTooRoughForThePiecesGetsExactNodes() {
        Complex pole = new Complex(Math.log(5.0), 0.02);
        HermiteTable.Source rough = HermiteTable.source(x -> {
            Complex inverse = new Complex(Math.log(x)).subtract(pole).reciprocal();
            // F = 1/(u − p), dF/dx = −1/(u − p)² / x
            return new Complex[] {inverse, inverse.multiply(inverse).negate().divide(x)};
        });
        assertFalse(ChebyshevSampler.passesChecks(rough, 1.0, 20.0));
        HermiteTable table = ChebyshevSampler.tableOf(rough, 1.0, 20.0, 128);
        HermiteTable direct = new HermiteTable(rough, 1.0, 20.0, 128);
        double[] a = new double[4];
        double[] b = new double[4];
        for (double u = 0.0; u <= Math.log(20.0); u += 0.0137) {
            table.evaluateLog(u, a);
            direct.evaluateLog(u, b);
            assertArrayEquals(b, a, 0.0, "u " + u);
        }
    }
}
