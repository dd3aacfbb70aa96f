package org.linesweep.physics;

/**
 * Closed forms for microstrip (width w, substrate height h, strip thickness t), quasi-TEM.
 *
 * <p>Static impedance and effective permittivity: E. Hammerstad and Ø. Jensen, "Accurate models for
 * microstrip computer-aided design", IEEE MTT-S International Microwave Symposium Digest, 1980,
 * pp. 407-409, including their thickness correction (widths in units of h, t_n = t/h). Stated accuracy:
 * Z0 of the air line better than 0.03 % for u ≤ 1000; ε_eff better than 0.2 % for εr ≤ 128 and
 * 0.01 ≤ u ≤ 100.
 *
 * <p>Dispersion: M. Kirschning and R. H. Jansen, "Accurate model for effective dielectric constant of
 * microstrip with validity up to millimetre-wave frequencies", Electronics Letters 18(6), 1982,
 * pp. 272-273; stated validity 0.1 ≤ u ≤ 100, εr ≤ 20, h/λ0 ≤ 0.13, accuracy 0.6 %. We feed it u = w/h
 * and the thickness-corrected static ε_eff.
 */
public final class MicrostripFormulas {

    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;

    private MicrostripFormulas() {
    }

    /** Hammerstad-Jensen Z01(u): air-filled, zero-thickness impedance, Ω. */
    public static double airImpedanceZeroThickness(double u) {
        double f = 6.0 + (2.0 * Math.PI - 6.0) * Math.exp(-Math.pow(30.666 / u, 0.7528));
        return ETA0 / (2.0 * Math.PI) * Math.log(f / u + Math.sqrt(1.0 + 4.0 / (u * u)));
    }

    /** Hammerstad-Jensen zero-thickness effective permittivity ε_e(u, εr). */
    public static double effectivePermittivityZeroThickness(double u, double relativePermittivity) {
        double u4 = u * u * u * u;
        double a = 1.0 + Math.log((u4 + (u / 52.0) * (u / 52.0)) / (u4 + 0.432)) / 49.0
                + Math.log(1.0 + Math.pow(u / 18.1, 3)) / 18.7;
        double b = 0.564 * Math.pow((relativePermittivity - 0.9) / (relativePermittivity + 3.0), 0.053);
        return (relativePermittivity + 1.0) / 2.0
                + (relativePermittivity - 1.0) / 2.0 * Math.pow(1.0 + 10.0 / u, -a * b);
    }

    /** Hammerstad-Jensen width increment of the air line for normalised thickness t_n = t/h. */
    static double airWidthIncrement(double u, double normalisedThickness) {
        if (normalisedThickness <= 0) {
            return 0.0;
        }
        double coth = 1.0 / Math.tanh(Math.sqrt(6.517 * u));
        return normalisedThickness / Math.PI
                * Math.log(1.0 + 4.0 * Math.E / (normalisedThickness * coth * coth));
    }

    /**
     * Air-filled impedance with thickness, Z01(u + Δu1), Ω: the quantity Wheeler's incremental-inductance
     * rule differentiates for the conductor loss.
     */
    public static double airImpedance(double widthMetres, double heightMetres, double thicknessMetres) {
        double u = widthMetres / heightMetres;
        return airImpedanceZeroThickness(u + airWidthIncrement(u, thicknessMetres / heightMetres));
    }

    /**
     * Static (quasi-TEM) impedance and effective permittivity with the thickness correction.
     *
     * @return {Z0 in Ω, ε_eff}
     */
    public static double[] staticImpedanceAndPermittivity(double u, double normalisedThickness,
            double relativePermittivity) {
        double airIncrement = airWidthIncrement(u, normalisedThickness);
        double dielectricIncrement = 0.5 * (1.0 + 1.0 / Math.cosh(Math.sqrt(relativePermittivity - 1.0)))
                * airIncrement;
        double u1 = u + airIncrement;
        double ur = u + dielectricIncrement;
        double z1 = airImpedanceZeroThickness(u1);
        double zr = airImpedanceZeroThickness(ur);
        double effective = effectivePermittivityZeroThickness(ur, relativePermittivity) * (z1 / zr) * (z1 / zr);
        return new double[] {zr / Math.sqrt(effective), effective};
    }

    /**
     * Kirschning-Jansen ε_eff(f).
     *
     * @param staticEffective ε_eff(0)
     * @param u w/h
     * @param relativePermittivity εr
     * @param frequencyTimesHeight f·h in Hz·m
     */
    public static double dispersiveEffectivePermittivity(double staticEffective, double u,
            double relativePermittivity, double frequencyTimesHeight) {
        double[] out = new double[4];
        new Dispersion(u).evaluate(staticEffective, relativePermittivity, frequencyTimesHeight * 1e-6,
                Math.log(frequencyTimesHeight * 1e-6), out);
        return out[0];
    }

    /**
     * Kirschning-Jansen dispersion for one strip width u = w/h, with the terms in u alone worked out once:
     * <pre>ε_eff(f) = εr − (εr − ε_eff(0))/(1 + P),   P = P1·P2·((0.1844 + P3·P4)·fn)^1.5763</pre>
     * with fn = f·h in GHz·mm and P1(u, fn), P2(εr), P3(u, fn), P4(εr) as in the 1982 letter, and its partial
     * derivatives in fn, εr and ε_eff(0) in closed form (each P's derivative by the chain rule), so a sweep
     * needs one evaluation a point and no numerical difference. Immutable.
     */
    static final class Dispersion {
        private static final double EXPONENT = 1.5763;
        private final double u;
        /** 0.27488 + 0.6315u − 0.065683·e^(−8.7513u): P1 without its fn-dependent part. */
        private final double p1Base;
        /** 0.0363·e^(−4.6u). */
        private final double p3Scale;

        Dispersion(double u) {
            this.u = u;
            this.p1Base = 0.27488 + 0.6315 * u - 0.065683 * Math.exp(-8.7513 * u);
            this.p3Scale = 0.0363 * Math.exp(-4.6 * u);
        }

        /**
         * @param fn f·h in GHz·mm, &gt; 0
         * @param logFn ln fn (the sweep knows ln f, so this costs no logarithm)
         * @param out receives {ε_eff, ∂ε_eff/∂fn, ∂ε_eff/∂εr, ∂ε_eff/∂ε_eff(0)}
         */
        void evaluate(double staticEffective, double relativePermittivity, double fn, double logFn, double[] out) {
            double er = relativePermittivity;
            double inverseFn = Math.exp(-logFn);
            // P1 = p1Base + 0.525u/(1 + 0.0157fn)^20
            double inverseBase = 1.0 / (1.0 + 0.0157 * fn);
            double b2 = inverseBase * inverseBase;
            double b4 = b2 * b2;
            double b16 = b4 * b4 * b4 * b4;
            double inverse20 = b16 * b4;
            double p1 = p1Base + 0.525 * u * inverse20;
            double p1Fn = -0.525 * u * 20.0 * 0.0157 * inverse20 * inverseBase;
            // P2 = 0.33622(1 − e^(−0.03442εr))
            double e2 = Math.exp(-0.03442 * er);
            double p2 = 0.33622 * (1.0 - e2);
            double p2Er = 0.33622 * 0.03442 * e2;
            // P3 = p3Scale·(1 − e^(−w)), w = (fn/38.7)^4.97
            double w = Math.exp(4.97 * (logFn - LN_38_7));
            double ew = Math.exp(-w);
            double p3 = p3Scale * (1.0 - ew);
            double p3Fn = p3Scale * ew * 4.97 * w * inverseFn;
            // P4 = 1 + 2.751(1 − e^(−y)), y = (εr/15.916)^8, dy/dεr = 8y/εr = 8r⁷/15.916
            double r = er / 15.916;
            double r2 = r * r;
            double r4 = r2 * r2;
            double y = r4 * r4;
            double ey = Math.exp(-y);
            double p4 = 1.0 + 2.751 * (1.0 - ey);
            double p4Er = 2.751 * ey * 8.0 * r4 * r2 * r / 15.916;
            // X = (Q·fn)^1.5763, Q = 0.1844 + P3·P4
            double q = 0.1844 + p3 * p4;
            double inverseQ = 1.0 / q;
            double x = Math.exp(EXPONENT * (Math.log(q) + logFn));
            double xFn = EXPONENT * x * (p3Fn * p4 * inverseQ + inverseFn);
            double xEr = EXPONENT * x * p3 * p4Er * inverseQ;
            double p = p1 * p2 * x;
            double pFn = p2 * (p1Fn * x + p1 * xFn);
            double pEr = p1 * (p2Er * x + p2 * xEr);
            double inverseOnePlusP = 1.0 / (1.0 + p);
            double excess = er - staticEffective;
            double effectiveP = excess * inverseOnePlusP * inverseOnePlusP;
            out[0] = er - excess * inverseOnePlusP;
            out[1] = effectiveP * pFn;
            out[2] = 1.0 - inverseOnePlusP + effectiveP * pEr;
            out[3] = inverseOnePlusP;
        }
    }

    private static final double LN_38_7 = Math.log(38.7);
}
