package org.linesweep.physics;

import org.apache.commons.math3.complex.Complex;

/**
 * Internal (surface) impedance of conductors, valid from DC through the skin-effect regime without a
 * seam. All results are per metre of line (round conductors) or per square (flat conductors), Ω.
 */
public final class InternalImpedance {

    private static final Complex ONE_PLUS_J = new Complex(1.0, 1.0);

    private InternalImpedance() {
    }

    /**
     * Internal impedance of a solid round wire divided by its DC resistance, as a function of a/δ alone:
     * Z/R_dc = (z/2)·I0(z)/I1(z) with z = (1 + j)·a/δ. Exact for an isolated round wire or one inside a
     * concentric return (S. A. Schelkunoff, Bell Syst. Tech. J. 13, 1934, pp. 532-579; the Kelvin-function
     * form of the same result). Tends to 1 + j(a/δ)²/4 at low frequency (internal inductance μ/8π) and to
     * (1 + j)·a/(2δ) + 1/4 at high frequency.
     *
     * @param radiusOverSkinDepth a/δ, ≥ 0
     * @return Z_int/R_dc
     */
    public static Complex roundWireRatio(double radiusOverSkinDepth) {
        if (radiusOverSkinDepth == 0.0) {
            return Complex.ONE;
        }
        if (RoundWireTable.TABLE.covers(radiusOverSkinDepth)) {
            return roundWireRatioWithSlope(radiusOverSkinDepth)[0];
        }
        Complex z = ONE_PLUS_J.multiply(radiusOverSkinDepth);
        return z.multiply(0.5).multiply(SpecialFunctions.besselIRatio(z));
    }

    /**
     * d(Z/R_dc)/d(a/δ) of the round wire: with z = (1 + j)a/δ and ρ = I0/I1, dF/dz = ρ + (z/2)(1 − ρ²)
     * (from I0′ = I1 and I1′ = I0 − I1/z, A&amp;S 9.6.27), times dz/d(a/δ) = 1 + j.
     *
     * @return {Z/R_dc, d(Z/R_dc)/d(a/δ)}
     */
    public static Complex[] roundWireRatioWithSlope(double radiusOverSkinDepth) {
        if (radiusOverSkinDepth == 0.0) {
            return new Complex[] {Complex.ONE, Complex.ZERO};
        }
        if (RoundWireTable.TABLE.covers(radiusOverSkinDepth)) {
            return RoundWireTable.TABLE.valueAndSlope(radiusOverSkinDepth);
        }
        return exactRoundWireRatioWithSlope(radiusOverSkinDepth);
    }

    /**
     * The round wire's Z/R_dc and slope depend on a/δ alone, so one table serves every wire of every design:
     * {@link #ROUND_WIRE_TABLE_NODES_PER_UNIT_LOG} nodes per unit of ln(a/δ) from a/δ = 0.01 (below it the
     * series needs two terms) to 1000 (far into the asymptotic regime), built once on first use (about
     * 3,000 exact evaluations, about a millisecond).
     */
    static final int ROUND_WIRE_TABLE_NODES_PER_UNIT_LOG = 256;

    /** Holder: built on first use, by the class loader's lock. */
    static final class RoundWireTable {
        static final HermiteTable TABLE = HermiteTable.of(InternalImpedance::exactRoundWireRatioWithSlope, 0.01,
                1000.0, ROUND_WIRE_TABLE_NODES_PER_UNIT_LOG);

        private RoundWireTable() {
        }
    }

    /** The exact round-wire Z/R_dc and its slope from the Bessel functions (what the table is built from). */
    static Complex[] exactRoundWireRatioWithSlope(double radiusOverSkinDepth) {
        if (radiusOverSkinDepth == 0.0) {
            return new Complex[] {Complex.ONE, Complex.ZERO};
        }
        Complex z = ONE_PLUS_J.multiply(radiusOverSkinDepth);
        Complex rho = SpecialFunctions.besselIRatio(z);
        Complex ratio = z.multiply(0.5).multiply(rho);
        Complex slope = rho.add(z.multiply(0.5).multiply(Complex.ONE.subtract(rho.multiply(rho))))
                .multiply(ONE_PLUS_J);
        return new Complex[] {ratio, slope};
    }

    /**
     * Internal impedance per metre of a solid round wire of the given radius, including Hammerstad's
     * roughness factor.
     *
     * @return Z_int, Ω/m; zero for a perfect conductor
     */
    public static Complex roundWire(Conductor conductor, double radiusMetres, double frequencyHz) {
        if (conductor.isPerfect()) {
            return Complex.ZERO;
        }
        double dcResistance = 1.0 / (conductor.conductivitySiemensPerMetre() * Math.PI * radiusMetres * radiusMetres);
        if (frequencyHz <= 0) {
            return new Complex(dcResistance);
        }
        double ratio = radiusMetres / conductor.skinDepthMetres(frequencyHz);
        return roundWireRatio(ratio).multiply(dcResistance * conductor.roughnessFactor(frequencyHz));
    }

    /**
     * Internal impedance per metre of a tubular return conductor (current on the inside, no field outside):
     * <pre>Z = (g/(2πbσ))·[I0(gb)K1(gc) + K0(gb)I1(gc)] / [I1(gc)K1(gb) − I1(gb)K1(gc)],  g = (1 + j)/δ</pre>
     * with b the inner and c the outer radius (Schelkunoff 1934). Evaluated with exponentially scaled
     * Bessel functions: multiplying through by e^(gb − gc) leaves only the bounded factor e^(−2g(c − b)).
     * Tends to 1/(σπ(c² − b²)) at DC and to (1 + j)·Rs/(2πb) at high frequency.
     *
     * @return Z_int, Ω/m; zero for a perfect conductor
     */
    public static Complex tube(Conductor conductor, double innerRadiusMetres, double outerRadiusMetres,
            double frequencyHz) {
        if (frequencyHz <= 0 && !conductor.isPerfect()) {
            return new Complex(1.0 / (conductor.conductivitySiemensPerMetre() * Math.PI
                    * (outerRadiusMetres - innerRadiusMetres) * (outerRadiusMetres + innerRadiusMetres)));
        }
        if (conductor.isPerfect()) {
            return Complex.ZERO;
        }
        double dcResistance = 1.0 / (conductor.conductivitySiemensPerMetre() * Math.PI
                * (outerRadiusMetres - innerRadiusMetres) * (outerRadiusMetres + innerRadiusMetres));
        double x = innerRadiusMetres / conductor.skinDepthMetres(frequencyHz);
        return tubeRatio(x, outerRadiusMetres / innerRadiusMetres)
                .multiply(dcResistance * conductor.roughnessFactor(frequencyHz));
    }

    /** Nodes per unit of ln(b/δ) in a tube table. */
    static final int TUBE_TABLE_NODES_PER_UNIT_LOG = 128;

    /** Recently built tube tables by c/b: a drag of anything but the outer conductor keeps c/b and b/δ. */
    private static final RecentTables<Double> RECENT_TUBE_TABLES = new RecentTables<>(8);

    /** A tube table for c/b covering [xMin, xMax]: a recent one if it covers the range, else a new one. */
    static HermiteTable sharedTubeTable(double outerOverInnerRadius, double xMin, double xMax) {
        return RECENT_TUBE_TABLES.covering(outerOverInnerRadius, xMin, xMax,
                () -> tubeTable(outerOverInnerRadius, xMin, xMax));
    }

    /**
     * A table of the tube's full (thin-wall) Z/R_dc for one c/b over [xMin, xMax] of b/δ, its nodes read from
     * exact evaluations (four complex Bessel functions each) at Chebyshev points, some 25 per unit of ln(b/δ)
     * instead of 128 (see {@link ChebyshevSampler}): a drag of the outer conductor changes c/b at every step, so
     * this is built at every step. The caller decides whether a table pays.
     */
    static HermiteTable tubeTable(double outerOverInnerRadius, double xMin, double xMax) {
        return ChebyshevSampler.tableOf(HermiteTable.source(x -> tubeRatioWithSlope(x, outerOverInnerRadius)),
                xMin, xMax, TUBE_TABLE_NODES_PER_UNIT_LOG);
    }

    /**
     * The tube's Z/R_dc and its derivative with respect to x = b/δ. With T = (z_b/2)(κ² − 1)·N/D, κ = c/b and
     * z_c = κ·z_b, differentiating N and D with I0′ = I1, I1′ = I0 − I1/z, K0′ = −K1, K1′ = −K0 − K1/z
     * (A&amp;S 9.6.27, 9.6.28) reuses the same four function values at each radius.
     *
     * @return {T, dT/dx}
     */
    public static Complex[] tubeRatioWithSlope(double innerRadiusOverSkinDepth, double outerOverInnerRadius) {
        double kappa = outerOverInnerRadius;
        double wallOverSkinDepth = innerRadiusOverSkinDepth * (kappa - 1.0);
        if (wallOverSkinDepth > THICK_WALL_SKIN_DEPTHS) {
            return thickTubeRatioWithSlope(innerRadiusOverSkinDepth, kappa);
        }
        return fullTubeRatioWithSlope(innerRadiusOverSkinDepth, kappa);
    }

    /** The full tube formula and its slope, whatever the wall thickness. */
    static Complex[] fullTubeRatioWithSlope(double innerRadiusOverSkinDepth, double kappa) {
        Complex gb = ONE_PLUS_J.multiply(innerRadiusOverSkinDepth);
        Complex gc = gb.multiply(kappa);
        Complex[] ib = SpecialFunctions.scaledI(gb);
        Complex[] kb = SpecialFunctions.scaledK(gb);
        Complex[] ic = SpecialFunctions.scaledI(gc);
        Complex[] kc = SpecialFunctions.scaledK(gc);
        Complex decay = gb.subtract(gc).multiply(2.0).exp();
        Complex numerator = decay.multiply(ib[0]).multiply(kc[1]).add(kb[0].multiply(ic[1]));
        Complex denominator = ic[1].multiply(kb[1]).subtract(decay.multiply(ib[1]).multiply(kc[1]));
        // derivatives of N and D with respect to z_b, scaled by the same e^(z_b − z_c) as N and D
        Complex k0cPlus = kc[0].add(kc[1].divide(gc));
        Complex i0cMinus = ic[0].subtract(ic[1].divide(gc));
        Complex numeratorSlope = decay.multiply(ib[1].multiply(kc[1]).subtract(ib[0].multiply(k0cPlus).multiply(kappa)))
                .add(kb[0].multiply(i0cMinus).multiply(kappa).subtract(kb[1].multiply(ic[1])));
        Complex denominatorSlope = i0cMinus.multiply(kb[1]).multiply(kappa)
                .subtract(ic[1].multiply(kb[0].add(kb[1].divide(gb))))
                .add(decay.multiply(ib[1].multiply(k0cPlus).multiply(kappa)
                        .subtract(ib[0].subtract(ib[1].divide(gb)).multiply(kc[1]))));
        double areaFactor = (kappa - 1.0) * (kappa + 1.0);
        Complex quotient = numerator.divide(denominator);
        Complex ratio = gb.multiply(0.5 * areaFactor).multiply(quotient);
        Complex quotientSlope = numeratorSlope.multiply(denominator).subtract(numerator.multiply(denominatorSlope))
                .divide(denominator.multiply(denominator));
        Complex slopeInZ = quotient.add(gb.multiply(quotientSlope)).multiply(0.5 * areaFactor);
        return new Complex[] {ratio, slopeInZ.multiply(ONE_PLUS_J)};
    }

    /**
     * Wall thickness, in skin depths, above which the tube's outer surface no longer matters: the coupling
     * factor |e^(−2g·t)| = e^(−2t/δ) is then below e^(−40) ≈ 4e-18, under double precision.
     */
    static final double THICK_WALL_SKIN_DEPTHS = 20.0;

    /**
     * The tube once its wall is many skin depths thick: with e^(−2g·t) negligible, N/D = K0(z_b)/K1(z_b) = q
     * exactly to double precision, so T = (z_b/2)(κ² − 1)·q and dq/dz = −1 + q² + q/z (from K0′ = −K1,
     * K1′ = −K0 − K1/z).
     */
    static Complex[] thickTubeRatioWithSlope(double innerRadiusOverSkinDepth, double kappa) {
        double areaFactor = (kappa - 1.0) * (kappa + 1.0);
        Complex[] unit = thickTubeUnitRatioWithSlope(innerRadiusOverSkinDepth);
        return new Complex[] {unit[0].multiply(areaFactor), unit[1].multiply(areaFactor)};
    }

    /**
     * The thick-walled tube's Z/R_dc divided by (c/b)² − 1, T₁ = (z_b/2)·K0(z_b)/K1(z_b), and its derivative in
     * b/δ: a function of b/δ alone, so one shared table serves every thick-walled tube.
     */
    static Complex[] thickTubeUnitRatioWithSlope(double innerRadiusOverSkinDepth) {
        Complex gb = ONE_PLUS_J.multiply(innerRadiusOverSkinDepth);
        Complex[] kb = SpecialFunctions.scaledK(gb);
        Complex q = kb[0].divide(kb[1]);
        Complex ratio = gb.multiply(0.5).multiply(q);
        Complex qSlope = q.multiply(q).add(q.divide(gb)).subtract(1.0);
        Complex slopeInZ = q.add(gb.multiply(qSlope)).multiply(0.5);
        return new Complex[] {ratio, slopeInZ.multiply(ONE_PLUS_J)};
    }

    /**
     * Holder of the thick-walled tube's table, T₁ from b/δ = 0.5 to 10⁵ at {@link #TUBE_TABLE_NODES_PER_UNIT_LOG}
     * nodes per unit of ln(b/δ) (a wall thicker than 20 skin depths means b/δ above 20/(c/b − 1), so every
     * practical wall ratio falls inside; outside, the exact form serves). Built on first use, a few
     * milliseconds.
     */
    static final class ThickTubeTable {
        static final HermiteTable TABLE = HermiteTable.of(InternalImpedance::thickTubeUnitRatioWithSlope, 0.5, 1e5,
                TUBE_TABLE_NODES_PER_UNIT_LOG);

        private ThickTubeTable() {
        }
    }

    /**
     * The tube's internal impedance divided by its DC resistance; depends on b/δ and c/b only.
     *
     * @param innerRadiusOverSkinDepth b/δ, &gt; 0
     * @param outerOverInnerRadius c/b, &gt; 1
     */
    public static Complex tubeRatio(double innerRadiusOverSkinDepth, double outerOverInnerRadius) {
        return tubeRatioWithSlope(innerRadiusOverSkinDepth, outerOverInnerRadius)[0];
    }

    /**
     * Surface impedance of a flat conductor of thickness t carrying current on one face:
     * Z_s = (k/σ)·coth(k t), k = (1 + j)/δ, Ω per square. This is the exact one-dimensional result for a
     * plane conductor (Ramo, Whinnery and Van Duzer, Fields and Waves in Communication Electronics, the
     * plane-conductor internal impedance); it gives 1/(σt) at DC and (1 + j)·Rs once t ≫ δ.
     * An infinite thickness gives the thick-conductor value (1 + j)·Rs.
     *
     * @return Z_s per square; zero for a perfect conductor
     */
    public static Complex flatSurface(Conductor conductor, double thicknessMetres, double frequencyHz) {
        if (conductor.isPerfect()) {
            return Complex.ZERO;
        }
        double sigma = conductor.conductivitySiemensPerMetre();
        if (frequencyHz <= 0) {
            return new Complex(1.0 / (sigma * thicknessMetres));
        }
        double delta = conductor.skinDepthMetres(frequencyHz);
        double roughness = conductor.roughnessFactor(frequencyHz);
        if (Double.isInfinite(thicknessMetres)) {
            return ONE_PLUS_J.multiply(roughness / (sigma * delta));
        }
        // Z_s·σt = (k t)·coth(k t) = u·coth(u)
        return flatRatioWithSlope(thicknessMetres / delta)[0].multiply(roughness / (sigma * thicknessMetres));
    }

    /**
     * A flat conductor's Z_s/R_dc = u·coth u with u = (1 + j)·t/δ, and its derivative in t/δ: a function of t/δ
     * alone, so read from one shared table (like the round wire's) between t/δ = 0.01 and 1000 and computed
     * exactly outside it.
     */
    static Complex[] flatRatioWithSlope(double thicknessOverSkinDepth) {
        if (FlatTable.TABLE.covers(thicknessOverSkinDepth)) {
            return FlatTable.TABLE.valueAndSlope(thicknessOverSkinDepth);
        }
        return exactFlatRatioWithSlope(thicknessOverSkinDepth);
    }

    /** The exact u·coth u and its slope (what the table is built from). */
    static Complex[] exactFlatRatioWithSlope(double thicknessOverSkinDepth) {
        Complex argument = ONE_PLUS_J.multiply(thicknessOverSkinDepth);
        return new Complex[] {xCothX(argument), xCothXSlope(argument).multiply(ONE_PLUS_J)};
    }

    /** Holder of the flat conductor's table: built on first use. */
    static final class FlatTable {
        static final HermiteTable TABLE = HermiteTable.of(InternalImpedance::exactFlatRatioWithSlope, 0.01,
                1000.0, ROUND_WIRE_TABLE_NODES_PER_UNIT_LOG);

        private FlatTable() {
        }
    }

    /** d(x·coth x)/dx = coth x − x·(coth² x − 1), with its series for small |x|. */
    static Complex xCothXSlope(Complex x) {
        if (x.abs() < 0.01) {
            Complex square = x.multiply(x);
            return x.multiply(2.0 / 3.0).subtract(x.multiply(square).multiply(4.0 / 45.0))
                    .add(x.multiply(square).multiply(square).multiply(12.0 / 945.0));
        }
        Complex decay = x.multiply(-2.0).exp();
        Complex coth = Complex.ONE.add(decay).divide(Complex.ONE.subtract(decay));
        return coth.subtract(x.multiply(coth.multiply(coth).subtract(Complex.ONE)));
    }

    /**
     * R_ac/R_dc of a flat conductor of thickness t carrying current on one face: Re Z_s(t)·σt, including
     * roughness. NaN for a perfect conductor.
     */
    public static double flatResistanceRatio(Conductor conductor, double thicknessMetres, double frequencyHz) {
        if (conductor.isPerfect()) {
            return Double.NaN;
        }
        return flatSurface(conductor, thicknessMetres, frequencyHz).getReal()
                * conductor.conductivitySiemensPerMetre() * thicknessMetres;
    }

    /** x·coth(x) for Re x ≥ 0, accurate both for small |x| (series) and large |x| (no overflow). */
    static Complex xCothX(Complex x) {
        if (x.abs() < 0.01) {
            // x·coth x = 1 + x²/3 − x⁴/45 + 2x⁶/945 − …, next term of relative size |x|⁸
            Complex square = x.multiply(x);
            return Complex.ONE.add(square.multiply(1.0 / 3.0))
                    .subtract(square.multiply(square).multiply(1.0 / 45.0))
                    .add(square.multiply(square).multiply(square).multiply(2.0 / 945.0));
        }
        Complex decay = x.multiply(-2.0).exp();
        return x.multiply(Complex.ONE.add(decay)).divide(Complex.ONE.subtract(decay));
    }

    /**
     * Weight by which the proximity factor applies to a round wire: s = 1 − R_dc/R_ac, the part of the
     * wire's resistance due to the skin effect. It is 0 at DC (uniform current, no crowding) and tends to
     * 1 as the skin effect develops, so the factor X/sqrt(X² − 1), which is a high-frequency result,
     * fades in at the same pace as the skin effect.
     *
     * @param wireRatio Z_int/R_dc of the isolated wire
     * @param proximityFactor X/sqrt(X² − 1)
     * @return the blended multiplier 1 + s·(P − 1)
     */
    public static double blendedProximity(Complex wireRatio, double proximityFactor) {
        double skinWeight = 1.0 - 1.0 / wireRatio.getReal();
        return 1.0 + Math.max(0.0, skinWeight) * (proximityFactor - 1.0);
    }
}
