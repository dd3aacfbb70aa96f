package org.linesweep.physics;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * The TE11 mode of a coaxial line, exactly.
 *
 * <p>The cutoff wavenumber k_c of TE11 is the lowest root of J1′(k_c a)·Y1′(k_c b) − J1′(k_c b)·Y1′(k_c a) = 0
 * (N. Marcuvitz, Waveguide Handbook, 1951, §2.4; Pozar, Microwave Engineering, §3.5). That equation is the
 * condition that the radial part R(r) of H_z, which obeys Bessel's equation of order 1,
 * <pre>R″ + R′/r + (k_c² − 1/r²)·R = 0,</pre>
 * has zero slope at both walls. We solve it that way, by shooting: integrate from r = a with R = 1,
 * R′ = 0 to r = b with an adaptive Dormand-Prince 8(5,3) integrator, and find the k_c that makes R′(b) = 0
 * with Brent's method. This needs no Bessel function of the second kind, which Commons Math lacks.
 * The familiar estimate k_c ≈ 2/(a + b) is 2-3 % low for 50-77 Ω lines.
 */
public final class CoaxModes {

    private static final double ODE_RELATIVE_TOLERANCE = 1e-12;

    private CoaxModes() {
    }

    /**
     * The dimensionless TE11 cutoff k_c·a.
     *
     * @param radiusRatio b/a &gt; 1
     * @return x = k_c·a; the free-space cutoff is x·c/(2πa)
     */
    public static double te11CutoffTimesInnerRadius(double radiusRatio) {
        double estimate = 2.0 / (1.0 + radiusRatio);
        // for the usual lines (b/a up to about 10) the root is 1 % below to 3 % above the estimate: try that
        // bracket first, which saves the scan's integrations (a drag of either diameter solves this at every step)
        double usualLow = 0.99 * estimate;
        double usualHigh = 1.04 * estimate;
        if (endSlope(usualLow, radiusRatio) > 0 && endSlope(usualHigh, radiusRatio) < 0) {
            return rootBetween(usualLow, usualHigh, radiusRatio);
        }
        // the root lies within 10 % of the estimate for b/a up to 10^4 (it is 2-3 % above it for common
        // lines, 8 % below it as b/a grows without bound); start just below and check the sign says so
        double low = 0.85 * estimate;
        double slopeLow = endSlope(low, radiusRatio);
        if (!(slopeLow > 0)) {
            low = 0.4 * estimate;
            slopeLow = endSlope(low, radiusRatio);
        }
        double high = low;
        double slopeHigh = slopeLow;
        for (int i = 0; i < 200; i++) {
            high = low * 1.04;
            slopeHigh = endSlope(high, radiusRatio);
            if (Math.signum(slopeHigh) != Math.signum(slopeLow)) {
                break;
            }
            low = high;
            slopeLow = slopeHigh;
        }
        return rootBetween(low, high, radiusRatio);
    }

    /** The root of the end slope in [low, high], where it changes sign, by Brent's method. */
    private static double rootBetween(double low, double high, double radiusRatio) {
        return new BrentSolver(1e-15, 1e-14).solve(200, x -> endSlope(x, radiusRatio), low, high);
    }

    /** R′ at ρ = b/a for R(1) = 1, R′(1) = 0, with distances in units of a and wavenumber x = k_c·a. */
    static double endSlope(double x, double radiusRatio) {
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
        FirstOrderIntegrator integrator = new DormandPrince853Integrator(span * 1e-9, span,
                1e-14, ODE_RELATIVE_TOLERANCE);
        double[] state = {1.0, 0.0};
        integrator.integrate(bessel, 1.0, state, radiusRatio, state);
        return state[1];
    }
}
