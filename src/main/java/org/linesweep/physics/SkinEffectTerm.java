package org.linesweep.physics;

import org.apache.commons.math3.complex.Complex;

/**
 * One conductor's share of a line's internal impedance per metre, with everything but the frequency worked out
 * when the line is built:
 * <pre>Z(ω) = w·R_dc·K(ω)·F(x),   x = s/δ = s·sqrt(πμσ)·sqrt(f),   ln x = ln(s·sqrt(πμσ)) + ½·ln f</pre>
 * where w is the geometry's weight, R_dc the conductor's DC resistance per metre (or per square), K
 * Hammerstad's roughness factor, s the conductor's size (radius, thickness) and F the shape's Z/R_dc from
 * {@link InternalImpedance}. Since x ∝ sqrt ω, dZ/dω = w·R_dc·[K′·F + K·(dF/d ln x)/(2ω)].
 *
 * <p>Why this form: the sweep knows ln f once per point, so each conductor's table coordinate is one
 * addition, and the value and slope come from one table lookup with no logarithm, division or object per
 * conductor. The tables are those of {@link InternalImpedance}; outside them the exact forms serve. Immutable
 * but for the coax tube's per-sweep table, which is replaced whole (safe to share between threads).
 */
final class SkinEffectTerm {

    private enum Shape {
        /** Solid round wire of radius s, optionally with a proximity factor blended in. */
        ROUND_WIRE,
        /** Flat conductor of thickness s carrying current on one face: u·coth u. */
        FLAT,
        /** Flat conductor of unbounded thickness: (1 + j)·x per unit size, x = 1/δ. */
        THICK_FLAT,
        /** Tube of inner radius s and outer radius κ·s with the return current inside. */
        TUBE
    }

    private final Shape shape;
    /** w·R_dc (THICK_FLAT: w/σ), Ω/m. */
    private final double scale;
    /** ln(s·sqrt(πμσ)): ln x at 1 Hz. */
    private final double logSizeAtOneHertz;
    /** s·sqrt(πμσ): x at 1 Hz. */
    private final double sizeAtOneHertz;
    /** ROUND_WIRE: the proximity factor P (1 for none). */
    private final double proximityFactor;
    /** TUBE: c/b. */
    private final double kappa;
    /** TUBE: ln x above which the wall is thick (x(κ − 1) &gt; 20). */
    private final double thickWallLogX;
    /** TUBE: this tube's table over a sweep's thin-wall range, or null. */
    private volatile HermiteTable tubeTable;

    private SkinEffectTerm(Shape shape, Conductor conductor, double sizeMetres, double dcResistance, double weight,
            double proximityFactor, double kappa) {
        this.shape = shape;
        this.scale = weight * dcResistance;
        double sqrtPiMuSigma = Math.sqrt(Math.PI * conductor.permeabilityHenryPerMetre()
                * conductor.conductivitySiemensPerMetre());
        this.sizeAtOneHertz = sizeMetres * sqrtPiMuSigma;
        this.logSizeAtOneHertz = Math.log(sizeAtOneHertz);
        this.proximityFactor = proximityFactor;
        this.kappa = kappa;
        this.thickWallLogX = Math.log(InternalImpedance.THICK_WALL_SKIN_DEPTHS / (kappa - 1.0));
    }

    /** A solid round wire of the given radius with the proximity factor P blended in (P = 1: isolated). */
    static SkinEffectTerm roundWire(Conductor conductor, double radiusMetres, double proximityFactor, double weight) {
        double dcResistance = 1.0 / (conductor.conductivitySiemensPerMetre() * Math.PI * radiusMetres * radiusMetres);
        return new SkinEffectTerm(Shape.ROUND_WIRE, conductor, radiusMetres, dcResistance, weight, proximityFactor,
                Double.NaN);
    }

    /** A flat conductor of the given thickness (infinite: the thick-conductor (1 + j)Rs), per square times weight. */
    static SkinEffectTerm flat(Conductor conductor, double thicknessMetres, double weight) {
        double sigma = conductor.conductivitySiemensPerMetre();
        if (Double.isInfinite(thicknessMetres)) {
            return new SkinEffectTerm(Shape.THICK_FLAT, conductor, 1.0, 1.0 / sigma, weight, 1.0, Double.NaN);
        }
        return new SkinEffectTerm(Shape.FLAT, conductor, thicknessMetres, 1.0 / (sigma * thicknessMetres), weight,
                1.0, Double.NaN);
    }

    /** A tube of inner radius b and outer radius c carrying the return current on its inside. */
    static SkinEffectTerm tube(Conductor conductor, double innerRadiusMetres, double outerRadiusMetres) {
        double dcResistance = 1.0 / (conductor.conductivitySiemensPerMetre() * Math.PI
                * (outerRadiusMetres - innerRadiusMetres) * (outerRadiusMetres + innerRadiusMetres));
        return new SkinEffectTerm(Shape.TUBE, conductor, innerRadiusMetres, dcResistance, 1.0, 1.0,
                outerRadiusMetres / innerRadiusMetres);
    }

    /** s/δ at f. */
    double sizeOverSkinDepth(double frequencyHz) {
        return sizeAtOneHertz * Math.sqrt(frequencyHz);
    }

    /** Below b/δ = 0.01 the tube is at its DC value to 1e-9; the exact form is cheap there. */
    static final double TUBE_TABLE_SMALLEST_X = 0.01;

    /**
     * For a tube: tabulates its thin-wall Z/R_dc (b/δ below 20 skin depths of wall) over the sweep's range when
     * that costs fewer exact evaluations (four complex Bessel functions each) than the sweep's points there
     * (see {@link ChebyshevSampler#pays}), reusing a recent table of the same c/b when it covers the range.
     * Other shapes read shared tables and need nothing.
     */
    void prepareForSweep(double[] frequenciesHz, int count) {
        if (shape != Shape.TUBE) {
            return;
        }
        double thickLimit = Math.exp(thickWallLogX);
        double low = Double.POSITIVE_INFINITY;
        double high = 0.0;
        int inside = 0;
        for (int i = 0; i < count; i++) {
            double x = sizeOverSkinDepth(frequenciesHz[i]);
            if (x <= thickLimit && x >= TUBE_TABLE_SMALLEST_X) {
                inside++;
                low = Math.min(low, x);
                high = Math.max(high, x);
            }
        }
        HermiteTable existing = tubeTable;
        if (inside < 2 || !(high > low) || (existing != null && existing.covers(low) && existing.covers(high))) {
            return;
        }
        if (ChebyshevSampler.pays(low, high, InternalImpedance.TUBE_TABLE_NODES_PER_UNIT_LOG, inside)) {
            tubeTable = InternalImpedance.sharedTubeTable(kappa, low, high);
        }
    }

    /**
     * Adds this conductor's Z and dZ/dω at the point {@code p} describes (its ln f, sqrt f, ω and roughness
     * factor, set by {@link LineModel#beginPoint}) to p's accumulated internal impedance.
     */
    void addTo(LineParameters p) {
        double[] f = p.lookup;
        shapeAt(p, f);
        double k = p.roughness;
        double kSlope = p.roughnessSlope;
        double half = 0.5 * p.inverseOmega;
        p.impedanceRe += scale * k * f[0];
        p.impedanceIm += scale * k * f[1];
        p.impedanceReSlope += scale * (kSlope * f[0] + k * f[2] * half);
        p.impedanceImSlope += scale * (kSlope * f[1] + k * f[3] * half);
    }

    /**
     * Writes F and dF/d ln x at the point into {@code f}. Each shape's path is its own small method, the exact
     * forms outside the tables too, so that the compiler inlines the common path into the sweep's loop.
     */
    private void shapeAt(LineParameters p, double[] f) {
        double u = logSizeAtOneHertz + 0.5 * p.logFrequency;
        switch (shape) {
            case ROUND_WIRE -> roundWire(u, f);
            case FLAT -> flat(u, f);
            case THICK_FLAT -> thickFlat(p, f);
            case TUBE -> tube(u, f);
            default -> throw new IllegalStateException(shape.toString());
        }
    }

    private void roundWire(double u, double[] f) {
        HermiteTable table = InternalImpedance.RoundWireTable.TABLE;
        if (table.coversLog(u)) {
            table.evaluateLog(u, f);
        } else {
            exactRoundWire(u, f);
        }
        if (proximityFactor != 1.0) {
            blendProximity(f);
        }
    }

    private static void exactRoundWire(double u, double[] f) {
        double x = Math.exp(u);
        exact(InternalImpedance.exactRoundWireRatioWithSlope(x), x, f);
    }

    private static void flat(double u, double[] f) {
        HermiteTable table = InternalImpedance.FlatTable.TABLE;
        if (table.coversLog(u)) {
            table.evaluateLog(u, f);
        } else {
            exactFlat(u, f);
        }
    }

    private static void exactFlat(double u, double[] f) {
        double x = Math.exp(u);
        exact(InternalImpedance.exactFlatRatioWithSlope(x), x, f);
    }

    /** (1 + j)·x with x = 1/δ (unit size), whose slope in ln x is itself. */
    private void thickFlat(LineParameters p, double[] f) {
        double x = sizeAtOneHertz * p.sqrtFrequency;
        f[0] = x;
        f[1] = x;
        f[2] = x;
        f[3] = x;
    }

    /** The tube's T and dT/d ln x: the thick-wall table, this tube's sweep table, or the exact form. */
    private void tube(double u, double[] f) {
        if (u > thickWallLogX && InternalImpedance.ThickTubeTable.TABLE.coversLog(u)) {
            InternalImpedance.ThickTubeTable.TABLE.evaluateLog(u, f);
            double areaFactor = (kappa - 1.0) * (kappa + 1.0);
            for (int i = 0; i < 4; i++) {
                f[i] *= areaFactor;
            }
            return;
        }
        HermiteTable table = tubeTable;
        if (table != null && table.coversLog(u)) {
            table.evaluateLog(u, f);
            return;
        }
        exactTube(u, f);
    }

    private void exactTube(double u, double[] f) {
        double x = Math.exp(u);
        exact(InternalImpedance.tubeRatioWithSlope(x, kappa), x, f);
    }

    /** Writes an exact {F, dF/dx} as {Re F, Im F, Re dF/d ln x, Im dF/d ln x}. */
    private static void exact(Complex[] valueAndSlope, double x, double[] f) {
        f[0] = valueAndSlope[0].getReal();
        f[1] = valueAndSlope[0].getImaginary();
        f[2] = x * valueAndSlope[1].getReal();
        f[3] = x * valueAndSlope[1].getImaginary();
    }

    /**
     * The wire's F times the blended proximity multiplier B = 1 + s·(P − 1), s = max(0, 1 − 1/Re F) (see
     * {@link InternalImpedance#blendedProximity}), and its slope F′·B + F·B′ with B′ = (P − 1)·Re F′/(Re F)²
     * while s &gt; 0.
     */
    private void blendProximity(double[] f) {
        double inverseRatio = 1.0 / f[0];
        double skinWeight = 1.0 - inverseRatio;
        double blended;
        double blendSlope;
        if (skinWeight > 0.0) {
            blended = 1.0 + skinWeight * (proximityFactor - 1.0);
            blendSlope = (proximityFactor - 1.0) * f[2] * inverseRatio * inverseRatio;
        } else {
            blended = 1.0;
            blendSlope = 0.0;
        }
        double re = f[0];
        double im = f[1];
        f[0] = re * blended;
        f[1] = im * blended;
        f[2] = f[2] * blended + re * blendSlope;
        f[3] = f[3] * blended + im * blendSlope;
    }
}
