package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.linesweep.physics.Tolerances.relativeError;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CoaxModesTest {

    /**
     * The lowest root x = k_c·a of J1′(x)Y1′(ρx) − J1′(ρx)Y1′(x), computed with mpmath 1.3.0 at 30 digits
     * ({@code besselj}/{@code bessely} with derivative 1, {@code findroot} on a bracket found by scanning up
     * from 0.3 times 2/(1 + ρ)), from a nearly closed gap to a nearly bare inner wire.
     */
    @ParameterizedTest
    @CsvSource({
        "1.0001, 0.999950002916479184",
        "1.001, 0.999500291479280382",
        "1.01, 0.995028980298316666",
        "1.2, 0.910331782773780678",
        "1.65, 0.761757248213506869",
        "2.3, 0.618632260046273158",
        "3.59, 0.44815131217565619",
        "5, 0.341023142845479501",
        "10, 0.180347008480539373",
        "30, 0.0612300089664358663",
        "100, 0.0184079803753898965",
        "1000, 0.00184117992452549421",
        "10000, 0.000184118374277271902"
    })
    void te11CutoffMatchesHighPrecisionRoots(double radiusRatio, double expected) {
        double x = CoaxModes.te11CutoffTimesInnerRadius(radiusRatio);
        // the condition's two terms cancel to (b/a − 1) times their size, which costs digits near b/a = 1
        double tolerance = radiusRatio < 1.01 ? 1e-12 : 1e-14;
        assertTrue(relativeError(x, expected) < tolerance, "b/a = " + radiusRatio + ": " + x);
    }

    /**
     * An independent method: shoot the radial equation R″ + R′/r + (k² − 1/r²)R = 0 (Bessel's equation of order
     * 1, no Bessel function used) from R(a) = 1, R′(a) = 0 and find the k that gives R′(b) = 0.
     */
    @ParameterizedTest
    @CsvSource({"1.05", "1.5", "2.3", "3.5", "7", "40"})
    void te11CutoffAgreesWithShootingTheRadialEquation(double radiusRatio) {
        double estimate = 2.0 / (1.0 + radiusRatio);
        double shot = new BrentSolver(1e-15, 1e-14).solve(200, k -> endSlope(k, radiusRatio),
                0.9 * estimate, 1.04 * estimate);
        assertEquals(shot, CoaxModes.te11CutoffTimesInnerRadius(radiusRatio), 1e-10 * shot);
    }

    /**
     * Past the series' ends: the thin gap's estimate and the circular guide's j′11 = 1.84118 (A&amp;S Table 9.5,
     * from memory; mpmath agrees).
     */
    @Test
    void extremeRatiosUseTheirLimits() {
        double thin = 1 + 1e-6;
        assertEquals(2 / (1 + thin), CoaxModes.te11CutoffTimesInnerRadius(thin), 1e-15);
        double wide = 1e9;
        assertEquals(1.84118, CoaxModes.te11CutoffTimesInnerRadius(wide) * wide, 1e-5);
        // either side of each switch the answers join (to the limits' stated accuracy)
        double below = CoaxModes.te11CutoffTimesInnerRadius(1 + 0.99 * CoaxModes.THIN_GAP);
        double above = CoaxModes.te11CutoffTimesInnerRadius(1 + 1.01 * CoaxModes.THIN_GAP);
        assertEquals(below, above, 1e-6 * below);
        double narrow = CoaxModes.te11CutoffTimesInnerRadius(0.99 * CoaxModes.VERY_WIDE) * 0.99;
        double open = CoaxModes.te11CutoffTimesInnerRadius(1.01 * CoaxModes.VERY_WIDE) * 1.01;
        assertEquals(narrow, open, 1e-10 * narrow);
    }

    @Test
    void ratiosNotAboveOneAreRefused() {
        for (double ratio : new double[] {1.0, 0.5, Double.NaN, Double.POSITIVE_INFINITY}) {
            assertThrows(IllegalArgumentException.class, () -> CoaxModes.te11CutoffTimesInnerRadius(ratio));
        }
    }

    /** R′ at ρ = b/a for R(1) = 1, R′(1) = 0, distances in units of a, wavenumber x = k·a (Dormand-Prince 8(5,3)). */
    private static double endSlope(double x, double radiusRatio) {
        FirstOrderDifferentialEquations bessel = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(double rho, double[] y, double[] yDot) {
                yDot[0] = y[1];
                yDot[1] = -y[1] / rho - (x * x - 1.0 / (rho * rho)) * y[0];
            }
        };
        double span = radiusRatio - 1.0;
        double[] state = {1.0, 0.0};
        new DormandPrince853Integrator(span * 1e-9, span, 1e-14, 1e-12)
                .integrate(bessel, 1.0, state, radiusRatio, state);
        return state[1];
    }
}
