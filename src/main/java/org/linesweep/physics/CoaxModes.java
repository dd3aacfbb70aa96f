package org.linesweep.physics;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The TE11 mode of a coaxial line, exactly.
 *
 * <p>The cutoff wavenumber k_c of TE11 is the lowest root of
 * <pre>J1′(k_c a)·Y1′(k_c b) − J1′(k_c b)·Y1′(k_c a) = 0</pre>
 * (N. Marcuvitz, Waveguide Handbook, 1951, §2.4; Pozar, Microwave Engineering, §3.5): the radial part of H_z,
 * A·J1(k_c r) + B·Y1(k_c r), has zero slope at both walls. With J1′ = J0 − J1/x and Y1′ = Y0 − Y1/x the
 * equation needs Bessel functions of orders 0 and 1 only, and only of small arguments: k_c·b rises from 1
 * (b/a → 1) to 1.8412, the first zero of J1′ (b/a → ∞, the circular guide's TE11), so the ascending series of
 * {@link SpecialFunctions#besselJY} serve at full accuracy. The familiar estimate k_c ≈ 2/(a + b) is 2-3 % low
 * for 50-77 Ω lines and 8 % high as b/a grows without bound, so the root lies in [0.9, 1.04] times it.
 */
public final class CoaxModes {

    /** The lowest root lies between these multiples of the estimate 2/(a + b) for every b/a &gt; 1. */
    private static final double BRACKET_LOW = 0.9;
    private static final double BRACKET_HIGH = 1.04;
    /**
     * b/a − 1 below which the estimate itself is returned: it is then within about 1e-10 of the exact root
     * (4.2e-10 at b/a = 1.0001 and 4.2e-8 at 1.001, mpmath at 30 digits: the excess goes as (b/a − 1)²/24),
     * about as close as the condition can be evaluated there.
     */
    static final double THIN_GAP = 5e-5;
    /** b/a above which k_c·b is the circular guide's 1.8411838 to 1e-11 (4e-8 at b/a = 1e4, falling as (a/b)²). */
    static final double VERY_WIDE = 1e6;
    /** j′11, the first zero of J1′ (A&amp;S Table 9.5 gives 1.84118; the full digits from mpmath 1.3.0). */
    static final double FIRST_ZERO_OF_J1_SLOPE = 1.8411837813406593;

    private CoaxModes() {
    }

    /**
     * The dimensionless TE11 cutoff k_c·a.
     *
     * @param radiusRatio b/a &gt; 1
     * @return x = k_c·a; the free-space cutoff is x·c/(2πa)
     */
    public static double te11CutoffTimesInnerRadius(double radiusRatio) {
        if (!(radiusRatio > 1.0 && Double.isFinite(radiusRatio))) {
            throw new IllegalArgumentException("coax TE11: b/a = " + radiusRatio + " must be above 1");
        }
        double estimate = 2.0 / (1.0 + radiusRatio);
        if (radiusRatio - 1.0 < THIN_GAP) {
            // the two terms of the condition cancel to (b/a − 1)·…, and the estimate is exact to (b/a − 1)²/24
            return estimate;
        }
        if (radiusRatio > VERY_WIDE) {
            return FIRST_ZERO_OF_J1_SLOPE / radiusRatio; // the circular guide's TE11; Y1′(k_c·a) would overflow
        }
        double[] work = new double[4];
        return new BrentSolver(1e-15, 1e-16).solve(100, x -> wallSlopeCondition(x, radiusRatio, work),
                BRACKET_LOW * estimate, BRACKET_HIGH * estimate);
    }

    /**
     * J1′(x)·Y1′(ρx) − J1′(ρx)·Y1′(x), with x = k·a and ρ = b/a: zero where a TE1n field fits between the walls.
     * It is negative below the TE11 root and positive above it (up to the next root).
     */
    static double wallSlopeCondition(double x, double radiusRatio, double[] work) {
        SpecialFunctions.besselJY(x, work);
        double innerJ = work[0] - work[1] / x;
        double innerY = work[2] - work[3] / x;
        double outer = radiusRatio * x;
        SpecialFunctions.besselJY(outer, work);
        double outerJ = work[0] - work[1] / outer;
        double outerY = work[2] - work[3] / outer;
        return innerJ * outerY - outerJ * innerY;
    }
}
